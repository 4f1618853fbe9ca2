package org.hobwright.post.nc;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.hobwright.api.check.Finding;
import org.hobwright.api.cycle.CycleStep;
import org.hobwright.api.job.Units;
import org.hobwright.api.spi.WriteContext;
import org.hobwright.api.spi.WriteResult;
import org.hobwright.post.Fixtures;
import org.hobwright.post.Fixtures.Fixture;
import org.hobwright.post.GoldenFiles;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * The program for each shipped dialect and each fixture: byte for byte against the golden file,
 * then read back by {@link NcReader} to check the safety invariants on the words as written and
 * that every coordinate, feed, speed and angle is the cycle's value at the dialect's precision,
 * rounded the safe way.
 */
class NcWriterTest {

    static Stream<Arguments> cases() {
        List<Arguments> out = new ArrayList<>();
        for (Fixture f : Fixtures.all()) {
            for (String d : f.dialects()) {
                out.add(Arguments.of(d, f));
            }
        }
        return out.stream();
    }

    private static String program(String dialect, Fixture f) {
        WriteResult r = new NcWriter().write(f.cycle(), f.context(dialect));
        assertFalse(Finding.anyError(r.findings()), () -> "no errors: " + r.findings());
        assertEquals(1, r.files().size());
        assertEquals(f.job().name() + ".nc", r.files().get(0).fileName());
        return r.files().get(0).text();
    }

    @ParameterizedTest(name = "{0} {1}")
    @MethodSource("cases")
    void matchesGoldenFile(String dialect, Fixture f) {
        GoldenFiles.check(f.id() + "." + dialect + ".nc", program(dialect, f));
    }

    @ParameterizedTest(name = "{0} {1}")
    @MethodSource("cases")
    void safetyInvariantsHoldOnTheText(String dialect, Fixture f) {
        String text = program(dialect, f);
        NcReader.assertSafe(text, Fixtures.dialectText(dialect), NcReader.Limits.of(f.job(), f.cycle()));
        List<NcReader.Block> blocks = new NcReader(Fixtures.dialectText(dialect)).blocks(text);
        assertTrue(blocks.stream().filter(b -> b.is("feed")).count() > 0, "the program has feed moves");
        assertTrue(blocks.stream().allMatch(b -> b.template().isPresent()), "every block comes from a template");
        assertTrue(text.toUpperCase(java.util.Locale.ROOT).contains("GUARDS CLOSED"), "cautions in the program");
    }

    /**
     * Every number is the cycle's at the dialect's precision, rounded in its safe direction:
     * positions within one unit of the last decimal, radial ones never closer to the work axis and
     * axial ones never closer to the blank than planned; speeds, feeds, swivel and helical
     * addition to the nearest (none of these fixtures sits at a limit).
     */
    @ParameterizedTest(name = "{0} {1}")
    @MethodSource("cases")
    void everyValueIsTheCyclesRoundedTheSafeWay(String dialect, Fixture f) {
        NcReader reader = new NcReader(Fixtures.dialectText(dialect));
        List<NcReader.Block> blocks = reader.blocks(program(dialect, f));
        Units u = f.job().units();
        int ld = reader.decimals(lengthKey(f));
        int fd = reader.decimals(u == Units.MM ? "mmPerRev" : "inPerRev");
        List<NcReader.Block> moves = blocks.stream().filter(b -> b.is("rapid") || b.is("feed")).toList();
        List<CycleStep> steps = f.cycle().steps().stream()
                .filter(s -> s instanceof CycleStep.Rapid || s instanceof CycleStep.Feed).toList();
        assertEquals(steps.size(), moves.size(), "one block per move");
        double face = u.fromMm(f.job().gear().faceWidthMm());
        for (int i = 0; i < steps.size(); i++) {
            NcReader.Block b = moves.get(i);
            double dia;
            double axial;
            if (steps.get(i) instanceof CycleStep.Rapid r) {
                assertTrue(b.is("rapid"), b.text());
                dia = r.diameterMm();
                axial = r.axialMm();
            } else {
                CycleStep.Feed fs = (CycleStep.Feed) steps.get(i);
                assertTrue(b.is("feed"), b.text());
                dia = fs.diameterMm();
                axial = fs.axialMm();
                near(u.fromMm(fs.feedMmPerRev()), b.number("feed"), fd, b);
            }
            outward(radialValue(reader, u.fromMm(dia)), reader.sign("radial") * b.number("radial"), ld, b);
            double planned = u.fromMm(axial);
            double read = reader.sign("axial") * b.number("axial");
            outward(2 * planned < face ? -planned : planned, 2 * planned < face ? -read : read, ld, b);
        }
        f.cycle().steps().stream().filter(CycleStep.Swivel.class::isInstance).map(CycleStep.Swivel.class::cast)
                .forEach(s -> {
                    NcReader.Block b = blocks.stream().filter(x -> x.is("swivel")).findFirst().orElseThrow();
                    near(s.machineAngleDeg(), b.number("swivel"), reader.decimals("deg"), b);
                });
        CycleStep.SyncOn on = f.cycle().steps().stream().filter(CycleStep.SyncOn.class::isInstance)
                .map(CycleStep.SyncOn.class::cast).findFirst().orElseThrow();
        NcReader.Block sync = blocks.stream().filter(b -> b.is(helical(f) ? "syncOnHelix" : "syncOn")).findFirst()
                .orElseThrow();
        near(on.hobTurns(), sync.number("hobTurns"), 0, sync);
        near(on.workTurns(), sync.number("workTurns"), 0, sync);
        near(on.hobRpm(), sync.number("hobRpm"), reader.decimals("rpm"), sync);
        NcReader.Block work = blocks.stream().filter(b -> b.is("workSpindle")).findFirst().orElseThrow();
        near(on.workRpm(), work.number("workRpm"), reader.decimals("rpm"), work);
        if (helical(f)) {
            near(on.differentialDegPerMm() * u.toMm(1), sync.number("differential"), reader.decimals("differential"),
                    sync);
        }
    }

    @ParameterizedTest(name = "{0} {1}")
    @MethodSource("cases")
    void programIsInTheJobsUnits(String dialect, Fixture f) {
        NcReader reader = new NcReader(Fixtures.dialectText(dialect));
        List<NcReader.Block> blocks = reader.blocks(program(dialect, f));
        boolean inch = f.job().units() == Units.IN;
        assertEquals(1, blocks.stream().filter(b -> b.is(inch ? "unitsIn" : "unitsMm")).count(), "units word");
        assertEquals(0, blocks.stream().filter(b -> b.is(inch ? "unitsMm" : "unitsIn")).count(),
                "no word of the other unit");
    }

    private static boolean helical(Fixture f) {
        return !f.job().gear().isSpur();
    }

    private static String lengthKey(Fixture f) {
        return f.job().units() == Units.MM ? "mm" : "in";
    }

    /** The radial value the dialect programs for a diameter (the diameter, or the radius), unsigned. */
    private static double radialValue(NcReader reader, double diameter) {
        return reader.radialIsDiameter() ? diameter : diameter / 2;
    }

    /** Equal at the dialect precision: within half a unit of the last decimal (rounding). */
    private static void near(double expected, double actual, int decimals, NcReader.Block b) {
        double tol = 0.5 * Math.pow(10, -decimals) * (1 + 1e-9);
        assertTrue(Math.abs(expected - actual) <= tol, () -> "line " + b.line() + " \"" + b.text() + "\": expected "
                + expected + " at " + decimals + " decimals, read " + actual);
    }

    /** Rounded up (away from the safe side's limit): not below the value, less than one unit above it. */
    private static void outward(double planned, double actual, int decimals, NcReader.Block b) {
        double unit = Math.pow(10, -decimals);
        assertTrue(actual >= planned - 1e-9 * Math.max(1, Math.abs(planned)) && actual < planned + unit,
                () -> "line " + b.line() + " \"" + b.text() + "\": planned " + planned + ", written " + actual
                        + ", not rounded outward at " + decimals + " decimals");
    }

    /** One writer keeps loaded dialects by name and text: the same text writes the same program, a changed text is read anew. */
    @Test
    void aKeptDialectIsUsedOnlyForTheSameText() {
        Fixture f = Fixtures.all().get(0);
        String dialect = Fixtures.dialects().stream()
                .filter(d -> Fixtures.dialectText(d).contains("\"lineEnding\": \"lf\"")).findFirst().orElseThrow();
        NcWriter writer = new NcWriter();
        String first = writer.write(f.cycle(), f.context(dialect)).files().get(0).text();
        assertEquals(first, writer.write(f.cycle(), f.context(dialect)).files().get(0).text());
        String crlf = Fixtures.dialectText(dialect).replace("\"lineEnding\": \"lf\"", "\"lineEnding\": \"crlf\"");
        WriteContext changed = new WriteContext(f.job(), "2026-12-01", "0.1.0-test",
                java.util.Map.of(WriteContext.DIALECT, crlf, WriteContext.DIALECT_NAME, dialect));
        String second = writer.write(f.cycle(), changed).files().get(0).text();
        assertFalse(first.contains("\r"));
        assertEquals(first.replace("\n", "\r\n"), second);
    }
}
