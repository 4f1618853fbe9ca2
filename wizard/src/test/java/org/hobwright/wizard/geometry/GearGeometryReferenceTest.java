package org.hobwright.wizard.geometry;

import static org.hobwright.wizard.geometry.TestGears.assertRelative;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.hobwright.api.cycle.GearData;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvFileSource;
import org.junit.jupiter.params.provider.CsvSource;

class GearGeometryReferenceTest {

    // Expected values and their sources: the header of reference/gear-geometry.csv.
    @ParameterizedTest(name = "case {0}: {7} = {8} ({9})")
    @CsvFileSource(resources = "/reference/gear-geometry.csv")
    void matchesPublishedValues(String id, int z, double m, double alpha, double beta, double x, String system,
                                String quantity, double expected, String source) {
        InvoluteGear g = TestGears.gear(z, m, alpha, beta, x, system);
        GearData data = GearGeometry.of(g);
        double actual = switch (quantity) {
            case "transverseModule" -> data.transverseModuleMm();
            case "transversePressureAngle" -> data.transversePressureAngleDeg();
            case "referenceDiameter" -> data.referenceDiameterMm();
            case "baseDiameter" -> data.baseDiameterMm();
            case "baseHelixAngle" -> data.baseHelixAngleDeg();
            case "tipDiameter" -> data.tipDiameterMm();
            case "rootDiameter" -> data.rootDiameterMm();
            case "lead" -> data.leadMm().orElseThrow();
            case "virtualTeeth" -> data.virtualTeeth();
            case "toothThickness" -> data.toothThicknessMm();
            case "transverseThickness" -> g.transverseThicknessMm();
            case "tipThicknessTransverse" -> g.transverseThicknessAtMm(g.tipDiameterMm());
            case "tipThickness" -> data.tipThicknessMm();
            case "dedendum" -> data.dedendumMm();
            case "wholeDepth" -> data.wholeDepthMm();
            default -> throw new IllegalArgumentException(quantity);
        };
        assertRelative(expected, actual, 5e-6, id + " " + quantity + " (" + source + ")");
    }

    // Module from diametral pitch: m = 25.4 / P (the inch is 25.4 mm exactly, FORMULAS.md case 8) and back
    // (m 2.5 → P 10.16, FORMULAS.md section 1.4).
    @ParameterizedTest
    @CsvSource({"12, 2.11667", "10, 2.54", "32, 0.79375"})
    void diametralPitchGivesModule(double p, double module) {
        assertRelative(module, new org.hobwright.api.job.Pitch.Diametral(p).moduleMm(), 5e-6, "P " + p);
        assertRelative(p, new org.hobwright.api.job.Pitch.Module(module).diametralPitch(), 5e-6, "m " + module);
    }

    // With an allowance the hob sits at x_E = x + E_sn/(2 m_n tan α_n) (FORMULAS.md section 2.1): the tooth thins by
    // exactly |E_sn| and the root deepens by |E_sn| / tan α_n on the diameter (independent arithmetic here).
    @Test
    void thicknessAllowanceThinsTheToothAndDeepensTheRoot() {
        InvoluteGear plain = TestGears.gear(24, 1, 20, 0, 0, "iso53-c");
        InvoluteGear thinned = new InvoluteGear(24, 1, Math.toRadians(20), 0, 0, -0.03, plain.system());
        assertEquals(plain.normalThicknessMm() - 0.03, thinned.normalThicknessMm(), 1e-12);
        assertEquals(plain.rootDiameterMm() - 0.03 / Math.tan(Math.toRadians(20)), thinned.rootDiameterMm(), 1e-12);
        assertEquals(plain.tipDiameterMm(), thinned.tipDiameterMm(), 1e-12);
        assertTrue(thinned.normalThicknessAtMm(thinned.tipDiameterMm()) < plain.normalThicknessAtMm(plain.tipDiameterMm()));
    }

    // Spur gears: transverse and normal values coincide, no lead (ISO 21771 with β = 0).
    @Test
    void spurGearHasNoLeadAndEqualModules() {
        GearData data = GearGeometry.of(TestGears.gear(20, 2, 20, 0, 0));
        assertEquals(2.0, data.transverseModuleMm(), 1e-15);
        assertTrue(data.leadMm().isEmpty());
        assertEquals(0.0, data.baseHelixAngleDeg(), 0.0);
    }
}
