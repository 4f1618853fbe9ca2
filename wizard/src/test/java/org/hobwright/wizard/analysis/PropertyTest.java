package org.hobwright.wizard.analysis;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.OptionalInt;
import java.util.SplittableRandom;
import org.hobwright.api.check.Finding;
import org.hobwright.api.cycle.GearData;
import org.hobwright.api.cycle.InspectionData;
import org.hobwright.api.cycle.ToleranceData;
import org.hobwright.api.job.DrawingValues;
import org.hobwright.api.job.Hand;
import org.hobwright.api.job.Pitch;
import org.hobwright.api.job.ToothProportions;
import org.hobwright.api.testkit.SampleJobs;
import org.hobwright.wizard.geometry.GearGeometry;
import org.hobwright.wizard.geometry.InvoluteGear;
import org.hobwright.wizard.geometry.ToothSystem;
import org.hobwright.wizard.inspection.OverPins;
import org.hobwright.wizard.inspection.PinChoice;
import org.hobwright.wizard.inspection.SpanMeasurement;
import org.hobwright.wizard.setup.HobSetup;
import org.junit.jupiter.api.Test;

/** Fixed-seed property loops of 10,000 cases each; every failure message names the case. */
class PropertyTest {
    private static final int CASES = 10_000;

    // Random valid gears: tip > reference > root, base < reference, tooth thickness > 0; span over a fixed k and
    // over-pins with a fixed pin finite and increasing with the profile shift (geometric facts of involute gears).
    @Test
    void validGearsHaveConsistentGeometry() {
        SplittableRandom r = new SplittableRandom(1328);
        for (int i = 0; i < CASES; i++) {
            ToothSystem system = ToothSystem.BUILT_IN.get(r.nextInt(ToothSystem.BUILT_IN.size()));
            int z = r.nextInt(8, 301);
            double m = Math.exp(r.nextDouble(Math.log(0.1), Math.log(20)));
            double beta = r.nextBoolean() ? 0 : r.nextDouble(5, 40);
            double x = r.nextDouble(-0.4, 0.9);
            double e = -r.nextDouble(0, 0.05) * m;
            InvoluteGear g = new InvoluteGear(z, m, Math.toRadians(system.nominalPressureAngleDeg()),
                    Math.toRadians(beta), x, e, system);
            String c = "case " + i + ": " + g;
            GearData d = GearGeometry.of(g);
            assertTrue(d.tipDiameterMm() > d.referenceDiameterMm(), c);
            assertTrue(d.referenceDiameterMm() > d.rootDiameterMm(), c);
            assertTrue(d.baseDiameterMm() < d.referenceDiameterMm(), c);
            assertTrue(d.toothThicknessMm() > 0, c);
            int k = SpanMeasurement.of(g).teeth();
            double pin = PinChoice.ruleDiameter(g);
            double w = SpanMeasurement.widthMm(g, k);
            double mp = OverPins.of(g, pin).overPinsMm();
            double w2 = SpanMeasurement.widthMm(g.withProfileShift(x + 0.05), k);
            double mp2 = OverPins.of(g.withProfileShift(x + 0.05), pin).overPinsMm();
            assertTrue(Double.isFinite(w) && Double.isFinite(mp) && Double.isFinite(w2) && Double.isFinite(mp2), c);
            assertTrue(w2 > w, c + " span " + w + " → " + w2);
            assertTrue(mp2 > mp, c + " over pins " + mp + " → " + mp2);
        }
    }

    // Random jobs anywhere inside the api records' limits (the field table's ranges), many of them absurd: the
    // analysis never throws, never yields NaN or infinity, and an unknown tooth system always gets an error.
    @Test
    void randomInvalidJobsGiveFindingsNeverExceptions() {
        SplittableRandom r = new SplittableRandom(53);
        List<String> ids = new ArrayList<>(ToothSystem.ids());
        ids.add("no-such-system");
        int[] reached = new int[3];
        for (int i = 0; i < CASES; i++) {
            JobBuilder b = new JobBuilder();
            b.teeth = sane(r) ? r.nextInt(6, 201) : r.nextInt(5, 2001);
            double m = sane(r) ? Math.exp(r.nextDouble(Math.log(0.2), Math.log(10)))
                    : Math.exp(r.nextDouble(Math.log(0.0501), Math.log(99.9)));
            b.pitch = r.nextBoolean() ? new Pitch.Module(m) : new Pitch.Diametral(25.4 / m);
            b.pressureAngle = sane(r) ? 20 : r.nextDouble(10, 45);
            b.helix = r.nextInt(3) == 0 ? 0 : sane(r) ? r.nextDouble(0, 40) : r.nextDouble(0, 60);
            b.hand = r.nextBoolean() ? Hand.RIGHT : Hand.LEFT;
            b.faceWidth = sane(r) ? r.nextDouble(2, 50) * m : Math.exp(r.nextDouble(Math.log(1e-3), Math.log(1e4)));
            b.shift = sane(r) ? r.nextDouble(-0.5, 1) : r.nextDouble(-3, 3);
            b.allowance = sane(r) ? -Math.min(10, r.nextDouble(0, 0.05) * m) : r.nextDouble(-10, 10);
            b.system = ids.get(r.nextInt(ids.size()));
            if (b.system.equals(ToothSystem.CUSTOM)) {
                double add = r.nextDouble(0.3, 2);
                b.custom = Optional.of(new ToothProportions(add, r.nextDouble(add + 1e-6, 3), r.nextDouble(0, 1)));
            }
            double tip = (b.teeth / Math.cos(Math.toRadians(b.helix)) + 2) * m;
            b.blank = r.nextBoolean() ? OptionalDouble.empty()
                    : OptionalDouble.of(sane(r) ? tip * r.nextDouble(0.9, 1.1) : Math.exp(r.nextDouble(-5, 8)));
            b.pin = r.nextBoolean() ? OptionalDouble.empty()
                    : OptionalDouble.of(sane(r) ? r.nextDouble(1.2, 2.5) * m : Math.exp(r.nextDouble(-5, 5)));
            b.toleranceClass = r.nextBoolean() ? OptionalInt.empty() : OptionalInt.of(r.nextInt(1, 12));
            b.drawing = r.nextBoolean() ? DrawingValues.NONE : randomDrawing(r, tip);
            b.hobPitch = sane(r) ? b.pitch : new Pitch.Module(Math.exp(r.nextDouble(Math.log(0.0501), Math.log(99.9))));
            b.hobPressureAngle = sane(r) ? b.pressureAngle : r.nextDouble(10, 45);
            b.starts = r.nextInt(1, 13);
            b.hobHand = r.nextBoolean() ? Hand.RIGHT : Hand.LEFT;
            b.hobDiameter = sane(r) ? r.nextDouble(10, 40) * m : Math.exp(r.nextDouble(-3, 7));
            b.leadAngle = r.nextBoolean() ? OptionalDouble.empty() : OptionalDouble.of(r.nextDouble(0, 45));
            b.hobReference = r.nextBoolean() ? OptionalDouble.empty() : OptionalDouble.of(Math.exp(r.nextDouble(-3, 7)));
            b.machine = SampleJobs.machine(r.nextBoolean());
            String c = "case " + i;
            var job = b.build();
            JobAnalysis a;
            try {
                a = JobAnalyser.analyse(job);
            } catch (RuntimeException ex) {
                throw new AssertionError(c + " threw " + ex, ex);
            }
            assertFinite(a, c);
            reached[0] += a.gear().isPresent() ? 1 : 0;
            reached[1] += a.inspection().isPresent() ? 1 : 0;
            reached[2] += a.hobSetup().isPresent() ? 1 : 0;
            boolean implausible = b.system.equals("no-such-system");
            if (implausible) {
                assertTrue(a.hasErrors(), c + " has no error");
                assertTrue(a.gear().isEmpty(), c);
            }
        }
        assertReached(reached);
    }

    private static void assertReached(int[] reached) {
        String counts = "gear " + reached[0] + ", inspection " + reached[1] + ", setup " + reached[2];
        assertTrue(reached[0] > CASES / 10 && reached[1] > CASES / 20 && reached[2] > CASES / 20, counts);
    }

    /** Most values plausible, some absurd, so that both the checks and the deeper computations are reached. */
    private static boolean sane(SplittableRandom r) {
        return r.nextInt(10) < 8;
    }

    private static DrawingValues randomDrawing(SplittableRandom r, double scale) {
        return new DrawingValues(od(r, scale), od(r, scale), od(r, scale), od(r, scale / 10),
                r.nextBoolean() ? OptionalInt.empty() : OptionalInt.of(r.nextInt(1, 50)), od(r, scale / 5),
                od(r, scale / 20), od(r, scale));
    }

    private static OptionalDouble od(SplittableRandom r, double scale) {
        return r.nextBoolean() ? OptionalDouble.empty()
                : OptionalDouble.of(sane(r) ? scale * r.nextDouble(0.8, 1.2) : Math.exp(r.nextDouble(-5, 8)));
    }

    private static void assertFinite(JobAnalysis a, String c) {
        List<Double> values = new ArrayList<>();
        a.gear().ifPresent(g -> values.addAll(List.of(g.transverseModuleMm(), g.transversePressureAngleDeg(),
                g.referenceDiameterMm(), g.baseDiameterMm(), g.tipDiameterMm(), g.rootDiameterMm(), g.addendumMm(),
                g.dedendumMm(), g.wholeDepthMm(), g.baseHelixAngleDeg(), g.toothThicknessMm(), g.tipThicknessMm(),
                g.virtualTeeth(), g.leadMm().orElse(0))));
        a.inspection().ifPresent((InspectionData v) -> values.addAll(List.of(v.spanWidthMm(),
                v.spanContactDiameterMm(), v.pinDiameterMm(), v.overPinsMm(), v.chordalThicknessMm(),
                v.chordalHeightMm())));
        a.tolerances().ifPresent((ToleranceData t) -> values.addAll(List.of(t.singlePitchUm(), t.totalPitchUm(),
                t.profileTotalUm(), t.helixTotalUm())));
        a.hobSetup().ifPresent((HobSetup s) -> values.addAll(List.of(s.referenceDiameterMm(), s.leadAngleDeg(),
                s.swivelAngleDeg())));
        for (double v : values) {
            if (!Double.isFinite(v)) {
                fail(c + ": non-finite value in " + a);
            }
        }
        for (Finding f : a.findings()) {
            String text = f.line();
            assertFalse(text.contains("NaN") || text.contains("Infinity"), c + ": " + text);
        }
    }
}
