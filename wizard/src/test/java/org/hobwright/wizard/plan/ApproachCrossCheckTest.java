package org.hobwright.wizard.plan;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.SplittableRandom;
import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.geometry.euclidean.threed.Line;
import org.apache.commons.math3.geometry.euclidean.threed.Vector3D;
import org.apache.commons.math3.optim.MaxEval;
import org.apache.commons.math3.optim.nonlinear.scalar.GoalType;
import org.apache.commons.math3.optim.univariate.BrentOptimizer;
import org.apache.commons.math3.optim.univariate.SearchInterval;
import org.apache.commons.math3.optim.univariate.UnivariateObjectiveFunction;
import org.apache.commons.math3.optim.univariate.UnivariatePointValuePair;
import org.junit.jupiter.api.Test;

/**
 * The exact helical approach against an independent computation of the same construction
 * (FORMULAS.md §7.1 option 2): commons-math3's 3-D line distance, a brute-force scan of the blank edge
 * refined by Brent's minimiser, and Brent's root finder for the height.
 */
class ApproachCrossCheckTest {

    /** Smallest distance from the blank edge to the tilted hob axis, minus the hob radius. */
    private static double gap(double height, double ra0, double ra, double depth, double etaRad) {
        double a = ra0 + ra - depth;
        Vector3D centre = new Vector3D(a, 0, height);
        Line axis = new Line(centre, centre.add(new Vector3D(0, Math.cos(etaRad), Math.sin(etaRad))), 1e-12);
        UnivariateFunction dist = phi -> axis.distance(new Vector3D(ra * Math.cos(phi), ra * Math.sin(phi), 0));
        int n = 720;
        int best = 0;
        double bestValue = Double.POSITIVE_INFINITY;
        for (int i = 0; i < n; i++) {
            double v = dist.value(-Math.PI + 2 * Math.PI * i / n);
            if (v < bestValue) {
                bestValue = v;
                best = i;
            }
        }
        double step = 2 * Math.PI / n;
        double centreAngle = -Math.PI + step * best;
        UnivariatePointValuePair min = new BrentOptimizer(1e-14, 1e-16).optimize(new MaxEval(1000),
                new UnivariateObjectiveFunction(dist), GoalType.MINIMIZE,
                new SearchInterval(centreAngle - step, centreAngle + step, centreAngle));
        return Math.min(min.getValue(), bestValue) - ra0;
    }

    private static double independent(double depth, double da0, double da, double etaDeg) {
        double ra0 = da0 / 2;
        double ra = da / 2;
        double eta = Math.toRadians(etaDeg);
        return new BrentSolver(1e-12).solve(1000, h -> gap(h, ra0, ra, depth, eta), 0, 4 * da0);
    }

    @Test
    void matchesTheWorkedExample() {
        // FORMULAS.md §10 row 35: 18.1330 mm
        assertEquals(18.1330, independent(4.5, 70, 66.9166, 13.2368), 5e-4);
        // FORMULAS.md §10 row 34: with the hob square to the gear (η = 0) the construction is the spur case,
        // E = √(h (d_a0 − h)) = 17.1683 mm for h 4.5, d_a0 70; the blank diameter does not enter
        assertEquals(17.1683, independent(4.5, 70, 66.9166, 0), 5e-4);
        assertEquals(CutGeometry.approachSpur(4.5, 70), independent(4.5, 70, 40, 0), 1e-8);
    }

    @Test
    void agreesWithTheIndependentConstructionOnRandomCases() {
        SplittableRandom rnd = new SplittableRandom(20261201L);
        for (int i = 0; i < 60; i++) {
            double da0 = rnd.nextDouble(16, 120);
            double da = rnd.nextDouble(5, 200);
            double depth = rnd.nextDouble(0.05, Math.min(da0, da) / 2 * 0.8);
            double eta = rnd.nextDouble(0, 45);
            double expected = independent(depth, da0, da, eta);
            double actual = CutGeometry.approachHelical(depth, da0, da, eta);
            assertEquals(expected, actual, 1e-6 * (1 + expected),
                    "d_a0 " + da0 + " d_a " + da + " h " + depth + " η " + eta);
        }
    }
}
