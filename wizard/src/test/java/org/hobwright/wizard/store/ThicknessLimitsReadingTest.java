package org.hobwright.wizard.store;

import static org.hobwright.wizard.store.StoreTesting.SCENARIO;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;
import java.util.OptionalDouble;
import org.hobwright.api.check.Finding;
import org.hobwright.api.job.HobJob;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import tools.jackson.databind.json.JsonMapper;
import tools.jackson.databind.node.ObjectNode;

/**
 * The job's lower tooth-thickness allowance, tolerance series and mating gear as the reader takes them: the
 * values, and a finding (never an exception) for what cannot be right.
 */
class ThicknessLimitsReadingTest {
    @TempDir
    Path home;
    JobReader reader;

    @BeforeEach
    void setUp() {
        reader = new JobReader(Library.open(Optional.of(home)));
    }

    private ObjectNode sample() throws Exception {
        return (ObjectNode) JsonMapper.shared().readTree(Files.readString(SCENARIO.resolve(
                "jobs/metering-pump-gear.json")));
    }

    private static ObjectNode gear(ObjectNode job) {
        return (ObjectNode) job.get("gear");
    }

    private static Finding onlyError(Loaded<HobJob> loaded) {
        assertFalse(loaded.ok(), "an error was expected");
        return loaded.findings().stream().filter(Finding::isError).findFirst().orElseThrow();
    }

    @Test
    void theLowerAllowanceIsRead() throws Exception {
        ObjectNode job = sample();
        gear(job).put("thicknessAllowanceLower", -0.08);
        Loaded<HobJob> loaded = reader.read(job, "job");
        assertTrue(loaded.ok(), loaded::errorLine);
        assertEquals(OptionalDouble.of(-0.08), loaded.get().gear().thicknessAllowanceLowerMm());
        assertEquals(-0.03, loaded.get().gear().thicknessAllowanceMm());
    }

    @Test
    void aLowerAllowanceAboveTheUpperIsAConflictNamingBoth() throws Exception {
        ObjectNode job = sample();
        gear(job).put("thicknessAllowanceLower", 0.02);
        Finding f = onlyError(reader.read(job, "job"));
        assertEquals("INPUT_CONFLICT", f.code());
        assertTrue(f.message().contains("thicknessAllowanceLower") && f.message().contains("thicknessAllowance"),
                f::line);
        assertTrue(f.fix().orElseThrow().contains("swap"), f::line);
    }

    // DIN 3967:1978-08 (tables from memory): d = 24 mm lies in the range above 10 up to 50 mm, where series cd
    // gives A_sne = −54 µm and tolerance series 25 T_sn = 30 µm, so A_sni = −84 µm.
    @Test
    void aSeriesGivesBothAllowancesForTheReferenceDiameter() throws Exception {
        ObjectNode job = sample();
        gear(job).remove("thicknessAllowance");
        gear(job).put("thicknessSeries", "DIN3967-cd25");
        Loaded<HobJob> loaded = reader.read(job, "job");
        assertTrue(loaded.ok(), loaded::errorLine);
        assertEquals(-0.054, loaded.get().gear().thicknessAllowanceMm(), 1e-12);
        assertEquals(-0.084, loaded.get().gear().thicknessAllowanceLowerMm().getAsDouble(), 1e-12);
        assertEquals(Optional.of("din3967-cd25"), loaded.get().gear().thicknessSeries());
    }

    @Test
    void aSeriesBesideTheDrawingsAllowancesIsAConflict() throws Exception {
        ObjectNode job = sample();
        gear(job).put("thicknessSeries", "din3967-cd25");
        Finding f = onlyError(reader.read(job, "job"));
        assertEquals("INPUT_CONFLICT", f.code());
        assertTrue(f.message().contains("thicknessSeries"), f::line);
    }

    @Test
    void anUnknownSeriesSaysWhatASeriesLooksLike() throws Exception {
        ObjectNode job = sample();
        gear(job).remove("thicknessAllowance");
        gear(job).put("thicknessSeries", "din3967-z99");
        Finding f = onlyError(reader.read(job, "job"));
        assertEquals("INPUT_CHOICE", f.code());
        assertTrue(f.fix().orElseThrow().contains("din3967-cd25"), f::line);
    }

    @Test
    void theMateIsReadWithItsOptionalValues() throws Exception {
        ObjectNode job = sample();
        ObjectNode mate = gear(job).putObject("mate");
        mate.put("teeth", 40);
        mate.put("centreDistance", 32.2);
        mate.put("thicknessAllowance", -0.04);
        Loaded<HobJob> loaded = reader.read(job, "job");
        assertTrue(loaded.ok(), loaded::errorLine);
        var m = loaded.get().gear().mate().orElseThrow();
        assertEquals(40, m.teeth());
        assertEquals(OptionalDouble.of(32.2), m.centreDistanceMm());
        assertEquals(OptionalDouble.empty(), m.profileShift());
        assertEquals(-0.04, m.thicknessAllowanceMm());
    }

    @Test
    void aMateWithoutTeethIsAMissingValue() throws Exception {
        ObjectNode job = sample();
        gear(job).putObject("mate").put("centreDistance", 32.2);
        Finding f = onlyError(reader.read(job, "job"));
        assertEquals("INPUT_MISSING", f.code());
        assertEquals("gear.mate.teeth", f.field());
    }
}
