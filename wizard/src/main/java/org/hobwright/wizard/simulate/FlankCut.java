package org.hobwright.wizard.simulate;

import java.util.ArrayList;
import java.util.List;

/**
 * The profile the discrete cuts leave on the right-hand side of the tooth space (the left side is
 * the mirror image with the cut phase negated), measured along the nominal path's normals, and the
 * exact cusps between neighbouring cuts on the involute.
 */
final class FlankCut {
    private static final int MAX_DEPTH = 40;
    /** Cut positions on either side searched for one that covers a flank end. */
    private static final int NEIGHBOURS = 8;

    final NominalPath path;
    /** Material left standing along each nominal normal, mm (≥ 0 up to rounding). */
    final double[] excess;
    /** The boundary point: nominal point + excess · normal. */
    final double[] bx;
    final double[] by;
    /** Cusps on the involute: roll length and height, mm, in roll order. */
    final List<double[]> cusps;
    /** Radius of the start of the active involute, mm ({@link #activeStart}). */
    final double involuteStartRadius;

    FlankCut(NominalPath path, double phase) {
        this.path = path;
        CutEnvelope env = new CutEnvelope(path, phase);
        int n = path.size;
        excess = new double[n];
        bx = new double[n];
        by = new double[n];
        int[] arg = new int[n];
        int[] out = new int[2];
        for (int i = 0; i < n; i++) {
            double t = env.boundary(path.x[i], path.y[i], path.nx[i], path.ny[i], path.phi[i], out);
            if (!Double.isFinite(t)) {
                t = 0;
            }
            excess[i] = t;
            bx[i] = path.x[i] + t * path.nx[i];
            by[i] = path.y[i] + t * path.ny[i];
            arg[i] = out[0];
        }
        cusps = new ArrayList<>();
        double[] c = new double[7];
        for (int i = 0; i + 1 < n; i++) {
            if (path.kind[i] == NominalPath.FLANK && path.kind[i + 1] == NominalPath.FLANK && arg[i] != arg[i + 1]) {
                refine(env, path.param[i], arg[i], path.param[i + 1], arg[i + 1], c, 0);
            }
        }
        involuteStartRadius = activeStart(env);
    }

    /**
     * The start of the active involute: below the highest straight-flank end E_k that lies on the
     * cut boundary, the profile is cut by a tip rounding; above it, by straight flanks only (each
     * cut's outline turns from flank to rounding exactly at E_k). E_k is on the boundary when no
     * other cut position contains it; ends inside the true involute (undercut) do not count.
     * Independent of the sampling.
     */
    private double activeStart(CutEnvelope env) {
        double best = Double.NaN;
        double[] e = new double[4];
        for (int k = env.firstPosition(); k <= env.lastPosition(); k++) {
            flankLine(env.angle(k), e);
            double rr = Math.hypot(e[0], e[1]);
            if (rr <= best || rr > path.setup.tipRadiusMm()
                    || !(path.excess(e[0], e[1]) >= -UndercutCheck.TOLERANCE_MM)) {
                continue;
            }
            boolean covered = false;
            for (int j = k - NEIGHBOURS; j <= k + NEIGHBOURS && !covered; j++) {
                covered = j != k && env.depthInside(j, e[0], e[1]) > 1e-12;
            }
            if (!covered) {
                best = rr;
            }
        }
        return Double.isNaN(best) ? path.involuteStartRadius : best;
    }

    private void refine(CutEnvelope env, double la, int ka, double lb, int kb, double[] c, int depth) {
        if (ka == kb || depth > MAX_DEPTH) {
            return;
        }
        if (Math.abs(ka - kb) == 1) {
            double[] corner = corner(env, Math.min(ka, kb));
            if (corner != null) {
                cusps.add(corner);
                return;
            }
            double lo = la;
            double hi = lb;
            double gLo = difference(env, lo, ka, kb, c);
            for (int it = 0; it < 60; it++) {
                double mid = (lo + hi) / 2;
                double g = difference(env, mid, ka, kb, c);
                if ((g <= 0) == (gLo <= 0)) {
                    lo = mid;
                    gLo = g;
                } else {
                    hi = mid;
                }
            }
            double l = (lo + hi) / 2;
            double h = entryAt(env, l, ka, c);
            if (Double.isFinite(h)) {
                cusps.add(new double[] {path.rollOfLambda(l), h});
            }
            return;
        }
        double mid = (la + lb) / 2;
        path.contact(NominalPath.FLANK, mid, c);
        int[] out = new int[2];
        env.boundary(c[0], c[1], c[2], c[3], c[4], out);
        refine(env, la, ka, mid, out[0], c, depth + 1);
        refine(env, mid, out[0], lb, kb, c, depth + 1);
    }

    /**
     * The cusp of two neighbouring straight-flank cuts k and k + 1: where their flank lines cross
     * (in the gear frame, each line R(−φ)·(E − (r φ, −a)) + s R(−φ)(sin α_t, cos α_t)). Its height is
     * its distance from the involute ({@link NominalPath#excess}); its roll length that of the
     * involute point on the same base tangent. Null when the crossing is not on both straight flanks.
     */
    private double[] corner(CutEnvelope env, int k) {
        double[] p1 = new double[4];
        double[] p2 = new double[4];
        flankLine(env.angle(k), p1);
        flankLine(env.angle(k + 1), p2);
        double det = p1[2] * p2[3] - p1[3] * p2[2];
        if (Math.abs(det) < 1e-15) {
            return null;
        }
        double s1 = ((p2[0] - p1[0]) * p2[3] - (p2[1] - p1[1]) * p2[2]) / det;
        double s2 = ((p2[0] - p1[0]) * p1[3] - (p2[1] - p1[1]) * p1[2]) / det;
        if (s1 < 0 || s2 < 0) {
            return null;
        }
        double x = p1[0] + s1 * p1[2];
        double y = p1[1] + s1 * p1[3];
        double height = path.excess(x, y);
        if (Double.isNaN(height)) {
            return null;
        }
        double rr = Math.hypot(x, y);
        return new double[] {Math.sqrt(rr * rr - path.rb * path.rb) - height, height};
    }

    /** Gear-frame point (the straight flank's lower end) and unit direction (upward) of the flank at φ. */
    private void flankLine(double phi, double[] out) {
        double c = Math.cos(phi);
        double s = Math.sin(phi);
        double gx = path.flankEnd[0] - path.r * phi;
        double gy = path.a + path.flankEnd[1];
        out[0] = gx * c + gy * s;
        out[1] = -gx * s + gy * c;
        out[2] = path.rack.sinA * c + path.rack.cosA * s;
        out[3] = -path.rack.sinA * s + path.rack.cosA * c;
    }

    private double difference(CutEnvelope env, double lambda, int ka, int kb, double[] c) {
        return entryAt(env, lambda, ka, c) - entryAt(env, lambda, kb, c);
    }

    private double entryAt(CutEnvelope env, double lambda, int k, double[] c) {
        path.contact(NominalPath.FLANK, lambda, c);
        return env.entry(k, c[0], c[1], c[2], c[3], new int[1]);
    }

    /** Largest excess over the involute part (samples and cusps), mm. */
    double maxInvoluteExcess() {
        double m = 0;
        for (int i = 0; i < path.size; i++) {
            if (path.kind[i] == NominalPath.FLANK) {
                m = Math.max(m, Math.abs(excess[i]));
            }
        }
        for (double[] cusp : cusps) {
            m = Math.max(m, Math.abs(cusp[1]));
        }
        return m;
    }

    /**
     * Height of the cusp at roll length L, mm: the cusps on either side interpolated as h/L (a
     * cusp between two tangents is ρ Δφ²/8 and the involute's radius of curvature ρ equals the roll
     * length; FORMULAS.md §6.2), then multiplied back by L. NaN without cusps.
     */
    double cuspHeightAt(double roll) {
        if (cusps.isEmpty()) {
            return Double.NaN;
        }
        double[] below = null;
        double[] above = null;
        for (double[] cusp : cusps) {
            if (cusp[0] <= roll && (below == null || cusp[0] > below[0])) {
                below = cusp;
            }
            if (cusp[0] >= roll && (above == null || cusp[0] < above[0])) {
                above = cusp;
            }
        }
        if (below == null) {
            return above[1] / above[0] * roll;
        }
        if (above == null || above[0] == below[0]) {
            return below[1] / below[0] * roll;
        }
        double w = (roll - below[0]) / (above[0] - below[0]);
        return (below[1] / below[0] * (1 - w) + above[1] / above[0] * w) * roll;
    }
}
