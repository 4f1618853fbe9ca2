package org.hobwright.wizard.spline;

import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import org.hobwright.api.check.Finding;
import org.hobwright.wizard.check.Wording;

/**
 * The limits of an external spline by DIN 5480-1:2006 (reference diameter d_B, 30°, profile shift
 * x m = (d_B − m z − 1.1 m)/2). The tooth-thickness deviation and tolerances come from the drawing; see
 * FORMULAS.md, splines, for each formula and its confidence.
 */
final class DinSplines {
    /** Basic rack root radius ρ_fP = 0.16 m. */
    static final double ROOT_RADIUS_FACTOR = 0.16;
    /** Form clearance c_F = 0.02 m. */
    static final double FORM_CLEARANCE_FACTOR = 0.02;
    /** Pin D_M = 2 m. */
    static final double PIN_FACTOR = 2.0;

    private DinSplines() {
    }

    /** The profile shift x m = (d_B − m z − 1.1 m) / 2, mm. */
    static double shiftMm(SplineDrawing s) {
        return (s.referenceDiameterMm() - s.pitchDiameterMm() - 1.1 * s.moduleMm()) / 2;
    }

    static Optional<SplineLimits> limits(SplineDrawing s, Wording words, List<Finding> findings) {
        double m = s.moduleMm();
        double dB = s.referenceDiameterMm();
        double x = shiftMm(s) / m;
        if (!Double.isFinite(dB) || x < -0.05 - 1e-9 || x > 0.45 + 1e-9) {
            findings.add(SplineCode.SPLINE_REFERENCE_DIAMETER.at("spline.referenceDiameter", Double.isFinite(dB)
                    ? "reference diameter " + words.length(dB) + " gives x = " + words.number(x) + " for " + s.teeth() + " teeth of module " + words.number(m) + " mm"
                    : "a DIN 5480 spline needs its reference diameter", "give d_B as on the drawing (the first number"
                    + " of W d_B × m × z)"));
            return Optional.empty();
        }
        double alpha = s.pressureAngleRad();
        double tan = Math.tan(alpha);
        double d = s.pitchDiameterMm();
        double es = s.allowanceMm().orElseThrow();
        double total = s.totalToleranceMm().orElseThrow();
        double majorMax = dB - 0.2 * m;
        OptionalDouble it = IsoFits.tolerance(11, majorMax);
        if (it.isEmpty()) {
            findings.add(SplineCode.SPLINE_SIZE.at("spline.referenceDiameter", "reference diameter " + words.length(dB)
                    + " is beyond the ISO 286 tables (up to 500 mm)", "check the reference diameter"));
            return Optional.empty();
        }
        double minorMax = dB - 2.2 * m + es / tan;
        double cf = FORM_CLEARANCE_FACTOR * m;
        double form = dB - 2 * m - 2 * cf;
        double basic = m * (Math.PI / 2 + 2 * x * tan);
        SplineTolerance tol = new SplineTolerance(es, total, s.effectiveVariationMm().orElseThrow(),
                "DIN 5480-1:2006 " + s.toleranceClass() + s.fitClass() + ", values from the drawing");
        return Optional.of(new SplineLimits(s, d, d * Math.cos(alpha), Math.PI * m, basic, majorMax,
                majorMax - it.getAsDouble(), minorMax, minorMax - total / tan, form, cf, ROOT_RADIUS_FACTOR * m, tol,
                PIN_FACTOR * m, "DIN 5480: D_M = 2 m"));
    }
}
