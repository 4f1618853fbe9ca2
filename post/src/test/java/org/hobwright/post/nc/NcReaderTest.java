package org.hobwright.post.nc;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.hobwright.post.Fixtures;
import org.hobwright.post.Fixtures.Fixture;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;

/**
 * The tests' program reader is the judge of every posted program, so it is tested itself: the
 * golden spur program (m 2, z 20 on the Varrow dialect; root Ø35, blank Ø44, hob Ø70, face 20 mm,
 * FORMULAS.md §1.5 and §7.1) keeps every invariant, and each one-word change below breaks exactly
 * the invariant named.
 */
class NcReaderTest {

    private static final Fixture SPUR = Fixtures.spurMetric();
    private static final String DIALECT = "varrow-ctl";

    private static String golden() throws IOException {
        return Files.readString(Path.of("src/test/resources/golden/spur-metric.varrow-ctl.nc"), StandardCharsets.UTF_8);
    }

    private static List<String> violations(String program) {
        return new NcReader(Fixtures.dialectText(DIALECT)).violations(program,
                NcReader.Limits.of(SPUR.job(), SPUR.cycle()));
    }

    @Test
    void theGoldenProgramKeepsEveryInvariant() throws IOException {
        assertEquals(List.of(), violations(golden()));
    }

    @ParameterizedTest(name = "{0} -> {2}")
    @CsvSource(delimiter = '|', value = {
        // a feed word written as zero
        "N450 G1 X35.000 Z-22.000 F1.500 | N450 G1 X35.000 Z-22.000 F0.000 | feed word 0.0 is not above zero",
        // the feed rate: 1.5 mm at 14 rpm is 21 mm/min, 400 mm at 14 rpm above the machine's 5000 mm/min
        "N450 G1 X35.000 Z-22.000 F1.500 | N450 G1 X35.000 Z-22.000 F400.000 | above the machine's 5000.0 mm/min",
        // a work speed word written as zero
        "N410 G97 S14 M4 | N410 G97 S0 M4 | work speed word 0.0 is not above zero",
        // the hob at 4100 rpm, above the Ottmere's 4000 rpm hob spindle
        "N420 G177 H20 Q1 S273 M63 | N420 G177 H20 Q1 S4100 M63 | hob speed 4100.0 rpm",
        // 14 rpm of the work locks the hob to 280 rpm; at 300:1 to 4200 rpm, and 300 is above the largest ratio 150
        "N420 G177 H20 Q1 S273 M63 | N420 G177 H300 Q1 S273 M63 | above the machine's 150.0",
        // the final cut 0.002 mm inside the root diameter
        "N450 G1 X35.000 Z-22.000 F1.500 | N450 G1 X34.998 Z-22.000 F1.500 | inside the final root diameter",
        // a rapid to full depth 1 mm before the entry face
        "N440 G0 X35.000 Z19.169 | N440 G0 X35.000 Z1.000 | brings the hob into the blank",
        // a rapid back along the blank 0.1 mm under its surface
        "N500 G0 X48.000 Z19.169 | N500 G0 X43.800 Z19.169 | brings the hob into the blank",
        // a block no template writes
        "N450 G1 X35.000 Z-22.000 F1.500 | N450 G1 X35.000 Z-22.000 | no block the dialect's templates write",
        // a number with an exponent
        "N450 G1 X35.000 Z-22.000 F1.500 | N450 G1 X3.5E1 Z-22.000 F1.500 | is not an ISO 6983 word",
        // the spindles stopped while synchronised
        "N470 G176 | N470 M65 | the spindles stop while synchronised",
        // a cut before the synchronisation
        "N420 G177 H20 Q1 S273 M63 | N420 M63 | a feed move before the synchronisation is on",
        // too short a settle dwell (the Ottmere needs 2 s)
        "N430 G4 U2.0 | N430 G4 U1.9 | the machine needs 2.0 s",
    })
    void aBrokenInvariantIsFound(String line, String broken, String expected) throws IOException {
        String program = golden();
        assertTrue(program.contains(line + "\r\n"), line);
        List<String> v = violations(program.replace(line + "\r\n", broken + "\r\n"));
        assertTrue(v.stream().anyMatch(x -> x.contains(expected)), () -> expected + " in " + v);
    }
}
