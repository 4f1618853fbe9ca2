package org.hobwright.wizard.simulate;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * DOMAIN.md §6.2 leaves open whether the helical enveloping depth carries cos³ β (virtual spur
 * gear) or 1/cos β (transverse-plane derivation). The simulation decides: its measured depth,
 * normal to the flank, follows the spur form / cos β within 1 %, and at 30° and 45° lies far from
 * the cos³ β form. These are the deciding cases quoted in DEVELOPERS.md ("Generating simulation").
 */
class HelicalFactorTest {

    /** The spur closed form δ = π² z₀² m_n sin α_n / (4 z i²), DOMAIN.md §6.2. */
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
}
