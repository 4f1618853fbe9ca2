package org.hobwright.wizard.store;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.lang.reflect.RecordComponent;
import java.nio.file.Path;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.OptionalInt;

/** Paths and comparisons shared by the store tests. */
final class StoreTesting {
    /** The sample scenario, from the wizard module folder (the tests' working folder). */
    static final Path SCENARIO = Path.of("..", "samples", "scenario");
    /** Test resources of this package. */
    static final Path RESOURCES = Path.of("src", "test", "resources", "store");
    /** The corpus of bad files. */
    static final Path BAD_FILES = Path.of("src", "test", "resources", "bad-files");

    private StoreTesting() {
    }

    /**
     * Asserts that two records (or values inside them) are equal, doubles within {@code relTol}
     * relative (absolute near zero). Components named in {@code skip} are not compared.
     */
    static void assertClose(Object expected, Object actual, double relTol, String path, String... skip) {
        if (expected instanceof Double e && actual instanceof Double a) {
            double tol = relTol * Math.max(1.0, Math.abs(e));
            if (Math.abs(e - a) > tol) {
                fail(path + ": expected " + e + " but was " + a);
            }
        } else if (expected instanceof OptionalDouble e && actual instanceof OptionalDouble a) {
            assertEquals(e.isPresent(), a.isPresent(), path + " present");
            if (e.isPresent()) {
                assertClose(e.getAsDouble(), a.getAsDouble(), relTol, path);
            }
        } else if (expected instanceof Optional<?> e && actual instanceof Optional<?> a) {
            assertEquals(e.isPresent(), a.isPresent(), path + " present");
            if (e.isPresent()) {
                assertClose(e.get(), a.get(), relTol, path);
            }
        } else if (expected instanceof OptionalInt || expected == null || !expected.getClass().isRecord()) {
            assertEquals(expected, actual, path);
        } else {
            assertTrue(actual != null && actual.getClass().isRecord(), path + " is a record");
            if (!expected.getClass().equals(actual.getClass())) {
                // e.g. Pitch.Module against Pitch.Diametral: compare what they mean, the module
                if (expected instanceof org.hobwright.api.job.Pitch pe && actual instanceof org.hobwright.api.job.Pitch pa) {
                    assertClose(pe.moduleMm(), pa.moduleMm(), relTol, path + ".moduleMm");
                    return;
                }
                fail(path + ": " + expected.getClass().getSimpleName() + " vs " + actual.getClass().getSimpleName());
            }
            outer:
            for (RecordComponent c : expected.getClass().getRecordComponents()) {
                for (String s : skip) {
                    if (s.equals(c.getName())) {
                        continue outer;
                    }
                }
                try {
                    assertClose(c.getAccessor().invoke(expected), c.getAccessor().invoke(actual), relTol,
                            path + "." + c.getName());
                } catch (ReflectiveOperationException x) {
                    throw new AssertionError(x);
                }
            }
        }
    }
}
