package org.hobwright.wizard.cli;

import java.io.IOException;
import java.io.InputStream;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.concurrent.Callable;
import java.util.function.Function;
import org.hobwright.api.cycle.GearData;
import org.hobwright.api.cycle.HobCycle;
import org.hobwright.api.job.HobJob;
import org.hobwright.api.job.Units;
import org.hobwright.text.Decimal;
import org.hobwright.wizard.geometry.GearGeometry;
import org.hobwright.wizard.geometry.ToothSystem;
import org.hobwright.wizard.plan.DefaultCyclePlanner;
import org.hobwright.wizard.simulate.FeedMarks;
import org.hobwright.wizard.simulate.GeneratingSimulation;
import org.hobwright.wizard.simulate.SimulationInputException;
import org.hobwright.wizard.simulate.ToothSpaceSimulation;
import org.hobwright.wizard.simulate.SimulationSvg;
import org.hobwright.wizard.store.AtomicFiles;
import org.hobwright.wizard.store.JobReader;
import org.hobwright.wizard.store.Library;
import org.hobwright.wizard.store.Loaded;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code hobwright simulate}: the tooth profile the hob will really cut, as numbers and an SVG picture. */
@Command(name = "simulate", mixinStandardHelpOptions = true,
        description = {"Simulates how the job's hob generates one tooth space (transverse section): the cut"
                + " profile beside the true involute, the enveloping cuts, undercut and the feed marks at the root.",
                "Writes JOB-NAME-simulation.svg into the output folder. Without JOB, simulates the built-in sample job."})
public final class SimulateCommand implements Callable<Integer> {
    /** Class-path location of the built-in sample job. */
    static final String SAMPLE = "org/hobwright/builtin/jobs/metering-pump-gear.json";

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Parameters(arity = "0..1", paramLabel = "JOB", description = "Job file (.json); default: the built-in sample.")
    Path job;

    @Option(names = "--out", paramLabel = "DIR", defaultValue = "hobwright-out",
            description = "Output folder (default: ${DEFAULT-VALUE}).")
    Path out;

    private final Function<Optional<Path>, Library> libraries;

    /** A command on the user's library ({@code --home}, else $HOBWRIGHT_HOME, else ~/.hobwright). */
    public SimulateCommand() {
        this(Library::open);
    }

    SimulateCommand(Function<Optional<Path>, Library> libraries) {
        this.libraries = libraries;
    }

    @Override
    public Integer call() {
        PrintWriter o = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        Loaded<HobJob> loaded = read(new JobReader(libraries.apply(home())));
        if (loaded.unreadable()) {
            err.println("hobwright: " + loaded.errorLine());
            return ExitCodes.USAGE;
        }
        loaded.findings().forEach(f -> err.println(f.line()));
        if (!loaded.ok()) {
            return ExitCodes.JOB_ERRORS;
        }
        HobJob j = loaded.get();
        // the checks and exit codes of plan: a job plan refuses is not simulated either
        HobCycle planned = new DefaultCyclePlanner().plan(j);
        if (planned.hasErrors()) {
            planned.findings().forEach(f -> err.println(f.line()));
            err.println("Nothing written: the job has errors (the same as 'hobwright plan' reports).");
            return ExitCodes.JOB_ERRORS;
        }
        Optional<ToothSystem> system = ToothSystem.of(j.gear());
        if (system.isEmpty()) {
            err.println(CliCode.SIMULATION_INPUT.at("gear.toothSystem", "tooth system \""
                    + j.gear().toothSystem() + "\" is not known", "use one of " + String.join(", ", ToothSystem.ids()))
                    .line());
            return ExitCodes.JOB_ERRORS;
        }
        GearData gear = GearGeometry.of(j.gear(), system.get());
        ToothSpaceSimulation sim;
        try {
            sim = GeneratingSimulation.run(GeneratingSimulation.setupOf(j, gear));
        } catch (SimulationInputException e) {
            err.println(CliCode.SIMULATION_INPUT.at(e.field(), e.getMessage(), e.fix()).line());
            return ExitCodes.JOB_ERRORS;
        }
        Optional<FeedMarks> marks = feed(planned).stream().boxed().findFirst().map(f -> FeedMarks.of(
                j.hob().outsideDiameterMm() / 2, f, Math.toRadians(j.gear().helixAngleDeg()),
                GeneratingSimulation.RESOLUTION_MM));
        Path target = out.resolve(j.name() + "-simulation.svg");
        try {
            AtomicFiles.writeText(target, SimulationSvg.render(sim, marks, j.gear().partName()), true);
        } catch (IOException e) {
            err.println("hobwright: cannot write " + target + ": " + e.getMessage());
            return ExitCodes.USAGE;
        }
        summary(o, j.units(), sim, marks);
        o.println("wrote " + target);
        return ExitCodes.OK;
    }

    private Loaded<HobJob> read(JobReader reader) {
        if (job != null) {
            return reader.read(job);
        }
        try (InputStream in = SimulateCommand.class.getClassLoader().getResourceAsStream(SAMPLE)) {
            if (in == null) {
                return Loaded.unreadable(CliCode.SAMPLE_MISSING.at("job", "the built-in sample job is not"
                        + " bundled in this build", "give a job file"));
            }
            return reader.read(new String(in.readAllBytes(), StandardCharsets.UTF_8), "built-in sample");
        } catch (IOException e) {
            return Loaded.unreadable(CliCode.SAMPLE_MISSING.at("job", "the built-in sample job cannot be read: "
                    + e.getMessage(), "give a job file"));
        }
    }

    /** The library folder given by an inherited {@code --home} option, when the top-level command has one. */
    private Optional<Path> home() {
        CommandLine.Model.OptionSpec option = spec.findOption("--home");
        return option == null ? Optional.empty() : Optional.ofNullable((Path) option.getValue());
    }

    /** The feed that leaves the finishing marks: the finishing feed the planner chose for the job. */
    private static OptionalDouble feed(HobCycle planned) {
        return planned.summary().map(s -> OptionalDouble.of(s.finishFeedMmPerRev())).orElse(OptionalDouble.empty());
    }

    private static void summary(PrintWriter o, Units units, ToothSpaceSimulation sim, Optional<FeedMarks> marks) {
        String u = " " + units.symbol();
        o.println("profile deviation max   " + micrometres(sim.profileDeviationMaxMm()));
        o.println("enveloping depth        " + micrometres(sim.envelopingDepthMm()) + " (closed form "
                + micrometres(sim.closedFormEnvelopingDepthMm()) + ")");
        o.println("undercut                " + (sim.undercut() ? "yes, " + length(units, sim.undercutDepthMm()) + u
                + " deep" : "no"));
        o.println("active involute from    Ø " + length(units, sim.activeInvoluteStartDiameterMm()) + u
                + " (form circle Ø " + length(units, sim.rootFormDiameterMm()) + u + ")");
        marks.ifPresent(m -> o.println("feed marks at the root  " + micrometres(m.depthMm()) + " at "
                + length(units, m.feedMm()) + u + " per work turn"));
    }

    /**
     * A quality value (a deviation from the true flank) in µm, as the targets and the plan's summary
     * give them: to 0.001 µm, trailing zeros dropped, so the smallest simulated step (about 0.01 µm) shows.
     */
    static String micrometres(double mm) {
        return Decimal.plain(mm * 1000, 3) + " µm";
    }

    /** A length in the job's unit to six significant digits. */
    private static String length(Units units, double mm) {
        return Decimal.significant(units.fromMm(mm), 6);
    }
}
