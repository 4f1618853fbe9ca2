package org.hobwright.wizard.simulate;

import org.hobwright.wizard.geometry.Involute;

/**
 * The profile a rack with continuous rolling would generate on the right-hand side of the tooth
 * space, root centre to tip: root circle (from the rack tip line), fillet (from the rounded tip
 * corner) and involute (from the straight flank), each point with its normal into the space and the
 * rolling angle at which the rack touches it.
 *
 * <p>Method (law of gearing, Willis; any gearing textbook): at rolling angle φ the rack touches the
 * profile where the rack outline's normal passes through the pitch point, the point where the
 * rolling line touches the reference circle. A rack point Q with outward normal n = (sin ν, −cos ν)
 * is in contact when the pitch point sits at X = u = Q_x − (Y_w − Q_y) tan ν on the rolling line
 * Y_w = −x m_n, i.e. at φ = u / r. A rack point maps to the gear frame as R(−φ)·(Q_x − r φ, a + Q_y),
 * a = r + x m_n. With undercut the rounded corner's path crosses the involute; the profile then
 * follows the corner's path up to the crossing and the involute above it.
 */
final class NominalPath {
    static final byte ROOT = 0;
    static final byte FILLET = 1;
    static final byte FLANK = 2;
    private static final int TABLE = 16;

    final GeneratingSetup setup;
    final TransverseRack rack;
    final double r;
    final double a;
    final double rb;
    final double rollingY;
    final double flankBaseAngle;
    /** Roll length (from the base circle) of the straight flank's lowest point, mm; negative below the interference point. */
    final double rollAtFlankEnd;
    final double nuMax;
    final double[] flankEnd = new double[2];
    /** True when the corner's path crosses the involute (continuous-rolling undercut). */
    final boolean crossing;
    /** Radius where the involute starts in the nominal profile, mm. */
    final double involuteStartRadius;
    final double lambdaStart;
    final double lambdaEnd;
    /** Range of contact rolling angles over the whole rack outline, rad. */
    final double phiMin;
    final double phiMax;

    final double[] x;
    final double[] y;
    final double[] nx;
    final double[] ny;
    final double[] phi;
    final double[] param;
    final byte[] kind;
    final int size;

    NominalPath(GeneratingSetup setup) {
        this.setup = setup;
        this.rack = setup.rack();
        this.r = setup.referenceRadiusMm();
        this.a = setup.datumDistanceMm();
        this.rb = setup.baseRadiusMm();
        this.rollingY = -setup.profileShift() * setup.normalModuleMm();
        this.flankBaseAngle = setup.flankBaseAngleRad();
        this.nuMax = rack.flankNormalAngle();
        rack.cornerPoint(nuMax, flankEnd);
        this.rollAtFlankEnd = r * rack.sinA - (rollingY - flankEnd[1]) / rack.sinA;
        double rollTip = Math.sqrt(Math.max(0, setup.tipRadiusMm() * setup.tipRadiusMm() - rb * rb));
        this.lambdaEnd = Math.max(0, (rollTip - rollAtFlankEnd) * rack.sinA / rack.cosA);

        double[] c = new double[7];
        double nuEnd = nuMax;
        double lStart = 0;
        boolean cross = false;
        double startRadius;
        // the corner's path can only cross the involute when the straight flank works past the
        // interference point (otherwise the fillet meets the involute tangentially at the flank end)
        double nuCross = rollAtFlankEnd < 0 ? findCrossing(c) : Double.NaN;
        if (!Double.isNaN(nuCross)) {
            cross = true;
            nuEnd = nuCross;
            contact(FILLET, nuCross, c);
            startRadius = Math.hypot(c[0], c[1]);
            double roll = Math.sqrt(Math.max(0, startRadius * startRadius - rb * rb));
            lStart = (roll - rollAtFlankEnd) * rack.sinA / rack.cosA;
        } else if (rollAtFlankEnd < 0) {
            lStart = -rollAtFlankEnd * rack.sinA / rack.cosA;
            startRadius = rb;
        } else {
            startRadius = Math.hypot(rb, rollAtFlankEnd);
        }
        this.crossing = cross;
        this.involuteStartRadius = startRadius;
        this.lambdaStart = Math.min(lStart, lambdaEnd);

        double[][] parts = {
            sample(ROOT, 0, Math.max(0, rack.vx)),
            sample(FILLET, 0, nuEnd),
            sample(FLANK, lambdaStart, lambdaEnd)};
        int n = 0;
        for (double[] p : parts) {
            n += p.length;
        }
        x = new double[n];
        y = new double[n];
        nx = new double[n];
        ny = new double[n];
        phi = new double[n];
        param = new double[n];
        kind = new byte[n];
        int k = 0;
        for (byte f = ROOT; f <= FLANK; f++) {
            for (double p : parts[f]) {
                contact(f, p, c);
                if (k > 0 && Math.hypot(c[0] - x[k - 1], c[1] - y[k - 1]) < 1e-12) {
                    continue;
                }
                x[k] = c[0];
                y[k] = c[1];
                nx[k] = c[2];
                ny[k] = c[3];
                phi[k] = c[4];
                param[k] = p;
                kind[k] = f;
                k++;
            }
        }
        size = k;
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (byte f = ROOT; f <= FLANK; f++) {
            double end = f == ROOT ? Math.max(0, rack.vx) : f == FILLET ? nuMax : lambdaEnd;
            // the contact rolling angle runs monotonically along each feature
            for (int j = 0; j <= 1; j++) {
                contact(f, end * j, c);
                lo = Math.min(lo, c[4]);
                hi = Math.max(hi, c[4]);
            }
        }
        phiMin = lo;
        phiMax = hi;
    }

    /**
     * The contact point of one rack feature.
     *
     * @param family ROOT (param u, mm), FILLET (param ν, rad) or FLANK (param λ, mm above the flank end)
     * @param out    receives gear-frame x, y, unit normal into the space x, y, rolling angle φ,
     *               and the rack point's x, y
     */
    void contact(byte family, double p, double[] out) {
        double qx;
        double qy;
        double rnx;
        double rny;
        double u;
        if (family == ROOT) {
            qx = p;
            qy = rack.tipY;
            rnx = 0;
            rny = -1;
            u = p;
        } else if (family == FILLET) {
            rack.cornerPoint(p, out);
            qx = out[0];
            qy = out[1];
            rnx = Math.sin(p);
            rny = -Math.cos(p);
            u = qx - (rollingY - qy) * Math.tan(p);
        } else {
            qx = flankEnd[0] + p * rack.sinA;
            qy = flankEnd[1] + p * rack.cosA;
            rnx = rack.cosA;
            rny = -rack.sinA;
            u = qx - (rollingY - qy) * rack.cosA / rack.sinA;
        }
        double f = u / r;
        double cs = Math.cos(f);
        double sn = Math.sin(f);
        double gx = qx - u;
        double gy = a + qy;
        out[0] = gx * cs + gy * sn;
        out[1] = -gx * sn + gy * cs;
        out[2] = -rnx * cs - rny * sn;
        out[3] = rnx * sn - rny * cs;
        out[4] = f;
        out[5] = qx;
        out[6] = qy;
    }

    /**
     * Roll length at which the rack flank rolled by φ touches the involute (or, when negative, the
     * involute's other branch beyond the interference point): L = L_E + (r φ − u_E) cos α_t, since
     * the contact runs along the line of action at r_b per radian of rolling.
     */
    double rollOfPosition(double phiRad) {
        double uE = flankEnd[0] - (rollingY - flankEnd[1]) * rack.cosA / rack.sinA;
        return rollAtFlankEnd + (r * phiRad - uE) * rack.cosA;
    }

    /** Roll length of the involute point generated at flank parameter λ: L = L_E + λ cot α_t. */
    double rollOfLambda(double lambda) {
        return rollAtFlankEnd + lambda * rack.cosA / rack.sinA;
    }

    /**
     * Material outside the right-hand involute at a point, along the involute's normal, mm:
     * r_b (ψ₀ − (ψ − inv α)), ψ the polar angle from the space centre line, cos α = r_b / r
     * (involutes of one base circle are parallel curves; elementary involute geometry). Positive
     * means the point lies in the space (excess material), negative inside the tooth (undercut).
     * NaN inside the base circle.
     */
    double excess(double px, double py) {
        double rr = Math.hypot(px, py);
        if (rr < rb) {
            return Double.NaN;
        }
        double alpha = Math.acos(rb / rr);
        return rb * (flankBaseAngle - (Math.atan2(px, py) - Involute.inv(alpha)));
    }

    private double findCrossing(double[] c) {
        int steps = 1024;
        double prevNu = nuMax;
        double prevEx = Double.NaN;
        for (int j = 0; j <= steps; j++) {
            double nu = nuMax * (1 - (double) j / steps);
            contact(FILLET, nu, c);
            double ex = excess(c[0], c[1]);
            if (ex < -1e-12 && prevEx >= 0) {
                double lo = nu;
                double hi = prevNu;
                for (int it = 0; it < 80; it++) {
                    double mid = (lo + hi) / 2;
                    contact(FILLET, mid, c);
                    double e = excess(c[0], c[1]);
                    if (e < 0) {
                        lo = mid;
                    } else {
                        hi = mid;
                    }
                }
                return lo;
            }
            if (!Double.isNaN(ex)) {
                prevEx = ex;
                prevNu = nu;
            }
        }
        return Double.NaN;
    }

    /** Parameters of one family spaced about {@code resolution} apart along the profile. */
    private double[] sample(byte family, double p0, double p1) {
        if (!(p1 > p0)) {
            return new double[0];
        }
        double[] c = new double[7];
        double[] len = new double[TABLE + 1];
        contact(family, p0, c);
        double lx = c[0];
        double ly = c[1];
        for (int j = 1; j <= TABLE; j++) {
            contact(family, p0 + (p1 - p0) * j / TABLE, c);
            len[j] = len[j - 1] + Math.hypot(c[0] - lx, c[1] - ly);
            lx = c[0];
            ly = c[1];
        }
        double total = len[TABLE];
        int n = Math.max(2, (int) Math.ceil(total / setup.resolutionMm()) + 1);
        double[] out = new double[n];
        int seg = 0;
        for (int i = 0; i < n; i++) {
            double s = total * i / (n - 1);
            while (seg < TABLE - 1 && len[seg + 1] < s) {
                seg++;
            }
            double span = len[seg + 1] - len[seg];
            double w = span > 0 ? (s - len[seg]) / span : 0;
            out[i] = p0 + (p1 - p0) * (seg + Math.min(1, Math.max(0, w))) / TABLE;
        }
        out[n - 1] = p1;
        return out;
    }
}
