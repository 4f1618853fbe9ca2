package org.hobwright.wizard.simulate;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.function.ToDoubleBiFunction;
import org.apache.commons.math3.optim.MaxEval;
import org.apache.commons.math3.optim.nonlinear.scalar.GoalType;
import org.apache.commons.math3.optim.univariate.BrentOptimizer;
import org.apache.commons.math3.optim.univariate.SearchInterval;
import org.apache.commons.math3.optim.univariate.UnivariateObjectiveFunction;
import org.hobwright.api.cycle.Point;
import org.junit.jupiter.api.Test;

/**
 * With more and more gashes the cut flank must approach the exact involute and the cut root the
 * exact root form of the rack tip. Both exact curves are computed here on their own, from their
 * textbook definitions, and the distances found by brute-force search plus Brent's method
 * (commons-math3).
 */
class ConvergenceTest {
    private static final int[] GASHES = {12, 48, 192, 768};

    /** Spur m 2, z 24, x 0.1, ISO 53 A rack: no undercut. */
    private static GeneratingSetup spur(int gashes) {
        return Jobs.setup(24, 2, 0, 0.1, "iso53-a", 1, gashes);
    }

    @Test
    void flankConvergesToTheInvolute() {
        double previous = Double.POSITIVE_INFINITY;
        for (int gashes : GASHES) {
            GeneratingSetup s = spur(gashes);
            ToothSpaceSimulation sim = GeneratingSimulation.run(s);
            double worst = worst(s, sim.rightInvolute(), 400, ConvergenceTest::distanceToInvolute);
            // the envelope never cuts into the involute (checked in worst), and its distance falls about as 1/i²
            // (cusp ρ Δφ²/8, FORMULAS.md §6.2): a fourfold gash count divides it by about 16
            assertTrue(worst < previous / 10, gashes + " gashes: " + worst + " vs " + previous);
            // the reported maximum sits on exact cusps; the sampled brute force may only fall short of it
            double reported = sim.profileDeviationMaxMm();
            assertTrue(worst <= reported * (1 + 1e-6) + 1e-12 && worst >= 0.8 * reported,
                    "reported " + reported + " vs brute force " + worst);
            previous = worst;
        }
        assertTrue(previous < 5e-6, "768 gashes leave " + previous + " mm");
    }

    @Test
    void rootConvergesToTheTrochoidOfTheRackTip() {
        double previous = Double.POSITIVE_INFINITY;
        for (int gashes : GASHES) {
            GeneratingSetup s = spur(gashes);
            ToothSpaceSimulation sim = GeneratingSimulation.run(s);
            double worst = worst(s, sim.rightRoot(), 300, ConvergenceTest::distanceToRootForm);
            assertTrue(worst < previous / 8, gashes + " gashes: " + worst + " vs " + previous);
            previous = worst;
        }
        assertTrue(previous < 2e-6, "768 gashes leave " + previous + " mm at the root");
    }

    /**
     * Distance from a point to the right flank's involute, mm. Involute of the base circle r_b
     * (textbook parametric form) r_b (cos θ + θ sin θ, sin θ − θ cos θ), turned so that it passes
     * through the reference circle at the half space width e_t/2 = (p_t − s_t)/2, s_t = m_t (π/2 + 2x tan α)
     * (ISO 21771 / FORMULAS.md §2.1). Positive outside the tooth (in the space).
     */
    static double distanceToInvolute(GeneratingSetup s, Point p) {
        double r = s.referenceRadiusMm();
        double rb = s.baseRadiusMm();
        double alphaT = s.transversePressureAngleRad();
        double mt = s.transverseModuleMm();
        double st = mt * (Math.PI / 2 + 2 * s.profileShift() * Math.tan(s.pressureAngleRad()));
        double halfSpaceAngle = (Math.PI * mt - st) / (2 * r);
        // polar angle (from +y, toward +x) of the involute point at roll θ: start angle + θ − atan θ
        double start = halfSpaceAngle - (Math.tan(alphaT) - alphaT);
        double thetaMax = Math.sqrt(Math.pow(s.tipRadiusMm() / rb, 2) - 1) * 1.05;
        UnivariateObjectiveFunction f = new UnivariateObjectiveFunction(theta -> {
            double ix = rb * (Math.cos(theta) + theta * Math.sin(theta));
            double iy = rb * (Math.sin(theta) - theta * Math.cos(theta));
            // turn the curve (polar angle χ from +x) into the gear frame (polar angle start + χ from +y)
            double gx = ix * Math.sin(start) + iy * Math.cos(start);
            double gy = ix * Math.cos(start) - iy * Math.sin(start);
            return Math.hypot(p.x() - gx, p.y() - gy);
        });
        double best = bruteThenBrent(f, 0, thetaMax);
        double polar = Math.atan2(p.x(), p.y());
        double rr = Math.hypot(p.x(), p.y());
        double roll = Math.sqrt(Math.max(0, rr * rr / (rb * rb) - 1));
        double onCurve = start + roll - Math.atan(roll);
        return polar < onCurve ? best : -best;
    }

    /**
     * How far a point lies inside what continuous rolling removes at the root, mm (positive:
     * material the discrete cuts leave standing). Continuous rolling sweeps the rack tip line,
     * which leaves the root circle r_f = a − h_aP0 over the tip flat's polar range [0, X_v / r], and
     * the tip rounding, whose centre traces a trochoid; the root form there is that trochoid's
     * offset by ρ. The centre in rack coordinates (spur rack, ISO 53 construction):
     * Y_c = −h_aP0 + ρ, X_c = π m/4 − ρ / cos α + Y_c tan α; it rolls as R(−φ)(X_c − r φ, a + Y_c)
     * (pure rolling on the reference circle).
     */
    static double distanceToRootForm(GeneratingSetup s, Point p) {
        double m = s.normalModuleMm();
        double alpha = s.pressureAngleRad();
        double rho = s.hobTipRadiusMm();
        double r = s.referenceRadiusMm();
        double a = s.datumDistanceMm();
        double yc = -s.hobAddendumMm() + rho;
        double xc = Math.PI * m / 4 - rho / Math.cos(alpha) + yc * Math.tan(alpha);
        UnivariateObjectiveFunction f = new UnivariateObjectiveFunction(phi -> {
            double x = xc - r * phi;
            double y = a + yc;
            double gx = x * Math.cos(phi) + y * Math.sin(phi);
            double gy = -x * Math.sin(phi) + y * Math.cos(phi);
            return Math.hypot(p.x() - gx, p.y() - gy);
        });
        double insideCorner = rho - bruteThenBrent(f, -0.6, 0.6);
        if (Math.atan2(p.x(), p.y()) <= xc / r) {
            return Math.max(insideCorner, Math.hypot(p.x(), p.y()) - (a - s.hobAddendumMm()));
        }
        return insideCorner;
    }

    /**
     * The largest distance of about {@code count} of the points, checking that none lies beyond the
     * exact curve (the discrete cuts remove less than continuous rolling, never more).
     */
    private static double worst(GeneratingSetup s, List<Point> points, int count,
                                ToDoubleBiFunction<GeneratingSetup, Point> distance) {
        double worst = 0;
        for (Point p : every(points, count)) {
            double d = distance.applyAsDouble(s, p);
            assertTrue(d > -1e-9, "a cut point lies beyond the exact curve by " + d + " mm");
            worst = Math.max(worst, d);
        }
        return worst;
    }

    /** About {@code count} points spread over the list, always with its last point. */
    private static List<Point> every(List<Point> points, int count) {
        int stride = Math.max(1, points.size() / count);
        java.util.ArrayList<Point> out = new java.util.ArrayList<>();
        for (int i = 0; i < points.size(); i += stride) {
            out.add(points.get(i));
        }
        out.add(points.get(points.size() - 1));
        return out;
    }

    private static double bruteThenBrent(UnivariateObjectiveFunction f, double lo, double hi) {
        int n = 600;
        double bestX = lo;
        double best = Double.POSITIVE_INFINITY;
        for (int i = 0; i <= n; i++) {
            double x = lo + (hi - lo) * i / n;
            double v = f.getObjectiveFunction().value(x);
            if (v < best) {
                best = v;
                bestX = x;
            }
        }
        double h = (hi - lo) / n;
        return new BrentOptimizer(1e-15, 1e-16).optimize(new MaxEval(500), f, GoalType.MINIMIZE,
                new SearchInterval(bestX - h, bestX + h, bestX)).getValue();
    }
}
