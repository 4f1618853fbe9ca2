package org.hobwright.wizard.cli;

import java.util.concurrent.Callable;
import picocli.CommandLine;
import picocli.CommandLine.Command;

/** {@code hobwright demo}: plans and posts the built-in sample job. */
@Command(name = "demo", mixinStandardHelpOptions = true,
        description = "Plans and posts the built-in sample job " + PlanRun.SAMPLE_JOB
                + " (an invented metering-pump gear on the invented Varrow 1605): program, CSV, setup sheet, report.")
final class DemoCommand extends Verb implements Callable<Integer> {
    @CommandLine.Mixin
    OutputOptions output = new OutputOptions();

    @Override
    public Integer call() {
        return plan(request());
    }

    /** The run the options ask for. */
    PlanRequest request() {
        return PlanRequest.demo(output.folder(), output.date, parent.home().orElse(null));
    }
}
