package org.hobwright.wizard.cli;

import java.io.PrintStream;
import java.time.Duration;
import java.time.Instant;

/**
 * Start-up measurement: with the system property {@code hobwright.timing} set, each phase of a run
 * prints its end time in milliseconds since the launcher started (its start time comes in the
 * environment variable {@code HOBWRIGHT_LAUNCHED}, seconds since the epoch), or else since the JVM
 * process started, on standard error. Used by the start-up benchmark to see where the time goes;
 * costs nothing when off.
 */
final class Timing {
    private static final boolean ON = System.getProperty("hobwright.timing") != null;

    private Timing() {
    }

    /** Marks the end of a phase. */
    static void mark(String phase) {
        if (ON) {
            PrintStream err = System.err;
            err.println("timing " + Duration.between(started(), Instant.now()).toMillis() + " ms " + phase);
        }
    }

    private static Instant started() {
        String launched = System.getenv("HOBWRIGHT_LAUNCHED");
        if (launched != null && launched.matches("\\d+\\.\\d{1,9}")) {
            String[] parts = launched.split("\\.");
            long nanos = Long.parseLong((parts[1] + "000000000").substring(0, 9));
            return Instant.ofEpochSecond(Long.parseLong(parts[0]), nanos);
        }
        return ProcessHandle.current().info().startInstant().orElse(Instant.now());
    }
}
