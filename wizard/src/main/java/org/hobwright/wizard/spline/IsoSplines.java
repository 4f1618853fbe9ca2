package org.hobwright.wizard.spline;

import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import org.hobwright.api.check.Finding;
import org.hobwright.wizard.check.Wording;

/**
 * The limits of an external spline by ISO 4156-1:2005 (metric module, side fit). Formulas from memory,
 * cross-read against a secondary summary of the standard's tables; see FORMULAS.md, splines, for each
 * formula and its confidence.
 */
final class IsoSplines {
    /** ISO 4156-1:2005 tolerance classes 4 … 7: factors of i* and i** in T + λ. */
    private static final double[][] TOTAL = {{10, 40}, {16, 64}, {25, 100}, {40, 160}};
    /** F_p = a √L + b per class 4 … 7, µm. */
    private static final double[][] PITCH = {{2.5, 6.3}, {3.55, 9}, {5, 12.5}, {7.1, 18}};
    /** f_f = a φ_f + b per class 4 … 7, µm. */
    private static final double[][] PROFILE = {{1.6, 10}, {2.5, 16}, {4, 25}, {6.3, 40}};
    /** F_β = a √g + b per class 4 … 7, µm. */
    private static final double[][] HELIX = {{0.8, 4}, {1, 5}, {1.25, 6.3}, {2, 10}};

    private IsoSplines() {
    }

    static Optional<SplineLimits> limits(SplineDrawing s, Wording words, List<Finding> findings) {
        double m = s.moduleMm();
        int z = s.teeth();
        double alpha = s.pressureAngleRad();
        double tan = Math.tan(alpha);
        double d = m * z;
        OptionalDouble es = s.allowanceMm().isPresent() ? s.allowanceMm() : IsoFits.deviation(s.fitClass(), d);
        double majorFactor = majorFactor(s.pressureAngleDeg());
        double majorMax = m * (z + majorFactor) + es.orElse(0) / tan;
        OptionalDouble it = IsoFits.tolerance(m <= 0.75 ? 10 : m < 2 ? 11 : 12, majorMax);
        if (es.isEmpty() || it.isEmpty() || d > 500) {
            findings.add(SplineCode.SPLINE_SIZE.at("spline.teeth", "pitch diameter " + words.length(d) + " is beyond the"
                    + " ISO 286 tables (up to 500 mm)", "give spline.allowance, or check module and teeth"));
            return Optional.empty();
        }
        SplineTolerance tol = tolerance(s, es.getAsDouble());
        double minorMax = m * (z - minorFactor(s)) + es.getAsDouble() / tan;
        double minorMin = minorMax - total(3, d, m) / tan;
        double hs = formHeightFactor(s.pressureAngleDeg()) * m;
        double db = d * Math.cos(alpha);
        double roll = d / 2 * Math.sin(alpha) - (hs - 0.5 * es.getAsDouble() / tan) / Math.sin(alpha);
        double form = 2 * Math.sqrt(db * db / 4 + roll * roll);
        return Optional.of(new SplineLimits(s, d, db, Math.PI * m, Math.PI * m / 2, majorMax,
                majorMax - it.getAsDouble(), minorMax, minorMin, form, 0.1 * m, rootRadiusFactor(s) * m, tol,
                SplinePins.pitchContactPinR40(d, db, alpha, Math.PI * m / 2),
                "ISO 4156: the pin touching at the pitch diameter, rounded up to the R40 series"));
    }

    /** Major diameter factor: D_ee max = m (z + a) + es/tan α_D; a = 1, 0.9, 0.8 for 30°, 37.5°, 45°. */
    static double majorFactor(double alphaDeg) {
        return alphaDeg == 30 ? 1.0 : alphaDeg == 37.5 ? 0.9 : 0.8;
    }

    /** Minor diameter factor: D_ie max = m (z − b) + es/tan α_D; b = 1.5 (30° flat), 1.8 (30° fillet), 1.4, 1.2. */
    static double minorFactor(SplineDrawing s) {
        double a = s.pressureAngleDeg();
        if (a == 30) {
            return s.root() == SplineRoot.FLAT ? 1.5 : 1.8;
        }
        return a == 37.5 ? 1.4 : 1.2;
    }

    /** h_s of the form diameter: 0.6 m, 0.55 m, 0.5 m for 30°, 37.5°, 45° (the mating internal's addendum plus c_F). */
    static double formHeightFactor(double alphaDeg) {
        return alphaDeg == 30 ? 0.6 : alphaDeg == 37.5 ? 0.55 : 0.5;
    }

    /** ρ_Fe min / m: 0.2 (30° flat), 0.4 (30° fillet), 0.3 (37.5°), 0.25 (45°). */
    static double rootRadiusFactor(SplineDrawing s) {
        double a = s.pressureAngleDeg();
        if (a == 30) {
            return s.root() == SplineRoot.FLAT ? 0.2 : 0.4;
        }
        return a == 37.5 ? 0.3 : 0.25;
    }

    /** The unit i* = 0.45 ∛D + 0.001 D (D ≤ 500 mm), µm, D in mm. */
    static double unitDiameter(double d) {
        return 0.45 * Math.cbrt(d) + 0.001 * d;
    }

    /** T + λ of a class (index 0 … 3 for classes 4 … 7), mm: a i* + b i**, i** = the unit of E = π m / 2. */
    static double total(int classIndex, double d, double m) {
        double[] k = TOTAL[classIndex];
        return (k[0] * unitDiameter(d) + k[1] * unitDiameter(Math.PI * m / 2)) / 1000;
    }

    /**
     * λ = 0.6 √(F_p² + f_f² + F_β²), with F_p over L = π m z / 2, f_f over φ_f = m + 0.0125 m z and F_β
     * over the spline length g, mm.
     */
    static double effectiveVariation(int classIndex, double m, int z, double lengthMm) {
        double fp = PITCH[classIndex][0] * Math.sqrt(Math.PI * m * z / 2) + PITCH[classIndex][1];
        double ff = PROFILE[classIndex][0] * (m + 0.0125 * m * z) + PROFILE[classIndex][1];
        double fb = HELIX[classIndex][0] * Math.sqrt(lengthMm) + HELIX[classIndex][1];
        return 0.6 * Math.sqrt(fp * fp + ff * ff + fb * fb) / 1000;
    }

    private static SplineTolerance tolerance(SplineDrawing s, double es) {
        int c = Math.max(0, Math.min(3, s.toleranceClass() - 4));
        double total = s.totalToleranceMm().orElse(total(c, s.pitchDiameterMm(), s.moduleMm()));
        double lambda = s.effectiveVariationMm().orElse(effectiveVariation(c, s.moduleMm(), s.teeth(), s.lengthMm()));
        String basis = "ISO 4156-1:2005 class " + s.toleranceClass() + s.fitClass()
                + (s.allowanceMm().isPresent() || s.totalToleranceMm().isPresent()
                || s.effectiveVariationMm().isPresent() ? ", with the drawing's values where given" : "");
        return new SplineTolerance(es, total, lambda, basis);
    }
}
