package org.hobwright.wizard.store;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;
import org.hobwright.api.check.Finding;
import org.hobwright.api.job.HobJob;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Input files that cannot be read: one line saying why, naming the file, and never an exception. */
class UnreadableInputTest {
    @TempDir
    Path dir;
    JobReader reader;

    @BeforeEach
    void setUp() {
        reader = new JobReader(Library.open(Optional.of(dir.resolve("home"))));
    }

    private void assertUnreadable(Loaded<HobJob> loaded, String code, String... parts) {
        assertTrue(loaded.unreadable(), () -> "unreadable expected: " + loaded.findings());
        assertTrue(loaded.value().isEmpty());
        assertEquals(code, loaded.findings().get(0).code(), loaded.findings().toString());
        String line = loaded.errorLine();
        assertFalse(line.contains("\n"), "one line: " + line);
        assertFalse(line.contains("Exception"), "no exception text: " + line);
        for (String p : parts) {
            assertTrue(line.contains(p), "\"" + p + "\" in: " + line);
        }
    }

    @Test
    void missingFile() {
        Path missing = dir.resolve("nope.json");
        assertUnreadable(reader.read(missing), "INPUT_NO_FILE", missing.toString(), "no such file");
    }

    @Test
    void folderInsteadOfFile() {
        assertUnreadable(reader.read(dir), "INPUT_NOT_A_FILE", dir.toString(), "folder");
    }

    @Test
    void fiftyMegabyteFile() throws IOException {
        Path big = dir.resolve("big.json");
        byte[] line = "{\"a\": 1},\n".getBytes(StandardCharsets.UTF_8);
        try (OutputStream out = new java.io.BufferedOutputStream(Files.newOutputStream(big), 1 << 16)) {
            out.write('[');
            for (long written = 0; written < 50L * 1024 * 1024; written += line.length) {
                out.write(line);
            }
            out.write("{}]".getBytes(StandardCharsets.UTF_8));
        }
        assertUnreadable(reader.read(big), "INPUT_TOO_LARGE", big.toString(), "1000000 bytes");
    }

    @Test
    void malformedJsonNamesTheLine() {
        Loaded<HobJob> loaded = reader.read("{\n  \"format\": \"hobwright-job\",\n  \"version\": 1\n  \"name\": \"x\"\n}",
                "broken.json");
        assertUnreadable(loaded, "INPUT_MALFORMED", "broken.json:4:", "malformed JSON");
    }

    @Test
    void repeatedKey() {
        assertUnreadable(reader.read("{\"format\": \"hobwright-job\", \"format\": \"x\"}", "twice.json"),
                "INPUT_MALFORMED", "twice.json:1:", "appears twice");
    }

    @Test
    void notUtf8() throws IOException {
        Path latin = dir.resolve("latin.json");
        Files.write(latin, new byte[] {'{', '"', 'n', '"', ':', '"', (byte) 0xE9, '"', '}'});
        assertUnreadable(reader.read(latin), "INPUT_IO", "UTF-8");
    }

    @Test
    void emptyAndNonObjectFiles() {
        assertUnreadable(reader.read("", "empty.json"), "INPUT_MALFORMED", "empty.json");
        assertUnreadable(reader.read("[1, 2]", "list.json"), "INPUT_MALFORMED", "list.json:1:", "one JSON object");
        assertUnreadable(reader.read("{} {}", "two.json"), "INPUT_MALFORMED", "after the end");
    }

    @Test
    void wrongFormatAndVersion() {
        assertUnreadable(reader.read("{\"format\": \"hobwright-machine\", \"version\": 1}", "m.json"),
                "INPUT_FORMAT", "hobwright-machine", "expected \"hobwright-job\"");
        assertUnreadable(reader.read("{\"version\": 1}", "n.json"), "INPUT_FORMAT", "missing");
        assertUnreadable(reader.read("{\"format\": \"hobwright-job\", \"version\": 7}", "v.json"),
                "INPUT_VERSION", "version 7");
        assertUnreadable(reader.read("{\"format\": \"hobwright-job\", \"version\": 99999999999999999999}", "big.json"),
                "INPUT_VERSION", "not one this program reads");
        assertUnreadable(reader.read("{\"format\": \"hobwright-job\", \"version\": \"1\"}", "s.json"),
                "INPUT_VERSION", "whole number");
        assertUnreadable(reader.read("{\"format\": \"hobwright-job\", \"version\": 1, \"units\": \"cm\"}", "u.json"),
                "INPUT_UNITS", "\"cm\"");
    }

    /**
     * A value of the wrong type is a wrong value of a readable file, like a value out of its range:
     * the file is read on and every problem is listed (exit code 1), naming the path and line.
     */
    @Test
    void wrongTypeIsAWrongValueNamingThePathAndLine() {
        String json = "{\"format\": \"hobwright-job\", \"version\": 1,\n \"units\": \"mm\",\n \"gear\": {\"teeth\": \"24\"}}";
        Loaded<HobJob> loaded = reader.read(json, "t.json");
        assertFalse(loaded.unreadable(), loaded.findings().toString());
        assertTrue(loaded.value().isEmpty());
        Finding wrong = loaded.findings().stream().filter(f -> f.code().equals("INPUT_WRONG_TYPE")).findFirst()
                .orElseThrow();
        assertEquals("gear.teeth", wrong.field());
        assertTrue(wrong.message().startsWith("t.json:3: gear.teeth must be a whole number, was the text \"24\""),
                wrong.message());
        assertTrue(loaded.findings().stream().anyMatch(f -> f.field().equals("gear.faceWidth")),
                "the rest of the file is still read: " + loaded.findings());
    }
}
