package org.hobwright.wizard.geometry;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class UndercutAndInvoluteTest {

    // Undercut limits with h* = 1 (FORMULAS.md cases 13, 14 and section 2.3, derived there;
    // z_min 17 at 20°, 32 at 14.5° as in Niemann/Winter, from memory).
    @ParameterizedTest
    @CsvSource({
        "20, 0, 12, 17.0973, 0.298133", "20, 15, 12, 15.5378, 0.227691", "14.5, 0, 12, 31.9029, 0.623859"})
    void undercutLimits(double alpha, double beta, int z, double zMin, double xMin) {
        InvoluteGear g = TestGears.gear(z, 1, alpha, beta, 0);
        assertEquals(zMin, Undercut.minTeeth(1.0, g), 5e-5);
        assertEquals(xMin, Undercut.minProfileShift(1.0, g), 5e-6);
    }

    // Practical limit 14 teeth at 20° and 26 at 14.5° (Niemann/Winter, from memory): the fewest teeth whose shift shortfall
    // at x = 0 stays within h* ÷ 5.
    @ParameterizedTest
    @CsvSource({"20, 14", "14.5, 26"})
    void slightShortfallReproducesThePracticalLimits(double alpha, int practical) {
        double limit = Undercut.SLIGHT_SHORTFALL;
        assertTrue(Undercut.minProfileShift(1.0, TestGears.gear(practical, 1, alpha, 0, 0)) <= limit);
        assertTrue(Undercut.minProfileShift(1.0, TestGears.gear(practical - 1, 1, alpha, 0, 0)) > limit);
    }

    // Two derivations meet: at the undercut limit x_min the root form circle (start of the generated involute)
    // falls on the base circle; above it the form circle lies above the base circle (generating geometry).
    @ParameterizedTest
    @CsvSource({"12, 0, iso53-a", "12, 15, iso53-a", "20, 30, iso53-c", "30, 0, full-depth-14.5"})
    void formCircleMeetsBaseCircleAtTheUndercutLimit(int z, double beta, String system) {
        InvoluteGear g = TestGears.gear(z, 2, system.equals("full-depth-14.5") ? 14.5 : 20, beta, 0, system);
        double xMin = Undercut.minProfileShift(Undercut.hStar(g), g);
        InvoluteGear limit = g.withProfileShift(xMin);
        assertEquals(limit.baseDiameterMm(), limit.rootFormDiameterMm(), 1e-6);
        assertTrue(g.withProfileShift(xMin + 0.1).rootFormDiameterMm() > limit.baseDiameterMm());
    }

    // Newton's iteration for q = 0.05 gives 0.5120398143 rad = 29.3377° (FORMULAS.md case 22, section 3.2).
    @Test
    void inverseInvoluteOfWorkedExample() {
        assertEquals(0.5120398143, Involute.inverse(0.05), 1e-10);
        assertEquals(29.3377, Math.toDegrees(Involute.inverse(0.05)), 5e-5);
    }

    // Independent check: commons-math3's Brent solver on tan α − α − q over (0, π/2), 10,000 fixed-seed values
    // of α from 0.01 to 1.5 rad; the inverse must agree to 1e-12 rad.
    @Test
    void inverseInvoluteAgreesWithBrentSolver() {
        SplittableRandom random = new SplittableRandom(20261201L);
        BrentSolver brent = new BrentSolver(1e-15, 1e-15);
        for (int i = 0; i < 10_000; i++) {
            double alpha = 0.01 + random.nextDouble() * 1.49;
            double q = Math.tan(alpha) - alpha;
            double reference = brent.solve(1000, a -> Math.tan(a) - a - q, 1e-6, 1.5001);
            assertEquals(reference, Involute.inverse(q), 1e-12, "q = " + q);
            assertEquals(alpha, Involute.inverse(q), 1e-12, "alpha = " + alpha);
        }
    }

    @Test
    void inverseInvoluteRefusesNegativeOrNaN() {
        assertEquals(0.0, Involute.inverse(0), 0);
        assertThrows(IllegalArgumentException.class, () -> Involute.inverse(-1e-3));
        assertThrows(IllegalArgumentException.class, () -> Involute.inverse(Double.NaN));
    }
}
