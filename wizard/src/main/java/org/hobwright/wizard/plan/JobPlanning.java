package org.hobwright.wizard.plan;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.hobwright.api.check.Finding;
import org.hobwright.api.check.Severity;
import org.hobwright.api.cycle.CycleSummary;
import org.hobwright.api.cycle.FastestProposal;
import org.hobwright.api.cycle.GearData;
import org.hobwright.api.cycle.HobCycle;
import org.hobwright.api.cycle.PassSummary;
import org.hobwright.api.cycle.SetupValues;
import org.hobwright.api.cycle.Rotation;
import org.hobwright.api.job.CuttingSense;
import org.hobwright.api.job.CycleSettings;
import org.hobwright.api.job.GearSpec;
import org.hobwright.api.job.HobJob;
import org.hobwright.api.job.HobSpec;
import org.hobwright.api.job.MachineFields;
import org.hobwright.api.job.MachineProfile;
import org.hobwright.api.job.MachineTimes;
import org.hobwright.text.Decimal;
import org.hobwright.wizard.analysis.JobAnalysis;
import org.hobwright.wizard.setup.Angles;
import org.hobwright.wizard.setup.HobSetup;
import org.hobwright.wizard.simulate.GeneratingSimulation;
import org.hobwright.wizard.store.CuttingData;
import org.hobwright.wizard.store.CuttingDataTable;

/**
 * Plans one analysed job: checks what would stop the cycle, resolves speeds, passes and feeds,
 * builds the steps, predicts the finish, checks travels and the safety invariants, and runs the
 * optimiser when asked. Reads the machine only through {@link MachineProfile}'s accessors.
 *
 * <p>Default roughing depth when the job leaves it open: the whole depth in one pass for modules
 * up to 2.5 mm, otherwise 1.25 m_n per pass (FORMULAS.md §7.5, common practice, no source).
 */
final class JobPlanning {
    private static final double ONE_PASS_MODULE_MM = 2.5;
    private static final double ROUGH_DEPTH_PER_MODULE = 1.25;

    private final HobJob job;
    private final JobAnalysis analysis;
    private final CuttingDataTable table;
    private final List<Finding> findings;
    private final GearSpec gear;
    private final HobSpec hob;
    private final MachineProfile machine;
    private final CycleSettings cycle;

    JobPlanning(HobJob job, JobAnalysis analysis, CuttingDataTable table, List<Finding> findings) {
        this.job = job;
        this.analysis = analysis;
        this.table = table;
        this.findings = findings;
        this.gear = job.gear();
        this.hob = job.hob();
        this.machine = job.machine();
        this.cycle = job.cycle();
    }

    HobCycle run() {
        GearData gd = analysis.gear().orElseThrow();
        HobSetup hs = analysis.hobSetup().orElseThrow();
        SyncRatio ratio = SyncRatio.of(gear.teeth(), hob.starts());
        SwivelSetting swivel = SwivelSetting.of(hs.swivelAngleDeg(), machine.swivel());
        double touchOff = gear.blankDiameterMm().orElse(gd.tipDiameterMm());
        double root = gd.rootDiameterMm();
        SpeedWindow window = SpeedWindow.of(machine, hob, ratio);
        Optional<CuttingData> row = table.find(cycle.workMaterial(), hob.material(), gear.moduleMm())
                .map(r -> job.spline().isPresent() ? r.forSplines() : r);
        new Blockers(job, table, findings).check(ratio, swivel, touchOff, root, roughDepth((touchOff - root) / 2), window, row);
        if (Finding.anyError(findings)) {
            return DefaultCyclePlanner.unplanned(analysis, findings);
        }
        Clearances.check(cycle, job.units(), findings);
        if (swivel.rounded()) {
            findings.add(PlanCode.PLAN_SWIVEL_ROUNDED.at("machine.swivel.resolution",
                    "the holder's resolution rounds the swivel setting from " + Angles.dms(swivel.exactDeg()) + " to "
                    + swivel.text(), null));
        }
        double depth = (touchOff - root) / 2;
        QualityLimits targets = QualityLimits.of(cycle.targets(), analysis.tolerances(), table.qualityDefaults(), row);
        CutModel model = CutModel.of(gear, hob);
        Drive drive = drive(ratio);
        PlanSettings settings = settings(depth, window, row, targets, model, drive);
        CycleGeometry geometry = new CycleGeometry(touchOff, root, gear.faceWidthMm(), hob.outsideDiameterMm(),
                gear.pressureAngleDeg(), hs.swivelAngleDeg(), !gear.isSpur(), cycle.axialClearanceMm(),
                cycle.radialClearanceMm(), machine.radialMaxMm(), machine.rapidMmPerMin(), machine.syncSettleS());
        Optional<HobShiftPlan> shift = HobShiftPlan.of(machine, hob, cycle, depth, gear.pressureAngleDeg(), findings);
        unknownTimes(shift.isPresent());
        String swivelDms = hs.swivelAngleDms();
        Toolpath path = ToolpathBuilder.build(geometry, drive, settings,
                HeaderSteps.of(job, swivel, drive, settings, shift), cycle.coolant());
        Prediction prediction = Prediction.of(model, settings);
        prediction.check(targets, model, findings);
        findings.addAll(TravelCheck.check(path.steps(), machine));
        invariants(root).violations(path.steps()).forEach(v -> findings.add(
                PlanCode.PLAN_INVARIANT_BROKEN.at("job", "planner safety check failed: " + v,
                "do not post; report this job to the Hobwright developers")));
        Optional<FastestProposal> fastest = cycle.fastest()
                ? fastest(geometry, drive, model, window, row, targets, path.cycleTimeS()) : Optional.empty();
        SetupValues setup = new SetupValues(touchOff, touchOff, root, hs.leadAngleDeg(), hs.swivelAngleDeg(),
                swivel.machineAngleDeg(), swivel.text(), swivelDms, swivel.direction(),
                settings.cuttingSpeedMPerMin(), settings.hobRpm(), drive.workRpm(settings.hobRpm()), ratio.hobTurns(),
                ratio.workTurns(),
                drive.differentialDegPerMm(), shift.map(HobShiftPlan::positionMm).orElse(0.0));
        PassSummary last = path.passes().get(path.passes().size() - 1);
        CycleSummary summary = new CycleSummary(path.cycleTimeS(), path.passes(), settings.finishFeedMmPerRev(),
                last.approachMm(), last.overrunMm(), prediction.feedMarkFlankUm(), prediction.feedMarkRootUm(),
                prediction.envelopingUm(), prediction.maxChipMm(), fastest, targets.applied());
        boolean errors = Finding.anyError(findings);
        return new HobCycle(analysis.gear(), analysis.inspection(), analysis.tolerances(), Optional.of(setup),
                errors ? List.of() : path.steps(), Optional.of(summary),
                job.spline().isPresent() ? analysis.simulation() : GeneratingSimulation.forCycle(job, gd, findings),
                DefaultCyclePlanner.sorted(findings), Optional.empty(), analysis.pair(), analysis.spline());
    }

    /**
     * The machine times the cycle (swivel, hob shift) and the batch (load, unload) count that the
     * profile does not give: they count as 0 s, and a remark says so.
     */
    private void unknownTimes(boolean shifts) {
        MachineTimes t = machine.times();
        List<String> missing = new ArrayList<>(4);
        if (t.loadS().isEmpty()) {
            missing.add(MachineFields.TIME_LOAD.key());
        }
        if (t.unloadS().isEmpty()) {
            missing.add(MachineFields.TIME_UNLOAD.key());
        }
        if (machine.swivel().programmable() && t.swivelS().isEmpty()) {
            missing.add(MachineFields.TIME_SWIVEL.key());
        }
        if (shifts && t.hobShiftS().isEmpty()) {
            missing.add(MachineFields.TIME_HOB_SHIFT.key());
        }
        if (!missing.isEmpty()) {
            findings.add(PlanCode.PLAN_MACHINE_TIME_UNKNOWN.at("machine.times", "the machine profile " + machine.name()
                    + " gives no " + String.join(", ", missing) + ": the cycle time and the batch time count "
                    + (missing.size() == 1 ? "it" : "them") + " as 0 s", "measure " + (missing.size() == 1 ? "it" : "them")
                    + " at the machine and add " + (missing.size() == 1 ? "it" : "them") + " to the machine profile"));
        }
    }

    private Drive drive(SyncRatio ratio) {
        if (hob.cuttingSense().isEmpty()) {
            findings.add(PlanCode.PLAN_HOB_SENSE_ASSUMED.at("hob.cuttingSense", "the hob's cutting sense is "
                    + "not given; the plan takes a hob that cuts turning clockwise seen from its drive end: check "
                    + "the hob (its cutting faces lead when it turns in its cutting sense) and give hob.cuttingSense",
                    null));
        }
        Rotation spindle = SpindleSenses.hobSpindle(hob.cuttingSense().orElse(CuttingSense.CLOCKWISE),
                cycle.run().hobTurnedRound());
        if (cycle.run().hobTurnedRound()) {
            findings.add(PlanCode.PLAN_HOB_TURNED_ROUND.at("cycle.hobTurnedRound", "the hob is turned "
                    + "round on its arbor: the hob spindle runs " + spindle.word() + " seen from its drive "
                    + "end, against the sense marked on the hob", "mount the hob as the program says before the "
                    + "first part; the program header and the setup sheet say so in capitals"));
        }
        SpindleSenses senses = SpindleSenses.of(spindle, machine.clockwiseTeethTowardChuck(), cycle.method(),
                hob.hand(), gear.hand());
        double differential = gear.isSpur() ? 0 : senses.differentialSign()
                * Kinematics.differentialDegPerMm(gear.helixAngleDeg(), gear.teeth(), gear.moduleMm());
        return new Drive(ratio, senses, differential);
    }

    /** The user's speeds, passes and feeds: given values kept, open ones chosen, limits applied. */
    private PlanSettings settings(double depth, SpeedWindow window, Optional<CuttingData> row, QualityLimits targets,
                                  CutModel model, Drive drive) {
        double rpm = SpeedChoice.hobRpm(boxed(cycle.cuttingSpeedMPerMin()), row, hob.outsideDiameterMm(), window,
                findings).orElseThrow();
        PassDepths depths = PassDepths.of(depth, roughDepth(depth), cycle.finishStockMm());
        FeedChoice feeds = FeedChoice.of(new FeedChoice.Inputs(cycle.roughFeedMmPerRev(), cycle.finishFeedMmPerRev(),
                row, targets, model, depths, drive.workRpm(rpm), machine.maxFeedMmPerMin()), findings).orElseThrow();
        return new PlanSettings(Kinematics.cuttingSpeed(rpm, hob.outsideDiameterMm()), rpm, feeds.roughMmPerRev(),
                feeds.finishMmPerRev(), depths);
    }

    /** The job's roughing depth, or the default for its module, mm. */
    private double roughDepth(double depth) {
        return cycle.roughDepthMm().orElse(gear.moduleMm() <= ONE_PASS_MODULE_MM ? depth
                : ROUGH_DEPTH_PER_MODULE * gear.moduleMm());
    }

    private CycleInvariants invariants(double root) {
        return new CycleInvariants(machine.hobMinRpm(), Math.min(machine.hobMaxRpm(), hob.maxRpm().orElse(
                Double.POSITIVE_INFINITY)), machine.workMinRpm(), machine.workMaxRpm(), machine.maxSyncRatio(),
                machine.maxFeedMmPerMin(), machine.syncSettleS(), root);
    }

    private Optional<FastestProposal> fastest(CycleGeometry geometry, Drive drive, CutModel model, SpeedWindow window,
                                              Optional<CuttingData> row, QualityLimits targets, double userTimeS) {
        if (row.isEmpty()) {
            findings.add(PlanCode.PLAN_FASTEST_NONE.at(Severity.WARNING, "cycle.workMaterial",
                    "the fastest cycle needs the cutting-data limits for " + cycle.workMaterial() + " with a "
                            + hob.material() + " hob", "add a row to your cutting-data table", PlanSources.TABLE));
            return Optional.empty();
        }
        Optional<FastestCycle.Result> r = FastestCycle.find(geometry, drive, model, new FastestCycle.Limits(window,
                row.get(), targets, machine.maxFeedMmPerMin(), cycle.finishStockMm()));
        if (r.isEmpty()) {
            findings.add(PlanCode.PLAN_FASTEST_NONE.at(Severity.WARNING, "machine", "no speed and feed satisfy every limit"
                    + " at once, so no fastest cycle can be proposed", "check the machine's speed limits",
                    PlanSources.MACHINE));
            return Optional.empty();
        }
        FastestProposal p = r.get().proposal();
        findings.add(PlanCode.PLAN_FASTEST.at("cycle.fastest", "fastest cycle " + Decimal.fixed(p.cycleTimeS(), 1)
                + " s (proved lower bound " + Decimal.fixed(p.lowerBoundS(), 1) + " s) against "
                + Decimal.fixed(userTimeS, 1) + " s planned: " + Decimal.fixed(p.cuttingSpeedMPerMin(), 1) + " m/min, "
                + p.passes() + " pass(es), roughing " + Decimal.fixed(p.roughFeedMmPerRev(), 3) + " mm, finishing "
                + Decimal.fixed(p.finishFeedMmPerRev(), 3) + " mm per work revolution; limits: " + p.bindingLimit(), null));
        return Optional.of(p);
    }

    private static Optional<Double> boxed(java.util.OptionalDouble v) {
        return v.isPresent() ? Optional.of(v.getAsDouble()) : Optional.empty();
    }
}
