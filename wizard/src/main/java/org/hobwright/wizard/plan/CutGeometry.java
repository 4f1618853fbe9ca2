package org.hobwright.wizard.plan;

/**
 * Approach (run-in) and overrun (run-out) lengths of an axial hobbing pass, mm.
 *
 * <pre>
 * spur approach     E = √(h (d_a0 − h))                                   (FORMULAS.md §7.1, widely published form,
 *                                                                          and the exact disk-model result)
 * helical approach  exact construction of FORMULAS.md §7.1 option 2 (derived): hob envelope a cylinder of
 *                   radius r_a0 whose axis u = (0, cos η, sin η) passes through (a, 0, E), a = r_a0 + r_a − h;
 *                   blank face edge P(φ) = (r_a cos φ, r_a sin φ, 0); E is the largest height with
 *                   min over φ of dist²(P(φ), axis) = r_a0²
 * overrun           U = (h / tan α_n) · sin|η|                               (FORMULAS.md §7.2, derived, low confidence)
 * </pre>
 * h radial depth of the pass below the blank (touch-off) diameter, d_a0 hob outside diameter,
 * r_a blank radius, η swivel angle, α_n normal pressure angle. Clearances are added by the caller.
 */
public final class CutGeometry {
    private static final int MAX_ITERATIONS = 200;

    private CutGeometry() {
    }

    /**
     * Spur approach E = √(h (d_a0 − h)), mm.
     *
     * @param depthMm            radial depth h, 0 &lt; h &lt; d_a0/2
     * @param hobOutsideDiameter d_a0, mm
     */
    public static double approachSpur(double depthMm, double hobOutsideDiameter) {
        return Math.sqrt(depthMm * (hobOutsideDiameter - depthMm));
    }

    /**
     * Exact helical approach (FORMULAS.md §7.1 option 2, derived). Reduces to the spur formula for η = 0.
     *
     * @param depthMm            radial depth h below the blank tip, 0 &lt; h &lt; d_a0/2, mm
     * @param hobOutsideDiameter d_a0, mm
     * @param blankDiameter      blank (tip) diameter d_a, mm, greater than 2h
     * @param swivelDeg          swivel angle η, degrees (sign irrelevant)
     * @return E, mm
     */
    public static double approachHelical(double depthMm, double hobOutsideDiameter, double blankDiameter,
                                         double swivelDeg) {
        double eta = Math.toRadians(Math.abs(swivelDeg));
        if (eta == 0) {
            return approachSpur(depthMm, hobOutsideDiameter);
        }
        Contact c = new Contact(hobOutsideDiameter / 2, blankDiameter / 2, depthMm, eta);
        double lo = 0;
        double hi = approachSpur(depthMm, hobOutsideDiameter) / Math.cos(eta) + depthMm;
        for (int i = 0; i < 60 && c.excess(hi) <= 0; i++) {
            lo = hi;
            hi *= 2;
        }
        // regula falsi (Illinois) on f(E) = min dist² − r_a0², f(lo) < 0 < f(hi)
        double flo = c.excess(lo);
        double fhi = c.excess(hi);
        int side = 0;
        for (int i = 0; i < MAX_ITERATIONS && hi - lo > 1e-12 * (1 + hi); i++) {
            double e = (lo * fhi - hi * flo) / (fhi - flo);
            if (!(e > lo && e < hi)) {
                e = (lo + hi) / 2;
            }
            double fe = c.excess(e);
            if (fe == 0) {
                return e;
            }
            if (fe < 0) {
                lo = e;
                flo = fe;
                if (side == -1) {
                    fhi /= 2;
                }
                side = -1;
            } else {
                hi = e;
                fhi = fe;
                if (side == 1) {
                    flo /= 2;
                }
                side = 1;
            }
        }
        return (lo + hi) / 2;
    }

    /**
     * Overrun U = (h / tan α_n) sin|η|, mm: half the generating zone along the hob axis projected onto
     * the work axis (FORMULAS.md §7.2, derived; for a spur gear |η| = γ and U is small).
     *
     * @param depthMm          radial depth h, mm
     * @param pressureAngleDeg normal pressure angle α_n, degrees
     * @param swivelDeg        swivel angle η, degrees
     */
    public static double overrun(double depthMm, double pressureAngleDeg, double swivelDeg) {
        return depthMm / Math.tan(Math.toRadians(pressureAngleDeg)) * Math.sin(Math.toRadians(Math.abs(swivelDeg)));
    }

    /** Distance of the blank edge from the tilted hob axis, minimised over the edge angle φ. */
    private static final class Contact {
        private final double ra0Sq;
        private final double ra;
        private final double a;
        private final double sinEta;
        private final double cosEta;
        private double phi;

        Contact(double ra0, double ra, double depth, double eta) {
            this.ra0Sq = ra0 * ra0;
            this.ra = ra;
            this.a = ra0 + ra - depth;
            this.sinEta = Math.sin(eta);
            this.cosEta = Math.cos(eta);
        }

        /**
         * min over φ of g(φ) − r_a0², g(φ) = r_a² + a² + E² − 2 a r_a cos φ − (r_a cos η sin φ − E sin η)².
         * For E ≥ 0 the minimum lies in −π/2 ≤ φ ≤ 0 (mirroring φ to −φ or to −π − φ never lowers g there),
         * where g is convex; Newton's method on g′ = 0, started at the last minimiser, finds it.
         */
        double excess(double height) {
            double p = ra * cosEta;
            double q = height * sinEta;
            double x = phi;
            for (int i = 0; i < 50; i++) {
                double s = Math.sin(x);
                double co = Math.cos(x);
                double t = p * s - q;
                double d1 = 2 * a * ra * s - 2 * t * p * co;
                double d2 = 2 * a * ra * co - 2 * p * p * co * co + 2 * t * p * s;
                if (d2 <= 0) {
                    break;
                }
                double step = d1 / d2;
                x -= step;
                if (x > 0) {
                    x = 0;
                } else if (x < -Math.PI / 2) {
                    x = -Math.PI / 2;
                }
                if (Math.abs(step) < 1e-14) {
                    break;
                }
            }
            phi = x;
            double t = p * Math.sin(x) - q;
            double g = ra * ra + a * a + height * height - 2 * a * ra * Math.cos(x) - t * t;
            return g - ra0Sq;
        }
    }
}
