package org.hobwright.samples.e2e;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The key numbers of each sample job, read from the JSON report (in the job's units), against
 * published values and worked examples. "FORMULAS.md §x / case n" refers to wizard/FORMULAS.md,
 * which names the published source of each case. Values marked "computed
 * independently" come from {@code src/test/resources/e2e/reference_values.py}, a separate
 * implementation of the same textbook formulas.
 */
class SampleJobNumbersTest {

    /** 6 significant figures, as the published cases are printed. */
    private static final double PRINTED = 5e-6;

    @TempDir
    Path work;

    private static void close(double expected, double actual, double relative, String what) {
        assertEquals(expected, actual, Math.abs(expected) * relative + 1e-12, what);
    }

    /**
     * A number printed in a text agrees with the expected value to half a unit of its last printed digit
     * ("0.2981" within 0.00005, "11.68" within 0.005; trailing zeros are not printed, so "0.3" stands for 0.30).
     */
    private static void printed(double expected, String number, String what) {
        int dot = number.indexOf('.');
        double halfUnit = 0.5 * Math.pow(10, dot < 0 ? 0 : -(number.length() - dot - 1));
        assertEquals(expected, Double.parseDouble(number), halfUnit + 1e-12, what);
    }

    /** The number (digits, sign, decimal point) that follows {@code prefix} in {@code text}. */
    private static String numberAfter(String text, String prefix) {
        int start = text.indexOf(prefix);
        assertTrue(start >= 0, "\"" + prefix + "\" in: " + text);
        int i = start + prefix.length();
        int end = i;
        while (end < text.length() && ("-.".indexOf(text.charAt(end)) >= 0 || Character.isDigit(text.charAt(end)))) {
            end++;
        }
        String number = text.substring(i, end);
        if (number.endsWith(".")) {
            number = number.substring(0, number.length() - 1);
        }
        return number;
    }

    @Test
    void meteringPumpGear() {
        PlanRun r = PlanRun.of("metering-pump-gear.json", work);
        assertEquals(0, r.exitCode(), r.describe());
        // ISO 21771 eq. (1), (13), (33): d = z m, d_b = d cos α, d_a = d + 2 m
        close(24.0, r.number("/gear/referenceDiameter"), 1e-9, "d");
        close(24.0 * Math.cos(Math.toRadians(20)), r.number("/gear/baseDiameter"), 1e-9, "d_b");
        close(26.0, r.number("/gear/tipDiameter"), 1e-9, "d_a");
        // the hob makes the thickness allowance E_sn −0.03 mm by going deeper, as a shift of
        // E_sn / (2 m tan α) (FORMULAS.md §2.1): d_f = d − 2 · 1.25 m + E_sn / tan α (ISO 21771 eq. (34))
        double rootDiameter = 24 - 2.5 - 0.03 / Math.tan(Math.toRadians(20));
        double depth = (26 - rootDiameter) / 2;
        close(rootDiameter, r.number("/gear/rootDiameter"), 1e-9, "d_f");
        close(depth, r.number("/gear/wholeDepth"), 1e-9, "h");
        // s_n = m π/2 + E_sn (FORMULAS.md §2.1)
        close(Math.PI / 2 - 0.03, r.number("/gear/toothThickness"), 1e-9, "s_n");
        // span: k = z α/180° + 0.5 = 3.17 → 3 (FORMULAS.md §3.1); W_3 = 7.716462 for the nominal
        // tooth (span tables list 7.7165 for m 1, z 24), minus |E_sn| cos α for the allowance
        assertEquals(3, r.number("/inspection/spanTeeth"));
        close(7.716462 - 0.03 * Math.cos(Math.toRadians(20)), r.number("/inspection/spanWidth"), 2e-6, "W_3");
        // over two 1.75 mm pins with the allowance: 26.406392 (computed independently, FORMULAS.md §3.2)
        close(26.406392, r.number("/inspection/overPins"), 2e-6, "M_d");
        // hob: d_m0 = 32 − 2 · 1.25 = 29.5 mm, sin γ = 1 / 29.5 (FORMULAS.md §4.1); spur: η = −γ (§4.2)
        double gamma = Math.toDegrees(Math.asin(1 / 29.5));
        close(gamma, r.number("/setup/leadAngle"), 1e-9, "γ");
        close(-gamma, r.number("/setup/swivelAngle"), 1e-9, "η");
        // the holder reads 5′ steps: −1° 56.56′ is set as −1° 55′ (nearest step)
        close(-(1 + 55 / 60.0), r.number("/setup/swivelSetting"), 1e-9, "setting");
        // generating ratio: n_2 = n_0 z_0 / z_2 (FORMULAS.md §5.1), 24 hob turns to 1 work turn
        close(r.number("/cycle/hobRpm") / 24, r.number("/cycle/workRpm"), 1e-9, "n_2");
        assertEquals(24, r.number("/setup/syncHobTurns"));
        assertEquals(1, r.number("/setup/syncWorkTurns"));
        // spur approach, full depth from the blank tip: E = √(h (d_a0 − h)) (FORMULAS.md §7.1, case 34 form)
        close(Math.sqrt(depth * (32 - depth)), r.number("/cycle/approachLength"), 1e-6, "E");
        // feed marks for the feed chosen: root f²/(4 d_a0), flank f² sin α/(4 d_a0), µm (FORMULAS.md §6.1)
        double f = r.number("/cycle/axialFeed");
        close(f * f / (4 * 32) * 1000, r.number("/cycle/feedMarkRootDepth"), 1e-9, "δ_root");
        close(f * f * Math.sin(Math.toRadians(20)) / (4 * 32) * 1000, r.number("/cycle/feedMarkDepth"), 1e-9, "δ_x");
        // enveloping flats π² z_0² m sin α / (4 z i²) with i = 12 gashes, µm (FORMULAS.md §6.2)
        close(Math.PI * Math.PI * Math.sin(Math.toRadians(20)) / (4 * 24 * 144) * 1000,
                r.number("/cycle/envelopingDepth"), 1e-9, "δ_y");
    }

    @Test
    void twoStartHobHalvesTheRatioAndQuadruplesTheEnvelopingFlats() {
        PlanRun one = PlanRun.of("metering-pump-gear.json", work.resolve("one"));
        PlanRun two = PlanRun.of("metering-pump-gear-two-start.json", work.resolve("two"));
        assertEquals(0, two.exitCode(), two.describe());
        // sin γ = z_0 m / d_m0 = 2 / 29.5 (FORMULAS.md §4.1)
        close(Math.toDegrees(Math.asin(2 / 29.5)), two.number("/setup/leadAngle"), 1e-9, "γ two-start");
        // n_2 = n_0 z_0 / z_2: 12 hob turns per work turn instead of 24 (FORMULAS.md §5.1)
        close(two.number("/cycle/hobRpm") / 12, two.number("/cycle/workRpm"), 1e-9, "n_2 two-start");
        // enveloping depth δ = π² z_0² m sin α / (4 z i²) grows with z_0² (FORMULAS.md §6.2)
        close(4 * one.number("/cycle/envelopingDepth"), two.number("/cycle/envelopingDepth"), 1e-9, "δ_y ratio");
        close(Math.PI * Math.PI * 4 * Math.sin(Math.toRadians(20)) / (4 * 24 * 144) * 1000,
                two.number("/cycle/envelopingDepth"), 1e-9, "δ_y two-start, µm");
        assertEquals(12, two.number("/setup/syncHobTurns"));
        assertEquals(1, two.number("/setup/syncWorkTurns"));
    }

    @Test
    void pinionWithTwelveTeethIsUndercutAndTheShiftIsProposed() {
        PlanRun r = PlanRun.of("dosing-pinion-z12.json", work);
        var undercut = r.finding("UNDERCUT").orElseThrow(() -> new AssertionError(r.describe()));
        // ISO 53 A hob: straight-flank height h* = h_fP − ρ_fP (1 − sin α) = 1.25 − 0.38 (1 − sin 20°) = 0.999968;
        // x_min = h* − z sin² α / 2 = 0.298101 and z_min = 2 h* / sin² α = 17.097 (FORMULAS.md §2.3, case 13)
        double sin = Math.sin(Math.toRadians(20));
        double hStar = 1.25 - 0.38 * (1 - sin);
        double xMin = hStar - 12 * sin * sin / 2;
        String message = undercut.at("/message").asString();
        String fix = undercut.at("/fix").asString();
        printed(xMin, numberAfter(message, "needs a shift of at least "), "x_min in " + message);
        printed(2 * hStar / (sin * sin), numberAfter(message, "no undercut from "), "z_min in " + message);
        // the proposal is x_min rounded up to 0.01: 0.30; with it d_a = m (z + 2 + 2x) = 11.68 mm,
        // d_f = m (z − 2.5 + 2x) = 8.08 mm (ISO 21771 eq. (33), (34)) and the tip thickness 0.435738 m
        // (FORMULAS.md §2.2, case 12 neighbour; the generating simulation checks that relation)
        double x = Math.ceil(xMin * 100) / 100;
        assertEquals(0.30, x, 1e-12);
        printed(x, numberAfter(fix, "set gear.profileShift to "), "proposed shift in " + fix);
        printed(0.8 * (12 + 2 + 2 * x), numberAfter(fix, "tip diameter "), "tip diameter in " + fix);
        printed(0.8 * (12 - 2.5 + 2 * x), numberAfter(fix, "root diameter "), "root diameter in " + fix);
        printed(0.435738 * 0.8, numberAfter(fix, "tip thickness "), "tip thickness in " + fix);
        close(11.2, r.number("/gear/tipDiameter"), 1e-9, "d_a, x = 0");
        close(9.6 - 2 * 1.25 * 0.8, r.number("/gear/rootDiameter"), 1e-9, "d_f, x = 0");
    }

    @Test
    void pinionWithTheProposedShiftIsClean() {
        PlanRun r = PlanRun.of("dosing-pinion-z12-shifted.json", work);
        assertEquals(0, r.exitCode(), r.describe());
        assertTrue(r.finding("UNDERCUT").isEmpty(), r.describe());
        assertTrue(r.finding("POINTED").isEmpty(), r.describe());
        // d_a = d + 2 m (1 + x), d_f = d − 2 m (1.25 − x) (ISO 21771 eq. (33), (34)), x = 0.3
        close(9.6 + 2 * 0.8 * 1.3, r.number("/gear/tipDiameter"), 1e-9, "d_a");
        close(9.6 - 2 * 0.8 * 0.95, r.number("/gear/rootDiameter"), 1e-9, "d_f");
        // tip thickness for m 1, z 12, x 0.3 is 0.435738 m (FORMULAS.md §2.2), well above 0.25 m
        close(0.435738 * 0.8, r.number("/gear/tipThickness"), PRINTED, "s_a");
        // span over k = 2: W_2 = 3.841181; over 1.4 mm pins: 11.881757 (computed independently)
        assertEquals(2, r.number("/inspection/spanTeeth"));
        close(3.841181, r.number("/inspection/spanWidth"), 2e-6, "W_2");
        close(11.881757, r.number("/inspection/overPins"), 2e-6, "M_d");
    }

    @Test
    void savedTemplatesFillWhatTheJobLeavesOpen() {
        // the pinion names the sliding-headstock lathe's template: 60 m/min and 0.4 mm per work
        // revolution come from it (the job gives neither)
        PlanRun pinion = PlanRun.of("dosing-pinion-z12-shifted.json", work.resolve("pinion"));
        close(60, pinion.number("/setup/cuttingSpeed"), 1e-9, "v_c from steel-small-module");
        close(0.4, pinion.number("/cycle/axialFeed"), 1e-9, "f_a from steel-small-module");
        // the demo job moved to the turret lathe with its template: a roughing and a finishing pass
        PlanRun moved = PlanRun.of("metering-pump-gear.json", work.resolve("moved"),
                "--machine", "ottmere-4008", "--template", "steel-rough-finish");
        assertEquals(0, moved.exitCode(), moved.describe());
        assertEquals(2, moved.number("/cycle/passes"), "finish stock 0.2 mm gives two passes");
        close(0.6, moved.number("/cycle/axialFeed"), 1e-9, "finishing feed from the template");
        // n_0 = 1000 v_c / (π d_a0) with v_c 60 m/min from the template, d_a0 32 mm (FORMULAS.md §5.1)
        close(1000 * 60 / (Math.PI * 32), moved.number("/cycle/hobRpm"), 1e-9, "n_0");
    }

    @Test
    void inchFinePitchWheelInBrass() {
        PlanRun r = PlanRun.of("indicator-wheel-dp32.json", work);
        assertEquals(0, r.exitCode(), r.describe());
        // AGMA fine pitch, P 32, N 32: D = N/P = 1.000 in, a = 1/P, b = 1.200/P + 0.002 in
        // (Mott, Machine Elements, 4th ed., Table 8-4; FORMULAS.md case 9: whole depth 0.07075 in)
        close(1.0, r.number("/gear/referenceDiameter"), 1e-9, "D");
        close(1.0625, r.number("/gear/tipDiameter"), 1e-9, "OD");
        close(0.921, r.number("/gear/rootDiameter"), 1e-9, "root");
        close(0.07075, r.number("/gear/wholeDepth"), 1e-9, "whole depth");
        // over wires 1.728/P = 0.054 in: 34.4130 in at 1 DP, 32 teeth (Machinery's Handbook wire
        // table, FORMULAS.md case 18) → 34.4130 / 32 = 1.07541 in
        close(0.054, r.number("/inspection/pinDiameter"), 1e-9, "wire");
        close(34.4130 / 32, r.number("/inspection/overPins"), PRINTED, "over wires");
        // hob: d_m0 = OD − 2 (1.200/P + 0.002) = 1.171 in; sin γ = (1/P) / d_m0 (FORMULAS.md §4.1)
        double gamma = Math.toDegrees(Math.asin((1 / 32.0) / 1.171));
        close(gamma, r.number("/setup/leadAngle"), 1e-9, "γ");
        // n_0 = 12 v_c / (π D_0) for ft/min and inches (FORMULAS.md §5.1, in inch units)
        close(12 * 200 / (Math.PI * 1.25), r.number("/cycle/hobRpm"), 1e-9, "n_0");
        close(r.number("/cycle/hobRpm") / 32, r.number("/cycle/workRpm"), 1e-9, "n_2");
        assertTrue(r.findings().stream().noneMatch(f -> f.at("/severity").asString().equals("warning")), r.describe());
    }

    @Test
    void helicalGearOnTheTurretLathe() {
        PlanRun r = PlanRun.of("pump-helical-gear-4008.json", work);
        assertEquals(0, r.exitCode(), r.describe());
        // FORMULAS.md §1.5 worked example (m_n 2, z 30, β 15° RH, x 0.2, ISO 53 A) scaled to m_n 0.8:
        // every length of these relations is proportional to m_n, every angle is unchanged.
        double s = 0.8 / 2;
        close(62.1166 * s, r.number("/gear/referenceDiameter"), PRINTED, "d (case 3)");
        close(58.1269 * s, r.number("/gear/baseDiameter"), PRINTED, "d_b (case 3)");
        close(66.9166 * s, r.number("/gear/tipDiameter"), PRINTED, "d_a (case 5)");
        close(57.9166 * s, r.number("/gear/rootDiameter"), PRINTED, "d_f (case 5)");
        close(3.43277 * s, r.number("/gear/toothThickness"), PRINTED, "s_n (case 10)");
        assertEquals(5, r.number("/inspection/spanTeeth"), "k (case 17)");
        close(27.7705 * s, r.number("/inspection/spanWidth"), PRINTED, "W_5 (case 17)");
        close(67.7794 * s, r.number("/inspection/overPins"), PRINTED, "over 1.4 mm balls (case 21, 3.5 mm scaled)");
        // hob d_a0 28 = 70 × 0.4, so d_m0 = 26 and γ, η are those of cases 26 and 27
        close(1.76323, r.number("/setup/leadAngle"), PRINTED, "γ (case 26)");
        close(13.2368, r.number("/setup/swivelAngle"), PRINTED, "η same-hand (case 27)");
        // n_0 = 1000 v_c / (π d_a0) (case 29 with d_a0 28); n_2 = n_0 / 30 (case 30)
        close(272.837 * 70 / 28, r.number("/cycle/hobRpm"), PRINTED, "n_0");
        close(r.number("/cycle/hobRpm") / 30, r.number("/cycle/workRpm"), 1e-9, "n_2");
        // exact helical approach for a cylindrical hob envelope (FORMULAS.md §7.1, case 35 scaled)
        close(18.1330 * s, r.number("/cycle/approachLength"), 2e-5, "E (case 35)");
        // overrun U = (h / tan α_n) sin η (FORMULAS.md §7.2, derived there, not from print)
        close(2.83098 * s, r.number("/cycle/overrunLength"), PRINTED, "U");
        // helical addition 360 sin β / (π z m_n) °/mm: case 31 (0.494308 °/mm at m_n 2) / 0.4
        close(0.494308 / s, Math.abs(r.number("/setup/differential")), PRINTED, "differential (case 31)");
    }

    @Test
    void helicalGearOnTheSlidingHeadstockLatheIsRefused() {
        PlanRun r = PlanRun.of("pump-helical-gear-1605.json", work);
        assertEquals(1, r.exitCode(), r.describe());
        var helix = r.findings().stream()
                .filter(f -> f.at("/severity").asString().equals("error"))
                .filter(f -> (f.at("/code").asString() + f.at("/field").asString()).toLowerCase().contains("helix"))
                .findFirst();
        assertTrue(helix.isPresent(), "an error says the machine cannot follow a helix:\n" + r.describe());
    }

    @Test
    void drawingWithAnImpossibleOutsideDiameterIsCaught() {
        PlanRun r = PlanRun.of("counter-wheel-drawing-error.json", work);
        assertEquals(1, r.exitCode(), r.describe());
        var drawing = r.findings().stream()
                .filter(f -> f.at("/field").asString().startsWith("gear.drawing")).toList();
        // z 40, m 0.5, x 0: d = 20, d_a = 21, d_f = 18.75, h = 1.125 (ISO 21771 eq. (1), (33), (34));
        // the drawing's 22.0 outside diameter belongs to a 42-tooth wheel (or to x = +1)
        var outside = drawing.stream()
                .filter(f -> f.at("/field").asString().equals("gear.drawing.outsideDiameter")).toList();
        assertEquals(1, outside.size(), r.describe());
        assertTrue(outside.get(0).at("/message").asString().contains("21"), outside.get(0).toString());
        assertEquals("error", outside.get(0).at("/severity").asString(), "an impossible drawing stops the job");
        for (String agrees : List.of("pitchDiameter", "rootDiameter", "wholeDepth")) {
            assertTrue(drawing.stream().noneMatch(f -> f.at("/field").asString().equals("gear.drawing." + agrees)),
                    agrees + " agrees with the teeth and module:\n" + r.describe());
        }
        // the outside diameter asks for x = 1 while the root diameter asks for x = 0: no one gear
        // has both, so the drawing itself is contradictory, not just the job's shift
        assertTrue(drawing.stream().anyMatch(f -> f.at("/field").asString().equals("gear.drawing")
                && f.at("/severity").asString().equals("error")), "the contradiction is named:\n" + r.describe());
    }
}
