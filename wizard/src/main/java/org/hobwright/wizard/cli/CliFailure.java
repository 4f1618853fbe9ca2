package org.hobwright.wizard.cli;

import org.hobwright.api.check.Finding;

/**
 * A problem that ends a command with a one-line message and an exit code: a usage error or an
 * input that cannot be read (2), or a job with errors when there is nothing else to print (1).
 */
final class CliFailure extends RuntimeException {
    private static final long serialVersionUID = 1L;

    private final int exitCode;

    CliFailure(int exitCode, String message) {
        super(message);
        this.exitCode = exitCode;
    }

    /** A usage or input problem, exit code 2. */
    static CliFailure usage(String message) {
        return new CliFailure(ExitCodes.USAGE, message);
    }

    int exitCode() {
        return exitCode;
    }

    /** Prints the one line of a failed run and returns its exit code (3 for a fault of Hobwright itself). */
    static int report(Exception ex, java.io.PrintWriter err) {
        if (ex instanceof CliFailure f) {
            err.println("hobwright: " + Finding.printable(f.getMessage()));
            return f.exitCode();
        }
        err.println("hobwright: internal error: " + Finding.printable(String.valueOf(ex)));
        return ExitCodes.INTERNAL;
    }
}
