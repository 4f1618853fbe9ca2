package org.hobwright.wizard.simulate;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.OptionalInt;
import org.hobwright.api.cycle.GearData;
import org.hobwright.api.cycle.Point;
import org.hobwright.api.cycle.SimulationData;
import org.hobwright.api.job.GearSpec;
import org.hobwright.api.job.HobJob;
import org.hobwright.api.job.HobSpec;
import org.hobwright.api.job.Pitch;
import org.hobwright.api.testkit.SampleJobs;
import org.hobwright.wizard.geometry.GearGeometry;
import org.hobwright.wizard.geometry.ToothSystem;
import org.junit.jupiter.api.Test;

class GeneratingSimulationTest {

    private static GearData geometry(GearSpec g) {
        return GearGeometry.of(g, ToothSystem.of(g).orElseThrow());
    }

    @Test
    void helicalSampleJob() {
        // m_n 2, z 30, β 15° RH, x 0.2, ISO 53 A, 14-gash single-start hob (FORMULAS.md §1.5 gear)
        HobJob job = SampleJobs.helicalMetric();
        GearData gear = geometry(job.gear());
        SimulationData data = GeneratingSimulation.simulate(job, gear);
        // closed form: FORMULAS.md §6.2 spur value 0.287041 µm divided by cos 15° (the settled helical factor)
        assertEquals(0.287041e-3 / Math.cos(Math.toRadians(15)), data.closedFormEnvelopingDepthMm(), 1e-9);
        assertEquals(data.closedFormEnvelopingDepthMm(), data.envelopingDepthMm(), 0.01 * data.envelopingDepthMm());
        assertFalse(data.undercut());
        assertTrue(data.profileDeviationMaxMm() > data.envelopingDepthMm(), "cusps grow toward the tip");
        assertTrue(data.activeInvoluteStartDiameterMm() > gear.baseDiameterMm());
        assertTrue(data.activeInvoluteStartDiameterMm() < gear.referenceDiameterMm());
        assertTrue(data.simulatedProfile().size() > 100);
        assertEquals(data.simulatedProfile().size(), data.nominalProfile().size());
        // the report's coarse outline gives the numbers of the 1 µm run: cusps are computed exactly
        ToothSpaceSimulation fine = GeneratingSimulation.run(GeneratingSimulation.setupOf(job, gear));
        assertEquals(fine.envelopingDepthMm(), data.envelopingDepthMm(), 1e-9 * data.envelopingDepthMm());
        assertEquals(fine.profileDeviationMaxMm(), data.profileDeviationMaxMm(), 0.02 * data.profileDeviationMaxMm());
        assertEquals(fine.activeInvoluteStartDiameterMm(), data.activeInvoluteStartDiameterMm(), 1e-9);
        List<Point> dev = data.deviation();
        for (int i = 1; i < dev.size(); i++) {
            assertTrue(dev.get(i).x() >= dev.get(i - 1).x(), "roll length increases");
            assertTrue(dev.get(i).y() > -1e-9, "no cut reaches inside the involute");
        }
    }

    /**
     * The nominal flank must have the tooth thickness of ISO 21771 at every diameter
     * (s_yt = d_y (s_t/d + inv α_t − inv α_yt), {@link GearGeometry#transverseThicknessAt}), and the
     * space centre must lie on the root circle d_f = d − 2 (h_fP − x m_n) (ISO 21771 eq. 34): checks the
     * rolling of the rack, including a thickness allowance taken as extra shift.
     */
    @Test
    void nominalFlankHasTheStandardThickness() {
        for (double allowance : new double[] {0, -0.05}) {
            GearSpec g = new GearSpec("t", 30, new Pitch.Module(2), 20, 15, org.hobwright.api.job.Hand.RIGHT, 20, 0.2,
                    allowance, "iso53-a", Optional.empty(), OptionalDouble.empty(), OptionalDouble.empty(),
                    OptionalInt.empty(), org.hobwright.api.job.DrawingValues.NONE);
            GearData gear = geometry(g);
            GeneratingSetup s = GeneratingSimulation.setupOf(Jobs.job(g, 1, 14), gear);
            NominalPath path = new NominalPath(s);
            double st = gear.toothThicknessMm() / Math.cos(Math.toRadians(15));
            double alphaT = Math.toRadians(gear.transversePressureAngleDeg());
            for (int i = 0; i < path.size; i += 97) {
                if (path.kind[i] != NominalPath.FLANK) {
                    continue;
                }
                double dy = 2 * Math.hypot(path.x[i], path.y[i]);
                double spaceHalfAngle = Math.atan2(path.x[i], path.y[i]);
                double thickness = dy * (Math.PI / 30 - spaceHalfAngle);
                double expected = GearGeometry.transverseThicknessAt(dy, gear.referenceDiameterMm(),
                        gear.baseDiameterMm(), st, alphaT);
                assertEquals(expected, thickness, 1e-9, "at d_y " + dy);
            }
            if (allowance == 0) {
                assertEquals(gear.rootDiameterMm() / 2, Math.hypot(path.x[0], path.y[0]), 1e-9);
            }
        }
    }

    @Test
    void activeInvoluteStartConvergesToTheFormCircle() {
        // form circle from the rack alone: the straight flank's end at depth h* m below the datum meets the
        // involute at roll length L = r sin α − (h* − x) m / sin α (FORMULAS.md §2.3 geometry)
        double previous = Double.POSITIVE_INFINITY;
        for (int gashes : new int[] {12, 96, 768}) {
            ToothSpaceSimulation sim = GeneratingSimulation.run(Jobs.setup(24, 2, 0, 0.1, "iso53-a", 1, gashes));
            GeneratingSetup s = sim.setup();
            double hStar = 1.25 - 0.38 * (1 - Math.sin(s.pressureAngleRad()));
            double roll = s.referenceRadiusMm() * Math.sin(s.pressureAngleRad())
                    - (hStar - 0.1) * 2 / Math.sin(s.pressureAngleRad());
            double form = 2 * Math.hypot(s.baseRadiusMm(), roll);
            assertEquals(form, sim.rootFormDiameterMm(), 1e-4);
            double gap = Math.abs(sim.activeInvoluteStartDiameterMm() - form);
            assertTrue(gap < 2 * s.baseRadiusMm() * s.stepRad(), "within one generating step: " + gap);
            assertTrue(gap < previous || gap < 1e-3, gashes + ": " + gap + " vs " + previous);
            previous = gap;
        }
        assertTrue(previous < 5e-3, "768 gashes: " + previous);
    }

    @Test
    void unknownToothSystemIsAFieldProblem() {
        GearSpec g = Jobs.gear(20, 1, 0, 0, "iso53-a");
        GearData gear = geometry(g);
        GearSpec odd = new GearSpec("t", 20, new Pitch.Module(1), 20, 0, g.hand(), 20, 0, 0, "no-such-rack",
                Optional.empty(), OptionalDouble.empty(), OptionalDouble.empty(), OptionalInt.empty(), g.drawing());
        SimulationInputException e = assertThrows(SimulationInputException.class,
                () -> GeneratingSimulation.simulate(Jobs.job(odd, 1, 12), gear));
        assertEquals("gear.toothSystem", e.field());
        assertTrue(e.getMessage().contains("no-such-rack"));
    }

    @Test
    void hobOfAnotherModuleIsAFieldProblem() {
        GearSpec g = Jobs.gear(20, 1, 0, 0, "iso53-a");
        HobJob job = Jobs.job(g, 1, 12);
        HobSpec h = job.hob();
        HobSpec other = new HobSpec(new Pitch.Module(1.25), h.pressureAngleDeg(), 1, h.hand(), 70, h.leadAngleDeg(),
                h.referenceDiameterMm(), 12, 80, h.maxRpm(), "hss");
        HobJob bad = new HobJob("t", job.units(), g, other, job.machine(), job.cycle());
        SimulationInputException e = assertThrows(SimulationInputException.class,
                () -> GeneratingSimulation.simulate(bad, geometry(g)));
        assertEquals("hob.module", e.field());
    }

    @Test
    void sharpCorneredRacksSimulateToo() {
        // AGMA fine pitch and 14½° full depth have no tip radius in the table: the corner traces the fillet
        GearSpec g = new GearSpec("t", 40, new Pitch.Diametral(32), 20, 0, org.hobwright.api.job.Hand.RIGHT, 5,
                0, 0, "agma-fine", Optional.empty(), OptionalDouble.empty(), OptionalDouble.empty(),
                OptionalInt.empty(), org.hobwright.api.job.DrawingValues.NONE);
        SimulationData data = GeneratingSimulation.simulate(Jobs.job(g, 1, 12), geometry(g));
        double closed = EnvelopingDepth.closedFormMm(25.4 / 32, 40, 1, 12, Math.toRadians(20), 0);
        assertEquals(closed, data.envelopingDepthMm(), 0.1 * closed);
        assertFalse(data.undercut());
    }

    /**
     * The root form circle from the simulated rack (where its tip rounding meets the straight flank,
     * found as a support point of the transverse ellipse) equals the engineering core's
     * {@code InvoluteGear.rootFormDiameterMm} (DIN 3960 form from the straight-flank height,
     * derived there) on every gear without undercut; with undercut, where the simulated tip rounding's
     * path crosses the involute. Fixed-seed loop over gears, tooth systems, helix angles and shifts.
     */
    @Test
    void rootFormCircleAgreesWithTheEngineeringCore() {
        java.util.SplittableRandom random = new java.util.SplittableRandom(3L);
        List<String> systems = List.of("iso53-a", "iso53-b", "iso53-c", "iso53-d", "agma-coarse", "full-depth-14.5");
        for (int n = 0; n < 60; n++) {
            String system = systems.get(random.nextInt(systems.size()));
            GearSpec g = new GearSpec("t", 10 + random.nextInt(80), new Pitch.Module(0.5 + 4 * random.nextDouble()),
                    system.equals("full-depth-14.5") ? 14.5 : 20, random.nextBoolean() ? 0 : 35 * random.nextDouble(),
                    org.hobwright.api.job.Hand.LEFT, 10, -0.5 + random.nextDouble(), -0.04 * random.nextDouble(), system,
                    Optional.empty(), OptionalDouble.empty(), OptionalDouble.empty(), OptionalInt.empty(),
                    org.hobwright.api.job.DrawingValues.NONE);
            ToothSystem ts = ToothSystem.of(g).orElseThrow();
            ToothSpaceSimulation sim = GeneratingSimulation.run(GeneratingSimulation.setupOf(Jobs.job(g, 1, 12),
                    GearGeometry.of(g, ts), 0.05));
            double engineering = org.hobwright.wizard.geometry.InvoluteGear.of(g, ts).rootFormDiameterMm();
            NominalPath path = new NominalPath(sim.setup());
            if (path.rollAtFlankEnd >= 0) {
                assertEquals(engineering, sim.rootFormDiameterMm(), 1e-9 * engineering, g.teeth() + " teeth, " + system);
            } else if (path.crossing) {
                assertEquals(engineering, 2 * path.involuteStartRadius, 1e-8 * engineering,
                        g.teeth() + " teeth, " + system + ", undercut");
            } else {
                assertTrue(engineering >= sim.rootFormDiameterMm(), "undercut by the straight flank alone");
            }
        }
    }
}
