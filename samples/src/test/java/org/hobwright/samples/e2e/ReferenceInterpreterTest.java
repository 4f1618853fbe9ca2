package org.hobwright.samples.e2e;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.concurrent.TimeUnit;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.hobwright.post.nc.NcReader;
import org.hobwright.samples.host.CycleImport;
import org.hobwright.samples.host.Operation;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import tools.jackson.databind.JsonNode;

/**
 * Every sample program, with the blocks of the dialects' invented words (M100 to M199, the range
 * the RS274/NGC reference interpreter leaves to the user: hob spindle, synchronisation, hob shift)
 * left out, read by that interpreter: {@code rs274} of LinuxCNC (Debian package
 * {@code linuxcnc-uspace}), run as {@code rs274 -g -t TOOLS -v VARS PROGRAM OUTPUT}. It must accept
 * the program, and what it makes of the words must be what Hobwright meant: the job's units, the
 * XZ plane, feed per revolution before the first feed, the tool station, the settle dwell in
 * seconds, the work spindle's sense, and every move of the cycle CSV at the position the CSV gives
 * (the interpreter reports X as a radius in the program's units whatever the diameter mode, and
 * Z as the machine counts it). Skipped when {@code rs274} is not installed ({@code .ci/run}
 * installs it when run with {@code HOBWRIGHT_CI_RS274=1}); {@code HOBWRIGHT_RS274} may name
 * another binary.
 */
class ReferenceInterpreterTest {
    private static final Pattern PRIVATE = Pattern.compile("(?<![A-Z#\\d.])M1\\d\\d(?!\\d)");
    private static final Pattern CALL = Pattern.compile("\\s*\\d+\\s+N[\\d.]+\\s+([A-Z_]+)\\((.*)\\)\\s*");

    static Stream<String> jobs() throws IOException {
        return ClimbAndConventionalTest.jobs();
    }

    static Optional<Path> interpreter() {
        String given = System.getenv("HOBWRIGHT_RS274");
        if (given != null && !given.isBlank()) {
            return Optional.of(Path.of(given));
        }
        for (String dir : System.getenv().getOrDefault("PATH", "/usr/bin").split(java.io.File.pathSeparator)) {
            Path p = Path.of(dir, "rs274");
            if (Files.isExecutable(p)) {
                return Optional.of(p);
            }
        }
        return Optional.empty();
    }

    /** One call of the interpreter's canonical machining functions. */
    private record Call(String name, List<String> args) {
        double number(int i) {
            return Double.parseDouble(args.get(i));
        }
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("jobs")
    void theReferenceInterpreterReadsTheStandardWordsAsMeant(String job, @TempDir Path work) throws Exception {
        Optional<Path> rs274 = interpreter();
        Assumptions.assumeTrue(rs274.isPresent(), "rs274 (Debian package linuxcnc-uspace) is not installed");
        PlanRun run = PlanRun.of(job, work);
        assertEquals(0, run.exitCode(), run.describe());
        SampleFiles files = SampleFiles.of(job);
        JsonNode jobTree = files.job();
        String dialect = files.dialectText();
        String program = Files.readString(run.file(".nc"));
        List<NcReader.Block> blocks = new NcReader(dialect).blocks(program);
        String tool = blocks.stream().filter(b -> b.is("toolCall")).findFirst().orElseThrow().values().get("tool");

        Path ngc = work.resolve("program.ngc");
        Files.writeString(ngc, standardOnly(program), StandardCharsets.UTF_8);
        Path tools = work.resolve("tools.tbl");
        Files.writeString(tools, "T" + tool + " P" + tool + " X0 Z0 ;\n");
        Path vars = work.resolve("empty.var");
        Files.writeString(vars, "");
        Path out = work.resolve("canon.txt");
        Process p = new ProcessBuilder(rs274.get().toString(), "-g", "-t", tools.toString(), "-v", vars.toString(),
                ngc.toString(), out.toString()).redirectErrorStream(true).redirectInput(ProcessBuilder.Redirect.from(
                vars.toFile())).start();
        String said = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        assertTrue(p.waitFor(60, TimeUnit.SECONDS), "rs274 ends");
        assertEquals(0, p.exitValue(), () -> "rs274 accepts the program:\n" + said);
        List<Call> calls = calls(Files.readAllLines(out));

        boolean inch = jobTree.get("units").asString().equals("in");
        assertTrue(calls.contains(new Call("USE_LENGTH_UNITS", List.of(inch ? "CANON_UNITS_INCHES" : "CANON_UNITS_MM"))),
                "the job's units");
        assertTrue(calls.contains(new Call("SELECT_PLANE", List.of("CANON_PLANE_XZ"))), "the XZ plane of a lathe");
        int perRev = calls.indexOf(new Call("SET_FEED_MODE", List.of("0", "1")));
        int firstFeed = indexOf(calls, "STRAIGHT_FEED");
        assertTrue(perRev >= 0 && perRev < firstFeed, "feed per revolution before the first feed");
        assertTrue(calls.contains(new Call("SELECT_TOOL", List.of(tool))), "the tool station " + tool);

        List<Operation> ops = CycleImport.operations(Files.readString(run.file(".csv")));
        double settle = ops.stream().filter(o -> o.kind().equals("dwell")).mapToDouble(Operation::seconds).sum();
        double dwell = calls.stream().filter(c -> c.name().equals("DWELL")).mapToDouble(c -> c.number(0)).sum();
        assertTrue(dwell >= settle - 1e-9 && dwell < settle + 0.01, "the settle dwell in seconds: " + dwell);
        String workRotation = ops.stream().filter(o -> o.kind().equals("sync-on")).findFirst().orElseThrow()
                .values().get("work_rotation");
        // M3 turns clockwise seen from the headstock toward the work (ISO 841, ISO 6983, from memory): the
        // other way seen from the gear's front face, where Hobwright's senses are seen
        String expected = workRotation.equals("clockwise") ? "START_SPINDLE_COUNTERCLOCKWISE" : "START_SPINDLE_CLOCKWISE";
        assertTrue(calls.stream().anyMatch(c -> c.name().equals(expected)), expected + " for a work turning "
                + workRotation + " seen from the front face");

        List<Call> moves = calls.stream().filter(c -> c.name().equals("STRAIGHT_FEED")
                || c.name().equals("STRAIGHT_TRAVERSE")).toList();
        List<Operation> planned = ops.stream().filter(o -> o.kind().equals("rapid") || o.kind().equals("feed")).toList();
        double unit = inch ? 25.4 : 1;
        int axialSign = files.dialect().at("/axes/axial/sign").asInt(1);
        int at = 0;
        for (Operation o : planned) {
            double x = o.number("diameter_mm").orElseThrow() / 2 / unit;
            double z = axialSign * o.number("axial_mm").orElseThrow() / unit;
            String kind = o.kind().equals("feed") ? "STRAIGHT_FEED" : "STRAIGHT_TRAVERSE";
            boolean found = false;
            for (; at < moves.size() && !found; at++) {
                Call c = moves.get(at);
                found = c.name().equals(kind) && Math.abs(c.number(0) - x) <= 0.0011 && Math.abs(c.number(2) - z) <= 0.0011;
            }
            final int step = o.sequence();
            assertTrue(found, () -> "step " + step + " (" + kind + " to X " + x + " Z " + z + ") as the interpreter "
                    + "reads it, in order");
        }
    }

    /**
     * The program without the blocks of invented words. Such a block holds nothing but its invented
     * M word and the P and Q values (or bracketed expressions) that go with it.
     */
    static String standardOnly(String program) {
        StringBuilder out = new StringBuilder();
        for (String line : program.split("\r?\n", -1)) {
            Matcher m = PRIVATE.matcher(line);
            if (m.find()) {
                String rest = m.replaceAll(" ").replaceFirst("^N\\d+\\s", "").replaceAll("[PQ](\\[[^;(]*\\]|[-+]?[\\d.]+)", " ");
                assertTrue(rest.isBlank(), () -> "a block of invented words holds only them: " + line);
                continue;
            }
            out.append(line).append('\n');
        }
        return out.toString().stripTrailing() + "\n";
    }

    private static List<Call> calls(List<String> lines) {
        List<Call> out = new ArrayList<>();
        for (String l : lines) {
            Matcher m = CALL.matcher(l);
            if (m.matches()) {
                List<String> args = new ArrayList<>();
                String a = m.group(2);
                if (!a.isEmpty() && !m.group(1).equals("COMMENT")) {
                    for (String part : a.split(",", -1)) {
                        args.add(part.strip());
                    }
                }
                out.add(new Call(m.group(1), args));
            }
        }
        return out;
    }

    private static int indexOf(List<Call> calls, String name) {
        for (int i = 0; i < calls.size(); i++) {
            if (calls.get(i).name().toUpperCase(Locale.ROOT).equals(name)) {
                return i;
            }
        }
        return Integer.MAX_VALUE;
    }
}
