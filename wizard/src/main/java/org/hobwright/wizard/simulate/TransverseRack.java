package org.hobwright.wizard.simulate;

/**
 * The hob's basic rack tooth in the transverse section of the gear: two straight flanks at the
 * transverse pressure angle α_t, a tip line at the hob addendum h_aP0 below the datum line and
 * rounded tip corners.
 *
 * <p>Rack frame: X along the datum line, Y away from the gear centre, datum at Y = 0, the tooth
 * centred on X = 0 and pointing toward the gear (tip line at Y = −h_aP0). Millimetres.
 *
 * <p>Geometry (derived here from the normal-section rack): the normal rack tooth is an inner prism
 * plus a cylinder of radius ρ along the tooth direction (Minkowski sum); a section across a
 * cylinder inclined at β is an ellipse with half axes ρ / cos β (along X) and ρ (along Y). So the
 * transverse tooth is the inner trapezoid A plus that ellipse. Scaling X by cos β turns the ellipse
 * into a circle of radius ρ, which makes every line intersection below a quadratic at most.
 * tan α_t = tan α_n / cos β and the transverse half thickness at the datum π m_t / 4 follow
 * ISO 21771:2007 eq. (2), (14).
 */
final class TransverseRack {
    /** Which part of the rack tooth a line enters through. */
    enum Feature { TIP, FILLET, FLANK, OTHER_FLANK, NONE }

    final double sinA;
    final double cosA;
    final double tipY;
    final double rho;
    final double cosBeta;
    private final double ax;
    private final double ay;
    /** Right inner vertex of A (unscaled); the left one is (−vx, vy). */
    final double vx;
    final double vy;
    private final double vxs;
    private final double mRx;
    private final double mRy;
    private final double fRx;
    private final double fRy;
    private final double hR;

    /**
     * @param alphaTRad        transverse pressure angle α_t, rad
     * @param halfThicknessMm  half the rack tooth thickness on the datum line (transverse), mm
     * @param addendumMm       hob addendum h_aP0 (the gear's dedendum h_fP), mm
     * @param tipRadiusMm      hob tip radius ρ (normal section; the gear's ρ_fP), mm, 0 for a sharp corner
     * @param cosBeta          cos β of the gear's helix angle
     */
    TransverseRack(double alphaTRad, double halfThicknessMm, double addendumMm, double tipRadiusMm, double cosBeta) {
        this.sinA = Math.sin(alphaTRad);
        this.cosA = Math.cos(alphaTRad);
        this.tipY = -addendumMm;
        this.rho = tipRadiusMm;
        this.cosBeta = cosBeta;
        this.ax = tipRadiusMm / cosBeta;
        this.ay = tipRadiusMm;
        double flankConst = halfThicknessMm * cosA;
        double support = Math.sqrt(ax * ax * cosA * cosA + ay * ay * sinA * sinA);
        this.vy = tipY + tipRadiusMm;
        this.vx = (flankConst - support + vy * sinA) / cosA;
        this.vxs = vx * cosBeta;
        double fx = sinA * cosBeta;
        double fy = cosA;
        double fn = Math.hypot(fx, fy);
        this.fRx = fx / fn;
        this.fRy = fy / fn;
        this.mRx = fRy;
        this.mRy = -fRx;
        this.hR = mRx * vxs + mRy * vy + tipRadiusMm;
    }

    /** True when the two tip corners leave a tip flat (or just meet): the rack is drawable. */
    boolean hasTipFlat() {
        return vx >= 0;
    }

    /** Normal angle of the flank: ν runs from 0 (tip, normal straight down) to π/2 − α_t (flank). */
    double flankNormalAngle() {
        return Math.PI / 2 - Math.atan2(sinA, cosA);
    }

    /**
     * The point of the right tip corner whose outward normal is (sin ν, −cos ν): the support point
     * of the ellipse, C + (a_x² n_x, a_y² n_y) / √(a_x² n_x² + a_y² n_y²).
     *
     * @param nu  normal angle, rad, 0 … π/2 − α_t
     * @param out receives x, y
     */
    void cornerPoint(double nu, double[] out) {
        if (rho == 0) {
            out[0] = vx;
            out[1] = vy;
            return;
        }
        double nx = Math.sin(nu);
        double ny = -Math.cos(nu);
        double s = Math.sqrt(ax * ax * nx * nx + ay * ay * ny * ny);
        out[0] = vx + ax * ax * nx / s;
        out[1] = vy + ay * ay * ny / s;
    }

    /**
     * Where the line p + t·d (rack frame, unscaled) enters the rack tooth, coming from small t.
     *
     * @param hit receives the entered feature in {@code hit[0]} (ordinal of {@link Feature})
     * @return the entry parameter t, +∞ when the line misses the tooth, −∞ when it starts inside
     */
    double entry(double px, double py, double dx, double dy, int[] hit) {
        double sx = px * cosBeta;
        double sdx = dx * cosBeta;
        double t0 = Double.NEGATIVE_INFINITY;
        double t1 = Double.POSITIVE_INFINITY;
        int feature = Feature.NONE.ordinal();
        // the offset half-planes g·q ≤ h of tip, right flank and left flank (scaled frame)
        for (int i = 0; i < 3; i++) {
            double gx = i == 0 ? 0 : i == 1 ? mRx : -mRx;
            double gy = i == 0 ? -1 : mRy;
            double h = i == 0 ? -tipY : hR;
            double gp = gx * sx + gy * py;
            double gd = gx * sdx + gy * dy;
            if (gd > 0) {
                t1 = Math.min(t1, (h - gp) / gd);
            } else if (gd < 0) {
                double t = (h - gp) / gd;
                if (t > t0) {
                    t0 = t;
                    feature = (i == 0 ? Feature.TIP : i == 1 ? Feature.FLANK : Feature.OTHER_FLANK).ordinal();
                }
            } else if (gp > h) {
                hit[0] = Feature.NONE.ordinal();
                return Double.POSITIVE_INFINITY;
            }
        }
        if (t0 > t1 || t0 == Double.NEGATIVE_INFINITY) {
            hit[0] = Feature.NONE.ordinal();
            return t0 > t1 ? Double.POSITIVE_INFINITY : t0;
        }
        int corner = rho > 0 ? corner(sx + t0 * sdx, py + t0 * dy) : 0;
        if (corner != 0) {
            // in a corner's wedge the tooth is the circle of radius ρ about that corner
            double ex = sx - corner * vxs;
            double ey = py - vy;
            double a = sdx * sdx + dy * dy;
            double b = ex * sdx + ey * dy;
            double c = ex * ex + ey * ey - rho * rho;
            double disc = b * b - a * c;
            double t = disc < 0 ? Double.POSITIVE_INFINITY : (-b - Math.sqrt(disc)) / a;
            if (disc < 0 || t > t1) {
                hit[0] = Feature.NONE.ordinal();
                return Double.POSITIVE_INFINITY;
            }
            hit[0] = Feature.FILLET.ordinal();
            return Math.max(t, t0);
        }
        hit[0] = feature;
        return t0;
    }

    /**
     * Which corner's wedge a scaled-frame point lies in: beyond the tip edge and below the flank's
     * start at that corner. 1 right, −1 left, 0 neither.
     */
    private int corner(double qx, double qy) {
        if (qx - vxs > 0 && (qx - vxs) * fRx + (qy - vy) * fRy < 0) {
            return 1;
        }
        if (qx + vxs < 0 && -(qx + vxs) * fRx + (qy - vy) * fRy < 0) {
            return -1;
        }
        return 0;
    }

    /**
     * Signed depth of a point inside the rack tooth: positive inside (how far it lies within the
     * outline), negative outside. Rack frame, unscaled input; measured in the scaled frame
     * (exact for spur gears, and its sign is exact for helical gears).
     */
    double depthInside(double px, double py) {
        double sx = px * cosBeta;
        int corner = corner(sx, py);
        double dist;
        if (corner != 0) {
            dist = Math.hypot(sx - corner * vxs, py - vy);
        } else {
            double dTip = tipY + rho - py;
            double dRight = mRx * sx + mRy * py - (hR - rho);
            double dLeft = -mRx * sx + mRy * py - (hR - rho);
            dist = Math.max(dTip, Math.max(dRight, dLeft));
        }
        return rho - dist;
    }
}
