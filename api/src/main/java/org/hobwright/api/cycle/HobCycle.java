package org.hobwright.api.cycle;

import java.util.List;
import java.util.Locale;
import java.util.Optional;
import org.hobwright.api.ApiStatus;
import org.hobwright.api.check.Finding;
import org.hobwright.api.check.Severity;
import org.hobwright.api.internal.Checks;
import org.hobwright.api.job.HobJob;

/**
 * The planner's answer for one job. Parts that could not be computed because of errors are
 * empty; the findings say why. A cycle with an error finding has no steps and must not be posted.
 *
 * @param gear        computed gear geometry
 * @param inspection  inspection values
 * @param tolerances  ISO 1328-1 flank tolerances, when a class is known
 * @param setup       setup values
 * @param steps       the ordered steps (empty when the job has errors)
 * @param summary     time and predicted quality
 * @param simulation  generating simulation, when run
 * @param findings    every finding, errors first
 * @param plannedFor  the job the cycle was planned for (empty from a planner built against api 1.0);
 *                    writers refuse to write the cycle with another job
 * @param pair        the gear with its mate, when the job gives a mating gear and the pair could be computed
 * @param spline      for a spline job, the spline's limits, pins and form check
 */
@ApiStatus(since = "1.0")
public record HobCycle(
        Optional<GearData> gear,
        Optional<InspectionData> inspection,
        Optional<ToleranceData> tolerances,
        Optional<SetupValues> setup,
        List<CycleStep> steps,
        Optional<CycleSummary> summary,
        Optional<SimulationData> simulation,
        List<Finding> findings,
        @ApiStatus(since = "1.1") Optional<HobJob> plannedFor,
        @ApiStatus(since = "1.1") Optional<GearPairData> pair,
        @ApiStatus(since = "1.1") Optional<SplineData> spline) {

    /**
     * Checks the components: a value out of range throws {@link IllegalArgumentException} naming the field and the
     * value.
     *
     * @param gear computed gear geometry
     * @param inspection inspection values
     * @param tolerances ISO 1328-1 flank tolerances, when a class is known
     * @param setup setup values
     * @param steps the ordered steps (empty when the job has errors)
     * @param summary time and predicted quality
     * @param simulation generating simulation, when run
     * @param findings every finding, errors first
     * @param plannedFor the job the cycle was planned for (empty from a planner built against api 1.0); writers
     *     refuse to write the cycle with another job
     * @param pair the gear with its mate, when the job gives a mating gear and the pair could be computed
     * @param spline for a spline job, the spline's limits, pins and form check
     */
    public HobCycle {
        Checks.present("gear", gear);
        Checks.present("inspection", inspection);
        Checks.present("tolerances", tolerances);
        Checks.present("setup", setup);
        steps = List.copyOf(Checks.present("steps", steps));
        Checks.present("summary", summary);
        Checks.present("simulation", simulation);
        findings = List.copyOf(Checks.present("findings", findings));
        Checks.present("plannedFor", plannedFor);
        Checks.present("pair", pair);
        Checks.present("spline", spline);
        if (Finding.anyError(findings) && !steps.isEmpty()) {
            throw new IllegalArgumentException("a cycle with error findings must have no steps, had "
                    + steps.size());
        }
    }

    /**
     * A cycle that does not say which job it was planned for (as planners built against api 1.0 make).
     *
     * @param gear computed gear geometry
     * @param inspection inspection values
     * @param tolerances ISO 1328-1 flank tolerances, when a class is known
     * @param setup setup values
     * @param steps the ordered steps (empty when the job has errors)
     * @param summary time and predicted quality
     * @param simulation generating simulation, when run
     * @param findings every finding, errors first
     */
    public HobCycle(Optional<GearData> gear, Optional<InspectionData> inspection, Optional<ToleranceData> tolerances,
                    Optional<SetupValues> setup, List<CycleStep> steps, Optional<CycleSummary> summary,
                    Optional<SimulationData> simulation, List<Finding> findings) {
        this(gear, inspection, tolerances, setup, steps, summary, simulation, findings, Optional.empty(),
                Optional.empty(), Optional.empty());
    }

    /**
     * A gear job's cycle with its gear pair (no spline data).
     *
     * @param gear computed gear geometry
     * @param inspection inspection values
     * @param tolerances ISO 1328-1 flank tolerances, when a class is known
     * @param setup setup values
     * @param steps the ordered steps (empty when the job has errors)
     * @param summary time and predicted quality
     * @param simulation generating simulation, when run
     * @param findings every finding, errors first
     * @param plannedFor the job the cycle was planned for
     * @param pair the gear with its mate, when the job gives a mating gear and the pair could be computed
     */
    public HobCycle(Optional<GearData> gear, Optional<InspectionData> inspection, Optional<ToleranceData> tolerances,
                    Optional<SetupValues> setup, List<CycleStep> steps, Optional<CycleSummary> summary,
                    Optional<SimulationData> simulation, List<Finding> findings, Optional<HobJob> plannedFor,
                    Optional<GearPairData> pair) {
        this(gear, inspection, tolerances, setup, steps, summary, simulation, findings, plannedFor, pair,
                Optional.empty());
    }

    /**
     * The cycle of a spline job, not yet marked with its job.
     *
     * @param spline the spline's limits, pins and form check
     * @return the copy
     */
    @ApiStatus(since = "1.1")
    public HobCycle withSpline(Optional<SplineData> spline) {
        return new HobCycle(gear, inspection, tolerances, setup, steps, summary, simulation, findings, plannedFor,
                pair, spline);
    }

    /**
     * A cycle without a gear pair or spline data (the form before the mating gear and the spline).
     *
     * @param gear computed gear geometry
     * @param inspection inspection values
     * @param tolerances ISO 1328-1 flank tolerances, when a class is known
     * @param setup setup values
     * @param steps the ordered steps (empty when the job has errors)
     * @param summary time and predicted quality
     * @param simulation generating simulation, when run
     * @param findings every finding, errors first
     * @param plannedFor the job the cycle was planned for
     */
    public HobCycle(Optional<GearData> gear, Optional<InspectionData> inspection, Optional<ToleranceData> tolerances,
                    Optional<SetupValues> setup, List<CycleStep> steps, Optional<CycleSummary> summary,
                    Optional<SimulationData> simulation, List<Finding> findings, Optional<HobJob> plannedFor) {
        this(gear, inspection, tolerances, setup, steps, summary, simulation, findings, plannedFor, Optional.empty(),
                Optional.empty());
    }

    /**
     * This cycle marked as planned for a job.
     *
     * @param job the job it was planned from
     * @return the marked copy
     */
    @ApiStatus(since = "1.1")
    public HobCycle forJob(HobJob job) {
        return new HobCycle(gear, inspection, tolerances, setup, steps, summary, simulation, findings,
                Optional.of(Checks.present("job", job)), pair,
                spline);
    }

    /** {@return true when any finding is an error: nothing may be posted} */
    public boolean hasErrors() {
        return Finding.anyError(findings);
    }

    /** {@return sum of the steps' seconds, s} */
    public double stepSeconds() {
        return steps.stream().mapToDouble(CycleStep::seconds).sum();
    }

    /**
     * The summary a programmer reads, a few lines: root and swivel setting, speeds and ratio, passes
     * and cycle time, predicted finish, then one line per finding. The full values are in the
     * components (and in the JSON report).
     */
    @Override
    @ApiStatus(since = "1.1")
    public String toString() {
        String nl = System.lineSeparator();
        StringBuilder sb = new StringBuilder();
        long errors = count(Severity.ERROR);
        long warnings = count(Severity.WARNING);
        sb.append("cycle: ").append(errors > 0 ? "not planned, " + errors + " error(s)" : steps.size() + " steps")
                .append(warnings > 0 ? ", " + warnings + " warning(s)" : "");
        gear.ifPresent(g -> sb.append(nl).append(String.format(Locale.ROOT,
                "  gear: tip %.3f mm, root %.3f mm", g.tipDiameterMm(), g.rootDiameterMm())));
        setup.ifPresent(s -> sb.append(nl).append(String.format(Locale.ROOT,
                "  setup: blank %.3f mm, swivel %s (%s), hob %.0f rpm, work %.2f rpm, ratio %d:%d",
                s.blankDiameterMm(), s.swivelSettingText(), s.swivelDirection(), s.hobRpm(), s.workRpm(),
                s.syncHobTurns(), s.syncWorkTurns())));
        summary.ifPresent(s -> sb.append(nl).append(String.format(Locale.ROOT,
                "  cycle: %d pass(es), finishing feed %.3f mm/rev, %.1f s; feed marks %.2f µm, enveloping %.2f µm",
                s.passes().size(), s.finishFeedMmPerRev(), s.cycleTimeS(), s.feedMarkFlankUm(),
                s.envelopingDepthUm())));
        if (!findings.isEmpty()) {
            sb.append(nl).append(Finding.lines(findings));
        }
        return sb.toString();
    }

    private long count(Severity s) {
        return findings.stream().filter(f -> f.severity() == s).count();
    }
}
