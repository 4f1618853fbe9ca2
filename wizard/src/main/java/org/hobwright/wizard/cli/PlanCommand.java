package org.hobwright.wizard.cli;

import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code hobwright plan}: the batch form of the wizard for one or many job files. */
@Command(name = "plan", mixinStandardHelpOptions = true,
        description = {"Checks and plans job files and writes the NC program, cycle CSV, setup sheet and report"
                + " of each into the output folder, all or nothing.",
                "Several files, or a folder of .json job files, are planned in one run."})
final class PlanCommand extends Verb implements Callable<Integer> {
    @Parameters(arity = "1..*", paramLabel = "JOB", description = "Job files (.json) or folders of job files.")
    List<Path> jobs;

    @Option(names = "--machine", paramLabel = "NAME|FILE",
            description = "Plan on this machine profile (a library name or a machine file) instead of the job's.")
    String machine;

    @Option(names = "--template", paramLabel = "NAME",
            description = "Fill the cycle values the jobs leave out from this template of the machine.")
    String template;

    @CommandLine.Mixin
    OutputOptions output = new OutputOptions();

    @Option(names = "--json", description = "Print the JSON report on standard output (the summary goes to"
            + " standard error); files are written only when --out is given.")
    boolean json;

    @Option(names = "--fastest", description = "Also ask the optimiser for the shortest cycle within the limits.")
    boolean fastest;

    @Override
    public Integer call() {
        Timing.mark("arguments parsed");
        return plan(request());
    }

    /** The run the options ask for. */
    PlanRequest request() {
        return PlanRequest.plan(jobs, machine, template, output.out, json, fastest, output.date,
                parent.home().orElse(null));
    }
}
