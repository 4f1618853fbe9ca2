package org.hobwright.post;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

/**
 * Byte-for-byte comparison with the files in src/test/resources/golden. Run the tests with
 * {@code -Dhobwright.golden.update=true} to rewrite them after a deliberate change, then review
 * the diff ({@code git diff post/src/test/resources/golden}) before committing: a golden file is
 * the reviewed expectation, never a snapshot to accept blindly.
 */
public final class GoldenFiles {
    private static final Path DIR = Path.of("src", "test", "resources", "golden");

    private GoldenFiles() {
    }

    /** True when the run rewrites golden files. */
    public static boolean updating() {
        return Boolean.getBoolean("hobwright.golden.update");
    }

    /** Compares (or, when updating, writes) one golden file. */
    public static void check(String name, String actual) {
        Path file = DIR.resolve(name);
        try {
            if (updating()) {
                Files.createDirectories(DIR);
                Files.write(file, actual.getBytes(StandardCharsets.UTF_8));
                return;
            }
            assertTrue(Files.exists(file), () -> "golden file " + file + " is missing; run with "
                    + "-Dhobwright.golden.update=true, then review it");
            String expected = new String(Files.readAllBytes(file), StandardCharsets.UTF_8);
            assertEquals(expected, actual, () -> "output differs from golden file " + file
                    + " (if the change is intended: rerun with -Dhobwright.golden.update=true and review the diff)");
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
