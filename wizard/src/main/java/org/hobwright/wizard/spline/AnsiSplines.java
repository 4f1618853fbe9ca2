package org.hobwright.wizard.spline;

import java.util.List;
import java.util.Optional;
import org.hobwright.api.check.Finding;
import org.hobwright.wizard.check.Wording;

/**
 * The limits of an external spline by ANSI B92.1-1996 (inch, side fit), computed in inches and returned
 * in mm. Formulas recalled and cross-read against a secondary summary of the standard's tables; see
 * FORMULAS.md, splines, for each formula and its confidence.
 */
final class AnsiSplines {
    private static final double IN = 25.4;
    /** The standard diametral pitches P (the stub pitch is 2P), in the groups of the class 5 tolerance table. */
    private static final double[][] GROUPS = {{2.5, 3}, {4, 5}, {6, 8}, {10, 12}, {16, 20}, {24, 32, 40, 48}, {64, 80},
        {128}};
    /** Class 5 machining tolerance T = a + b N and effective variation λ = c + d N, 0.0001 in, per group. */
    private static final double[][] CLASS5 = {{15, 0.18, 20, 0.35}, {13, 0.15, 18, 0.23}, {11, 0.15, 15, 0.20},
        {11, 0.10, 14, 0.17}, {11, 0.07, 13, 0.12}, {11, 0.07, 11, 0.12}, {9, 0.06, 10, 0.10}, {9, 0.05, 9, 0.08}};
    /** Factors of the class 5 values for classes 4 … 7. */
    private static final double[] CLASS_FACTOR = {0.71, 1.0, 1.40, 2.00};
    /** The external spline pin, 1.92 / P. */
    static final double PIN_FACTOR = 1.92;

    private AnsiSplines() {
    }

    /** Index of the pitch group of P, or −1 when P is not a standard pitch. */
    static int group(double p) {
        for (int g = 0; g < GROUPS.length; g++) {
            for (double q : GROUPS[g]) {
                if (Math.abs(p - q) <= 1e-6 * q) {
                    return g;
                }
            }
        }
        return -1;
    }

    static Optional<SplineLimits> limits(SplineDrawing s, Wording words, List<Finding> findings) {
        double p = s.diametralPitch();
        int g = group(p);
        if (g < 0) {
            findings.add(SplineCode.SPLINE_PITCH.at("spline.diametralPitch", "diametral pitch " + words.number(p)
                    + " is not one of ANSI B92.1's (2.5/5 … 128/256)", "use the pitch on the drawing, e.g. \"16/32\""));
            return Optional.empty();
        }
        int n = s.teeth();
        double alpha = s.pressureAngleRad();
        double tan = Math.tan(alpha);
        double es = s.allowanceMm().orElse(0) / IN;
        double d = n / p;
        double db = d * Math.cos(alpha);
        double basic = (Math.PI / 2 + extraThickness(s.pressureAngleDeg())) / p;
        double majorMax = (n + 1) / p + es / tan;
        double minorMax = (n - minorFactor(s, p)) / p + es / tan;
        double classSeven = total(g, n, 3);
        double cf = Math.min(0.010, Math.max(0.002, 0.001 * d));
        double form = Math.max((n - formFactor(s.pressureAngleDeg())) / p - 2 * cf, hobFormDiameter(s, p));
        int c = Math.max(0, Math.min(3, s.toleranceClass() - 4));
        double total = s.totalToleranceMm().isPresent() ? s.totalToleranceMm().getAsDouble() / IN : total(g, n, c);
        double lambda = s.effectiveVariationMm().isPresent() ? s.effectiveVariationMm().getAsDouble() / IN
                : CLASS_FACTOR[c] * tenThousandths(CLASS5[g][2] + CLASS5[g][3] * n);
        SplineTolerance tol = new SplineTolerance(es * IN, total * IN, lambda * IN, "ANSI B92.1-1996 class "
                + s.toleranceClass() + (s.allowanceMm().isPresent() ? ", allowance from the drawing" : ", fit h"));
        double pin = PIN_FACTOR / p;
        return Optional.of(new SplineLimits(s, d * IN, db * IN, Math.PI / p * IN, basic * IN, majorMax * IN,
                (majorMax - majorTolerance(p)) * IN, minorMax * IN, (minorMax - classSeven / tan) * IN, form * IN,
                cf * IN, IsoSplines.rootRadiusFactor(s) / p * IN, tol, pin * IN, "ANSI B92.1: 1.92/P"));
    }

    /**
     * Tolerance of the external major diameter, in: 0.020 (P below 3), 0.015 (3/6), 0.010 (4/8), 0.008 (5/10),
     * 0.005 (6/12 … 24/48), 0.003 (32/64 … 48/96), 0.002 (finer).
     */
    static double majorTolerance(double p) {
        return p < 3 - 1e-9 ? 0.020 : p < 4 - 1e-9 ? 0.015 : p < 5 - 1e-9 ? 0.010 : p < 6 - 1e-9 ? 0.008
                : p < 32 - 1e-9 ? 0.005 : p < 64 - 1e-9 ? 0.003 : 0.002;
    }

    /** The external tooth's extra thickness over π/(2P), times P: 0 (30°), 0.1 (37.5°), 0.2 (45°). */
    static double extraThickness(double alphaDeg) {
        return alphaDeg == 30 ? 0 : alphaDeg == 37.5 ? 0.1 : 0.2;
    }

    /** D_re = (N − b)/P: 1.35 (30° flat), 1.8 (30° fillet, up to 12/24) or 2.0 (16/32 and finer), 1.3, 1.0. */
    static double minorFactor(SplineDrawing s, double p) {
        double a = s.pressureAngleDeg();
        if (a == 30) {
            return s.root() == SplineRoot.FLAT ? 1.35 : p < 16 ? 1.8 : 2.0;
        }
        return a == 37.5 ? 1.3 : 1.0;
    }

    /** D_Fe = (N − b)/P − 2 c_F: 1 (30°), 0.8 (37.5°), 0.6 (45°). */
    static double formFactor(double alphaDeg) {
        return alphaDeg == 30 ? 1.0 : alphaDeg == 37.5 ? 0.8 : 0.6;
    }

    /**
     * The smallest form diameter a standard 30° hob generates, in: the standard takes the larger of this and
     * the tabled D_Fe (which matters for few teeth). Written as the standard does,
     * √(3 N² + (N − 0.016 P − 4.5)²) / (2P) for the flat root and √(3 N² + (N − 5.359)²) / (2P) for the fillet
     * root; that is 2 √(r_b² + L²) with L = r sin 30° − h/sin 30°, h = 0.5625/P + 0.002 in (flat) or
     * 0.6699/P (fillet) the straight flank of the standard hob. 0 for 37.5° and 45°.
     */
    static double hobFormDiameter(SplineDrawing s, double p) {
        if (s.pressureAngleDeg() != 30) {
            return 0;
        }
        int n = s.teeth();
        double k = s.root() == SplineRoot.FLAT ? n - 0.016 * p - 4.5 : n - 5.359;
        return Math.sqrt(3.0 * n * n + k * k) / (2 * p);
    }

    /** T + λ of class 4 … 7 (index 0 … 3) for a pitch group, in: the class factor times the class 5 table values. */
    static double total(int group, int n, int classIndex) {
        double[] k = CLASS5[group];
        return CLASS_FACTOR[classIndex] * (tenThousandths(k[0] + k[1] * n) + tenThousandths(k[2] + k[3] * n));
    }

    /** A table value in ten-thousandths of an inch, rounded as the table prints it, in. */
    private static double tenThousandths(double value) {
        return Math.rint(value) / 10000;
    }
}
