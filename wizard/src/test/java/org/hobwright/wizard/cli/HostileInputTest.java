package org.hobwright.wizard.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import tools.jackson.databind.json.JsonMapper;
import tools.jackson.databind.node.ObjectNode;

/**
 * Inputs a careless or hostile user may give: each ends with exit 0, 1 or 2 and a message that
 * names the field, never an internal error (exit 3), a stack trace, a raw control character or a
 * file written where it does not belong.
 */
class HostileInputTest {
    private static final JsonMapper JSON = JsonMapper.builder().build();

    @TempDir
    Path dir;

    private Path out() {
        return dir.resolve("out");
    }

    private ObjectNode sample() {
        return (ObjectNode) JSON.readTree(Store.builtinText("jobs/metering-pump-gear.json"));
    }

    /** The sample job with its machine given inline (all its values editable). */
    private ObjectNode withInlineMachine() {
        ObjectNode job = sample();
        ObjectNode machine = (ObjectNode) JSON.readTree(Store.builtinText("machines/varrow-1605.json"));
        for (String key : List.of("$schema", "format", "version", "units", "description")) {
            machine.remove(key);
        }
        job.set("machine", machine);
        return job;
    }

    private Path file(String name, Object tree) throws IOException {
        return Files.writeString(dir.resolve(name), tree instanceof String s ? s : JSON.writeValueAsString(tree));
    }

    /** A run with findings: exit 1, the finding naming {@code field} and {@code words}, nothing written. */
    private Cli.Run assertJobError(Path job, String field, String words) {
        Cli.Run r = Cli.run(dir, "plan", job.toString(), "--out", out().toString());
        assertEquals(ExitCodes.JOB_ERRORS, r.code(), r::toString);
        assertTrue(r.out().contains(" " + field + ": "), r::toString);
        assertTrue(r.out().contains(words), r::toString);
        assertFalse((r.out() + r.err()).contains("Exception") || r.err().contains("internal error"), r::toString);
        assertFalse(Files.exists(out()), "nothing may be written");
        return r;
    }

    @Test
    void anEmptyKeyAtTheTopIsAFindingOnTheEmptyKey() throws IOException {
        ObjectNode job = sample();
        job.put("", 1);
        assertJobError(file("empty-key.json", job), "\"\"", "unknown key \"\"");
        ObjectNode blank = sample();
        blank.put(" ", 1);
        assertJobError(file("blank-key.json", blank), "\" \"", "unknown key \" \"");
    }

    @Test
    void numbersThatOverflowToInfinityAreFindings() throws IOException {
        ObjectNode wide = sample();
        ((ObjectNode) wide.get("gear")).put("faceWidth", 1e308);
        assertJobError(file("wide.json", wide), "gear.faceWidth", "working range");

        ObjectNode crawling = withInlineMachine();
        ((ObjectNode) crawling.get("machine")).put("rapid", Double.MIN_VALUE);
        assertJobError(file("crawling.json", crawling), "machine.rapid", "working range");

        ObjectNode inches = sample();
        inches.put("units", "in");
        ((ObjectNode) inches.get("gear")).put("faceWidth", 1e308);  // 2.54e308 mm does not fit a double
        assertJobError(file("inches.json", inches), "gear.faceWidth", "working range");
    }

    @Test
    void aTinyRoughingDepthIsAFindingAtOnce() throws IOException {
        for (String extra : List.of("", ", \"finishStock\": 0.1")) {
            ObjectNode job = sample();
            ObjectNode cycle = (ObjectNode) JSON.readTree("{\"roughDepth\": 1e-9" + extra + "}");
            ((ObjectNode) job.get("cycle")).setAll(cycle);
            assertJobError(file("tiny.json", job), "cycle.roughDepth", "1e-9");
        }
    }

    @Test
    void controlCharactersInKeysAndValuesAreShownEscaped() throws IOException {
        ObjectNode job = sample();
        job.put("\u001b[31mred\nline", 1);
        Cli.Run r = assertJobError(file("escape.json", job), "\\u001B[31mred\\nline", "unknown key");
        assertFalse((r.out() + r.err()).contains("\u001b"), r::toString);
        assertTrue(r.out().lines().anyMatch(l -> l.contains("INPUT_UNKNOWN_KEY") && l.contains("red\\nline")),
                r::toString);

        Path badUnits = file("units.json", Store.builtinText("jobs/metering-pump-gear.json")
                .replace("\"units\": \"mm\"", "\"units\": \"mm\\u001b]0;title\\u0007\\r\\nX\""));
        Cli.Run u = Cli.run(dir, "plan", badUnits.toString(), "--out", out().toString());
        assertTrue(u.code() == ExitCodes.USAGE || u.code() == ExitCodes.JOB_ERRORS, u::toString);
        String all = u.out() + u.err();
        assertFalse(all.contains("\u001b") || all.contains("\u0007") || all.contains("\r"), u::toString);
    }

    @Test
    void anEmptyOutputFolderIsAUsageError() throws IOException {
        Path job = file("job.json", sample());
        List<String[]> runs = List.of(new String[] {"plan", job.toString(), "--out", ""},
                new String[] {"plan", job.toString(), "--out="}, new String[] {"demo", "--out", ""},
                new String[] {"wizard", "--out", " "});
        for (String[] args : runs) {
            Cli.Run r = Cli.run(dir, args);
            assertEquals(ExitCodes.USAGE, r.code(), () -> String.join(" ", args) + "\n" + r);
            assertTrue(r.err().contains("--out needs a folder name"), r::toString);
        }
        try (Stream<Path> s = Files.list(Path.of(""))) {
            assertTrue(s.noneMatch(p -> p.getFileName().toString().startsWith("metering-pump-gear.")),
                    "nothing written into the working folder");
        }
    }

    @Test
    void aWizardValueThatOverflowsInAnotherUnitIsRefusedNotACrash() {
        // inches, a face width of 1e308 in (2.54e308 mm overflows), back to the first step, millimetres
        String answers = "j1\nin\n\n\n24\n1\n\n\n\n\n1e308\n" + "back\n".repeat(10) + "mm\n";
        Cli.Run r = Cli.piped(dir, answers, "wizard", "--out", out().toString());
        assertEquals(ExitCodes.USAGE, r.code(), r::toString);     // the answers end before the wizard does
        assertTrue(r.out().contains("Face width: must be at most 1000000 mm in size"), r::toString);
        assertFalse(r.err().contains("internal error"), r::toString);
    }

    @Test
    void aFileThatReportsNoSizeIsReadWithTheSameBound() {
        Path proc = Path.of("/proc/kallsyms");   // Linux: reports 0 bytes, holds megabytes
        assumeTrue(Files.isReadable(proc), "needs a Linux /proc");
        Cli.Run r = Cli.run(dir, "plan", proc.toString(), "--out", out().toString());
        assertEquals(ExitCodes.USAGE, r.code(), r::toString);
        assertTrue(r.err().contains("more than the limit of 1000000 bytes"), r::toString);
        assertEquals(1, r.err().lines().count(), r::toString);
    }

    @Test
    void aLibraryFolderThatIsALinkIsNotWrittenThrough() throws IOException {
        Path home = Files.createDirectory(dir.resolve("home"));
        Path elsewhere = Files.createDirectory(dir.resolve("elsewhere"));
        Files.createSymbolicLink(home.resolve("machines"), elsewhere);
        Path machine = file("shop-lathe.json", Store.builtinText("machines/varrow-1605.json")
                .replace("\"varrow-1605\"", "\"shop-lathe\""));
        Cli.Run r = Cli.run(home, "machines", "save", machine.toString());
        assertEquals(ExitCodes.USAGE, r.code(), r::toString);
        assertTrue(r.err().contains("is a symbolic link"), r::toString);
        try (Stream<Path> s = Files.list(elsewhere)) {
            assertEquals(0, s.count(), "nothing saved through the link");
        }
    }

    @Test
    void outputsIntoTheLibrarysFoldersAreRefused() throws IOException {
        Path home = Files.createDirectory(dir.resolve("home"));
        Path job = file("job.json", sample());
        for (String shelf : List.of("machines", "templates", "dialects", "machines/sub")) {
            Cli.Run r = Cli.run(home, "plan", job.toString(), "--out", home.resolve(shelf).toString());
            assertEquals(ExitCodes.USAGE, r.code(), r::toString);
            assertTrue(r.err().contains("lies inside the library folder"), r::toString);
        }
        Cli.Run list = Cli.run(home, "machines", "list");
        assertFalse(list.out().contains("metering-pump-gear"), list::toString);
        // beside the library's folders, in the same home, outputs are fine
        Cli.Run beside = Cli.run(home, "plan", job.toString(), "--out", home.resolve("out").toString());
        assertEquals(ExitCodes.OK, beside.code(), beside::toString);
    }
}
