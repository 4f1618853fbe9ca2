package org.hobwright.wizard.plan;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.stream.Stream;
import org.hobwright.api.cycle.CycleStep;
import org.hobwright.api.cycle.HobCycle;
import org.hobwright.api.cycle.Rotation;
import org.hobwright.api.job.CuttingSense;
import org.hobwright.api.job.CycleSettings;
import org.hobwright.api.job.HobJob;
import org.hobwright.api.job.HobSpec;
import org.hobwright.api.job.HobbingMethod;
import org.hobwright.api.job.MachineProfile;
import org.hobwright.api.job.RunSettings;
import org.hobwright.wizard.store.JobReader;
import org.hobwright.wizard.store.Library;
import org.hobwright.wizard.store.Loaded;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The hob's sense of rotation and the feed direction against the physical situation, computed here
 * with 3-D vectors in a frame of the machine (not the planner's frame): a hob head above, below or
 * beside the work, its drive end on either side, the hob swivelled. For every sample job, planned
 * with climb and with conventional hobbing, with a hob cutting either way, mounted normally or
 * turned round on its arbor:
 * <ul>
 * <li>the hob spindle turns so that the hob cuts (its own cutting sense seen from its own drive end);</li>
 * <li>climb: the hob teeth at the contact move against the hob's feed relative to the work;
 *     conventional: with it (R. P. Phillips, "Design and Selection of Hobs", Gear Technology, glossary);</li>
 * <li>the work turns with the hob's thread like a worm wheel: the gear tooth at the contact moves
 *     with the thread pattern of the turning hob, found by following a point of the hob's thread
 *     helix numerically (a nut on a turning screw), not from the planner's rule.</li>
 * </ul>
 */
class CuttingDirectionTest {

    /** Work axis out of the front face (away from the chuck). */
    private static final double[] W = {0, 0, 1};

    /** One physical hob head: direction from the work axis to the hob centre, hob axis from the drive end. */
    private record Head(String name, double[] toHob, double[] driveToHob) {
    }

    private static List<Head> heads() {
        return List.of(new Head("above, drive end toward the operator", new double[] {0, 1, 0}, new double[] {-1, 0, 0}),
                new Head("above, drive end away from the operator", new double[] {0, 1, 0}, new double[] {1, 0, 0}),
                new Head("beside, drive end down", new double[] {1, 0, 0}, new double[] {0, 1, 0}),
                new Head("below, drive end toward the operator", new double[] {0, -1, 0}, new double[] {-1, 0, 0}));
    }

    private static List<HobJob> sampleJobs(Path home) throws IOException {
        List<HobJob> out = new ArrayList<>();
        JobReader reader = new JobReader(Library.open(Optional.of(home)));
        try (Stream<Path> files = Files.list(Path.of("..", "samples", "scenario", "jobs"))) {
            for (Path p : files.sorted().toList()) {
                Loaded<HobJob> j = reader.read(p, new JobReader.Overrides(Optional.empty(), Optional.empty()));
                j.value().ifPresent(out::add);
            }
        }
        return out;
    }

    @Test
    void everySampleJobCutsWithTheHobsSenseAndFeedsForTheMethod(@TempDir Path home) throws IOException {
        int planned = 0;
        for (HobJob base : sampleJobs(home)) {
            for (Head head : heads()) {
                for (HobbingMethod method : HobbingMethod.values()) {
                    for (CuttingSense sense : CuttingSense.values()) {
                        for (boolean turnedRound : new boolean[] {false, true}) {
                            HobJob job = variant(base, head, method, sense, turnedRound);
                            HobCycle c = new DefaultCyclePlanner().plan(job);
                            if (c.hasErrors()) {
                                continue;
                            }
                            planned++;
                            check(job, head, c, method, sense, turnedRound);
                        }
                    }
                }
            }
        }
        assertTrue(planned >= 5 * 4 * 8, "most sample jobs plan in every variant, planned " + planned);
    }

    private static void check(HobJob job, Head head, HobCycle c, HobbingMethod method, CuttingSense sense,
                              boolean turnedRound) {
        String what = job.name() + ", head " + head.name() + ", " + method + ", hob cutting " + sense
                + (turnedRound ? ", turned round" : "");
        CycleStep.SyncOn on = c.steps().stream().filter(CycleStep.SyncOn.class::isInstance)
                .map(CycleStep.SyncOn.class::cast).findFirst().orElseThrow();
        // the hob axis tilted by the swivel about the radial direction (the sign of the tilt does not matter)
        double eta = Math.toRadians(c.setup().orElseThrow().swivelAngleDeg());
        double[] h = rotate(head.driveToHob(), head.toHob(), eta);
        // the spindle's angular velocity, clockwise seen from the drive end looking along +h
        double[] omega = scale(h, on.hobRotation() == Rotation.CLOCKWISE ? 1 : -1);
        // the hob's own drive end: the spindle's, or the other end when the hob is turned round
        double[] hobOwnAxis = turnedRound ? scale(h, -1) : h;
        double ownSense = dot(omega, hobOwnAxis);
        assertEquals(sense == CuttingSense.CLOCKWISE, ownSense > 0, what + ": the hob turns in its cutting sense");

        double[] toothAtContact = cross(omega, scale(head.toHob(), -1));
        for (CycleStep.Feed f : cuttingFeeds(c.steps())) {
            double[] feedDirection = scale(W, -Math.signum(f.axialMm() - previousAxial(c.steps(), f)));
            double v = dot(toothAtContact, feedDirection);
            assertEquals(method == HobbingMethod.CLIMB, v < 0, what + ": climb = teeth against the feed");
        }

        double pattern = threadPatternVelocity(h, omega, job.hob().hand().sign(), head.toHob());
        // the gear tooth at the contact (r toward the hob) moves with the pattern: Ω w × r·toHob ∥ pattern
        double[] tangent = cross(W, head.toHob());
        double omegaWork = pattern * dot(h, tangent);
        Rotation work = omegaWork < 0 ? Rotation.CLOCKWISE : Rotation.COUNTER_CLOCKWISE;
        assertEquals(work, on.workRotation(), what + ": the work turns like a worm wheel with the hob's thread");
    }

    /**
     * Velocity along +h of the point where a thread of the hob crosses the line from the hob centre to
     * the work, for a hob of hand {@code hand} turning with angular velocity {@code omega}, found
     * numerically: the thread is x(φ) = r(cos φ e₁ + sin φ e₂) + hand·(L/2π)·φ·h with e₁ toward the work
     * and e₁ × e₂ = h (a right-hand helix rises along +h as it turns counter-clockwise about +h); the
     * body turns by ω·t about h; bisection finds where the turned thread meets the contact line.
     */
    private static double threadPatternVelocity(double[] h, double[] omega, int hand, double[] toHob) {
        double dt = 1e-3;
        return (crossing(h, omega, hand, toHob, dt) - crossing(h, omega, hand, toHob, 0)) / dt;
    }

    /** Position along h, at time t, of the thread point that sits on the contact line. */
    private static double crossing(double[] h, double[] omega, int hand, double[] toHob, double t) {
        double[] e1 = scale(toHob, -1);
        double[] e2 = cross(h, e1);
        double angle = dot(omega, h) * t;
        double lo = -Math.PI / 2;
        double hi = Math.PI / 2;
        for (int i = 0; i < 80; i++) {
            double mid = (lo + hi) / 2;
            double side = dot(threadPoint(e1, e2, h, hand, mid, angle), e2);
            if (side > 0) {
                hi = mid;
            } else {
                lo = mid;
            }
        }
        return dot(threadPoint(e1, e2, h, hand, (lo + hi) / 2, angle), h);
    }

    private static double[] threadPoint(double[] e1, double[] e2, double[] h, int hand, double phi, double angle) {
        double lead = 1.0;
        double[] body = add(add(scale(e1, Math.cos(phi)), scale(e2, Math.sin(phi))), scale(h, hand * lead * phi / (2 * Math.PI)));
        return rotate(body, h, angle);
    }

    private static List<CycleStep.Feed> cuttingFeeds(List<CycleStep> steps) {
        return steps.stream().filter(s -> s instanceof CycleStep.Feed f && f.cutting()).map(CycleStep.Feed.class::cast)
                .toList();
    }

    private static double previousAxial(List<CycleStep> steps, CycleStep.Feed f) {
        double ax = Double.NaN;
        for (CycleStep s : steps) {
            if (s == f) {
                return ax;
            }
            if (s instanceof CycleStep.Rapid r) {
                ax = r.axialMm();
            } else if (s instanceof CycleStep.Feed g) {
                ax = g.axialMm();
            }
        }
        throw new AssertionError("feed not found");
    }

    private static HobJob variant(HobJob j, Head head, HobbingMethod method, CuttingSense sense, boolean turnedRound) {
        double[] clockwiseTeeth = cross(head.driveToHob(), scale(head.toHob(), -1));
        boolean towardChuck = dot(clockwiseTeeth, W) < 0;
        MachineProfile m = j.machine();
        MachineProfile machine = new MachineProfile(m.name(), m.dialect(), m.workMinRpm(), m.workMaxRpm(),
                m.hobMinRpm(), m.hobMaxRpm(), m.maxSyncRatio(), m.followsHelix(), m.swivel(), m.radialMinMm(),
                m.radialMaxMm(), m.axialMinMm(), m.axialMaxMm(), m.hobShiftTravelMm(), m.rapidMmPerMin(),
                m.maxFeedMmPerMin(), m.syncSettleS(), m.maxHobDiameterMm(), towardChuck, m.times(), m.phasedSync());
        HobSpec h = j.hob();
        HobSpec hob = new HobSpec(h.pitch(), h.pressureAngleDeg(), h.starts(), h.hand(), h.outsideDiameterMm(),
                h.leadAngleDeg(), h.referenceDiameterMm(), h.gashes(), h.lengthMm(), h.maxRpm(), h.material(),
                Optional.of(sense), h.identifier());
        CycleSettings c = j.cycle();
        RunSettings r = c.run();
        CycleSettings cycle = new CycleSettings(c.workMaterial(), c.cuttingSpeedMPerMin(), c.roughFeedMmPerRev(),
                c.finishFeedMmPerRev(), c.roughDepthMm(), c.finishStockMm(), method, c.axialClearanceMm(),
                c.radialClearanceMm(), c.coolant(), c.targets(), c.hobShiftPerPartMm(), c.hobShiftEveryParts(),
                c.fastest(), new RunSettings(r.batchSize(), r.programNumber(), r.toolStation(), turnedRound,
                r.hobLifePerToothM()));
        // a longer axial travel on both sides, so that conventional hobbing from the back face fits
        MachineProfile roomy = new MachineProfile(machine.name(), machine.dialect(), machine.workMinRpm(),
                machine.workMaxRpm(), machine.hobMinRpm(), machine.hobMaxRpm(), machine.maxSyncRatio(),
                machine.followsHelix(), machine.swivel(), machine.radialMinMm(), machine.radialMaxMm(), -200, 400,
                machine.hobShiftTravelMm(), machine.rapidMmPerMin(), machine.maxFeedMmPerMin(), machine.syncSettleS(),
                machine.maxHobDiameterMm(), machine.clockwiseTeethTowardChuck(), machine.times(), machine.phasedSync());
        assertFalse(j.name().isEmpty());
        return new HobJob(j.name(), j.units(), j.gear(), hob, roomy, cycle);
    }

    /** Rodrigues' rotation of v about the unit axis k by angle a. */
    private static double[] rotate(double[] v, double[] k, double a) {
        return add(add(scale(v, Math.cos(a)), scale(cross(k, v), Math.sin(a))), scale(k, dot(k, v) * (1 - Math.cos(a))));
    }

    private static double[] cross(double[] a, double[] b) {
        return new double[] {a[1] * b[2] - a[2] * b[1], a[2] * b[0] - a[0] * b[2], a[0] * b[1] - a[1] * b[0]};
    }

    private static double dot(double[] a, double[] b) {
        return a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
    }

    private static double[] scale(double[] a, double s) {
        return new double[] {a[0] * s, a[1] * s, a[2] * s};
    }

    private static double[] add(double[] a, double[] b) {
        return new double[] {a[0] + b[0], a[1] + b[1], a[2] + b[2]};
    }

    private static double[] sub(double[] a, double[] b) {
        return new double[] {a[0] - b[0], a[1] - b[1], a[2] - b[2]};
    }
}
