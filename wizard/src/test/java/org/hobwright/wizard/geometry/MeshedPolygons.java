package org.hobwright.wizard.geometry;

import java.awt.geom.AffineTransform;
import java.awt.geom.Area;
import java.awt.geom.Path2D;

/**
 * Two external gears in mesh as polygons in their transverse plane, for a brute-force check of the
 * gear-pair relations. It uses no involute function, no working pressure angle and no production code:
 * each flank is the unwound string of the base circle, P(t) = r_b (cos t + t sin t, sin t − t cos t),
 * turned so that the tooth is s_t wide on the reference circle (the definition of tooth thickness), cut at
 * the tip circle; below the base circle the tooth narrows to a point on its centre line (less material
 * than any real root, so a mate's tip never meets it). Overlap of the two gears is decided by
 * {@link Area} intersection (java.awt.geom), the free play by bisection on the angle of the mate.
 *
 * <p>Gear 1 sits at the origin with a tooth on the +x axis; gear 2 sits at (a, 0) with a tooth space
 * facing gear 1 and is turned by θ. The arrangement is mirror-symmetric about the x axis, so the free
 * positions of gear 2 form an interval symmetric about θ = 0.
 */
final class MeshedPolygons {
    private static final int SAMPLES = 400;

    private final Gear first;
    private final Gear second;
    private final double cosBaseHelix;

    /** One gear's transverse section from first definitions. */
    private record Gear(int z, double rb, double ra, double halfAngleAtReference, double polarAtReference,
                        double tipRoll) {
        static Gear of(int z, double mn, double alphaN, double beta, double x, double allowance, double tipDiameter) {
            double d = z * mn / Math.cos(beta);
            double alphaT = Math.atan(Math.tan(alphaN) / Math.cos(beta));
            double rb = d * Math.cos(alphaT) / 2;
            double st = (mn * (Math.PI / 2 + 2 * x * Math.tan(alphaN)) + allowance) / Math.cos(beta);
            double tRef = Math.sqrt((d / 2 / rb) * (d / 2 / rb) - 1);
            double polarRef = Math.atan2(Math.sin(tRef) - tRef * Math.cos(tRef), Math.cos(tRef) + tRef * Math.sin(tRef));
            double ra = tipDiameter / 2;
            return new Gear(z, rb, ra, st / d, polarRef, Math.sqrt((ra / rb) * (ra / rb) - 1));
        }

        /** The teeth centred at angle {@code centre} + 2π j / z for j in [from, to], as one area. */
        Area teeth(double centre, int from, int to) {
            Area all = new Area();
            for (int j = from; j <= to; j++) {
                all.add(new Area(tooth(centre + 2 * Math.PI * j / z)));
            }
            return all;
        }

        private Path2D tooth(double c) {
            Path2D.Double p = new Path2D.Double();
            // the clockwise flank, base circle to tip: its involute is turned so that it crosses the reference
            // circle at c − s_t/d
            double lowStart = c - halfAngleAtReference - polarAtReference;
            for (int i = 0; i <= SAMPLES; i++) {
                double t = tipRoll * i / SAMPLES;
                double qx = rb * (Math.cos(t) + t * Math.sin(t));
                double qy = rb * (Math.sin(t) - t * Math.cos(t));
                double x = Math.cos(lowStart) * qx - Math.sin(lowStart) * qy;
                double y = Math.sin(lowStart) * qx + Math.cos(lowStart) * qy;
                if (i == 0) {
                    p.moveTo(x, y);
                } else {
                    p.lineTo(x, y);
                }
            }
            // the counter-clockwise flank, mirrored about the tooth's centre line, tip to base circle (the
            // tip circle between the two is left as its chord: far shorter than any clearance checked)
            double highStart = c + halfAngleAtReference + polarAtReference;
            for (int i = SAMPLES; i >= 0; i--) {
                double t = tipRoll * i / SAMPLES;
                double qx = rb * (Math.cos(t) + t * Math.sin(t));
                double qy = rb * (Math.sin(t) - t * Math.cos(t));
                p.lineTo(Math.cos(highStart) * qx + Math.sin(highStart) * qy,
                        Math.sin(highStart) * qx - Math.cos(highStart) * qy);
            }
            p.lineTo(rb / 2 * Math.cos(c), rb / 2 * Math.sin(c));
            p.closePath();
            return p;
        }
    }

    /**
     * The pair. Each gear: teeth, normal module, normal pressure angle and helix angle (rad), profile shift,
     * normal thickness allowance, tip diameter.
     */
    MeshedPolygons(double mn, double alphaN, double beta, int z1, double x1, double e1, double da1, int z2, double x2,
                   double e2, double da2) {
        this.first = Gear.of(z1, mn, alphaN, beta, x1, e1, da1);
        this.second = Gear.of(z2, mn, alphaN, beta, x2, e2, da2);
        this.cosBaseHelix = Math.cos(Math.asin(Math.sin(beta) * Math.cos(alphaN)));
    }

    /** True when the gears overlap at centre distance a with gear 2 turned by θ. */
    boolean overlap(double a, double theta) {
        Area one = first.teeth(0, -1, 1);
        Area two = second.teeth(Math.PI + Math.PI / second.z() + theta, -2, 1);
        two.transform(AffineTransform.getTranslateInstance(a, 0));
        one.intersect(two);
        return !one.isEmpty();
    }

    /**
     * Normal backlash at centre distance a: the free turn of gear 2 with gear 1 held, times its base radius
     * (the flank moves along the line of action), projected into the normal plane by cos β_b; NaN when the gears
     * overlap even in the middle position. Three teeth of gear 1 and four of gear 2 take part: more than a
     * transverse contact ratio below 2 can bring into contact.
     */
    double normalBacklash(double a) {
        if (overlap(a, 0)) {
            return Double.NaN;
        }
        double lo = 0;
        double hi = 2 * Math.PI / second.z();
        for (int i = 0; i < 34; i++) {
            double mid = (lo + hi) / 2;
            if (overlap(a, mid)) {
                hi = mid;
            } else {
                lo = mid;
            }
        }
        return 2 * (lo + hi) / 2 * second.rb() * cosBaseHelix;
    }

    /** The centre distance in [lo, hi] at which the gears just touch on both flanks (no backlash), by bisection. */
    double centreDistanceWithoutBacklash(double lo, double hi) {
        if (!overlap(lo, 0) || overlap(hi, 0)) {
            throw new IllegalArgumentException("the bracket [" + lo + ", " + hi + "] does not hold the contact");
        }
        for (int i = 0; i < 34; i++) {
            double mid = (lo + hi) / 2;
            if (overlap(mid, 0)) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        return (lo + hi) / 2;
    }
}
