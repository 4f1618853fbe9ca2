package org.hobwright.post.nc;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.hobwright.api.check.Finding;
import org.hobwright.api.check.Severity;
import org.hobwright.api.spi.WriteContext;
import org.hobwright.api.spi.WriteResult;
import org.hobwright.post.Fixtures;
import org.hobwright.post.Fixtures.Fixture;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * Dialect problems become error findings that name the dialect file and the line, never
 * exceptions. Each test breaks one line of a shipped dialect and expects that line's number.
 */
class DialectLoaderTest {

    private static final String VARROW = Fixtures.dialectText("varrow-ctl");

    @ParameterizedTest
    @ValueSource(strings = {"varrow-ctl", "ottmere-ctl"})
    void shippedDialectsLoadWithoutFindings(String name) {
        DialectLoader.Loaded l = DialectLoader.load(name, Fixtures.dialectText(name));
        assertTrue(l.dialect().isPresent(), () -> l.findings().toString());
        assertTrue(l.findings().isEmpty(), () -> l.findings().toString());
    }

    @Test
    void unknownPlaceholderNamesTheLine() {
        Finding f = single(replace("\"feed\": \"G1 {radial} {axial} F{feed}\"", "\"feed\": \"G1 {radial} {axial} F{fed}\""),
                "NC_DIALECT_UNKNOWN_PLACEHOLDER");
        assertTrue(f.message().contains("line " + lineOf("\"feed\": \"G1")), f.message());
        assertTrue(f.message().contains("{fed}"), f.message());
        assertEquals("dialect.templates.feed.0", f.field());
    }

    /** A key written twice is an error naming its line, as in every other Hobwright file (not "the last one wins"). */
    @Test
    void aKeyWrittenTwiceIsAnError() {
        Finding f = single(replace("\"rapid\": \"G0 {radial} {axial}\"",
                "\"rapid\": \"G0 {radial} {axial}\",\n    \"rapid\": \"G0 {axial}\""), "NC_DIALECT_UNREADABLE");
        assertTrue(f.message().contains("line " + (lineOf("\"rapid\":") + 1)), f.message());
        assertTrue(f.message().contains("rapid"), f.message());
    }

    @Test
    void placeholderWithoutValueInThatTemplateIsAnError() {
        Finding f = single(replace("\"rapid\": \"G0 {radial} {axial}\"", "\"rapid\": \"G0 {radial} {axial} F{feed}\""),
                "NC_DIALECT_BAD_TEMPLATE");
        assertTrue(f.message().contains("line " + lineOf("\"rapid\":")), f.message());
    }

    @Test
    void missingRequiredTemplateNamesTheTemplatesLine() {
        Finding f = single(replace("    \"syncOff\": \"M160\",\n", ""), "NC_DIALECT_MISSING_TEMPLATE");
        assertTrue(f.message().contains("line " + lineOf("\"templates\": {")), f.message());
        assertTrue(f.message().contains("syncOff"), f.message());
    }

    @Test
    void missingTemplateTheCycleNeedsIsRefusedByTheWriter() {
        Fixture helical = Fixtures.helicalMetric();
        String text = replace("    \"syncOnHelix\": [\"{hobDir} P{hobRpm}\", \"M161 P{hobTurns} Q{workTurns}\", "
                + "\"M162 P{differential}\"],\n", "");
        WriteResult r = new NcWriter().write(helical.cycle(), new WriteContext(helical.job(), Fixtures.DATE, "t",
                java.util.Map.of(WriteContext.DIALECT, text, WriteContext.DIALECT_NAME, "varrow-ctl")));
        assertTrue(r.files().isEmpty());
        Finding f = r.findings().get(0);
        assertEquals("NC_DIALECT_MISSING_TEMPLATE", f.code());
        assertTrue(f.message().contains("syncOnHelix") && f.message().contains("line " + lineOf("\"templates\": {")),
                f.message());
    }

    @Test
    void textWhereANumberBelongsNamesTheLine() {
        Finding f = single(replace("\"mm\": 3,", "\"mm\": \"three\","), "NC_DIALECT_BAD_VALUE");
        assertTrue(f.message().contains("decimals.mm"), f.message());
        assertTrue(f.message().contains("line " + lineOf("\"decimals\":")), f.message());
    }

    @Test
    void fractionWhereAWholeNumberBelongsNamesTheLine() {
        Finding f = single(replace("\"mm\": 3,", "\"mm\": 2.5,"), "NC_DIALECT_BAD_VALUE");
        assertTrue(f.message().contains("line " + lineOf("\"decimals\":")), f.message());
    }

    @Test
    void numberOutOfRangeNamesTheLine() {
        Finding f = single(replace("\"step\": 10 }", "\"step\": 0 }"), "NC_DIALECT_BAD_NUMBER");
        assertTrue(f.message().contains("line " + lineOf("\"lineNumbers\":")), f.message());
        assertEquals("dialect.lineNumbers.step", f.field());
    }

    @Test
    void unknownKeyNamesTheKeyAndLine() {
        DialectLoader.Loaded l = DialectLoader.load("varrow-ctl", replace("\"trailingZeros\": true,",
                "\"trailingZeroes\": true,"));
        assertTrue(l.dialect().isEmpty());
        Finding f = l.findings().stream().filter(x -> x.code().equals("NC_DIALECT_UNKNOWN_KEY")).findFirst()
                .orElseThrow(() -> new AssertionError(l.findings().toString()));
        assertTrue(f.message().startsWith("varrow-ctl line " + lineOf("\"trailingZeros\":") + ", trailingZeroes: "),
                f.message());
        assertTrue(l.findings().stream().anyMatch(x -> x.code().equals("NC_DIALECT_MISSING_KEY")
                && x.message().contains("\"trailingZeros\" is missing")), l.findings().toString());
    }

    @Test
    void brokenJsonNamesTheLine() {
        Finding f = single(replace("\"toolCall\": \"T{tool} M6 G43\",", "\"toolCall\": \"T{tool} M6 G43\""),
                "NC_DIALECT_UNREADABLE");
        assertTrue(f.message().contains("line " + (lineOf("\"toolCall\":") + 1)), f.message());
    }

    @Test
    void wrongFormatAndSeveralProblemsAreAllReported() {
        String text = replace("\"format\": \"hobwright-dialect\"", "\"format\": \"hobwright-job\"")
                .replace("\"sign\": -1", "\"sign\": 2").replace("\"lineEnding\": \"crlf\"", "\"lineEnding\": \"cr\"");
        DialectLoader.Loaded l = DialectLoader.load("varrow-ctl", text);
        assertTrue(l.dialect().isEmpty());
        List<String> codes = l.findings().stream().map(Finding::code).toList();
        assertTrue(codes.contains("NC_DIALECT_FORMAT") && codes.contains("NC_DIALECT_BAD_VALUE"), codes.toString());
        assertEquals(3, l.findings().size(), l.findings().toString());
        assertTrue(l.findings().stream().allMatch(f -> f.severity() == Severity.ERROR && f.fix().isPresent()));
    }

    @Test
    void aVersion1DialectSaysWhatToAdd() {
        Finding f = single(replace("\"version\": 2,", "\"version\": 1,"), "NC_DIALECT_VERSION");
        assertTrue(f.fix().orElseThrow().contains("safeStart") && f.fix().orElseThrow().contains("{tool}"),
                f.fix().toString());
    }

    @Test
    void aDefaultOutsideTheRangeIsAnError() {
        Finding f = single(replace("\"programNumber\": { \"default\": 4120, \"min\": 1, \"max\": 9999 }",
                "\"programNumber\": { \"default\": 12000, \"min\": 1, \"max\": 9999 }"), "NC_DIALECT_BAD_NUMBER");
        assertTrue(f.message().contains("programNumber"), f.message());
    }

    @Test
    void aProgramNumberOrToolTheControlCannotTakeIsRefused() {
        Fixture f = Fixtures.spurInch();
        var c = f.job().cycle();
        var run = new org.hobwright.api.job.RunSettings(1, java.util.OptionalInt.of(12000), java.util.OptionalInt.of(30),
                false, java.util.OptionalDouble.empty());
        var job = new org.hobwright.api.job.HobJob(f.job().name(), f.job().units(), f.job().gear(), f.job().hob(),
                f.job().machine(), c.withRun(run));
        WriteResult r = new NcWriter().write(f.cycle(), new WriteContext(job, Fixtures.DATE, "t",
                java.util.Map.of(WriteContext.DIALECT, VARROW, WriteContext.DIALECT_NAME, "varrow-ctl")));
        assertTrue(r.files().isEmpty());
        assertEquals(List.of("NC_PROGRAM_NUMBER", "NC_TOOL_STATION"), r.findings().stream().map(Finding::code).toList());
        assertTrue(r.findings().get(0).message().contains("1 to 9999"), r.findings().get(0).message());
    }

    @Test
    void theJobsProgramNumberAndToolAreWritten() {
        Fixture f = Fixtures.spurInch();
        var run = new org.hobwright.api.job.RunSettings(1, java.util.OptionalInt.of(815), java.util.OptionalInt.of(7),
                false, java.util.OptionalDouble.empty());
        var job = new org.hobwright.api.job.HobJob(f.job().name(), f.job().units(), f.job().gear(), f.job().hob(),
                f.job().machine(), f.job().cycle().withRun(run));
        WriteResult r = new NcWriter().write(f.cycle(), new WriteContext(job, Fixtures.DATE, "t",
                java.util.Map.of(WriteContext.DIALECT, VARROW, WriteContext.DIALECT_NAME, "varrow-ctl")));
        String text = r.files().get(0).text();
        assertTrue(text.contains("(PROGRAM 815 SPUR-INCH)") && text.contains(" T7 M6 G43\r\n"), text);
    }

    @Test
    void missingDialectIsRefused() {
        Fixture f = Fixtures.spurMetric();
        WriteResult r = new NcWriter().write(f.cycle(), f.plainContext());
        assertTrue(r.files().isEmpty());
        assertEquals("NC_DIALECT_MISSING", r.findings().get(0).code());
    }

    private static Finding single(String text, String code) {
        DialectLoader.Loaded l = DialectLoader.load("varrow-ctl", text);
        assertTrue(l.dialect().isEmpty(), "a broken dialect does not load");
        assertEquals(1, l.findings().size(), () -> l.findings().toString());
        Finding f = l.findings().get(0);
        assertEquals(code, f.code(), f::toString);
        assertTrue(f.message().startsWith("varrow-ctl line "), f.message());
        return f;
    }

    private static String replace(String from, String to) {
        assertTrue(VARROW.contains(from), () -> "the sample dialect contains " + from);
        return VARROW.replace(from, to);
    }

    /** 1-based line of the first occurrence of a text in the shipped dialect. */
    private static int lineOf(String text) {
        int at = VARROW.indexOf(text);
        assertTrue(at >= 0, text);
        return (int) VARROW.substring(0, at).chars().filter(c -> c == '\n').count() + 1;
    }
}
