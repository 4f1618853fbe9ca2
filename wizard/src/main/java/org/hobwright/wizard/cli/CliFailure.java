package org.hobwright.wizard.cli;

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
}
