package org.hobwright.wizard.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/** {@code plan} and {@code demo} with the writers of the post module. */
class PlanRunTest {
    private static final String SAMPLE = Store.builtinText("jobs/metering-pump-gear.json");

    @TempDir
    Path dir;

    private static List<String> names(Path folder) throws IOException {
        try (Stream<Path> s = Files.list(folder)) {
            return s.map(p -> p.getFileName().toString()).sorted().toList();
        }
    }

    @Test
    void demoWritesEveryOutputAndSaysWhatItWrote() throws IOException {
        Path out = dir.resolve("out");
        Cli.Run r = Cli.run(dir.resolve("home"), "demo", "--out", out.toString());
        assertEquals(ExitCodes.OK, r.code(), r::toString);
        List<String> files = names(out);
        assertTrue(files.size() >= 4, files::toString);   // program, CSV, setup sheet, report
        assertTrue(files.stream().anyMatch(f -> f.endsWith(".csv")), files::toString);
        assertTrue(r.out().contains("Wrote " + files.size() + " files to " + out), r::toString);
        assertTrue(r.out().contains(" mm"), "values carry their units: " + r.out());
        assertTrue(r.out().contains("Caution"), r::toString);
    }

    @Test
    void theSameJobAndDateGiveTheSameBytes() throws IOException {
        Map<String, String> env = Map.of("HOBWRIGHT_HOME", dir.resolve("home").toString(),
                "SOURCE_DATE_EPOCH", "1764547200");      // 2025-12-01T00:00:00Z
        Path a = dir.resolve("a");
        Path b = dir.resolve("b");
        assertEquals(ExitCodes.OK, Cli.run(env, "", getClass().getClassLoader(), "demo", "--out", a.toString()).code());
        assertEquals(ExitCodes.OK, Cli.run(dir.resolve("home"), "demo", "--out", b.toString(), "--date",
                "2025-12-01").code());
        assertEquals(names(a), names(b));
        for (String name : names(a)) {
            assertArrayEquals(Files.readAllBytes(a.resolve(name)), Files.readAllBytes(b.resolve(name)), name);
        }
        String report = names(a).stream().filter(n -> n.endsWith(".json")).findFirst().map(a::resolve)
                .map(p -> readString(p)).orElseThrow();
        assertTrue(report.contains("2025-12-01"), "the injected date is printed");
    }

    @Test
    void aFolderOfJobsIsPlannedInOneRun() throws IOException {
        Path jobs = Files.createDirectory(dir.resolve("jobs"));
        Files.writeString(jobs.resolve("a.json"), SAMPLE.replace("\"metering-pump-gear\"", "\"gear-a\""));
        Files.writeString(jobs.resolve("b.json"), SAMPLE.replace("\"metering-pump-gear\"", "\"gear-b\""));
        Path out = dir.resolve("out");
        Cli.Run r = Cli.run(dir.resolve("home"), "plan", jobs.toString(), "--out", out.toString(), "--json");
        assertEquals(ExitCodes.OK, r.code(), r::toString);
        JsonNode reports = JsonMapper.shared().readTree(r.out());
        assertTrue(reports.isArray() && reports.size() == 2, r::toString);
        List<String> files = names(out);
        assertTrue(files.stream().anyMatch(f -> f.startsWith("gear-a")) && files.stream()
                .anyMatch(f -> f.startsWith("gear-b")), files::toString);
        assertTrue(r.err().contains("gear-a") && r.err().contains("gear-b"), "the summary goes to standard error");
    }

    @Test
    void oneBadJobOfSeveralStopsTheWholeRun() throws IOException {
        Path good = Files.writeString(dir.resolve("good.json"), SAMPLE);
        Path bad = Files.writeString(dir.resolve("bad.json"), SAMPLE.replace("\"metering-pump-gear\"", "\"bad\"")
                .replace("\"helixAngle\": 0", "\"helixAngle\": 15, \"hand\": \"left\""));
        Path out = dir.resolve("out");
        Cli.Run r = Cli.run(dir.resolve("home"), "plan", good.toString(), bad.toString(), "--out", out.toString());
        assertEquals(ExitCodes.JOB_ERRORS, r.code(), r::toString);
        // varrow-1605 cannot follow a helix (samples/scenario/machines/varrow-1605.json)
        assertTrue(r.out().contains("MACHINE_NO_HELIX"), r::toString);
        assertFalse(Files.exists(out), "nothing may be written");
    }

    @Test
    void theJsonReportOfAJobWithErrorsHasItsFindingsAndWhatCouldBeComputed() throws IOException {
        Path bad = Files.writeString(dir.resolve("bad.json"), SAMPLE
                .replace("\"helixAngle\": 0", "\"helixAngle\": 15, \"hand\": \"left\""));
        Cli.Run r = Cli.run(dir.resolve("home"), "plan", bad.toString(), "--json");
        assertEquals(ExitCodes.JOB_ERRORS, r.code(), r::toString);
        JsonNode report = JsonMapper.shared().readTree(r.out());
        assertTrue(report.at("/findings").valueStream().anyMatch(f -> f.at("/code").asString()
                .equals("MACHINE_NO_HELIX")), r::toString);
        // d = z m_n / cos β = 24 × 1 / cos 15° (ISO 21771 reference diameter)
        assertEquals(24 / Math.cos(Math.toRadians(15)), report.at("/gear/referenceDiameter").doubleValue(), 1e-9,
                r::toString);
    }

    @Test
    void theMachineAndFastestOptionsReachThePlan() throws IOException {
        Path job = Files.writeString(dir.resolve("job.json"), SAMPLE.replace("\"helixAngle\": 0",
                "\"helixAngle\": 15, \"hand\": \"right\"").replace("\"blankDiameter\": 26.0,", ""));
        Cli.Run r = Cli.run(dir.resolve("home"), "plan", job.toString(), "--machine", "ottmere-4008", "--fastest",
                "--json");
        assertEquals(ExitCodes.OK, r.code(), r::toString);
        assertTrue(r.err().contains("fastest proposal"), r::toString);
        Path machineFile = Files.writeString(dir.resolve("m.json"), Store.builtinText("machines/ottmere-4008.json"));
        Cli.Run fromFile = Cli.run(dir.resolve("home"), "plan", job.toString(), "--machine", machineFile.toString(),
                "--json");
        assertEquals(ExitCodes.OK, fromFile.code(), fromFile::toString);
    }

    private static String readString(Path p) {
        try {
            return Files.readString(p);
        } catch (IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
    }

    /** --out naming a file is refused before anything is planned, and the file is left alone. */
    @Test
    void anOutputFolderThatIsAFileIsRefusedBeforePlanning() throws IOException {
        Path file = Files.writeString(dir.resolve("not-a-folder"), "keep");
        Path job = Files.writeString(dir.resolve("job.json"), Store.builtinText("jobs/metering-pump-gear.json"));
        Cli.Run r = Cli.run(dir.resolve("home"), "plan", job.toString(), "--out", file.toString());
        assertEquals(ExitCodes.USAGE, r.code(), r::toString);
        assertTrue(r.err().contains("is a file, not a folder"), r::toString);
        assertTrue(r.out().isBlank(), "no planned summary before the refusal: " + r);
        assertEquals("keep", Files.readString(file));
    }

    /** A second run into the same folder names every file it replaced. */
    @Test
    void replacedOutputsAreNamed() throws IOException {
        Path job = Files.writeString(dir.resolve("job.json"), Store.builtinText("jobs/metering-pump-gear.json"));
        Path out = dir.resolve("out");
        Cli.Run first = Cli.run(dir.resolve("home"), "plan", job.toString(), "--out", out.toString());
        assertEquals(ExitCodes.OK, first.code(), first::toString);
        assertFalse(first.out().contains("Replaced"), first::toString);
        Cli.Run again = Cli.run(dir.resolve("home"), "plan", job.toString(), "--out", out.toString());
        assertEquals(ExitCodes.OK, again.code(), again::toString);
        assertTrue(again.out().contains("Replaced 4 older files of the same names: metering-pump-gear.nc,"), again::toString);
    }

    /**
     * The fastest proposal says which job values give it; planned with them, the job takes the
     * proposed time (within 2 %: the values are printed rounded down).
     */
    @Test
    void theFastestProposalCanBeApplied() throws IOException {
        Path job = Files.writeString(dir.resolve("job.json"), SAMPLE);
        Cli.Run r = Cli.run(dir.resolve("home"), "plan", job.toString(), "--fastest", "--json");
        assertEquals(ExitCodes.OK, r.code(), r::toString);
        String line = r.err().lines().filter(l -> l.contains("fastest proposal: ")).findFirst().orElseThrow();
        double time = Double.parseDouble(between(line, "fastest proposal: ", " s in "));
        String speed = between(line, "cycle.cuttingSpeed ", ", ");
        String rough = between(line, "cycle.roughFeed ", " and ");
        String finish = line.substring(line.indexOf("cycle.finishFeed ") + "cycle.finishFeed ".length()).strip();
        Path fast = Files.writeString(dir.resolve("fast.json"), SAMPLE.replace("\"workMaterial\": \"steel-free-machining\",",
                "\"workMaterial\": \"steel-free-machining\", \"cuttingSpeed\": " + speed + ", \"roughFeed\": " + rough
                        + ", \"finishFeed\": " + finish + ","));
        Cli.Run applied = Cli.run(dir.resolve("home"), "plan", fast.toString(), "--json");
        assertEquals(ExitCodes.OK, applied.code(), applied::toString);
        double planned = JsonMapper.shared().readTree(applied.out()).at("/cycle/cycleTime").doubleValue();
        assertEquals(time, planned, 0.02 * time, line + "\n" + applied);
    }

    private static String between(String text, String before, String after) {
        int start = text.indexOf(before) + before.length();
        return text.substring(start, text.indexOf(after, start));
    }
}
