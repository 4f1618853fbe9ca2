package org.hobwright.samples.e2e;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.hobwright.post.nc.NcReader;
import org.hobwright.samples.host.CycleImport;
import org.hobwright.samples.host.Operation;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/**
 * Every sample job that plans cleanly, read back from its files by independent means: the
 * program (read by the post tests' {@link NcReader}) starts with the dialect's safe start before
 * any spindle or axis move, retracting the radial axis alone to the machine's radial limit, and
 * ends with the dialect's safe end after the last move; the program number and the tool station
 * it calls are the job file's (else the dialect file's defaults) and the ones the setup sheet and
 * the report give; the sheet's axial zero and feed
 * direction agree with the way the program's cutting moves run; the sheet names the hob's gashes and
 * the work material of the job file; and the report's batch times add up
 * from the cycle CSV's step times and the machine profile's load and unload times (time per part =
 * load + the sum of the steps + unload, batch time = parts × time per part).
 */
class BatchAndProgramTest {
    private static final JsonMapper JSON = JsonMapper.builder().build();

    static Stream<String> jobs() throws IOException {
        return ClimbAndConventionalTest.jobs();
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("jobs")
    void theProgramStartsAndEndsSafeAndTheNumbersAgree(String job, @TempDir Path work) throws IOException {
        PlanRun run = PlanRun.of(job, work);
        assertEquals(0, run.exitCode(), run.describe());
        SampleFiles files = SampleFiles.of(job);
        JsonNode jobTree = files.job();
        JsonNode machine = files.machine();
        JsonNode dialect = files.dialect();
        NcReader reader = new NcReader(files.dialectText());
        List<NcReader.Block> blocks = reader.blocks(Files.readString(run.file(".nc")));

        int safeStart = first(blocks, "safeStart");
        int firstMove = first(blocks, "workSpindle", "syncOn", "syncOnHelix", "rapid", "feed", "swivel", "hobShift");
        assertTrue(safeStart >= 0 && safeStart < firstMove, "the safe start before any spindle or axis move");
        NcReader.Block retract = blocks.stream().filter(b -> b.is("safeStart") && b.values().containsKey("safeRadial"))
                .findFirst().orElseThrow();
        String axial = dialect.at("/axes/axial/letter").asString();
        assertTrue(retract.word(axial).isEmpty(), "the radial axis alone: " + retract.text());
        double radialMax = machine.at("/travel/radialMax").asDouble();
        boolean diameter = dialect.at("/axes/radial/diameter").asBoolean(false);
        double unit = jobTree.get("units").asString().equals("in") ? 25.4 : 1;
        double expected = (diameter ? radialMax : radialMax / 2) / unit;
        double oneUnit = Math.pow(10, -reader.decimals(unit == 1 ? "mm" : "in"));
        double safe = retract.number("safeRadial");
        assertTrue(safe <= expected + 1e-9 && safe > expected - oneUnit - 1e-9,
                "the safe start at the radial limit " + expected + ", never past it: " + safe);

        int safeEnd = last(blocks, "safeEnd");
        int lastMove = last(blocks, "rapid", "feed");
        int end = last(blocks, "programEnd");
        assertTrue(lastMove < safeEnd && safeEnd < end, "the safe end after the last move, before the end");

        String program = blocks.stream().filter(b -> b.is("programStart")).findFirst().orElseThrow()
                .values().get("programNumber");
        String tool = blocks.stream().filter(b -> b.is("toolCall")).findFirst().orElseThrow().values().get("tool");
        long givenProgram = jobTree.at("/cycle/programNumber").asLong(dialect.at("/programNumber/default").asLong());
        long givenTool = jobTree.at("/cycle/toolStation").asLong(dialect.at("/toolStation/default").asLong());
        assertEquals(givenProgram, Long.parseLong(program), "the job's program number, else the dialect's default");
        assertEquals(givenTool, Long.parseLong(tool), "the job's tool station, else the dialect's default");
        JsonNode report = JSON.readTree(Files.readString(run.file(".report.json")));
        assertEquals(Long.parseLong(program), report.at("/program/number").asLong(), "report and program");
        assertEquals(Long.parseLong(tool), report.at("/program/toolStation").asLong(), "report and program");
        String sheet = Files.readString(run.file(".setup.html"));
        assertTrue(sheet.contains("Program " + program + " ·"), "the sheet's program number " + program);
        assertTrue(sheet.contains("hob station " + tool + " ·"), "the sheet's tool station " + tool);

        String z = dialect.at("/axes/axial/letter").asString();
        boolean zTowardChuck = sheet.contains(z + "+ toward the chuck");
        assertTrue(zTowardChuck || sheet.contains(z + "+ away from the chuck"), "the sheet says which way " + z
                + " counts");
        boolean feedTowardChuck = sheet.contains("from the front face toward the chuck");
        assertTrue(feedTowardChuck || sheet.contains("from the chuck side toward the front face"), "the feed direction");
        assertEquals(feedTowardChuck == zTowardChuck ? 1 : -1, ClimbAndConventionalTest.feedSign(blocks),
                "the program's cutting moves run the way the sheet says");
        assertTrue(sheet.contains("· " + jobTree.at("/hob/gashes").asInt() + " gashes ·"), "the hob's gashes");
        assertTrue(sheet.contains("Work material " + jobTree.at("/cycle/workMaterial").asString() + " ·"),
                "the work material");

        List<Operation> ops = CycleImport.operations(Files.readString(run.file(".csv")));
        double steps = ops.stream().mapToDouble(Operation::seconds).sum();
        double load = machine.at("/times/load").asDouble(0);
        double unload = machine.at("/times/unload").asDouble(0);
        int parts = jobTree.at("/cycle/batchSize").asInt(1);
        double perPart = report.at("/batch/timePerPart").asDouble();
        assertEquals(parts, report.at("/batch/parts").asInt());
        assertEquals(load + steps + unload, perPart, 0.001 * ops.size() + 1e-9, "load + steps + unload");
        assertEquals(parts * perPart, report.at("/batch/batchTime").asDouble(), 1e-6 * parts * perPart);
        assertFalse(sheet.contains("counted as 0 s"), "the sample machines give their load and unload times");
    }

    private static int first(List<NcReader.Block> blocks, String... templates) {
        for (int i = 0; i < blocks.size(); i++) {
            for (String t : templates) {
                if (blocks.get(i).is(t)) {
                    return i;
                }
            }
        }
        return Integer.MAX_VALUE;
    }

    private static int last(List<NcReader.Block> blocks, String... templates) {
        for (int i = blocks.size() - 1; i >= 0; i--) {
            for (String t : templates) {
                if (blocks.get(i).is(t)) {
                    return i;
                }
            }
        }
        return -1;
    }
}
