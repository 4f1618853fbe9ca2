package org.hobwright.wizard.tolerance;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.hobwright.api.cycle.ToleranceData;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class FlankTolerancesTest {

    // ISO 1328-1:2013 eq. (5)-(12), worked examples of FORMULAS.md section 9.1 (case 38), computed with the formulas as
    // from memory, not read in the standard's text (FORMULAS.md §9.1); f_HαT with the 0.001 d term (see FlankTolerances).
    // columns: class, d, m_n, b, then unrounded f_pT, F_pT, f_HαT, f_fαT, F_αT, f_HβT, f_fβT, F_βT
    @ParameterizedTest
    @CsvSource({
        "6, 62.1166, 2, 20, 8.29028, 25.2565, 6.87607, 8.62670, 11.0318, 8.42775, 9.28312, 12.5381",
        "7, 120, 3, 30, 12.6400, 40.7299, 10.6400, 13.3000, 17.0323, 12.9295, 14.4631, 19.3998"})
    void unroundedValuesOfTheWorkedExamples(int a, double d, double mn, double b, double fpT, double bigFpT,
                                            double fHa, double ffa, double bigFa, double fHb, double ffb,
                                            double bigFb) {
        double[] u = FlankTolerances.unrounded(a, d, mn, b);
        double[] expected = {fpT, bigFpT, fHa, ffa, bigFa, fHb, ffb, bigFb};
        for (int i = 0; i < expected.length; i++) {
            assertEquals(expected[i], u[i], 5e-6 * expected[i], "value " + i);
        }
    }

    // Rounded by clause 5.2.3 (FORMULAS.md section 9.1 tables): class 6 → 8.5, 25, 7.0, 8.5, 11, 8.5, 9.5, 13;
    // class 7 → 13, 41, 11, 13, 17, 13, 14, 19.
    @ParameterizedTest
    @CsvSource({
        "6, 62.1166, 2, 20, 8.5, 25, 7.0, 8.5, 11, 8.5, 9.5, 13",
        "7, 120, 3, 30, 13, 41, 11, 13, 17, 13, 14, 19"})
    void roundedValuesOfTheWorkedExamples(int a, double d, double mn, double b, double fpT, double bigFpT,
                                          double fHa, double ffa, double bigFa, double fHb, double ffb, double bigFb) {
        ToleranceData t = FlankTolerances.of(a, d, mn, b);
        assertEquals(a, t.flankToleranceClass());
        assertEquals(fpT, t.singlePitchUm(), 1e-12);
        assertEquals(bigFpT, t.totalPitchUm(), 1e-12);
        assertEquals(fHa, t.profileSlopeUm(), 1e-12);
        assertEquals(ffa, t.profileFormUm(), 1e-12);
        assertEquals(bigFa, t.profileTotalUm(), 1e-12);
        assertEquals(fHb, t.helixSlopeUm(), 1e-12);
        assertEquals(ffb, t.helixFormUm(), 1e-12);
        assertEquals(bigFb, t.helixTotalUm(), 1e-12);
    }

    // Clause 5.2.3: above 10 µm to 1 µm; 5 to 10 µm to 0.5 µm; below 5 µm to 0.1 µm.
    @ParameterizedTest
    @CsvSource({"25.2565, 25", "10.64, 11", "10.4, 10", "9.74, 9.5", "9.76, 10", "5.1, 5", "4.96, 5",
        "4.94, 4.9", "1.234, 1.2", "3.05, 3.1"})
    void roundingRule(double raw, double rounded) {
        assertEquals(rounded, FlankTolerances.round(raw), 1e-12);
    }

    // Each class is √2 times the one before, from the unrounded class-5 value (clause 5.2.2, from memory).
    @Test
    void classStepIsRootTwo() {
        for (int a = 1; a < 11; a++) {
            double[] lower = FlankTolerances.unrounded(a, 100, 2, 20);
            double[] upper = FlankTolerances.unrounded(a + 1, 100, 2, 20);
            for (int i = 0; i < lower.length; i++) {
                assertEquals(Math.sqrt(2), upper[i] / lower[i], 1e-12);
            }
        }
    }

    // Scope of ISO 1328-1:2013 (clause 1): 5 ≤ z ≤ 1000, 5 ≤ d ≤ 15000, 0.5 ≤ m_n ≤ 70, 4 ≤ b ≤ 1200, β ≤ 45°.
    @Test
    void scopeLimits() {
        assertTrue(FlankTolerances.outOfScope(24, 24, 1, 8, 0).isEmpty());
        assertTrue(FlankTolerances.outOfScope(5, 5, 0.5, 4, 45).isEmpty());
        assertEquals(1, FlankTolerances.outOfScope(40, 16, 0.4, 4, 0).size());
        assertTrue(FlankTolerances.outOfScope(40, 16, 0.4, 4, 0).get(0).contains("normal module 0.4 mm"));
        assertEquals(5, FlankTolerances.outOfScope(4, 20000, 80, 2, 50).size());
    }
}
