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
 * then read back by {@link NcReader} to check the safety invariants and that every coordinate,
 * feed, speed and angle equals the cycle's value at the dialect's precision.
 */
class NcWriterTest {

    static Stream<Arguments> cases() {
        List<Arguments> out = new ArrayList<>();
        for (String d : Fixtures.dialects()) {
            for (Fixture f : Fixtures.all()) {
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
        NcReader reader = new NcReader(Fixtures.dialectText(dialect));
        List<NcReader.Block> blocks = reader.blocks(text);
        int syncOn = index(blocks, reader.literalWords(helical(f) ? "syncOnHelix" : "syncOn", 0), true);
        int syncOff = index(blocks, reader.literalWords("syncOff", 0), true);
        int stop = index(blocks, reader.literalWords("spindlesStop", 0), true);
        List<Integer> feeds = feedBlocks(blocks, reader);
        assertFalse(feeds.isEmpty(), "the program has feed moves");
        assertTrue(syncOn < feeds.get(0), "sync on before the first cutting move");
        assertTrue(syncOff > feeds.get(feeds.size() - 1), "sync off after the last cutting move");
        assertTrue(syncOff < stop, "sync off before the spindles stop");
        double finalRadial = radialValue(reader, f.job().units().fromMm(
                f.cycle().setup().orElseThrow().finalInfeedDiameterMm()));
        double slack = 0.5 * Math.pow(10, -reader.decimals(lengthKey(f))) * (1 + 1e-9);
        for (int i : feeds) {
            double programmed = reader.sign("radial") * blocks.get(i).word(reader.letter("radial")).orElseThrow().value();
            assertTrue(programmed >= finalRadial - slack, () -> "no cut below the final diameter (at the dialect's "
                    + "precision): " + blocks.get(i).text());
        }
        int max = reader.dialect().get("maxLineLength").asInt();
        text.lines().forEach(l -> assertTrue(l.length() <= max, () -> "line within " + max + ": " + l));
        assertTrue(text.toUpperCase(java.util.Locale.ROOT).contains("GUARDS CLOSED"), "cautions in the program");
    }

    @ParameterizedTest(name = "{0} {1}")
    @MethodSource("cases")
    void everyValueEqualsTheCycleAtTheDialectPrecision(String dialect, Fixture f) {
        NcReader reader = new NcReader(Fixtures.dialectText(dialect));
        List<NcReader.Block> blocks = reader.blocks(program(dialect, f));
        Units u = f.job().units();
        int ld = reader.decimals(lengthKey(f));
        int fd = reader.decimals(u == Units.MM ? "mmPerRev" : "inPerRev");
        List<String> rapid = reader.literalWords("rapid", 0);
        List<String> feed = reader.literalWords("feed", 0);
        List<NcReader.Block> moves = blocks.stream().filter(b -> b.word(reader.letter("radial")).isPresent()
                && (b.has(rapid) || b.has(feed))).toList();
        List<CycleStep> steps = f.cycle().steps().stream()
                .filter(s -> s instanceof CycleStep.Rapid || s instanceof CycleStep.Feed).toList();
        assertEquals(steps.size(), moves.size(), "one block per move");
        for (int i = 0; i < steps.size(); i++) {
            NcReader.Block b = moves.get(i);
            double dia;
            double axial;
            if (steps.get(i) instanceof CycleStep.Rapid r) {
                assertTrue(b.has(rapid), b.text());
                dia = r.diameterMm();
                axial = r.axialMm();
            } else {
                CycleStep.Feed fs = (CycleStep.Feed) steps.get(i);
                assertTrue(b.has(feed), b.text());
                dia = fs.diameterMm();
                axial = fs.axialMm();
                near(u.fromMm(fs.feedMmPerRev()), b.word("F").orElseThrow().value(), fd, b);
            }
            near(reader.sign("radial") * radialValue(reader, u.fromMm(dia)),
                    b.word(reader.letter("radial")).orElseThrow().value(), ld, b);
            near(reader.sign("axial") * u.fromMm(axial), b.word(reader.letter("axial")).orElseThrow().value(), ld, b);
        }
        f.cycle().steps().stream().filter(CycleStep.Swivel.class::isInstance).map(CycleStep.Swivel.class::cast)
                .forEach(s -> {
                    NcReader.Block b = blocks.stream().filter(x -> x.word(reader.letter("swivel")).isPresent())
                            .findFirst().orElseThrow();
                    near(s.machineAngleDeg(), b.word(reader.letter("swivel")).orElseThrow().value(),
                            reader.decimals("deg"), b);
                });
        CycleStep.SyncOn on = f.cycle().steps().stream().filter(CycleStep.SyncOn.class::isInstance)
                .map(CycleStep.SyncOn.class::cast).findFirst().orElseThrow();
        NcReader.Block sync = blocks.get(index(blocks, reader.literalWords(helical(f) ? "syncOnHelix" : "syncOn", 0),
                true));
        String syncTemplate = reader.dialect().get("templates").get(helical(f) ? "syncOnHelix" : "syncOn").asString();
        near(on.hobTurns(), sync.word(letterBefore(syncTemplate, "{hobTurns}")).orElseThrow().value(), 0, sync);
        near(on.workTurns(), sync.word(letterBefore(syncTemplate, "{workTurns}")).orElseThrow().value(), 0, sync);
        near(on.hobRpm(), sync.word(letterBefore(syncTemplate, "{hobRpm}")).orElseThrow().value(),
                reader.decimals("rpm"), sync);
        if (helical(f)) {
            near(on.differentialDegPerMm() * u.toMm(1), sync.word(letterBefore(syncTemplate, "{differential}"))
                    .orElseThrow().value(), reader.decimals("deg"), sync);
        }
    }

    @ParameterizedTest(name = "{0} {1}")
    @MethodSource("cases")
    void programIsInTheJobsUnits(String dialect, Fixture f) {
        NcReader reader = new NcReader(Fixtures.dialectText(dialect));
        List<NcReader.Block> blocks = reader.blocks(program(dialect, f));
        boolean inch = f.job().units() == Units.IN;
        assertTrue(index(blocks, reader.literalWords(inch ? "unitsIn" : "unitsMm", 0), false) >= 0, "units word");
        assertEquals(-1, index(blocks, reader.literalWords(inch ? "unitsMm" : "unitsIn", 0), false),
                "no word of the other unit");
    }

    private static String letterBefore(String template, String placeholder) {
        int i = template.indexOf(placeholder);
        int s = i;
        while (s > 0 && Character.isLetter(template.charAt(s - 1))) {
            s--;
        }
        return template.substring(s, i);
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

    private static List<Integer> feedBlocks(List<NcReader.Block> blocks, NcReader reader) {
        List<String> feed = reader.literalWords("feed", 0);
        List<Integer> out = new ArrayList<>();
        for (int i = 0; i < blocks.size(); i++) {
            if (blocks.get(i).has(feed) && blocks.get(i).word("F").isPresent()) {
                out.add(i);
            }
        }
        return out;
    }

    private static int index(List<NcReader.Block> blocks, List<String> words, boolean required) {
        for (int i = 0; i < blocks.size(); i++) {
            if (blocks.get(i).has(words)) {
                return i;
            }
        }
        if (required) {
            throw new AssertionError("no block with " + words);
        }
        return -1;
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
