package org.hobwright.wizard.simulate;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.optim.MaxEval;
import org.apache.commons.math3.optim.nonlinear.scalar.GoalType;
import org.apache.commons.math3.optim.univariate.BrentOptimizer;
import org.apache.commons.math3.optim.univariate.SearchInterval;
import org.apache.commons.math3.optim.univariate.UnivariateObjectiveFunction;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Whether the helical enveloping depth carries cos³ β (virtual spur gear) or 1/cos β
 * (transverse-plane derivation, FORMULAS.md §6.2). The simulation decides: its measured depth,
 * normal to the flank, follows the spur form / cos β within 1 %, and at 30° and 45° lies far from
 * the cos³ β form. These are the deciding cases quoted in FORMULAS.md §6.2.
 */
class HelicalFactorTest {

    /** The spur closed form δ = π² z₀² m_n sin α_n / (4 z i²), FORMULAS.md §6.2. */
    private static double spurForm(double m, int z, int starts, int gashes) {
        return Math.PI * Math.PI * starts * starts * m * Math.sin(Math.toRadians(20)) / (4.0 * z * gashes * gashes);
    }

    @ParameterizedTest(name = "m {0}, z {1}, z0 {2}, i {3}, beta {4}")
    @CsvSource({
        "2, 30, 1, 14, 15",
        "2, 30, 1, 14, 30",
        "2, 30, 1, 14, 45",
        "4, 15, 3, 10, 30",
        "1, 40, 2, 12, 45",
    })
    void measuredDepthFollowsOneOverCosBeta(double m, int z, int starts, int gashes, double betaDeg) {
        double beta = Math.toRadians(betaDeg);
        ToothSpaceSimulation sim = GeneratingSimulation.run(Jobs.setup(z, m, betaDeg, 0.5, "iso53-a", starts, gashes));
        double measured = sim.envelopingDepthMm();
        double overCos = spurForm(m, z, starts, gashes) / Math.cos(beta);
        double cubed = spurForm(m, z, starts, gashes) * Math.pow(Math.cos(beta), 3);
        assertEquals(overCos, measured, 0.01 * overCos, "1/cos β form");
        if (betaDeg >= 30) {
            // cos³ β would predict 35 % (30°) or 65 % (45°) less than the 1/cos β form
            assertTrue(Math.abs(measured - cubed) > 0.3 * measured, "cos³ β form " + cubed + " vs " + measured);
        }
    }

    /**
     * The same question answered in three dimensions, without the transverse model: the hob's
     * normal-section rack flank is a plane (normal (cos α_n cos β, −sin α_n, −cos α_n sin β), through
     * (π m_n/4) n_p + r ŷ); rolled by φ it is the plane R(−φ)N · P = N·P₀ − r φ N_x in the gear frame.
     * Two cuts Δφ apart around the reference circle meet in a cusp edge; its point Q in the plane
     * z = 0 is measured against the flank surface, built as the envelope of all rolled planes: the
     * union of the characteristic lines (plane ∩ its φ-derivative), so the distance is the smallest
     * distance from Q to one of those lines (Brent's method, commons-math3). This normal depth must
     * follow the 1/cos β form, and the simulation's transverse depth times cos β_b must equal it.
     */
    @ParameterizedTest(name = "3D: beta {0}")
    @CsvSource({"0", "15", "30", "45"})
    void threeDimensionalCuspFollowsOneOverCosBeta(double betaDeg) {
        double m = 2;
        int z = 30;
        int gashes = 14;
        double alpha = Math.toRadians(20);
        double beta = Math.toRadians(betaDeg);
        double r = z * m / (2 * Math.cos(beta));
        double[] nv = {Math.cos(alpha) * Math.cos(beta), -Math.sin(alpha), -Math.cos(alpha) * Math.sin(beta)};
        double[] p0 = {Math.PI * m / 4 * Math.cos(beta), r, -Math.PI * m / 4 * Math.sin(beta)};
        double c0 = nv[0] * p0[0] + nv[1] * p0[1] + nv[2] * p0[2];
        double step = 2 * Math.PI / (gashes * z);
        double phiC = Math.PI * m / (4 * r * Math.cos(beta));
        // cusp edge point in z = 0: both rolled planes, solved as 2 × 2
        double[] a1 = rolled(nv, phiC - step / 2);
        double[] a2 = rolled(nv, phiC + step / 2);
        double b1 = c0 - r * (phiC - step / 2) * nv[0];
        double b2 = c0 - r * (phiC + step / 2) * nv[0];
        double det = a1[0] * a2[1] - a1[1] * a2[0];
        double[] q = {(b1 * a2[1] - a1[1] * b2) / det, (a1[0] * b2 - b1 * a2[0]) / det, 0};
        UnivariateObjectiveFunction distance = new UnivariateObjectiveFunction(phi -> {
            double[] a = rolled(nv, phi);
            double[] b = derivative(nv, phi);
            double av = c0 - r * phi * nv[0] - dot(a, q);
            double bv = -r * nv[0] - dot(b, q);
            double aa = dot(a, a);
            double ab = dot(a, b);
            double bb = dot(b, b);
            double dd = aa * bb - ab * ab;
            double lambda = (av * bb - bv * ab) / dd;
            double mu = (aa * bv - ab * av) / dd;
            return Math.sqrt(Math.pow(lambda * a[0] + mu * b[0], 2) + Math.pow(lambda * a[1] + mu * b[1], 2)
                    + Math.pow(lambda * a[2] + mu * b[2], 2));
        });
        double depth3d = new BrentOptimizer(1e-14, 1e-18).optimize(new MaxEval(1000), distance, GoalType.MINIMIZE,
                new SearchInterval(phiC - 2 * step, phiC + 2 * step, phiC)).getValue();
        double overCos = spurForm(m, z, 1, gashes) / Math.cos(beta);
        assertEquals(overCos, depth3d, 0.01 * overCos, "3D normal cusp vs the 1/cos β form");
        ToothSpaceSimulation sim = GeneratingSimulation.run(Jobs.setup(z, m, betaDeg, 0, "iso53-a", 1, gashes));
        assertEquals(depth3d, sim.envelopingDepthMm(), 0.01 * depth3d, "simulation vs 3D");
    }

    /** R(−φ) N: the plane normal turned with the gear. */
    private static double[] rolled(double[] n, double phi) {
        return new double[] {n[0] * Math.cos(phi) + n[1] * Math.sin(phi), -n[0] * Math.sin(phi) + n[1] * Math.cos(phi),
            n[2]};
    }

    /** d/dφ of R(−φ) N. */
    private static double[] derivative(double[] n, double phi) {
        return new double[] {-n[0] * Math.sin(phi) + n[1] * Math.cos(phi), -n[0] * Math.cos(phi) - n[1] * Math.sin(phi),
            0};
    }

    private static double dot(double[] a, double[] b) {
        return a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
    }
}
