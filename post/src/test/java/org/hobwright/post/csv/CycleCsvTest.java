package org.hobwright.post.csv;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.SplittableRandom;
import org.hobwright.api.check.Finding;
import org.hobwright.api.cycle.CycleStep;
import org.hobwright.api.cycle.Rotation;
import org.hobwright.api.spi.WriteResult;
import org.hobwright.post.Fixtures;
import org.hobwright.post.Fixtures.Fixture;
import org.hobwright.post.GoldenFiles;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/** The cycle CSV: golden files, exact round trip, RFC 4180 form, units in the headers, reader findings. */
class CycleCsvTest {

    static List<Fixture> fixtures() {
        return Fixtures.all();
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("fixtures")
    void matchesGoldenFile(Fixture f) {
        WriteResult r = new CsvWriter().write(f.cycle(), f.plainContext());
        assertEquals(f.job().name() + ".csv", r.files().get(0).fileName());
        GoldenFiles.check(f.id() + ".csv", r.files().get(0).text());
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("fixtures")
    void roundTripIsExact(Fixture f) {
        CycleCsv.Read back = CycleCsv.read(CycleCsv.write(f.cycle().steps()));
        assertTrue(back.findings().isEmpty(), back.findings()::toString);
        assertEquals(f.cycle().steps(), back.steps());
    }

    @Test
    void roundTripIsExactForRandomSteps() {
        // fixed seed, so a failure can be replayed
        SplittableRandom random = new SplittableRandom(20261201L);
        for (int run = 0; run < 200; run++) {
            List<CycleStep> steps = new ArrayList<>();
            for (int i = 0; i < 50; i++) {
                steps.add(randomStep(random));
            }
            String text = CycleCsv.write(steps);
            CycleCsv.Read back = CycleCsv.read(text);
            assertEquals(steps, back.steps(), () -> "run with text:\n" + text);
        }
    }

    @Test
    void commentsWithCommasQuotesAndNonAsciiAreQuotedByRfc4180() {
        List<CycleStep> steps = List.of(new CycleStep.Comment("Pass 1, \"finish\" at 13° 14′"),
                new CycleStep.Dwell(1.5));
        String text = CycleCsv.write(steps);
        assertTrue(text.contains(",\"Pass 1, \"\"finish\"\" at 13° 14′\"\r\n"), text);
        List<List<String>> rows = Rfc4180.parse(text);
        assertEquals(3, rows.size());
        rows.forEach(r -> assertEquals(CsvColumn.values().length, r.size(), r::toString));
        assertEquals("Pass 1, \"finish\" at 13° 14′", rows.get(1).get(CsvColumn.TEXT.ordinal()));
        assertEquals(steps, CycleCsv.read(text).steps());
    }

    @Test
    void everyRowEndsWithCrlfAndNumbersUseAPointUnderADecimalCommaLocale() {
        Locale before = Locale.getDefault();
        try {
            Locale.setDefault(Locale.GERMANY);
            String text = CycleCsv.write(Fixtures.helicalMetric().cycle().steps());
            assertEquals(CycleCsv.write(Fixtures.helicalMetric().cycle().steps()), text);
            assertFalse(text.replace("\r\n", "").contains("\n"), "no bare line feeds");
            for (List<String> row : Rfc4180.parse(text).subList(1, Rfc4180.parse(text).size())) {
                for (CsvColumn c : List.of(CsvColumn.DIAMETER_MM, CsvColumn.AXIAL_MM, CsvColumn.TIME_S)) {
                    String cell = row.get(c.ordinal());
                    assertTrue(cell.isEmpty() || cell.matches("-?\\d+(\\.\\d+)?"), () -> c + ": " + cell);
                }
            }
        } finally {
            Locale.setDefault(before);
        }
    }

    @Test
    void headerNamesCarryTheirUnits() {
        List<String> header = Rfc4180.parse(CycleCsv.write(List.of())).get(0);
        List<String> unitless = List.of("format_version", "step_no", "kind", "pass_no", "cutting", "hob_turns",
                "work_turns", "hob_rotation", "work_rotation", "coolant", "text", "radial_axis", "axial_axis",
                "swivel_axis", "swivel_programmable");
        for (String h : header) {
            assertTrue(unitless.contains(h) || h.matches(".*_(mm|s|rpm|deg|deg_per_mm|mm_per_rev)"), h);
        }
        assertEquals(CsvColumn.values().length, header.size());
    }

    /**
     * The hob centre on the dialect's axes, computed by hand: the hob tip reaches a work diameter of
     * 30 mm with a 32 mm hob, so its centre is 30/2 + 32/2 = 31 mm from the work axis. The
     * sliding-headstock lathe's dialect programs X in diameter (62) and counts Z negative toward
     * the chuck (5 mm into the face → −5); the turret lathe's programs X as a radius (31). A manual
     * swivel holder gets its row, without an axis letter, and so does a swivel on a dialect without a swivel
     * axis.
     */
    @Test
    void machineColumnsPutTheHobCentreOnTheDialectsAxes() {
        List<CycleStep> steps = List.of(new CycleStep.Swivel(-1.9, 0, false), new CycleStep.Swivel(13.2, 0, true),
                new CycleStep.Feed(1, 30, 5, 0.5, true, 12, 32), new CycleStep.Rapid(1, 30, 5, 1));
        Fixtures.Fixture f = Fixtures.spurMetric();
        List<List<String>> varrow = Rfc4180.parse(new CsvWriter().write(withSteps(f, steps), f.context("varrow-ctl"))
                .files().get(0).text());
        List<List<String>> ottmere = Rfc4180.parse(new CsvWriter().write(withSteps(f, steps),
                f.context("ottmere-ctl")).files().get(0).text());
        List<String> h = varrow.get(0);
        assertEquals("false", varrow.get(1).get(h.indexOf("swivel_programmable")));
        assertEquals("", varrow.get(1).get(h.indexOf("swivel_axis")));
        assertEquals("true", varrow.get(2).get(h.indexOf("swivel_programmable")));
        assertEquals("", varrow.get(2).get(h.indexOf("swivel_axis")), "the Varrow dialect has no swivel axis");
        assertEquals("32", varrow.get(3).get(h.indexOf("hob_tip_diameter_mm")));
        assertEquals("31", varrow.get(3).get(h.indexOf("hob_centre_radius_mm")));
        assertEquals("X", varrow.get(3).get(h.indexOf("radial_axis")));
        assertEquals("62", varrow.get(3).get(h.indexOf("radial_value_mm")));
        assertEquals("Z", varrow.get(3).get(h.indexOf("axial_axis")));
        assertEquals("-5", varrow.get(3).get(h.indexOf("axial_value_mm")));
        assertEquals("31", ottmere.get(3).get(h.indexOf("radial_value_mm")));
        assertEquals("A", ottmere.get(2).get(h.indexOf("swivel_axis")));
        assertEquals("", varrow.get(4).get(h.indexOf("hob_centre_radius_mm")), "a step without the hob's size");
        assertEquals("2", varrow.get(4).get(h.indexOf("format_version")));
    }

    private static org.hobwright.api.cycle.HobCycle withSteps(Fixtures.Fixture f, List<CycleStep> steps) {
        org.hobwright.api.cycle.HobCycle c = f.cycle();
        return new org.hobwright.api.cycle.HobCycle(c.gear(), c.inspection(), c.tolerances(), c.setup(), steps,
                c.summary(), c.simulation(), c.findings(), c.plannedFor());
    }

    @Test
    void readerNamesLineAndColumnOfBadCells() {
        String good = CycleCsv.write(Fixtures.spurMetric().cycle().steps());
        String[] lines = good.split("\r\n");
        lines[5] = lines[5].replaceFirst(",48,", ",\"48,5\",");
        Finding f = CycleCsv.read(String.join("\r\n", lines) + "\r\n").findings().get(0);
        assertTrue(f.message().contains("line 6") && f.message().contains("diameter_mm"), f.message());
    }

    @Test
    void readerRefusesAnotherVersionAndMissingColumns() {
        String good = CycleCsv.write(Fixtures.spurMetric().cycle().steps());
        String v3 = good.replace("\r\n2,3,", "\r\n3,3,");
        assertTrue(CycleCsv.read(v3).findings().get(0).message().contains("format_version 3"));
        String noText = good.replace(",text\r\n", ",txt\r\n");
        Finding f = CycleCsv.read(noText).findings().get(0);
        assertTrue(f.message().contains("\"text\" is missing"), f.message());
        assertTrue(CycleCsv.read(noText).steps().isEmpty());
    }

    private static CycleStep randomStep(SplittableRandom r) {
        double s = r.nextDouble() * 100;
        return switch (r.nextInt(10)) {
            case 0 -> new CycleStep.Comment("note " + r.nextInt(1000) + ", \"q\"");
            case 1 -> new CycleStep.Coolant(r.nextBoolean());
            case 2 -> new CycleStep.Swivel(r.nextDouble(-45, 45), s, r.nextBoolean());
            case 3 -> new CycleStep.SyncOn(1 + r.nextInt(10), 1 + r.nextInt(200), r.nextDouble(50, 6000),
                    r.nextDouble(1e-3, 100), r.nextBoolean() ? Rotation.CLOCKWISE : Rotation.COUNTER_CLOCKWISE,
                    r.nextBoolean() ? Rotation.CLOCKWISE : Rotation.COUNTER_CLOCKWISE, r.nextDouble(-2, 2) * 1e-3, s);
            case 4 -> new CycleStep.SyncOff(s);
            case 5 -> new CycleStep.SpindlesStop(s);
            case 6 -> new CycleStep.Dwell(s);
            case 7 -> new CycleStep.HobShift(r.nextDouble() * 1e-5, s);
            case 8 -> new CycleStep.Rapid(r.nextInt(4), r.nextDouble(0, 500), r.nextDouble(-1e3, 1e3) * 1e-7, s,
                    r.nextBoolean() ? 0 : r.nextDouble(5, 200));
            default -> new CycleStep.Feed(r.nextInt(4), r.nextDouble(0, 500), r.nextDouble(-300, 300),
                    r.nextDouble(1e-4, 5), r.nextBoolean(), s, r.nextBoolean() ? 0 : r.nextDouble(5, 200));
        };
    }
}
