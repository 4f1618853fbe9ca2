package org.hobwright.wizard.geometry;

/**
 * The root form diameter d_Ff: where the usable involute of a hobbed gear begins.
 *
 * <p>Without undercut the straight flank of the hob generates the involute down to the point
 * where the hob's tip rounding begins:
 * <pre>d_Ff = sqrt( d_b² + ( d sin α_t − 2 (h_s − x_E m_n) / sin α_t )² )</pre>
 * with h_s the straight-flank height of the hob ({@link ToothSystem#straightFlankHeightMm}) (the rack
 * line at height h_s − x m_n below the rolling line meets the line of action at (h_s − x m_n)/sin α_t
 * from the pitch point; the same form is in DIN 3960, from memory).
 *
 * <p>With undercut (the bracket above is 0 or less) the hob's tip cuts into the involute near the base
 * circle, and the involute starts where the undercut ends. That point is found here from its
 * definition: the lowest point of the involute that no position of the rolling hob tooth reaches
 * into. A point P of the gear's transverse section, rolled by φ, lies in the rack's transverse frame
 * at Q = R(φ) P + (r φ, −a), a = r + x_E m_n (the rack rolls without slipping on the reference circle);
 * scaling Q's X by cos β gives the normal section, where the hob tooth is its basic rack counterpart
 * (half thickness π m_n / 4 at the datum, flank angle α_n, addendum h_aP0 = h_fP, tip radius
 * ρ_aP0 = ρ_fP). The tooth is the inner trapezoid shrunk by ρ plus a disc of radius ρ, so a point
 * reaches into it by ρ minus its distance from the inner trapezoid. Each involute point is rolled
 * through the tooth's passage (sampled, then refined by golden-section search), and the start of the
 * involute is bracketed by bisection on the roll length. Derived here from the generating kinematics
 * (law of gearing); the generating simulation's continuous profile is the independent check in the
 * tests.
 */
public final class RootForm {
    /** Reach into the hob tooth below which a point counts as not cut (the tangent contact), mm. */
    static final double CUT_TOLERANCE_MM = 1e-9;
    private static final int SAMPLES = 240;
    private static final double GOLDEN = (Math.sqrt(5) - 1) / 2;

    private final double r;
    private final double a;
    private final double rb;
    private final double cosBeta;
    private final double tanAlphaN;
    private final double cosAlphaN;
    private final double sinAlphaN;
    private final double halfThicknessAtDatum;
    private final double tipRadius;
    private final double innerTipY;
    private final double flankBaseAngle;

    private RootForm(InvoluteGear g) {
        this.r = g.referenceDiameterMm() / 2;
        double mn = g.normalModuleMm();
        this.a = r + g.effectiveProfileShift() * mn;
        this.rb = g.baseDiameterMm() / 2;
        this.cosBeta = Math.cos(g.helixAngleRad());
        this.tanAlphaN = Math.tan(g.normalPressureAngleRad());
        this.cosAlphaN = Math.cos(g.normalPressureAngleRad());
        this.sinAlphaN = Math.sin(g.normalPressureAngleRad());
        this.halfThicknessAtDatum = Math.PI * mn / 4;
        this.tipRadius = g.system().rootRadiusMm(mn);
        this.innerTipY = -g.system().dedendumMm(mn) + tipRadius;
        this.flankBaseAngle = Math.PI / g.teeth() - g.transverseThicknessMm() / g.referenceDiameterMm()
                - Involute.inv(g.transversePressureAngleRad());
    }

    /**
     * The root form diameter of a gear, mm: the closed form without undercut, else the start of the
     * involute above the undercut (the tip diameter when the undercut reaches the tip).
     */
    public static double diameterMm(InvoluteGear g) {
        double alphaT = g.transversePressureAngleRad();
        double hs = g.system().straightFlankHeightMm(g.normalModuleMm(), g.normalPressureAngleRad())
                - g.effectiveProfileShift() * g.normalModuleMm();
        double t = g.referenceDiameterMm() * Math.sin(alphaT) - 2 * hs / Math.sin(alphaT);
        double db = g.baseDiameterMm();
        if (t > 0) {
            return Math.sqrt(db * db + t * t);
        }
        return new RootForm(g).undercutEndDiameterMm(g.tipDiameterMm());
    }

    private double undercutEndDiameterMm(double tipDiameterMm) {
        double rollTip = Math.sqrt(Math.max(0, tipDiameterMm * tipDiameterMm / 4 - rb * rb));
        if (!isCut(rollTip * 1e-9)) {
            return 2 * rb;
        }
        if (isCut(rollTip)) {
            return tipDiameterMm;
        }
        double lo = rollTip * 1e-9;
        double hi = rollTip;
        for (int i = 0; i < 60 && hi - lo > 1e-9 * rollTip; i++) {
            double mid = (lo + hi) / 2;
            if (isCut(mid)) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        return 2 * Math.hypot(rb, hi);
    }

    /**
     * True when some position of the hob tooth reaches into the involute point at roll length L. The
     * reach over the tooth's passage has a peak where the straight flank touches the point (exactly 0)
     * and, on an undercut flank, another where the tip rounding passes it; every peak of the samples is
     * refined.
     */
    boolean isCut(double roll) {
        double alpha = Math.atan2(roll, rb);
        double radius = Math.hypot(rb, roll);
        double psi = flankBaseAngle + Involute.inv(alpha);
        double px = radius * Math.sin(psi);
        double py = radius * Math.cos(psi);
        double lo = -Math.PI / 2;
        double hi = Math.PI / 2;
        if (radius < r) {
            // the point's rack X grows with φ (dX/dφ ≥ r − radius): roll only through the tooth's width
            double reachY = Math.max(0, radius - a);
            double width = (halfThicknessAtDatum + reachY * tanAlphaN) / cosBeta + 1e-9;
            lo = rollingAngleAt(px, py, -width, lo, hi);
            hi = rollingAngleAt(px, py, width, lo, hi);
        }
        double step = (hi - lo) / SAMPLES;
        double[] reach = new double[SAMPLES + 1];
        for (int i = 0; i <= SAMPLES; i++) {
            reach[i] = reach(px, py, lo + i * step);
        }
        for (int i = 0; i <= SAMPLES; i++) {
            boolean peak = (i == 0 || reach[i] >= reach[i - 1]) && (i == SAMPLES || reach[i] >= reach[i + 1]);
            if (peak && (reach[i] > CUT_TOLERANCE_MM || refinedPeak(px, py, lo + Math.max(0, i - 1) * step,
                    lo + Math.min(SAMPLES, i + 1) * step) > CUT_TOLERANCE_MM)) {
                return true;
            }
        }
        return false;
    }

    /** The rolling angle in [lo, hi] where the point's rack X is {@code x} (X rises with φ), by bisection. */
    private double rollingAngleAt(double px, double py, double x, double lo, double hi) {
        for (int i = 0; i < 50; i++) {
            double mid = (lo + hi) / 2;
            if (px * Math.cos(mid) - py * Math.sin(mid) + r * mid < x) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        return (lo + hi) / 2;
    }

    /** Largest reach between two rolling angles, by golden-section search, mm. */
    private double refinedPeak(double px, double py, double left, double right) {
        double c = right - GOLDEN * (right - left);
        double d = left + GOLDEN * (right - left);
        double fc = reach(px, py, c);
        double fd = reach(px, py, d);
        for (int i = 0; i < 100 && right - left > 1e-15; i++) {
            if (fc > fd) {
                right = d;
                d = c;
                fd = fc;
                c = right - GOLDEN * (right - left);
                fc = reach(px, py, c);
            } else {
                left = c;
                c = d;
                fc = fd;
                d = left + GOLDEN * (right - left);
                fd = reach(px, py, d);
            }
        }
        return Math.max(fc, fd);
    }

    /**
     * How far the gear point (px, py) reaches into the hob tooth when the gear has rolled by φ, mm,
     * measured in the normal section (negative: outside by that much).
     */
    private double reach(double px, double py, double phi) {
        double c = Math.cos(phi);
        double s = Math.sin(phi);
        double x = Math.abs((px * c - py * s + r * phi) * cosBeta);
        double y = px * s + py * c - a;
        // inner trapezoid: y ≥ innerTipY, |x| ≤ w + y tan α_n, its flank shrunk by ρ along its normal
        double w = halfThicknessAtDatum - tipRadius / cosAlphaN;
        double flankGap = (w + y * tanAlphaN - x) * cosAlphaN;
        double tipGap = y - innerTipY;
        if (flankGap >= 0 && tipGap >= 0) {
            return tipRadius + Math.min(flankGap, tipGap);
        }
        // the corner where the inner flank meets the inner tip line (or the axis, without a tip flat)
        double cornerY = Math.max(innerTipY, -w / tanAlphaN);
        double cornerX = w + cornerY * tanAlphaN;
        double along = (x - cornerX) * sinAlphaN + (y - cornerY) * cosAlphaN;
        double distance;
        if (along > 0 && flankGap < 0) {
            distance = -flankGap;
        } else if (tipGap < 0 && x <= cornerX && cornerY == innerTipY) {
            distance = -tipGap;
        } else {
            distance = Math.hypot(x - cornerX, y - cornerY);
        }
        return tipRadius - distance;
    }
}
