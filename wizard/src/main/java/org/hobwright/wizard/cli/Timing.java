package org.hobwright.wizard.cli;

import java.io.PrintStream;
import java.time.Duration;
import java.time.Instant;

/**
 * Start-up measurement: with the system property {@code hobwright.timing} set, each phase of a run
 * prints its end time in milliseconds since the JVM process started, on standard error. Used by
 * the start-up benchmark to see where the time goes; costs nothing when off.
 */
final class Timing {
    private static final boolean ON = System.getProperty("hobwright.timing") != null;

    private Timing() {
    }

    /** Marks the end of a phase. */
    static void mark(String phase) {
        if (ON) {
            Instant started = ProcessHandle.current().info().startInstant().orElse(Instant.now());
            PrintStream err = System.err;
            err.println("timing " + Duration.between(started, Instant.now()).toMillis() + " ms " + phase);
        }
    }
}
