package org.hobwright.wizard.geometry;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class ToothSystemTest {

    // Basic rack factors: ISO 53:1998 types A-D (factors from memory, FORMULAS.md §1.3);
    // AGMA coarse/fine from Mott, Machine Elements, 4th ed., Table 8-4; 14.5° full depth from memory.
    @ParameterizedTest
    @CsvSource({
        "iso53-a, 1.0, 1.25, 0.38, 20", "iso53-b, 1.0, 1.25, 0.30, 20", "iso53-c, 1.0, 1.25, 0.25, 20",
        "iso53-d, 1.0, 1.40, 0.39, 20", "agma-coarse, 1.0, 1.25, 0.30, 20", "agma-fine, 1.0, 1.2, 0.30, 20",
        "full-depth-14.5, 1.0, 1.157, 0.209, 14.5"})
    void hasTheFactorsOfItsStandard(String id, double ha, double hf, double rho, double alpha) {
        ToothSystem s = ToothSystem.builtIn(id).orElseThrow();
        assertEquals(ha, s.addendumFactor(), 0);
        assertEquals(hf, s.dedendumFactor(), 0);
        assertEquals(rho, s.rootRadiusFactor(), 0);
        assertEquals(alpha, s.nominalPressureAngleDeg(), 0);
    }

    // Fine-pitch dedendum 1.200/P + 0.002 in (Mott Table 8-4): P 32 → 0.0395 in.
    @ParameterizedTest
    @CsvSource({"32, 0.0395", "20, 0.062", "64, 0.02075"})
    void finePitchDedendumAddsTwoThousandths(double p, double dedendumIn) {
        ToothSystem fine = ToothSystem.builtIn("agma-fine").orElseThrow();
        assertEquals(dedendumIn, fine.dedendumMm(25.4 / p) / 25.4, 1e-12);
    }

    // Largest fillet radius of the rack (FORMULAS.md §1.3, derived; ISO 53 clause 5.9 from memory): c ≤ 0.295 m → c/(1 − sin α); the 14.5° rack's 0.209/P equals the
    // largest radius that fits its 0.157/P clearance (0.157/(1 − sin 14.5°) = 0.209439).
    @ParameterizedTest
    @CsvSource({"iso53-a, 20, 0.379951", "full-depth-14.5, 14.5, 0.209439"})
    void largestRootRadiusFitsTheClearance(String id, double alpha, double expected) {
        ToothSystem s = ToothSystem.builtIn(id).orElseThrow();
        assertEquals(expected, s.maxRootRadiusMm(1, Math.toRadians(alpha)), 1e-6);
    }

    // Second form for 0.295 m < c ≤ 0.396 m (FORMULAS.md §1.3): (π m/4 − h_fP tan α)/tan((90° − α)/2); for
    // h_fP = 1.35 m, c = 0.35 m, α = 20° by hand: (0.785398 − 0.491362)/0.700208 = 0.419930.
    @org.junit.jupiter.api.Test
    void largestRootRadiusOfADeepRackUsesTheSecondForm() {
        ToothSystem s = new ToothSystem("custom", 1.0, 1.35, 0.3, 0, 20, "test");
        assertEquals(0.419930, s.maxRootRadiusMm(1, Math.toRadians(20)), 1e-6);
    }

    // Straight-flank height h* = h_aP0 − ρ_aP0 (1 − sin α) (FORMULAS.md section 2.3, derived): ISO 53 A → 0.999968,
    // 14.5° full depth → 1.00033: both ≈ 1, the classic undercut rule's h*.
    @ParameterizedTest
    @CsvSource({"iso53-a, 20, 0.999968", "full-depth-14.5, 14.5, 1.000330", "iso53-c, 20, 1.085505"})
    void straightFlankHeight(String id, double alpha, double expected) {
        assertEquals(expected, ToothSystem.builtIn(id).orElseThrow().straightFlankHeightMm(1, Math.toRadians(alpha)),
                1e-6);
    }
}
