package org.hobwright.post.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.hobwright.api.check.Finding;
import org.hobwright.api.cycle.HobCycle;
import org.hobwright.api.spi.WriteContext;
import org.hobwright.api.spi.WriteResult;
import org.hobwright.post.Fixtures;
import org.hobwright.post.Fixtures.Fixture;
import org.hobwright.post.GoldenFiles;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/** The JSON report: the contract pointers listed in post/README.md, job units, unrounded numbers. */
class ReportWriterTest {

    /** The pointers post/README.md ("The JSON report") lists as a contract. */
    static final List<String> CONTRACT = List.of("/gear/referenceDiameter", "/gear/baseDiameter",
            "/gear/tipDiameter", "/gear/rootDiameter", "/gear/wholeDepth", "/gear/toothThickness",
            "/inspection/spanTeeth", "/inspection/spanWidth", "/inspection/pinDiameter", "/inspection/overPins",
            "/setup/leadAngle", "/setup/swivelAngle", "/setup/swivelAngleDms", "/setup/swivelDirection",
            "/cycle/hobRpm", "/cycle/workRpm", "/cycle/axialFeed", "/cycle/passes", "/cycle/approachLength",
            "/cycle/overrunLength", "/cycle/cuttingTime", "/cycle/feedMarkDepth", "/cycle/envelopingDepth",
            "/batch/parts", "/batch/cycleTime", "/batch/timePerPart", "/batch/batchTime", "/findings");

    static List<Fixture> fixtures() {
        return Fixtures.all();
    }

    static JsonNode report(Fixture f) {
        WriteResult r = new ReportWriter().write(f.cycle(), f.plainContext());
        assertEquals(f.job().name() + ".report.json", r.files().get(0).fileName());
        return JsonMapper.builder().build().readTree(r.files().get(0).text());
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("fixtures")
    void matchesGoldenFile(Fixture f) {
        GoldenFiles.check(f.id() + ".report.json",
                new ReportWriter().write(f.cycle(), f.plainContext()).files().get(0).text());
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("fixtures")
    void hasEveryContractPointer(Fixture f) {
        JsonNode n = report(f);
        for (String p : CONTRACT) {
            assertFalse(n.at(p).isMissingNode(), p);
        }
        assertTrue(n.at("/setup/swivelAngleDms").isString());
        for (JsonNode finding : n.at("/findings")) {
            for (String key : List.of("severity", "code", "field", "message", "source")) {
                assertTrue(finding.get(key).isString(), key);
            }
        }
    }

    @Test
    void helicalValuesAreTheWorkedExampleUnrounded() {
        JsonNode n = report(Fixtures.helicalMetric());
        // FORMULAS.md §1.5 (ISO 21771), §4.2, §5.1, check cases 3, 27, 30
        assertEquals(62.1166, n.at("/gear/referenceDiameter").asDouble());
        assertEquals(13.2368, n.at("/setup/swivelAngle").asDouble());
        assertEquals("13° 14′ 12.4″", n.at("/setup/swivelAngleDms").asString());
        assertEquals(9.09457, n.at("/cycle/workRpm").asDouble());
        // FORMULAS.md §7.3, check case 36: t_h = 3.29603 min for L 44.964 mm, f_a 1.5, n₀ 272.837, z₂ 30
        assertEquals(3.29603 * 60, n.at("/cycle/cuttingTime").asDouble(), 0.01);
        assertEquals(1, n.at("/cycle/passes").asInt());
        assertEquals(18.1330, n.at("/cycle/approachLength").asDouble());
        assertEquals(2.94570, n.at("/cycle/feedMarkDepth").asDouble());
        assertEquals(0.494308, n.at("/setup/differential").asDouble());
        // quality values in µm everywhere: the fixture gives the simulation's closed-form enveloping depth
        // (in mm, 0.000258687) and the cycle's prediction (in µm, 0.258687) as the same quantity
        assertEquals(n.at("/cycle/envelopingDepth").asDouble(), n.at("/simulation/closedFormEnvelopingDepth").asDouble(),
                1e-9);
        assertEquals(0.26, n.at("/simulation/envelopingDepth").asDouble(), 1e-9);
        assertEquals(1.2, n.at("/simulation/profileDeviationMax").asDouble(), 1e-9);
        assertTrue(n.at("/simulation/undercut").isBoolean());
        assertEquals("mm", n.at("/units/length").asString());
    }

    @Test
    void inchJobReportsInches() {
        JsonNode n = report(Fixtures.spurInch());
        assertEquals("in", n.at("/units/length").asString());
        // FORMULAS.md §1.5: P 32, N 40 fine pitch scaled to N 32: D = 1.000 in, root Ø D − 2 × 0.0395 in
        assertEquals(1.0, n.at("/gear/referenceDiameter").asDouble(), 1e-12);
        assertEquals(0.921, n.at("/gear/rootDiameter").asDouble(), 1e-12);
        // Machinery's Handbook wire table (FORMULAS.md §3.2): 34.4130 in over 1.728 in wires for 32 T, 1 DP, so 34.4130 / 32 in at 32 DP
        assertEquals(34.4130 / 32, n.at("/inspection/overPins").asDouble(), 1e-12);
        assertEquals(0.02, n.at("/cycle/axialFeed").asDouble(), 1e-12);
        // unrounded: exactly the millimetre value divided by 25.4
        assertEquals(23.868192567962073 / 25.4, n.at("/gear/baseDiameter").asDouble());
        // cutting speed in ft/min: 80 m/min / 0.3048 m/ft
        assertEquals(80 / 0.3048, n.at("/setup/cuttingSpeed").asDouble(), 1e-9);
        assertTrue(n.at("/simulation").isMissingNode(), "no simulation in this cycle");
    }

    @Test
    void reportWithErrorsOnlyWhenAsked() {
        Fixture f = Fixtures.spurMetric();
        HobCycle c = f.cycle();
        HobCycle bad = new HobCycle(c.gear(), c.inspection(), c.tolerances(), c.setup(), List.of(), c.summary(),
                c.simulation(), List.of(Finding.error("GEAR_UNDERCUT", "gear.teeth", "undercut", "more teeth", "FORMULAS.md §2.3")));
        assertTrue(new ReportWriter().write(bad, f.plainContext()).files().isEmpty());
        Map<String, String> res = new HashMap<>();
        res.put(ReportWriter.WITH_ERRORS, "true");
        WriteResult r = new ReportWriter().write(bad, new WriteContext(f.job(), Fixtures.DATE, "t", res));
        JsonNode n = JsonMapper.builder().build().readTree(r.files().get(0).text());
        assertEquals("error", n.at("/findings/0/severity").asString());
        assertEquals("GEAR_UNDERCUT", n.at("/findings/0/code").asString());
        assertEquals("more teeth", n.at("/findings/0/fix").asString());
    }
}
