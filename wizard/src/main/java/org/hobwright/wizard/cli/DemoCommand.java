package org.hobwright.wizard.cli;

import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.Callable;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParentCommand;

/** {@code hobwright demo}: plans and posts the built-in sample job. */
@Command(name = "demo", mixinStandardHelpOptions = true,
        description = "Plans and posts the built-in sample job " + PlanRun.SAMPLE_JOB
                + " (an invented metering-pump gear on the invented Varrow SL-16): program, CSV, setup sheet, report.")
final class DemoCommand implements Callable<Integer> {
    /** The output folder when none is given. */
    static final String DEFAULT_OUT = "hobwright-out";

    @ParentCommand
    HobwrightCommand parent;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Option(names = "--out", paramLabel = "DIR", defaultValue = DEFAULT_OUT,
            description = "Output folder (default: ${DEFAULT-VALUE}).")
    Path out;

    @Option(names = "--date", paramLabel = "YYYY-MM-DD",
            description = "Date printed in the outputs (default: $SOURCE_DATE_EPOCH, else today).")
    String date;

    @Override
    public Integer call() {
        PlanRequest request = new PlanRequest(List.of(), Optional.empty(), Optional.empty(), Optional.of(out),
                false, false, Optional.ofNullable(date), parent.home());
        CommandLine cl = spec.commandLine();
        return new PlanRun(parent.env(), cl.getOut(), cl.getErr()).run(request);
    }
}
