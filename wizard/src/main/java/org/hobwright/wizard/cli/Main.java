package org.hobwright.wizard.cli;

import java.io.PrintWriter;
import java.util.Optional;

/**
 * Entry point of the terminal tool. The only place that calls {@link System#exit}.
 *
 * <p>A plain {@code plan} or {@code demo} (only the options {@link QuickArgs} knows, each well
 * formed) runs without loading picocli, which saves a large part of the start-up; everything else,
 * including every usage error and {@code --help}, goes through the picocli command line.
 */
public final class Main {
    private Main() {
    }

    /**
     * Runs the tool and exits with its code: 0 done, 1 the job has errors, 2 usage or input problem,
     * 3 a fault in Hobwright itself ({@link ExitCodes}).
     *
     * @param args command-line arguments
     */
    public static void main(String[] args) {
        Timing.mark("main entered");
        Optional<PlanRequest> quick = QuickArgs.parse(args);
        int code = quick.isPresent() ? quick(quick.get()) : HobwrightCommand.run(args);
        Timing.mark("done");
        System.exit(code);
    }

    private static int quick(PlanRequest request) {
        PrintWriter out = new PrintWriter(System.out, true);
        PrintWriter err = new PrintWriter(System.err, true);
        try {
            return new PlanRun(CliEnvironment.system(), out, err).run(request);
        } catch (RuntimeException e) {
            return CliFailure.report(e, err);
        } finally {
            out.flush();
            err.flush();
        }
    }
}
