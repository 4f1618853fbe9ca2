package org.hobwright.samples.e2e;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The report of a spline job has every /spline pointer post/README.md documents and /simulation/formReached,
 * with lengths in the job's units: the inch sample's values are the millimetre values of the same spline
 * divided by 25.4 (the 16/32 spline of 15 teeth: D = 15/16 in, D_ee max = 16/16 in, pin 1.92/16 in).
 */
class SplineReportTest {
    static final List<String> POINTERS = List.of("/spline/pitchDiameter", "/spline/baseDiameter",
            "/spline/majorDiameterMax", "/spline/majorDiameterMin", "/spline/minorDiameterMax",
            "/spline/minorDiameterMin", "/spline/formDiameter", "/spline/toothThicknessMax",
            "/spline/toothThicknessMin", "/spline/pinDiameter", "/spline/overPinsMax", "/spline/overPinsMin");

    @Test
    void inchSplineReportInInches(@TempDir Path work) {
        PlanRun run = PlanRun.of("reel-shaft-spline-4008.json", work);
        assertEquals(0, run.exitCode(), run.describe());
        for (String p : POINTERS) {
            assertTrue(run.number(p) > 0, p);
        }
        assertTrue(run.json().at("/simulation/formReached").asBoolean(), "formReached");
        assertEquals("in", run.json().at("/units/length").asString());
        assertEquals(15.0 / 16, run.number("/spline/pitchDiameter"), 1e-12);
        assertEquals(16.0 / 16, run.number("/spline/majorDiameterMax"), 1e-12);
        assertEquals(1.92 / 16, run.number("/spline/pinDiameter"), 1e-12);
        assertTrue(run.number("/spline/overPinsMax") > run.number("/spline/overPinsMin"));
    }

    @Test
    void metricSplineSheetAndProgramSaySpline(@TempDir Path work) throws Exception {
        PlanRun run = PlanRun.of("drive-shaft-spline-1605.json", work);
        assertEquals(0, run.exitCode(), run.describe());
        assertEquals("spline", run.json().at("/partKind").asString());
        String sheet = Files.readString(run.file(".html"));
        assertTrue(sheet.contains("Spline hobbing setup sheet") && sheet.contains("Form ⌀ D_Fe"), "sheet");
        assertTrue(Files.readString(run.file(".nc")).toUpperCase(java.util.Locale.ROOT).contains("SPLINE ISO4156 Z 18"),
                "program header");
    }
}
