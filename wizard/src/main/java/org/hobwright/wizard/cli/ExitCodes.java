package org.hobwright.wizard.cli;

/** The tool's exit codes. */
public final class ExitCodes {
    /** Done. */
    public static final int OK = 0;
    /** The job has errors; findings were printed, nothing was written. */
    public static final int JOB_ERRORS = 1;
    /** Usage error or an input file that cannot be read. */
    public static final int USAGE = 2;
    /** A bug in Hobwright itself; never used for a problem with the job. */
    public static final int INTERNAL = 3;

    private ExitCodes() {
    }
}
