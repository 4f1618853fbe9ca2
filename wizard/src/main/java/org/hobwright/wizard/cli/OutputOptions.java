package org.hobwright.wizard.cli;

import java.nio.file.Path;
import picocli.CommandLine.Option;

/** The output options of {@code wizard}, {@code demo} and {@code plan}. */
final class OutputOptions {
    @Option(names = "--out", paramLabel = "DIR",
            description = "Output folder (default: " + PlanRequest.DEFAULT_OUT + "), created when missing; files of"
                    + " the same names in it are replaced, and the summary names them.")
    Path out;

    @Option(names = "--date", paramLabel = "YYYY-MM-DD",
            description = "Date printed in the outputs (default: $SOURCE_DATE_EPOCH, else today).")
    String date;

    /** The folder given, or the default one. */
    Path folder() {
        return out == null ? Path.of(PlanRequest.DEFAULT_OUT) : PlanRequest.named(out, "--out");
    }
}
