package org.hobwright.wizard.simulate;

/**
 * The rack positions at which a gash's cutting edges pass the generating plane, and the boundary
 * their cuts leave: along any line through the tooth space, the boundary is where the line first
 * enters one of the rack teeth (the smallest entry parameter over all positions).
 *
 * <p>Position k is the rack rolled by φ_k = (k + phase)·Δφ, Δφ = 2π z₀ / (i z). A gear-frame point
 * G maps to the rack frame as X = (R(φ)G)_x + r φ, Y = (R(φ)G)_y − a (inverse of the mapping in
 * {@link NominalPath}).
 */
final class CutEnvelope {
    private final TransverseRack rack;
    private final double r;
    private final double a;
    private final double step;
    private final double phase;
    private final int kLo;
    private final double[] cos;
    private final double[] sin;

    /**
     * @param path      the nominal path (gives the rack, radii and the rolling range)
     * @param phase     cut phase as a fraction of Δφ
     */
    CutEnvelope(NominalPath path, double phase) {
        this.rack = path.rack;
        this.r = path.r;
        this.a = path.a;
        this.step = path.setup.stepRad();
        this.phase = phase;
        this.kLo = (int) Math.floor(path.phiMin / step - phase) - 4;
        int kHi = (int) Math.ceil(path.phiMax / step - phase) + 4;
        int n = kHi - kLo + 1;
        cos = new double[n];
        sin = new double[n];
        for (int i = 0; i < n; i++) {
            double f = angle(kLo + i);
            cos[i] = Math.cos(f);
            sin[i] = Math.sin(f);
        }
    }

    /** Rolling angle of position k, rad. */
    double angle(int k) {
        return (k + phase) * step;
    }

    /** Lowest and highest position index that can touch the profile. */
    int firstPosition() {
        return kLo + 4;
    }

    int lastPosition() {
        return kLo + cos.length - 5;
    }

    /** Entry parameter of the gear-frame line p + t d into the rack tooth at position k (see {@link TransverseRack#entry}). */
    double entry(int k, double px, double py, double dx, double dy, int[] hit) {
        double c = cosOf(k);
        double s = sinOf(k);
        double sh = r * angle(k);
        return rack.entry(px * c - py * s + sh, px * s + py * c - a, dx * c - dy * s, dx * s + dy * c, hit);
    }

    /** Depth of a gear-frame point inside the rack tooth at position k (positive inside), mm. */
    double depthInside(int k, double px, double py) {
        return rack.depthInside(px * cosOf(k) - py * sinOf(k) + r * angle(k), px * sinOf(k) + py * cosOf(k) - a);
    }

    /** Deepest of the gear-frame points inside the rack tooth at position k (positive inside), mm. */
    double depthInside(int k, double[] px, double[] py) {
        double worst = Double.NEGATIVE_INFINITY;
        for (int j = 0; j < px.length; j++) {
            worst = Math.max(worst, depthInside(k, px[j], py[j]));
        }
        return worst;
    }

    private double cosOf(int k) {
        int i = k - kLo;
        return i >= 0 && i < cos.length ? cos[i] : Math.cos(angle(k));
    }

    private double sinOf(int k) {
        int i = k - kLo;
        return i >= 0 && i < sin.length ? sin[i] : Math.sin(angle(k));
    }

    /**
     * Where the line p + t d first enters any rack position, searching outward from the position
     * nearest {@code phiHint} while the entry keeps falling (the entry is unimodal in k near the
     * contact: the distance of a rolling straight line or circle from a fixed point grows on both
     * sides of tangency).
     *
     * @param out receives the winning position index in {@code out[0]} and its feature in {@code out[1]}
     * @return the entry parameter t (0 on the continuous envelope, positive for material left standing)
     */
    double boundary(double px, double py, double dx, double dy, double phiHint, int[] out) {
        int[] hit = new int[1];
        int kc = (int) Math.floor(phiHint / step - phase);
        double best = Double.POSITIVE_INFINITY;
        int arg = kc;
        int feature = TransverseRack.Feature.NONE.ordinal();
        // the two positions on either side of the contact, then outward
        for (int k = kc; k <= kc + 1; k++) {
            double t = entry(k, px, py, dx, dy, hit);
            if (t < best) {
                best = t;
                arg = k;
                feature = hit[0];
            }
        }
        for (int dir = -1; dir <= 1; dir += 2) {
            int k = dir < 0 ? kc - 1 : kc + 2;
            int worse = 0;
            while (worse < 1) {
                double t = entry(k, px, py, dx, dy, hit);
                if (t < best) {
                    best = t;
                    arg = k;
                    feature = hit[0];
                    worse = 0;
                } else {
                    worse++;
                }
                k += dir;
            }
        }
        out[0] = arg;
        out[1] = feature;
        return best;
    }
}
