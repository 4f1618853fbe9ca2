package org.hobwright.wizard.cli;

import java.nio.file.Path;
import java.util.concurrent.Callable;
import org.hobwright.wizard.run.Outputs;
import org.hobwright.wizard.steps.Answers;
import org.hobwright.wizard.steps.LibraryServices;
import org.hobwright.wizard.steps.StepSession;
import org.hobwright.wizard.store.JsonDocument;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/** {@code hobwright wizard}: the interactive walk-through, also on piped input. */
@Command(name = "wizard", mixinStandardHelpOptions = true,
        description = {"Walks through GEAR, CUTTER, MACHINE, CYCLE and REVIEW, one question at a time, checking"
                + " every answer; at REVIEW offers to write the outputs with the job file (NAME.job.json, for"
                + " 'plan') and to save the cycle used as a template.",
                "Starts blank, with defaults only where a standard or the trade's convention gives one (each"
                        + " names its source under '?'), or from --job FILE.",
                "Enter keeps the value in brackets, '?' explains the question, '-' clears an optional value,"
                        + " 'back' returns to the previous question. Angles: decimal or degrees-minutes-seconds."})
final class WizardCommand extends Verb implements Callable<Integer> {
    @CommandLine.Mixin
    OutputOptions output = new OutputOptions();

    @Option(names = "--job", paramLabel = "FILE", description = "Start from this job file instead of a blank job.")
    Path job;

    @Override
    public Integer call() {
        return run(parent, spec.commandLine());
    }

    /** Runs the wizard with this command's options (the defaults when run without the verb). */
    int run(HobwrightCommand top, CommandLine cl) {
        CliEnvironment env = top.env();
        String generatedOn = GeneratedOn.resolve(output.date, env);
        Store store = Store.open(top.home(), env);
        OutputFolder.check(output.folder());
        Answers defaults = job == null ? Answers.blank()
                : Answers.fromTree(Store.readable(JsonDocument.read(job)).get().root());
        StepSession session = new StepSession(new LibraryServices(store.library(), env.loader()), defaults);
        Prompter prompter = new Prompter(env.in(), cl.getOut(), env.piped());
        prompter.say("Hobwright " + ToolVersion.VERSION + " wizard. Enter keeps the value in brackets, '?' explains,"
                + " 'back' returns.");
        WizardFinish finish = new WizardFinish(session, store, new Outputs(store.library(), env.loader(), generatedOn,
                ToolVersion.VERSION, java.util.concurrent.ForkJoinPool.commonPool()),
                output.folder());
        return new TerminalWizard(session, prompter).run(finish);
    }
}
