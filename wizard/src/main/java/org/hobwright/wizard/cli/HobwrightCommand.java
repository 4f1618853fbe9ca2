package org.hobwright.wizard.cli;

import org.hobwright.api.check.Finding;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.Optional;
import java.util.concurrent.Callable;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.ScopeType;

/** The {@code hobwright} command and its verbs; without a verb it runs the wizard. */
@Command(name = "hobwright", mixinStandardHelpOptions = true, versionProvider = ToolVersion.class,
        description = "Plans gear hobbing: checks the drawing, sets up the hob, synchronises the spindles,"
                + " plans feeds and passes, and posts the program, cycle CSV and setup sheet."
                + " Without a verb, runs the wizard.",
        subcommands = {WizardCommand.class, DemoCommand.class, PlanCommand.class, MachinesCommand.class,
                TemplatesCommand.class, DialectsCommand.class, SimulateCommand.class, CommandLine.HelpCommand.class},
        footer = {"", "Exit codes: 0 done, 1 the job has errors (findings printed, nothing written),"
                + " 2 usage or input problem, 3 a fault in Hobwright itself.",
                "Caution: a hobbing cycle drives a rotating cutter and synchronised spindles. Prove out every"
                        + " program at reduced override with the guards closed, following the machine builder's"
                        + " manual and your shop's rules."})
public final class HobwrightCommand implements Callable<Integer> {

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Option(names = "--home", paramLabel = "DIR", scope = ScopeType.INHERIT,
            description = "Library folder of machines, templates and dialects"
                    + " (default: $HOBWRIGHT_HOME, else ~/.hobwright).")
    Path home;

    private final CliEnvironment env;

    /** A command on the given environment. */
    public HobwrightCommand(CliEnvironment env) {
        this.env = env;
    }

    CliEnvironment env() {
        return env;
    }

    Optional<Path> home() {
        return Optional.ofNullable(home).map(h -> PlanRequest.named(h, "--home"));
    }

    @Override
    public Integer call() {
        return new WizardCommand().run(this, spec.commandLine());
    }

    /** Builds the command line on the real terminal, the system clock and the process environment. */
    public static CommandLine commandLine() {
        return commandLine(CliEnvironment.system());
    }

    /** Builds the command line on the given environment with the project's exit codes. */
    public static CommandLine commandLine(CliEnvironment env) {
        CommandLine cl = new CommandLine(new HobwrightCommand(env));
        cl.setExecutionExceptionHandler((ex, line, parsed) -> CliFailure.report(ex, line.getErr()));
        cl.setParameterExceptionHandler((ex, args) -> {
            CommandLine where = ex.getCommandLine();
            where.getErr().println("hobwright: " + Finding.printable(String.valueOf(ex.getMessage())) + " (see '"
                    + where.getCommandSpec().qualifiedName() + " --help')");
            return ExitCodes.USAGE;
        });
        return cl;
    }

    /** Runs with the given arguments on the standard streams; returns the exit code. */
    public static int run(String[] args) {
        CommandLine cl = commandLine(CliEnvironment.system());
        cl.setOut(new PrintWriter(System.out, true));
        cl.setErr(new PrintWriter(System.err, true));
        return cl.execute(args);
    }
}
