package org.hobwright.wizard.simulate;

import org.hobwright.wizard.geometry.Involute;

/**
 * Undercut as the simulation sees it: does any cut rack position reach inside the true involute
 * of the flank (above the base circle)? A rack flank touching the involute never enters it (an
 * involute is convex and each straight flank is one of its tangents), so any penetration comes
 * from a straight flank working beyond the interference point or from the tip corner.
 *
 * <p>Only positions whose flank line touches the involute's other branch (contact roll length
 * below 0) can reach inside: every other position lies wholly on the far side of a tangent of the
 * convex involute. The involute is sampled by roll length ℓ_j = L_a (j/N)³, dense at the base
 * circle where an undercut begins; each sample is tested against each such position.
 */
final class UndercutCheck {
    /** Penetrations below this are rounding, mm. */
    static final double TOLERANCE_MM = 1e-9;
    private static final int SAMPLES = 240;

    private UndercutCheck() {
    }

    /**
     * Deepest penetration of any cut position into the right-hand involute, mm (≤ 0 when none).
     *
     * @param path  nominal path (base radius, tip, flank angle)
     * @param phase cut phase as a fraction of Δφ
     */
    static double depth(NominalPath path, double phase) {
        CutEnvelope env = new CutEnvelope(path, phase);
        if (path.rollOfPosition(env.angle(env.firstPosition())) >= TOLERANCE_MM
                && path.rollOfPosition(env.angle(env.lastPosition())) >= TOLERANCE_MM) {
            return Double.NEGATIVE_INFINITY;
        }
        double rb = path.rb;
        double ra = path.setup.tipRadiusMm();
        double rollTip = Math.sqrt(Math.max(0, ra * ra - rb * rb));
        double[] px = new double[SAMPLES];
        double[] py = new double[SAMPLES];
        for (int j = 1; j <= SAMPLES; j++) {
            double l = rollTip * Math.pow((double) j / SAMPLES, 3);
            double alpha = Math.atan2(l, rb);
            double rr = Math.hypot(rb, l);
            double psi = path.flankBaseAngle + Involute.inv(alpha);
            px[j - 1] = rr * Math.sin(psi);
            py[j - 1] = rr * Math.cos(psi);
        }
        double worst = Double.NEGATIVE_INFINITY;
        for (int k = env.firstPosition(); k <= env.lastPosition(); k++) {
            if (path.rollOfPosition(env.angle(k)) < TOLERANCE_MM) {
                worst = Math.max(worst, env.depthInside(k, px, py));
            }
        }
        return worst;
    }
}
