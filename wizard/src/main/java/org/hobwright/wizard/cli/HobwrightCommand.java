package org.hobwright.wizard.cli;

import java.io.PrintWriter;
import picocli.CommandLine;
import picocli.CommandLine.Command;

/** The {@code hobwright} command and its verbs. */
@Command(name = "hobwright", mixinStandardHelpOptions = true, versionProvider = ToolVersion.class,
        description = "Plans gear hobbing: checks the drawing, sets up the hob, synchronises the spindles,"
                + " plans feeds and passes, and posts the program, cycle CSV and setup sheet.",
        subcommands = {SimulateCommand.class, CommandLine.HelpCommand.class},
        footer = {"", "Exit codes: 0 done, 1 the job has errors (findings printed), 2 usage or input problem.",
                "Caution: a hobbing cycle drives a rotating cutter and synchronised spindles. Prove out every"
                        + " program at reduced override with the guards closed, following the machine builder's"
                        + " manual and your shop's rules."})
public final class HobwrightCommand implements Runnable {

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public void run() {
        spec.commandLine().usage(spec.commandLine().getOut());
    }

    /** Builds the command line with the project's exit-code mapping. */
    public static CommandLine commandLine() {
        CommandLine cl = new CommandLine(new HobwrightCommand());
        cl.setExitCodeExceptionMapper(t -> ExitCodes.USAGE);
        cl.setExecutionExceptionHandler((ex, line, parsed) -> {
            line.getErr().println("hobwright: internal error: " + ex);
            return ExitCodes.INTERNAL;
        });
        return cl;
    }

    /** Runs with the given arguments on standard streams; returns the exit code. */
    public static int run(String[] args) {
        CommandLine cl = commandLine();
        cl.setOut(new PrintWriter(System.out, true));
        cl.setErr(new PrintWriter(System.err, true));
        return cl.execute(args);
    }
}
