package org.hobwright.wizard.store;

import static org.hobwright.wizard.store.StoreTesting.RESOURCES;
import static org.hobwright.wizard.store.StoreTesting.SCENARIO;
import static org.hobwright.wizard.store.StoreTesting.assertClose;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import org.hobwright.api.check.Finding;
import org.hobwright.api.job.Hand;
import org.hobwright.api.job.HobJob;
import org.hobwright.api.job.HobbingMethod;
import org.hobwright.api.job.Pitch;
import org.hobwright.api.job.Units;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import tools.jackson.databind.json.JsonMapper;
import tools.jackson.databind.node.ObjectNode;

class JobReaderTest {
    @TempDir
    Path home;
    JobReader reader;

    @BeforeEach
    void setUp() {
        reader = new JobReader(Library.open(Optional.of(home)));
    }

    private static String sampleJob() throws Exception {
        return Files.readString(SCENARIO.resolve("jobs/metering-pump-gear.json"));
    }

    @Test
    void readsTheSampleJobAsWritten() {
        Loaded<HobJob> loaded = reader.read(SCENARIO.resolve("jobs/metering-pump-gear.json"));
        assertTrue(loaded.ok(), loaded::errorLine);
        HobJob job = loaded.get();
        // values as the sample file states them (mm file: no conversion)
        assertEquals("metering-pump-gear", job.name());
        assertEquals(Units.MM, job.units());
        assertEquals(24, job.gear().teeth());
        assertEquals(new Pitch.Module(1.0), job.gear().pitch());
        assertEquals(-0.03, job.gear().thicknessAllowanceMm());
        assertEquals(Hand.RIGHT, job.gear().hand(), "spur gear without hand reads as right hand");
        assertEquals("varrow-1605", job.machine().name());
        // the built-in machine's swivel resolution is written "0°5'": 5/60 degree
        assertEquals(5.0 / 60, job.machine().swivel().resolutionDeg(), 1e-12);
        assertEquals(HobbingMethod.CLIMB, job.cycle().method());
    }

    @Test
    void inchAndMetricFilesOfTheSameGearGiveTheSameJob() {
        // 1 in = 25.4 mm and 1 ft = 0.3048 m exactly (international yard and pound agreement, 1959);
        // 0°5' = 5/60 degree and "1 30" = 1.5 degrees (sexagesimal angle, definition)
        HobJob inch = reader.read(RESOURCES.resolve("instrument-gear-in.json")).get();
        HobJob metric = reader.read(RESOURCES.resolve("instrument-gear-mm.json")).get();
        assertEquals(Units.IN, inch.units());
        assertEquals(Units.MM, metric.units());
        assertClose(metric, inch, 1e-9, "job", "units");
        assertEquals(6.35, inch.gear().faceWidthMm(), 1e-12);
        assertEquals(30.48, inch.cycle().cuttingSpeedMPerMin().getAsDouble(), 1e-12);
        assertEquals(10160, inch.machine().rapidMmPerMin(), 1e-9);
    }

    @Test
    void degreesMinutesSecondsAreAngles() {
        HobJob inch = reader.read(RESOURCES.resolve("instrument-gear-in.json")).get();
        assertEquals(15.0, inch.gear().helixAngleDeg(), 1e-12);
        assertEquals(1.5, inch.hob().leadAngleDeg().getAsDouble(), 1e-12);
        assertEquals(Hand.LEFT, inch.gear().hand());
    }

    @Test
    void aTemplateFillsOnlyTheKeysTheJobLeavesOut() throws Exception {
        // the sample job states workMaterial, method and coolant; brass-fine gives speeds, feeds and targets
        String json = sampleJob().replace("\"workMaterial\": \"steel-free-machining\",",
                "\"template\": \"brass-fine\", \"workMaterial\": \"steel-free-machining\", \"roughFeed\": 0.8,");
        HobJob job = reader.read(json, "job.json").get();
        assertEquals("steel-free-machining", job.cycle().workMaterial(), "the job's own key wins");
        assertEquals(0.8, job.cycle().roughFeedMmPerRev().getAsDouble(), "the job's own key wins");
        assertEquals(80, job.cycle().cuttingSpeedMPerMin().getAsDouble(), "from the template");
        assertEquals(0.6, job.cycle().finishFeedMmPerRev().getAsDouble(), "from the template");
        assertEquals(3.0, job.cycle().targets().envelopingDepthUm().getAsDouble(), "from the template");
    }

    @Test
    void aMetricTemplateIsConvertedForAnInchJob() throws Exception {
        // brass-fine is in mm: 80 m/min, 1.0 mm/rev; an inch job reads them as the same physical values
        String json = Files.readString(RESOURCES.resolve("instrument-gear-in.json"))
                .replace("\"machine\": {", "\"machine\": \"varrow-1605\", \"unused\": {")
                .replace("\"cuttingSpeed\": 100,", "\"template\": \"brass-fine\",")
                .replace("\"roughFeed\": 0.02,", "");
        ObjectNode tree = (ObjectNode) JsonMapper.shared().readTree(json);
        tree.remove("unused");
        HobJob job = reader.read(tree, "inch-job").get();
        assertEquals(80, job.cycle().cuttingSpeedMPerMin().getAsDouble(), 1e-9);
        assertEquals(1.0, job.cycle().roughFeedMmPerRev().getAsDouble(), 1e-9);
        assertEquals(0.254, job.cycle().finishFeedMmPerRev().getAsDouble(), 1e-12, "the job's own 0.01 in");
    }

    @Test
    void overridesReplaceMachineAndTemplate(@TempDir Path dir) throws Exception {
        Loaded<HobJob> byName = reader.read(SCENARIO.resolve("jobs/metering-pump-gear.json"),
                new JobReader.Overrides(Optional.of("ottmere-4008"), Optional.of("steel-production")));
        assertTrue(byName.ok(), byName::errorLine);
        assertEquals("ottmere-4008", byName.get().machine().name());
        assertEquals(20, byName.get().cycle().hobShiftEveryParts(), "from the ottmere template");

        Path file = dir.resolve("my-machine.json");
        Files.writeString(file, Files.readString(SCENARIO.resolve("machines/ottmere-4008.json"))
                .replace("\"ottmere-4008\"", "\"my-machine\""));
        Loaded<HobJob> byFile = reader.read(SCENARIO.resolve("jobs/metering-pump-gear.json"),
                new JobReader.Overrides(Optional.of(file.toString()), Optional.empty()));
        assertTrue(byFile.ok(), byFile::errorLine);
        assertEquals("my-machine", byFile.get().machine().name());

        Loaded<HobJob> unknown = reader.read(SCENARIO.resolve("jobs/metering-pump-gear.json"),
                new JobReader.Overrides(Optional.of("no-such-machine"), Optional.empty()));
        assertTrue(unknown.unreadable());
        assertEquals("LIBRARY_NOT_FOUND", unknown.findings().get(0).code());
    }

    @Test
    void valueProblemsAreFindingsNamingTheFieldAndLine() throws Exception {
        String json = sampleJob().replace("\"teeth\": 24", "\"teeth\": 0").replace("\"module\": 1.0,\n    \"pressureAngle\": 20,\n    \"helixAngle\"",
                "\"module\": 0,\n    \"pressureAngle\": \"abc\",\n    \"helixAngle\"");
        Loaded<HobJob> loaded = reader.read(json, "pump.json");
        assertFalse(loaded.unreadable(), "bad values are job errors, not unreadable input");
        assertTrue(loaded.value().isEmpty());
        assertFinding(loaded.findings(), "INPUT_VALUE", "gear.teeth", "pump.json:9:");
        assertFinding(loaded.findings(), "INPUT_VALUE", "gear.module", "pump.json:10:");
        assertFinding(loaded.findings(), "INPUT_ANGLE", "gear.pressureAngle", "pump.json:11:");
    }

    @Test
    void anInMemoryTreeIsCheckedLikeAFile() throws Exception {
        ObjectNode tree = (ObjectNode) JsonMapper.shared().readTree(sampleJob());
        tree.remove("format");
        tree.remove("version");
        assertTrue(reader.read(tree, "wizard").ok(), "format and version may be left out of a tree");
        ((ObjectNode) tree.get("gear")).put("faceWidth", Double.NaN);
        ((ObjectNode) tree.get("hob")).put("module", Double.POSITIVE_INFINITY);
        Loaded<HobJob> loaded = reader.read(tree, "wizard");
        assertFinding(loaded.findings(), "INPUT_VALUE", "gear.faceWidth", "finite");
        assertFinding(loaded.findings(), "INPUT_VALUE", "hob.module", "finite");
    }

    @Test
    void unknownKeyNamesKeyFileAndLine() throws Exception {
        String json = sampleJob().replace("\"teeth\": 24,", "\"teeth\": 24,\n    \"colour\": \"blue\",");
        Loaded<HobJob> loaded = reader.read(json, "pump.json");
        assertFalse(loaded.unreadable(), "a wrong key is an error of a readable job (exit 1)");
        assertTrue(loaded.value().isEmpty());
        Finding f = loaded.findings().get(0);
        assertEquals("INPUT_UNKNOWN_KEY", f.code());
        assertEquals("gear.colour", f.field());
        assertTrue(loaded.errorLine().startsWith("pump.json:10: unknown key \"colour\" in gear"), loaded.errorLine());
        assertTrue(loaded.errorLine().contains("teeth"), "lists the allowed keys: " + loaded.errorLine());
    }

    @Test
    void anOlderJobVersionIsMigrated() {
        Loaded<HobJob> loaded = reader.read(RESOURCES.resolve("old-job-v0.json"));
        assertTrue(loaded.ok(), loaded::errorLine);
        assertEquals(2, loaded.get().hob().starts(), "threads → starts");
        assertEquals(1.0, loaded.get().gear().moduleMm(), "normalModule → module");
        assertFinding(loaded.findings(), "INPUT_MIGRATED", "version", "version 0");
    }

    static void assertFinding(List<Finding> findings, String code, String field, String messagePart) {
        assertTrue(findings.stream().anyMatch(f -> f.code().equals(code) && f.field().equals(field)
                        && f.message().contains(messagePart)),
                () -> "expected " + code + " " + field + " containing \"" + messagePart + "\" in " + findings);
    }
}
