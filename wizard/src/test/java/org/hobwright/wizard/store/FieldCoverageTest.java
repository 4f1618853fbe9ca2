package org.hobwright.wizard.store;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Optional;
import java.util.OptionalDouble;
import java.util.OptionalInt;
import java.util.Set;
import java.util.TreeSet;
import org.hobwright.api.job.CycleSettings;
import org.hobwright.api.job.DrawingValues;
import org.hobwright.api.job.FieldDef;
import org.hobwright.api.job.GearSpec;
import org.hobwright.api.job.Hand;
import org.hobwright.api.job.HobJob;
import org.hobwright.api.job.HobSpec;
import org.hobwright.api.job.HobbingMethod;
import org.hobwright.api.job.JobFields;
import org.hobwright.api.job.MachineFields;
import org.hobwright.api.job.Pitch;
import org.hobwright.api.job.QualityTargets;
import org.hobwright.api.job.SplineHobProfile;
import org.hobwright.api.job.SplineSpec;
import org.hobwright.api.job.ToothProportions;
import org.hobwright.api.job.Units;
import org.hobwright.api.testkit.SampleJobs;
import org.junit.jupiter.api.Test;
import tools.jackson.databind.JsonNode;

/**
 * Every field of the table is written by {@link JobWriter} and read back by the readers: a field
 * added to the table and not to the writer or the reader fails here. The thickness series replaces
 * both allowances, so it has a job of its own.
 */
class FieldCoverageTest {
    /** A job with every optional value given (the custom tooth system, every drawing value). */
    static HobJob full() {
        DrawingValues drawing = new DrawingValues(OptionalDouble.of(40), OptionalDouble.of(44), OptionalDouble.of(35),
                OptionalDouble.of(4.5), OptionalInt.of(3), OptionalDouble.of(15.3), OptionalDouble.of(3.5),
                OptionalDouble.of(46.1));
        GearSpec gear = new GearSpec("part 1", 20, new Pitch.Module(2), 20, 10, Hand.LEFT, 20, 0.1, -0.05, "custom",
                Optional.of(new ToothProportions(1, 1.25, 0.3)), OptionalDouble.of(44.5), OptionalDouble.of(3.5),
                OptionalInt.of(7), drawing, OptionalDouble.of(-0.1), Optional.empty(),
                Optional.of(new org.hobwright.api.job.MatingGear(31, OptionalDouble.of(0.2), OptionalDouble.of(52),
                        -0.04, OptionalDouble.of(-0.12))));
        HobSpec hob = new HobSpec(new Pitch.Module(2), 20, 1, Hand.LEFT, 60, OptionalDouble.of(2.1),
                OptionalDouble.of(55), 12, 60, OptionalDouble.of(3000), "carbide")
                .withCuttingSense(Optional.of(org.hobwright.api.job.CuttingSense.COUNTER_CLOCKWISE))
                .withIdentifier(Optional.of("H-17"));
        CycleSettings cycle = new CycleSettings("brass", OptionalDouble.of(80), OptionalDouble.of(1),
                OptionalDouble.of(0.5), OptionalDouble.of(1.5), 0.2, HobbingMethod.CONVENTIONAL, 2, 3, false,
                new QualityTargets(OptionalDouble.of(2), OptionalDouble.of(3), OptionalDouble.of(0.1)), 0.5, 10, true)
                .withRun(new org.hobwright.api.job.RunSettings(50, OptionalInt.of(1234), OptionalInt.of(7), true,
                        OptionalDouble.of(8)));
        var machine = SampleJobs.machine(true).withTimes(new org.hobwright.api.job.MachineTimes(OptionalDouble.of(20),
                OptionalDouble.of(10), OptionalDouble.of(5), OptionalDouble.of(2), OptionalDouble.of(600)))
                .withPhasedSync(true).withClockwiseTeethTowardChuck(true);
        return new HobJob("full", Units.MM, gear, hob, machine, cycle);
    }

    private static Set<String> leaves(JsonNode n, String path, Set<String> out) {
        n.properties().forEach(e -> {
            String p = path.isEmpty() ? e.getKey() : path + "." + e.getKey();
            if (e.getValue().isObject()) {
                leaves(e.getValue(), p, out);
            } else {
                out.add(p);
            }
        });
        return out;
    }

    /**
     * A spline job with every optional value given: the DIN 5480 reference diameter, the drawing's
     * deviation and tolerances, the spline hob's root, tip radius and addendum.
     */
    static HobJob fullSpline() {
        HobJob gearJob = full();
        GearSpec frame = new GearSpec("shaft 2", 18, new Pitch.Module(1.25), 30, 0, Hand.RIGHT, 16, 0, 0,
                SplineParts.TOOTH_SYSTEM, Optional.empty(), OptionalDouble.of(24.8), OptionalDouble.of(2.5),
                OptionalInt.empty(), DrawingValues.NONE);
        SplineSpec spline = new SplineSpec("din5480", "fillet", 8, "f", OptionalDouble.of(25), OptionalDouble.of(-0.03),
                OptionalDouble.of(0.05), OptionalDouble.of(0.02));
        HobSpec hob = gearJob.hob().withPitch(new Pitch.Module(1.25)).withPressureAngleDeg(30)
                .withSplineProfile(Optional.of(new SplineHobProfile("fillet", 0.3, OptionalDouble.of(0.7))));
        return gearJob.withName("full-spline").withGear(frame).withHob(hob).withSpline(Optional.of(spline));
    }

    /** The keys a gear job has not: the spline's, the spline hob's, the part word (a gear is the default). */
    private static boolean splineOnly(FieldDef f) {
        return f == JobFields.PART || f.key().startsWith("spline.") || f == JobFields.HOB_ROOT
                || f == JobFields.HOB_TIP_RADIUS || f == JobFields.HOB_ADDENDUM;
    }

    /** Every key of the table a job of {@code part} writes when it gives every value. */
    private static Set<String> expected(boolean spline) {
        Set<String> expected = new TreeSet<>(Set.of("format", "version"));
        for (FieldDef f : JobFields.all()) {
            boolean otherPart = spline ? f.key().startsWith("gear.") : splineOnly(f);
            if (!otherPart && f != JobFields.GEAR_DIAMETRAL_PITCH && f != JobFields.HOB_DIAMETRAL_PITCH
                    && f != JobFields.SPLINE_DIAMETRAL_PITCH && f != JobFields.CYCLE_TEMPLATE
                    && f != JobFields.MACHINE && f != JobFields.GEAR_THICKNESS_SERIES) {
                expected.add(f.key());
            }
        }
        for (FieldDef f : MachineFields.all()) {
            if (f != MachineFields.UNITS && f != MachineFields.DESCRIPTION) {
                expected.add("machine." + f.key());
            }
        }
        return expected;
    }

    private static void writtenAndReadBack(HobJob job, boolean spline) {
        JsonNode tree = JobWriter.jobTree(job, Units.MM, false);
        Set<String> written = leaves(tree, "", new TreeSet<>());
        assertEquals(expected(spline), written);
        Loaded<HobJob> back = new JobReader(Library.open(Optional.empty(), java.util.Map.of(),
                java.nio.file.Path.of("no-home"))).read(tree, job.name());
        assertEquals(java.util.List.of(), back.findings());
        StoreTesting.assertClose(job, back.get(), 1e-12, "job");
    }

    @Test
    void everyJobFieldIsWrittenAndReadBack() {
        writtenAndReadBack(full(), false);
    }

    @Test
    void everySplineJobFieldIsWrittenAndReadBack() {
        writtenAndReadBack(fullSpline(), true);
    }

    @Test
    void theThicknessSeriesIsWrittenInsteadOfTheAllowancesAndReadBack() {
        HobJob job = full();
        HobJob series = job.withGear(job.gear().withThicknessSeries(Optional.of("din3967-cd25")));
        JsonNode tree = JobWriter.jobTree(series, Units.MM, false);
        assertEquals("din3967-cd25", tree.get("gear").get("thicknessSeries").asString());
        assertEquals(null, tree.get("gear").get("thicknessAllowance"));
        assertEquals(null, tree.get("gear").get("thicknessAllowanceLower"));
        Loaded<HobJob> back = new JobReader(Library.open(Optional.empty(), java.util.Map.of(),
                java.nio.file.Path.of("no-home"))).read(tree, "full");
        assertEquals(Optional.of("din3967-cd25"), back.get().gear().thicknessSeries());
    }
}
