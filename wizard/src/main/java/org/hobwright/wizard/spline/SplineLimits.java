package org.hobwright.wizard.spline;

import java.util.List;
import java.util.Optional;
import org.hobwright.api.check.Finding;
import org.hobwright.wizard.check.Wording;

/**
 * The limits of an external involute spline as its standard gives them, in mm. Symbols are the
 * standards' (ISO 4156-1:2005 names; ANSI B92.1 and DIN 5480 map onto them, see FORMULAS.md, splines).
 *
 * @param spec                  the spline
 * @param pitchDiameterMm       D = m z
 * @param baseDiameterMm        D_b = m z cos α_D
 * @param circularPitchMm       p = π m
 * @param basicToothThicknessMm S: the tooth thickness at D with es = 0 (π m / 2 for ISO 4156; the
 *                              standard's own value for ANSI 37.5° and 45° and for DIN 5480)
 * @param majorDiameterMaxMm    D_ee max
 * @param majorDiameterMinMm    D_ee min
 * @param minorDiameterMaxMm    D_ie max
 * @param minorDiameterMinMm    D_ie min
 * @param formDiameterMm        D_Fe max: the involute must reach down to here
 * @param formClearanceMm       c_F, radial
 * @param minimumRootRadiusMm   ρ_Fe min, the smallest root radius the standard asks for
 * @param tolerance             es, T + λ, λ
 * @param recommendedPinMm      the pin the standard recommends (or Hobwright's rule, see pinRule)
 * @param pinRule               how the recommended pin was found
 */
public record SplineLimits(SplineDrawing spec, double pitchDiameterMm, double baseDiameterMm, double circularPitchMm,
                           double basicToothThicknessMm, double majorDiameterMaxMm, double majorDiameterMinMm,
                           double minorDiameterMaxMm, double minorDiameterMinMm, double formDiameterMm,
                           double formClearanceMm, double minimumRootRadiusMm, SplineTolerance tolerance,
                           double recommendedPinMm, String pinRule) {

    /**
     * The limits of a spline by its standard; problems with the inputs become findings and no limits.
     *
     * @param spec     the spline
     * @param words    numbers in the job's units for the messages
     * @param findings receives the findings
     */
    public static Optional<SplineLimits> of(SplineDrawing spec, Wording words, List<Finding> findings) {
        int before = findings.size();
        SplineInputs.check(spec, findings);
        if (Finding.anyError(findings.subList(before, findings.size()))) {
            return Optional.empty();
        }
        Optional<SplineLimits> limits = switch (spec.standard()) {
            case ISO_4156 -> IsoSplines.limits(spec, words, findings);
            case ANSI_B92_1 -> AnsiSplines.limits(spec, words, findings);
            case DIN_5480 -> DinSplines.limits(spec, words, findings);
        };
        if (limits.isPresent() && !(limits.get().toothThicknessMinMm() > 0)) {
            findings.add(SplineCode.SPLINE_TOOTH_TOO_THIN.at("spline.toleranceClass", "the minimum actual tooth"
                    + " thickness S_min would be " + words.length(limits.get().toothThicknessMinMm()),
                    "check the module, the fit class and the tolerances"));
            return Optional.empty();
        }
        return limits;
    }

    /** Maximum effective tooth thickness S_v max, mm. */
    public double effectiveThicknessMaxMm() {
        return tolerance.effectiveMaxMm(basicToothThicknessMm);
    }

    /** Minimum effective tooth thickness S_v min, mm. */
    public double effectiveThicknessMinMm() {
        return tolerance.effectiveMinMm(basicToothThicknessMm);
    }

    /** Maximum actual tooth thickness S_max (circular, at D), mm. */
    public double toothThicknessMaxMm() {
        return tolerance.actualMaxMm(basicToothThicknessMm);
    }

    /** Minimum actual tooth thickness S_min (circular, at D), mm. */
    public double toothThicknessMinMm() {
        return tolerance.actualMinMm(basicToothThicknessMm);
    }

    /**
     * The profile shift coefficient of a rack (hob) that generates tooth thickness S at D:
     * x = (S − π m/2) / (2 m tan α_D), from S = m (π/2 + 2 x tan α_D) (ISO 21771:2007, as for gears).
     */
    public double shiftFor(double toothThicknessMm) {
        double m = spec.moduleMm();
        return (toothThicknessMm - Math.PI * m / 2) / (2 * m * Math.tan(spec.pressureAngleRad()));
    }

    /**
     * Addendum of the hob that cuts the root to D_ie max when it cuts S_v max, measured from the hob's
     * datum line (where its tooth is π m / 2 thick): h_a0 = D/2 + x(S_v max) m − D_ie max / 2. Derived;
     * for ISO 4156 30° flat root it is 0.75 m, for DIN 5480 0.55 m.
     */
    public double standardHobAddendumMm() {
        return pitchDiameterMm / 2 + shiftFor(effectiveThicknessMaxMm()) * spec.moduleMm() - minorDiameterMaxMm / 2;
    }
}
