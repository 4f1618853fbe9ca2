package org.hobwright.wizard.analysis;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.hobwright.api.check.Finding;
import org.hobwright.api.cycle.GearData;
import org.hobwright.api.cycle.SimulationData;
import org.hobwright.api.cycle.SplineData;
import org.hobwright.api.job.GearSpec;
import org.hobwright.api.job.HobJob;
import org.hobwright.api.job.HobSpec;
import org.hobwright.api.job.SplineHobProfile;
import org.hobwright.api.job.SplineSpec;
import org.hobwright.wizard.check.HobChecks;
import org.hobwright.wizard.check.MachineChecks;
import org.hobwright.wizard.check.Wording;
import org.hobwright.wizard.geometry.GearGeometry;
import org.hobwright.wizard.geometry.InvoluteGear;
import org.hobwright.wizard.geometry.ToothSystem;
import org.hobwright.wizard.setup.HobSetup;
import org.hobwright.wizard.spline.FormCheck;
import org.hobwright.wizard.spline.SplineCode;
import org.hobwright.wizard.spline.SplineDrawing;
import org.hobwright.wizard.spline.SplineHob;
import org.hobwright.wizard.spline.SplineHobCheck;
import org.hobwright.wizard.spline.SplineLimits;
import org.hobwright.wizard.spline.SplinePins;
import org.hobwright.wizard.spline.SplineRoot;
import org.hobwright.wizard.spline.SplineStandard;

/**
 * Runs the spline checks on a spline job: the spline against its standard, the pins, the spline hob
 * against the spline, the form check by the generating simulation, the hob's lead and swivel and the
 * machine's capacity. The planner then cuts the spline as the spur gear it is: reference diameter D,
 * tip D_ee max, root as the hob cuts it at the middle of the tooth-thickness tolerance.
 */
final class SplineJobAnalyser {
    /** Spacing of the simulated profile points, as a fraction of the module (as the gear report's). */
    private static final double SPACING = 0.04;

    private SplineJobAnalyser() {
    }

    static JobAnalysis analyse(HobJob job) {
        List<Finding> findings = new ArrayList<>();
        Wording words = new Wording(job.units());
        GearSpec frame = job.gear();
        SplineSpec spline = job.spline().orElseThrow();
        MachineChecks.capacity(job, words, findings);
        Optional<SplineStandard> standard = SplineStandard.of(spline.standard());
        Optional<SplineRoot> root = SplineRoot.of(spline.root());
        if (standard.isEmpty() || root.isEmpty()) {
            findings.add(SplineCode.SPLINE_STANDARD.at(standard.isEmpty() ? "spline.standard" : "spline.root",
                    "standard \"" + spline.standard() + "\" with root \"" + spline.root() + "\" is not known",
                    "use one of " + String.join(", ", SplineStandard.ids()) + " and flat or fillet"));
            return done(Optional.empty(), Optional.empty(), Optional.empty(), Optional.empty(), findings);
        }
        if (!frame.isSpur()) {
            findings.add(SplineCode.SPLINE_HELIX.at("spline.helixAngle", "helix angle " + frame.helixAngleDeg() + "°",
                    "give no helix angle"));
        }
        SplineDrawing drawing = new SplineDrawing(standard.get(), frame.teeth(), frame.moduleMm(),
                frame.pressureAngleDeg(), root.get(), spline.toleranceClass(), spline.fitClass(),
                spline.referenceDiameterMm().orElse(Double.NaN), frame.faceWidthMm(), spline.allowanceMm(),
                spline.totalToleranceMm(), spline.effectiveVariationMm());
        Optional<SplineLimits> limits = SplineLimits.of(drawing, words, findings);
        if (limits.isEmpty()) {
            return done(Optional.empty(), Optional.empty(), Optional.empty(), Optional.empty(), findings);
        }
        SplineLimits l = limits.get();
        SplinePins pins = SplinePins.choose(l, frame.pinDiameterMm(), List.of(), words, findings);
        frame.blankDiameterMm().ifPresent(b -> blank(l, b, words, findings));
        HobSpec hobSpec = job.hob();
        if (hobSpec.splineProfile().isEmpty()) {
            findings.add(SplineCode.SPLINE_HOB_NOT_SPLINE.at("hob.root", "the hob has no root form and tip radius",
                    "give hob.root (" + l.spec().root().id() + ") and hob.tipRadius"));
            return done(Optional.empty(), Optional.empty(), Optional.of(data(l, pins, Optional.empty())),
                    Optional.empty(), findings);
        }
        SplineHobProfile profile = hobSpec.splineProfile().get();
        SplineHob hob = new SplineHob(hobSpec.moduleMm(), hobSpec.pressureAngleDeg(),
                SplineRoot.of(profile.root()).orElse(l.spec().root()), profile.addendumMm().orElse(
                l.standardHobAddendumMm()), profile.tipRadiusMm(), hobSpec.starts(), hobSpec.gashes());
        boolean fits = SplineHobCheck.check(l, hob, words, findings);
        double middle = (l.toothThicknessMaxMm() + l.toothThicknessMinMm()) / 2;
        ToothSystem rack = rack(l, hob, middle);
        fits &= HobChecks.leadAngle(hobSpec, rack, words, findings);
        HobChecks.remarks(frame, hobSpec, words, findings);
        Optional<FormCheck> form = Optional.empty();
        Optional<HobSetup> setup = Optional.empty();
        if (fits) {
            form = Optional.of(FormCheck.run(l, hob, Math.max(0.001, SPACING * l.spec().moduleMm()), words, findings));
            HobSetup s = HobSetup.of(frame, hobSpec, rack);
            MachineChecks.swivel(job, s, words, findings);
            setup = Optional.of(s);
        }
        InvoluteGear equivalent = new InvoluteGear(frame.teeth(), frame.moduleMm(), Math.toRadians(frame.pressureAngleDeg()),
                0, l.shiftFor(middle), 0, rack);
        return done(Optional.of(GearGeometry.of(equivalent)), setup, Optional.of(data(l, pins, form)),
                form.map(f -> f.atMiddle().toData()), findings);
    }

    /**
     * The hob's rack as a tooth system: addendum to the major diameter at the middle shift, dedendum the hob
     * addendum, root radius the hob tip radius. The equivalent spur gear of this system at the shift of the
     * middle tooth thickness has tip D_ee max, root as cut and tooth thickness S at D.
     */
    private static ToothSystem rack(SplineLimits l, SplineHob hob, double thicknessMm) {
        double m = l.spec().moduleMm();
        double xm = l.shiftFor(thicknessMm) * m;
        double addendum = (l.majorDiameterMaxMm() / 2 - l.pitchDiameterMm() / 2 - xm) / m;
        return new ToothSystem("spline", addendum, hob.addendumMm() / m, hob.tipRadiusMm() / m, 0,
                l.spec().pressureAngleDeg(), l.spec().standard().title() + " spline hob");
    }

    private static void blank(SplineLimits l, double blankMm, Wording words, List<Finding> findings) {
        if (blankMm < l.majorDiameterMinMm() - 1e-9) {
            findings.add(SplineCode.SPLINE_BLANK_BELOW_MAJOR.at("spline.blankDiameter", "blank " + words.length(blankMm)
                    + " is below D_ee min " + words.length(l.majorDiameterMinMm()), "turn the blank to "
                    + words.length(l.majorDiameterMinMm()) + " … " + words.length(l.majorDiameterMaxMm())));
        } else if (blankMm > l.majorDiameterMaxMm() + 1e-9) {
            findings.add(SplineCode.SPLINE_BLANK_ABOVE_MAJOR.at("spline.blankDiameter", "blank " + words.length(blankMm)
                    + " is above D_ee max " + words.length(l.majorDiameterMaxMm()), "turn the major diameter to "
                    + words.length(l.majorDiameterMinMm()) + " … " + words.length(l.majorDiameterMaxMm())
                    + " before hobbing"));
        }
    }

    private static SplineData data(SplineLimits l, SplinePins pins, Optional<FormCheck> form) {
        return new SplineData(l.spec().standard().title(), l.pitchDiameterMm(), l.baseDiameterMm(),
                l.majorDiameterMaxMm(), l.majorDiameterMinMm(), l.minorDiameterMaxMm(), l.minorDiameterMinMm(),
                l.formDiameterMm(), l.formClearanceMm(), l.basicToothThicknessMm(), l.effectiveThicknessMaxMm(),
                l.effectiveThicknessMinMm(), l.toothThicknessMaxMm(), l.toothThicknessMinMm(),
                l.tolerance().allowanceMm(), l.tolerance().totalMm(), l.tolerance().effectiveVariationMm(),
                pins.pinMm(), pins.origin(), pins.overPinsMaxMm(), pins.overPinsMinMm(),
                form.map(f -> new SplineData.Form(f.formReached(), f.involuteStartDiameterMm(), f.rootDiameterMm(),
                        f.rootDiameterMinMm(), f.rootDiameterMaxMm())));
    }

    private static JobAnalysis done(Optional<GearData> gear, Optional<HobSetup> setup, Optional<SplineData> spline,
                                    Optional<SimulationData> simulation, List<Finding> findings) {
        return JobAnalyser.result(gear, Optional.empty(), Optional.empty(), setup, findings, Optional.empty(), spline,
                simulation);
    }
}
