package org.hobwright.wizard.analysis;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Optional;
import org.hobwright.api.check.Finding;
import org.hobwright.api.cycle.GearData;
import org.hobwright.api.cycle.GearPairData;
import org.hobwright.api.cycle.InspectionData;
import org.hobwright.api.cycle.SimulationData;
import org.hobwright.api.cycle.SplineData;
import org.hobwright.api.cycle.ToleranceData;
import org.hobwright.api.job.GearSpec;
import org.hobwright.api.job.HobJob;
import org.hobwright.api.job.Units;
import org.hobwright.wizard.check.BlankCheck;
import org.hobwright.wizard.check.DrawingCheck;
import org.hobwright.wizard.check.EngineeringCode;
import org.hobwright.wizard.check.GearChecks;
import org.hobwright.wizard.check.GearPairChecks;
import org.hobwright.wizard.check.HobChecks;
import org.hobwright.wizard.check.InputChecks;
import org.hobwright.wizard.check.InspectionChecks;
import org.hobwright.wizard.check.MachineChecks;
import org.hobwright.wizard.check.ToleranceCheck;
import org.hobwright.wizard.check.Wording;
import org.hobwright.wizard.geometry.GearGeometry;
import org.hobwright.wizard.geometry.InvoluteGear;
import org.hobwright.wizard.geometry.ToothSystem;
import org.hobwright.wizard.inspection.InspectionValues;
import org.hobwright.wizard.inspection.MeasurementLimits;
import org.hobwright.wizard.setup.HobSetup;

/**
 * Runs the engineering core on a job: input ranges, geometry, the gear checks, inspection values,
 * tolerances, hob setup and the machine and drawing checks. Never throws for a problem with the job;
 * every problem is a finding, and a part that cannot be computed because of an error stays empty.
 * Findings come errors first, then warnings, then remarks, each group in check order.
 */
public final class JobAnalyser {
    private JobAnalyser() {
    }

    /** Analyses a job. */
    public static JobAnalysis analyse(HobJob job) {
        if (job.spline().isPresent()) {
            return SplineJobAnalyser.analyse(job);
        }
        List<Finding> findings = new ArrayList<>();
        Wording words = new Wording(job.units());
        GearSpec spec = job.gear();
        MachineChecks.capacity(job, words, findings);
        Optional<ToothSystem> system = ToothSystem.of(spec);
        if (system.isEmpty()) {
            findings.add(EngineeringCode.GEAR_TOOTH_SYSTEM_UNKNOWN.at("gear.toothSystem",
                    "tooth system \"" + spec.toothSystem() + "\" is not known",
                    "use one of " + String.join(", ", ToothSystem.ids())));
            return result(Optional.empty(), Optional.empty(), Optional.empty(), Optional.empty(), findings);
        }
        boolean hobFits = HobChecks.matches(spec, job.hob(), words, findings);
        hobFits &= HobChecks.leadAngle(job.hob(), system.get(), words, findings);
        HobChecks.remarks(spec, job.hob(), words, findings);
        Optional<HobSetup> setup = Optional.empty();
        if (hobFits) {
            HobSetup s = HobSetup.of(spec, job.hob(), system.get());
            MachineChecks.swivel(job, s, words, findings);
            setup = Optional.of(s);
        }
        List<Finding> inputs = InputChecks.gear(spec, words);
        findings.addAll(inputs);
        InvoluteGear g = InvoluteGear.of(spec, system.get());
        if (Finding.anyError(inputs) || !GearChecks.rootPositive(g, words, findings)) {
            return result(Optional.empty(), Optional.empty(), Optional.empty(), setup, findings);
        }
        GearData gear = GearGeometry.of(g);
        GearChecks.customRootRadius(g, words, findings);
        GearChecks.undercut(g, job, words, findings);
        double tip = Math.min(g.tipDiameterMm(), spec.blankDiameterMm().orElse(Double.POSITIVE_INFINITY));
        spec.blankDiameterMm().ifPresent(b -> BlankCheck.check(g, b, words, findings));
        GearChecks.tip(g, tip, job, words, findings);
        Optional<ToleranceData> tolerances = ToleranceCheck.tolerances(spec, g, findings);
        InspectionValues inspection = InspectionValues.of(g, tip, spec.pinDiameterMm(), shopStepMm(job.units()));
        InspectionChecks.check(g, spec.faceWidthMm(), inspection, words, findings);
        if (spec.thicknessAllowanceLowerMm().isPresent()) {
            double lower = spec.thicknessAllowanceLowerMm().getAsDouble();
            InspectionChecks.checkLowerLimit(g, inspection, lower, words, findings);
            inspection = inspection.withLimits(MeasurementLimits.of(g, inspection, lower,
                    InspectionChecks.limitsBasis(spec, words, findings)));
        }
        DrawingCheck.check(spec.drawing(), g, inspection.pins().pinDiameterMm(), words, findings);
        Optional<GearPairData> pair = spec.mate().isPresent()
                ? GearPairChecks.check(spec, g, tip, words, findings) : Optional.empty();
        return result(Optional.of(gear), Optional.of(inspection.data()), tolerances, setup, findings, pair,
                Optional.empty(), Optional.empty());
    }

    /** Rounding step of a computed pin: 0.01 mm, or 0.0005 in in inch jobs (common practice, no source). */
    static double shopStepMm(Units units) {
        return units == Units.IN ? Units.IN.toMm(0.0005) : 0.01;
    }

    static JobAnalysis result(Optional<GearData> gear, Optional<InspectionData> inspection,
                                      Optional<ToleranceData> tolerances, Optional<HobSetup> setup,
                                      List<Finding> findings) {
        return result(gear, inspection, tolerances, setup, findings, Optional.empty(), Optional.empty(),
                Optional.empty());
    }

    /** The analysis with its findings sorted errors first, each group in check order. */
    static JobAnalysis result(Optional<GearData> gear, Optional<InspectionData> inspection,
                              Optional<ToleranceData> tolerances, Optional<HobSetup> setup, List<Finding> findings,
                              Optional<GearPairData> pair, Optional<SplineData> spline,
                              Optional<SimulationData> simulation) {
        List<Finding> sorted = new ArrayList<>(findings);
        sorted.sort(Comparator.comparing(Finding::severity));
        return new JobAnalysis(gear, inspection, tolerances, setup, sorted, pair, spline, simulation);
    }
}
