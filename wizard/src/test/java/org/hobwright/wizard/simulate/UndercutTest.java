package org.hobwright.wizard.simulate;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.SplittableRandom;
import org.hobwright.api.job.GearSpec;
import org.hobwright.wizard.geometry.InvoluteGear;
import org.hobwright.wizard.geometry.ToothSystem;
import org.hobwright.wizard.geometry.Undercut;
import org.junit.jupiter.api.Test;

/**
 * The simulation's undercut (some cut reaches inside the true involute) against the engineering
 * rule for rack generation, FORMULAS.md §2.3 (derived there), which the engineering core's
 * undercut check ({@link Undercut}) also applies:
 * x_min = h* − z sin² α_t / (2 cos β), h* = h_aP0* − ρ_aP0* (1 − sin α_n) the height of the
 * tool's straight flank below the datum line.
 */
class UndercutTest {
    private static final List<String> SYSTEMS = List.of("iso53-a", "iso53-b", "iso53-c", "iso53-d");

    static double minimumShift(String system, int teeth, double helixDeg) {
        ToothSystem ts = ToothSystem.builtIn(system).orElseThrow();
        double alphaN = Math.toRadians(20);
        double beta = Math.toRadians(helixDeg);
        double alphaT = Math.atan(Math.tan(alphaN) / Math.cos(beta));
        double hStar = ts.dedendumFactor() - ts.rootRadiusFactor() * (1 - Math.sin(alphaN));
        return hStar - teeth * Math.pow(Math.sin(alphaT), 2) / (2 * Math.cos(beta));
    }

    @Test
    void ruleReproducesThePublishedLimits() {
        // FORMULAS.md §2.3 / §10 cases 13, 14: x_min(z 12, 20°) = 0.298133 with h* = 1 (ISO 53 A gives 0.99997)
        assertEquals(0.298133, minimumShift("iso53-a", 12, 0), 5e-5);
        assertEquals(0.227691, minimumShift("iso53-a", 12, 15), 5e-5);
    }

    @Test
    void smallPinionWithoutShiftIsUndercut() {
        // 12 teeth, x = 0, standard 12-gash hob: below the practical 14 and theoretical 17 teeth (FORMULAS.md §2.3)
        ToothSpaceSimulation sim = GeneratingSimulation.run(Jobs.setup(12, 1, 0, 0, "iso53-a", 1, 12));
        assertTrue(sim.undercut());
        assertTrue(sim.undercutDepthMm() > 1e-4, "undercut depth " + sim.undercutDepthMm());
        // the involute then starts above the base circle, where the fillet crosses it
        assertTrue(sim.activeInvoluteStartDiameterMm() > sim.setup().baseRadiusMm() * 2);
    }

    @Test
    void eighteenTeethWithoutShiftAreNotUndercut() {
        // z_min = 17.0973 at 20° (17 theoretical, FORMULAS.md §2.3)
        assertFalse(GeneratingSimulation.run(Jobs.setup(18, 1, 0, 0, "iso53-a", 1, 12)).undercut());
    }

    /**
     * Property: across teeth, tooth systems, helix angles and shifts within 0.05 … 0.3 of the limit
     * on either side, undercut appears exactly below the limit. Fine cuts (400 gashes) so that the
     * cut positions sample the undercutting range densely (fixed seed, reproducible).
     */
    @Test
    void undercutAppearsExactlyBelowTheLimit() {
        SplittableRandom random = new SplittableRandom(20261201L);
        for (int n = 0; n < 40; n++) {
            int teeth = 8 + random.nextInt(33);
            String system = SYSTEMS.get(random.nextInt(SYSTEMS.size()));
            double helix = random.nextBoolean() ? 0 : 5 + 25 * random.nextDouble();
            double margin = 0.05 + 0.25 * random.nextDouble();
            boolean below = random.nextBoolean();
            double xMin = minimumShift(system, teeth, helix);
            double x = below ? xMin - margin : xMin + margin;
            GeneratingSetup s = Jobs.setup(teeth, 1.5, helix, x, system, 1, 400)
                    .withHob(1, 400, random.nextDouble());
            // the engineering core's undercut check uses the same limit
            GearSpec g = Jobs.gear(teeth, 1.5, helix, x, system);
            InvoluteGear ig = InvoluteGear.of(g, ToothSystem.of(g).orElseThrow());
            assertEquals(xMin, Undercut.minProfileShift(Undercut.hStar(ig), ig), 1e-9, "engineering check's limit");
            ToothSpaceSimulation sim = GeneratingSimulation.run(s);
            assertEquals(below, sim.undercut(), String.format(java.util.Locale.ROOT,
                    "z %d, %s, beta %.2f, x %.4f (limit %.4f): depth %.3g mm", teeth, system, helix, x, xMin,
                    sim.undercutDepthMm()));
        }
    }
}
