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

    @Test
    void everyJobFieldIsWrittenAndReadBack() {
        JsonNode tree = JobWriter.jobTree(full(), Units.MM, false);
        Set<String> written = leaves(tree, "", new TreeSet<>());
        Set<String> expected = new TreeSet<>(Set.of("format", "version"));
        for (FieldDef f : JobFields.all()) {
            if (f != JobFields.GEAR_DIAMETRAL_PITCH && f != JobFields.HOB_DIAMETRAL_PITCH
                    && f != JobFields.CYCLE_TEMPLATE && f != JobFields.MACHINE
                    && f != JobFields.GEAR_THICKNESS_SERIES) {
                expected.add(f.key());
            }
        }
        for (FieldDef f : MachineFields.all()) {
            if (f != MachineFields.UNITS && f != MachineFields.DESCRIPTION) {
                expected.add("machine." + f.key());
            }
        }
        assertEquals(expected, written);
        Loaded<HobJob> back = new JobReader(Library.open(Optional.empty(), java.util.Map.of(),
                java.nio.file.Path.of("no-home"))).read(tree, "full");
        assertEquals(java.util.List.of(), back.findings());
        StoreTesting.assertClose(full(), back.get(), 1e-12, "job");
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
