package org.hobwright.wizard.inspection;

import java.util.function.DoubleUnaryOperator;

/**
 * An independent model of a hobbed gear's flanks for brute-force cross-checks. It uses no involute
 * function, no tooth-space angle formula and no production code: a flank is the unwound string of the
 * base circle, P(t) = r_b (cos t + t sin t, sin t − t cos t), turned so that the tooth is s_t wide on the
 * reference circle (the definition of tooth thickness), and swept along the helix z = φ · p_z / 2π for a
 * helical gear. Distances and extremes are found by sampling and golden-section refinement.
 */
public final class SampledFlanks {
    private static final double GOLDEN = (Math.sqrt(5) - 1) / 2;

    private final int z;
    private final double rb;
    private final double ra;
    private final double leadPerRad;
    private final double halfToothAngleAtReference;
    private final double referenceRadius;

    /**
     * Builds the flank model from first definitions: m_t = m_n / cos β, d = z m_t,
     * tan α_t = tan α_n / cos β, d_b = d cos α_t, s_t = m_t (π/2 + 2 x tan α_n) + E_sn / cos β, p_z = π d / tan β.
     */
    public SampledFlanks(int z, double mn, double alphaNDeg, double betaDeg, double x, double allowance, double tipDiameter) {
        double beta = Math.toRadians(betaDeg);
        double an = Math.toRadians(alphaNDeg);
        double mt = mn / Math.cos(beta);
        double d = z * mt;
        double at = Math.atan(Math.tan(an) / Math.cos(beta));
        this.z = z;
        this.rb = d * Math.cos(at) / 2;
        this.ra = tipDiameter / 2;
        this.referenceRadius = d / 2;
        double st = mt * (Math.PI / 2 + 2 * x * Math.tan(an)) + allowance / Math.cos(beta);
        this.halfToothAngleAtReference = st / d;
        this.leadPerRad = betaDeg == 0 ? 0 : Math.PI * d / Math.tan(beta) / (2 * Math.PI);
    }

    /** Roll parameter at the tip. */
    double tipRoll() {
        return Math.sqrt((ra / rb) * (ra / rb) - 1);
    }

    /**
     * A point of the flank of the tooth centred at polar angle {@code centre} in the transverse plane z = 0,
     * turned by φ about the axis and lifted along the helix. {@code upper} picks the flank on the
     * counter-clockwise side of the tooth.
     */
    double[] point(double centre, boolean upper, double t, double phi) {
        double qx = rb * (Math.cos(t) + t * Math.sin(t));
        double qy = rb * (Math.sin(t) - t * Math.cos(t));
        double tRef = Math.sqrt((referenceRadius / rb) * (referenceRadius / rb) - 1);
        double polarRef = Math.atan2(rb * (Math.sin(tRef) - tRef * Math.cos(tRef)),
                rb * (Math.cos(tRef) + tRef * Math.sin(tRef)));
        double x;
        double y;
        if (upper) {
            // mirrored involute: polar angle falls with radius; passes centre + s_t/d at the reference circle
            double start = centre + halfToothAngleAtReference + polarRef + phi;
            x = Math.cos(start) * qx + Math.sin(start) * qy;
            y = Math.sin(start) * qx - Math.cos(start) * qy;
        } else {
            double start = centre - halfToothAngleAtReference - polarRef + phi;
            x = Math.cos(start) * qx - Math.sin(start) * qy;
            y = Math.sin(start) * qx + Math.cos(start) * qy;
        }
        return new double[] {x, y, leadPerRad * phi};
    }

    /** Pitch angle 2π/z. */
    double pitchAngle() {
        return 2 * Math.PI / z;
    }

    /** Shortest distance from a point to the lower flank of the tooth above the gap centred on +x (φ limited). */
    public double distanceToGapFlank(double[] c, double phiRange) {
        double centre = Math.PI / z;
        DoubleUnaryOperator overPhi = phi -> minimise(t -> dist(point(centre, false, t, phi), c), 0, tipRoll() * 1.5);
        return leadPerRad == 0 ? overPhi.applyAsDouble(0) : minimise(overPhi, -phiRange, phiRange, 40);
    }

    /**
     * Diameter of the flank point nearest to c (the lower flank of the tooth above the gap centred on +x, φ
     * limited): where a ball centred at c touches the helicoid. The involute is continued beyond the tip, so
     * a ball riding on the tip edge shows a contact above the tip diameter.
     */
    double nearestFlankDiameter(double[] c, double phiRange) {
        double centre = Math.PI / z;
        DoubleUnaryOperator overT = phi -> minimise(t -> dist(point(centre, false, t, phi), c), 0, tipRoll() * 1.5);
        double phi = leadPerRad == 0 ? 0 : argmin(overT, -phiRange, phiRange, 40);
        double t = argmin(s -> dist(point(centre, false, s, phi), c), 0, tipRoll() * 1.5, 200);
        double[] p = point(centre, false, t, phi);
        return 2 * Math.hypot(p[0], p[1]);
    }

    /** Largest projection onto n of the upper flank of the tooth centred at {@code centre}, |z| ≤ b/2. */
    double support(double centre, double[] n, double faceWidth) {
        double phiMax = leadPerRad == 0 ? 0 : faceWidth / 2 / leadPerRad;
        DoubleUnaryOperator overPhi = phi -> -minimise(t -> -dot(point(centre, true, t, phi), n), 0, tipRoll());
        return leadPerRad == 0 ? overPhi.applyAsDouble(0)
                : -minimise(phi -> -overPhi.applyAsDouble(phi), -phiMax, phiMax, 40);
    }

    private static double dist(double[] a, double[] b) {
        double dx = a[0] - b[0];
        double dy = a[1] - b[1];
        double dz = a[2] - b[2];
        return Math.sqrt(dx * dx + dy * dy + dz * dz);
    }

    private static double dot(double[] a, double[] n) {
        return a[0] * n[0] + a[1] * n[1] + a[2] * n[2];
    }

    /** Minimum of f on [lo, hi]: 200 samples, then golden-section search around the best. */
    static double minimise(DoubleUnaryOperator f, double lo, double hi) {
        return minimise(f, lo, hi, 200);
    }

    /** Minimum of f on [lo, hi]: n samples, then golden-section search around the best. */
    static double minimise(DoubleUnaryOperator f, double lo, double hi, int n) {
        return f.applyAsDouble(argmin(f, lo, hi, n));
    }

    /** Where f is least on [lo, hi]: n samples, then golden-section search around the best. */
    static double argmin(DoubleUnaryOperator f, double lo, double hi, int n) {
        double step = (hi - lo) / n;
        int best = 0;
        double bestValue = Double.POSITIVE_INFINITY;
        for (int i = 0; i <= n; i++) {
            double v = f.applyAsDouble(lo + i * step);
            if (v < bestValue) {
                bestValue = v;
                best = i;
            }
        }
        double a = lo + Math.max(0, best - 1) * step;
        double b = lo + Math.min(n, best + 1) * step;
        double c = b - GOLDEN * (b - a);
        double d = a + GOLDEN * (b - a);
        double fc = f.applyAsDouble(c);
        double fd = f.applyAsDouble(d);
        for (int i = 0; i < 80; i++) {
            if (fc < fd) {
                b = d;
                d = c;
                fd = fc;
                c = b - GOLDEN * (b - a);
                fc = f.applyAsDouble(c);
            } else {
                a = c;
                c = d;
                fc = fd;
                d = a + GOLDEN * (b - a);
                fd = f.applyAsDouble(d);
            }
        }
        double found = fc < fd ? c : d;
        return Math.min(fc, fd) < bestValue ? found : lo + best * step;
    }
}
