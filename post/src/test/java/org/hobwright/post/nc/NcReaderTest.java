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
    private static final String DIALECT = "ottmere-ctl";

    private static String golden() throws IOException {
        return Files.readString(Path.of("src/test/resources/golden/spur-metric.ottmere-ctl.nc"), StandardCharsets.UTF_8);
    }

    private static List<String> violations(String program) {
        return new NcReader(Fixtures.dialectText(DIALECT)).violations(program,
                NcReader.Limits.of(SPUR.job(), SPUR.cycle()));
    }

    @Test
    void theGoldenProgramKeepsEveryInvariant() throws IOException {
        assertEquals(List.of(), violations(golden()));
    }

    /** Each case: the lines to change (¶ between lines), what they become, which occurrence, what is found. */
    @ParameterizedTest(name = "{0} -> {3}")
    @CsvSource(delimiter = '|', value = {
        // a feed word written as zero
        "G1 X17.5 Z-22. F1.5 | G1 X17.5 Z-22. F0 | first | feed word 0.0 is not above zero",
        // the feed rate: 400 mm at 13.6 rpm is 5440 mm/min, above the machine's 5000 mm/min
        "G1 X17.5 Z-22. F1.5 | G1 X17.5 Z-22. F400 | first | above the machine's 5000.0 mm/min",
        // a work speed word written as zero
        "S13.6 M3 | S0 M3 | first | work speed word 0.0 is not above zero",
        // the hob at 4100 rpm, above the Ottmere's 4000 rpm hob spindle
        "M173 P272.8 | M173 P4100 | first | hob speed 4100.0 rpm",
        // 13.6 rpm of the work locks the hob to 4080 rpm at 300:1, and 300 is above the largest ratio 150
        "M171 P20 Q1 | M171 P300 Q1 | first | above the machine's 150.0",
        // the final cut 0.001 mm (as a radius) inside the root diameter
        "G1 X17.5 Z-22. F1.5 | G1 X17.499 Z-22. F1.5 | first | inside the final root diameter",
        // a rapid to full depth 1 mm before the front face
        "G0 X17.5 Z19.169 | G0 X17.5 Z1. | first | brings the hob into the blank",
        // the rapid back along the blank 0.1 mm under its surface
        "G0 X24. Z19.169 | G0 X21.9 Z19.169 | last | brings the hob into the blank",
        // a block no template writes
        "G1 X17.5 Z-22. F1.5 | G1 X17.5 Z-22. | first | no block the dialect's templates write",
        // a number with an exponent
        "G1 X17.5 Z-22. F1.5 | G1 X1.75E1 Z-22. F1.5 | first | is not an ISO 6983 word",
        // the spindles stopped while synchronised
        "M170¶M175 | M175 | first | the spindles stop while synchronised",
        // a cut before the synchronisation
        "M173 P272.8¶M171 P20 Q1 | M173 P272.8 | first | a feed move before the synchronisation is on",
        // too short a settle dwell (the Ottmere needs 2 s)
        "G4 P2. | G4 P1.9 | first | the machine needs 2.0 s",
    })
    void aBrokenInvariantIsFound(String lines, String broken, String which, String expected) throws IOException {
        String program = golden();
        String from = "\n" + lines.replace("¶", "\n") + "\n";
        int at = which.equals("last") ? program.lastIndexOf(from) : program.indexOf(from);
        assertTrue(at >= 0, lines);
        String changed = program.substring(0, at) + "\n" + broken + "\n" + program.substring(at + from.length());
        List<String> v = violations(changed);
        assertTrue(v.stream().anyMatch(x -> x.contains(expected)), () -> expected + " in " + v);
    }
}
