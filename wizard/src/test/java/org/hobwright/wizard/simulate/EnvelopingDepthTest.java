package org.hobwright.wizard.simulate;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class EnvelopingDepthTest {

    /** FORMULAS.md §6.2 worked values (spur form; derived there, matching the remembered hob-maker handbook form). */
    @ParameterizedTest
    @CsvSource({
        // module, teeth, starts, gashes, expected µm        source
        "2, 30, 1, 14, 0.287041",   // FORMULAS.md §6.2 / §10 case 33
        "2, 30, 2, 14, 1.14816",    // FORMULAS.md §6.2, two-start
        "1, 20, 1, 12, 0.293021",   // FORMULAS.md §6.2
    })
    void closedFormReproducesTheWorkedValues(double m, int z, int starts, int gashes, double expectedUm) {
        double um = 1000 * EnvelopingDepth.closedFormMm(m, z, starts, gashes, Math.toRadians(20), 0);
        assertEquals(expectedUm, um, 1e-5 * expectedUm);
    }

    /**
     * Two independent methods must meet: the cusp the simulation measures between exact rack
     * positions, and the closed form ρ Δφ²/8 (FORMULAS.md §6.2). Within 10 %.
     */
    @ParameterizedTest(name = "m {0}, z {1}, z0 {2}, i {3}")
    @CsvSource({
        "2, 30, 1, 14",
        "1, 20, 1, 12",
        "2, 30, 2, 14",
        "4, 15, 3, 10",   // the coarse case FORMULAS.md §6.2 quotes at about 20 µm
        "1, 100, 1, 12",
        "0.5, 40, 2, 9",
        "3, 25, 1, 16",
        "1, 17, 3, 11",
        "6, 60, 2, 12",
        "1.5, 12, 1, 8",
    })
    void simulatedDepthMeetsTheClosedForm(double m, int z, int starts, int gashes) {
        ToothSpaceSimulation sim = GeneratingSimulation.run(Jobs.setup(z, m, 0, 0.5, "iso53-a", starts, gashes));
        double closed = EnvelopingDepth.closedFormMm(m, z, starts, gashes, Math.toRadians(20), 0);
        assertEquals(closed, sim.envelopingDepthMm(), 0.10 * closed);
        assertEquals(closed, sim.closedFormEnvelopingDepthMm(), 1e-12);
    }

    /**
     * Feed marks at the root: the envelope of hob tip circles measured by the simulation against the
     * sagitta rule δ_root = f_a² / (4 d_a0 cos² β) (FORMULAS.md §6.1; §10 case 32: f_a 2, d_a0 70 →
     * 14.2857 µm) as the planner computes it. The exact sagitta is a little deeper (r − √(r² − s²/4)).
     */
    @ParameterizedTest(name = "f {0}, d_a0 {1}, beta {2}")
    @CsvSource({
        "2, 70, 0, 14.2857",    // FORMULAS.md §6.1 table and §10 case 32
        "1.5, 70, 0, 8.03571",  // FORMULAS.md §6.1 table
        "2, 70, 15, 15.3113",   // the same rule with 1/cos² β, computed by hand
        "0.5, 32, 0, 1.95313",  // the same rule, computed by hand
    })
    void feedMarksMeetTheSagittaRule(double feed, double hobDiameter, double betaDeg, double expectedUm) {
        FeedMarks marks = FeedMarks.of(hobDiameter / 2, feed, Math.toRadians(betaDeg), 0.001);
        double rule = org.hobwright.wizard.plan.FinishFormulas.feedMarkRootUm(feed, hobDiameter, betaDeg);
        assertEquals(expectedUm, rule, 1e-4 * expectedUm);
        assertEquals(rule, 1000 * marks.depthMm(), 1e-3 * rule);
        double deepest = marks.profile().stream().mapToDouble(p -> -p.y()).max().orElseThrow();
        assertEquals(marks.depthMm(), deepest, 0.01 * marks.depthMm(), "the drawn section shows the scallops");
    }
}
