package org.hobwright.wizard.spline;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.hobwright.api.check.Finding;
import org.hobwright.api.cycle.HobCycle;
import org.hobwright.api.cycle.SplineData;
import org.hobwright.api.job.HobJob;
import org.hobwright.api.job.Units;
import org.hobwright.wizard.plan.DefaultCyclePlanner;
import org.hobwright.wizard.store.JobReader;
import org.hobwright.wizard.store.JobWriter;
import org.hobwright.wizard.store.Library;
import org.hobwright.wizard.store.Loaded;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Spline jobs through reading, analysis and planning: the sample jobs plan, their limits are the
 * standard's (the same numbers {@link SplineLimits} gives for the drawing), and a spline that the hob or
 * the machine cannot make gets findings and no steps.
 */
class SplineJobsTest {
    private static final Path JOBS = Path.of("..", "samples", "scenario", "jobs");

    @TempDir
    Path home;

    private Loaded<HobJob> read(String json) {
        return new JobReader(Library.open(Optional.of(home))).read(json, "test.json");
    }

    private static String sample(String name) throws Exception {
        return Files.readString(JOBS.resolve(name));
    }

    @Test
    void metricSampleJobPlansWithTheStandardsLimits() throws Exception {
        HobJob job = read(sample("drive-shaft-spline-1605.json")).value().orElseThrow();
        assertEquals("spline", job.part());
        HobCycle cycle = new DefaultCyclePlanner().plan(job);
        assertFalse(cycle.hasErrors(), cycle.findings().toString());
        assertFalse(cycle.steps().isEmpty());
        SplineData d = cycle.spline().orElseThrow();
        SplineLimits l = Splines.limits(Splines.iso(18, 1, 30, SplineRoot.FLAT, 5, "h").withLength(16));
        assertEquals(l.majorDiameterMaxMm(), d.majorDiameterMaxMm(), 1e-12);
        assertEquals(l.minorDiameterMinMm(), d.minorDiameterMinMm(), 1e-12);
        assertEquals(l.formDiameterMm(), d.formDiameterMm(), 1e-12);
        assertEquals(l.toothThicknessMaxMm(), d.toothThicknessMaxMm(), 1e-12);
        assertEquals(l.toothThicknessMinMm(), d.toothThicknessMinMm(), 1e-12);
        assertTrue(d.form().orElseThrow().formReached());
        // the planner feeds to the root the hob cuts at the middle of the tolerance
        assertEquals(d.form().get().rootDiameterMm(), cycle.setup().orElseThrow().finalInfeedDiameterMm(), 1e-9);
        assertEquals(d.form().get().rootDiameterMm(), cycle.gear().orElseThrow().rootDiameterMm(), 1e-9);
        assertEquals(l.majorDiameterMaxMm(), cycle.gear().get().tipDiameterMm(), 1e-9, "tip of the equivalent gear");
    }

    @Test
    void splinesAreCutSlowerThanTheGearRowByTheTypicalSplineRule() throws Exception {
        HobJob job = read(sample("drive-shaft-spline-1605.json")).value().orElseThrow();
        HobCycle cycle = new DefaultCyclePlanner().plan(job);
        assertFalse(cycle.hasErrors(), cycle.findings().toString());
        // the built-in row for the gear of the same material, hob material and module
        var gearRow = org.hobwright.wizard.store.CuttingDataTable.builtIn()
                .find(job.cycle().workMaterial(), job.hob().material(), job.gear().moduleMm()).orElseThrow();
        double speed = cycle.setup().orElseThrow().cuttingSpeedMPerMin();
        assertTrue(speed <= 0.9 * gearRow.cuttingSpeed().max() + 1e-9 && speed >= 0.9 * gearRow.cuttingSpeed().min()
                - 1e-9, "speed " + speed + " within 0.9 × the gear row " + gearRow.cuttingSpeed());
        var splineRow = gearRow.forSplines();
        assertEquals(0.8 * gearRow.roughFeed().max(), splineRow.roughFeed().max(), 1e-12);
        assertTrue(splineRow.status().contains("typical"), "marked as typical values: " + splineRow.status());
    }

    @Test
    void inchSampleReadsThePitchAsTheStandardWritesIt() throws Exception {
        HobJob job = read(sample("reel-shaft-spline-4008.json")).value().orElseThrow();
        assertEquals(Units.IN, job.units());
        assertEquals(25.4 / 16, job.gear().moduleMm(), 1e-12);
        HobCycle cycle = new DefaultCyclePlanner().plan(job);
        assertFalse(cycle.hasErrors(), cycle.findings().toString());
        assertEquals(1.92 / 16 * 25.4, cycle.spline().orElseThrow().pinDiameterMm(), 1e-12);
    }

    @Test
    void splineJobsSurviveAWriteAndARead() throws Exception {
        for (String name : List.of("drive-shaft-spline-1605.json", "reel-shaft-spline-4008.json")) {
            HobJob job = read(sample(name)).value().orElseThrow();
            HobJob again = read(JobWriter.jobText(job, job.units(), true)).value().orElseThrow();
            assertEquals(job.spline(), again.spline(), name);
            assertEquals(job.hob().splineProfile(), again.hob().splineProfile(), name);
            assertEquals(job.gear().teeth(), again.gear().teeth(), name);
            assertEquals(job.gear().moduleMm(), again.gear().moduleMm(), 1e-12, name);
        }
    }

    @Test
    void badSplineInputIsAFindingNamingTheField() throws Exception {
        String metric = sample("drive-shaft-spline-1605.json");
        assertCode(read(metric.replace("\"module\": 1.0,\n    \"pressureAngle\": 30,\n    \"root\": \"flat\",\n    \"toleranceClass\"",
                "\"diametralPitch\": \"16/30\",\n    \"pressureAngle\": 30,\n    \"root\": \"flat\",\n    \"toleranceClass\"")),
                "INPUT_VALUE", "spline.diametralPitch");
        assertCode(read(metric.replace("\"part\": \"spline\",", "\"part\": \"spline\",\n  \"gear\": {},")),
                "INPUT_CONFLICT", "gear");
        assertCode(read(metric.replace("\"standard\": \"iso4156\"", "\"standard\": \"iso-4156\"")), "INPUT_CHOICE",
                "spline.standard");
        assertCode(read(metric.replace("\"part\": \"spline\",", "")), "INPUT_MISSING", "gear");
    }

    @Test
    void aHobThatCannotMakeTheSplineGetsFindingsNotAProgram() throws Exception {
        String metric = sample("drive-shaft-spline-1605.json");
        assertPlanError(metric.replace("\"root\": \"flat\",\n    \"tipRadius\": 0.2", "\"root\": \"fillet\",\n    \"tipRadius\": 0.4"),
                "SPLINE_HOB_ROOT_FORM");
        assertPlanError(metric.replace("\"tipRadius\": 0.2,", "\"tipRadius\": 0.45,"), "SPLINE_FORM_NOT_REACHED");
        assertPlanError(metric.replace("\"tipRadius\": 0.2,", "\"tipRadius\": 0.2,\n    \"addendum\": 0.95,"),
                "SPLINE_ROOT_BELOW_MINOR");
        assertPlanError(metric.replace("\"root\": \"flat\",\n    \"tipRadius\": 0.2,\n", ""), "SPLINE_HOB_NOT_SPLINE");
        assertPlanError(metric.replace("\"outsideDiameter\": 32", "\"outsideDiameter\": 45"), "MACHINE_HOB_TOO_LARGE");
        assertPlanError(metric.replace("\"pressureAngle\": 30,\n    \"root\": \"flat\",\n    \"tipRadius\"",
                "\"pressureAngle\": 37.5,\n    \"root\": \"flat\",\n    \"tipRadius\""), "SPLINE_HOB_PRESSURE_ANGLE");
    }

    private void assertPlanError(String json, String code) {
        Loaded<HobJob> job = read(json);
        assertTrue(job.value().isPresent(), job.findings().toString());
        HobCycle cycle = new DefaultCyclePlanner().plan(job.value().get());
        assertTrue(cycle.hasErrors(), code);
        assertTrue(cycle.steps().isEmpty(), code);
        assertTrue(Splines.codes(cycle.findings()).contains(code), code + " in " + cycle.findings());
    }

    private static void assertCode(Loaded<HobJob> loaded, String code, String field) {
        List<Finding> found = new ArrayList<>(loaded.findings());
        assertTrue(found.stream().anyMatch(f -> f.code().equals(code) && f.field().equals(field)),
                code + " at " + field + " in " + found);
    }
}
