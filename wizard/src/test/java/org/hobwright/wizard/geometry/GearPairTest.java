package org.hobwright.wizard.geometry;

import static org.hobwright.wizard.geometry.TestGears.gear;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The gear-pair relations ({@link GearPair}, FORMULAS.md §3.4) against the worked examples of SDP/SI
 * <i>Elements of Metric Gear Technology</i>, Section 4 (profile-shifted spur pair and normal-system helical
 * pair; the printed digits are quoted from memory and agree with the relations to all of them), and against
 * two gears meshed as polygons ({@link MeshedPolygons}), which share no formula with the production code.
 */
class GearPairTest {

    private static InvoluteGear withAllowance(InvoluteGear g, double e) {
        return g.withThicknessAllowance(e);
    }

    // SDP/SI Section 4, profile-shifted spur pair: m 3, α 20°, z 12 / 24, x 0.6 / 0.36 → inv α_w 0.034316,
    // α_w 26.0886°, centre distance modification y 0.83329, a 56.4999 mm.
    @Test
    void spurPairOfThePublishedExample() {
        GearPair p = GearPair.of(gear(12, 3, 20, 0, 0.6), 24, 0.36, 0);
        assertEquals(54, p.referenceCentreDistanceMm(), 1e-12, "a_d = (z₁ + z₂) m / 2");
        double a = p.centreDistanceWithoutBacklashMm(0.96);
        assertEquals(56.4999, a, 5e-5, "a");
        assertEquals(0.83329, a / 3 - 18, 5e-6, "y = a/m − (z₁ + z₂)/2");
        assertEquals(26.0886, Math.toDegrees(p.workingPressureAngleRad(a)), 5e-5, "α_w");
        assertEquals(0.034316, Involute.inv(p.workingPressureAngleRad(a)), 5e-7, "inv α_w");
        assertEquals(0.96, p.profileShiftSum(a), 1e-9, "x₁ + x₂ back from a");
        assertEquals(0, p.normalBacklashMm(a), 1e-9, "no backlash at the centre distance without backlash");
    }

    // SDP/SI Section 4, helical pair in the normal system: m_n 3, α_n 20°, β 30°, z 12 / 60, x_n 0.09809 / 0 →
    // α_t 22.79588°, inv α_wt 0.023405, α_wt 23.1126°, y 0.09744, a 125.000 mm.
    @Test
    void helicalPairOfThePublishedExample() {
        GearPair p = GearPair.of(gear(12, 3, 20, 30, 0.09809), 60, 0, 0);
        assertEquals(22.79588, Math.toDegrees(p.gear().transversePressureAngleRad()), 5e-6, "α_t");
        assertEquals(124.7077, p.referenceCentreDistanceMm(), 5e-5, "a_d = (z₁ + z₂) m_n / (2 cos β)");
        assertEquals(23.1126, Math.toDegrees(p.workingPressureAngleRad(125)), 5e-5, "α_wt at a 125");
        assertEquals(0.023405, Involute.inv(p.workingPressureAngleRad(125)), 5e-7, "inv α_wt");
        assertEquals(0.09809, p.profileShiftSum(125), 2e-5, "x₁ + x₂ the published a implies");
        assertEquals(125.000, p.centreDistanceWithoutBacklashMm(0.09809), 5e-4, "a");
    }

    // Brute force: the centre distance at which the two polygon gears just touch on both flanks, for pairs
    // with and without shifts, allowances, helix; and the backlash at a centre distance a little larger.
    @ParameterizedTest(name = "z {0}/{3}, m {6}, β {7}°, x {1}/{4}, E {2}/{5}")
    @CsvSource({
        "12, 0.6, 0, 24, 0.36, 0, 3, 0",
        "20, 0, 0, 31, 0, 0, 2, 0",
        "17, 0.3, -0.05, 40, -0.2, -0.08, 2.5, 0",
        "12, 0.09809, 0, 60, 0, 0, 3, 30",
        "23, 0.2, -0.04, 35, 0.1, -0.06, 2, 18"})
    void centreDistanceAndBacklashAgreeWithMeshedPolygons(int z1, double x1, double e1, int z2, double x2, double e2,
                                                         double m, double beta) {
        InvoluteGear g1 = withAllowance(gear(z1, m, 20, beta, x1), e1);
        GearPair pair = GearPair.of(g1, z2, x2, e2);
        MeshedPolygons mesh = new MeshedPolygons(m, Math.toRadians(20), Math.toRadians(beta), z1, x1, e1,
                g1.tipDiameterMm(), z2, x2, e2, pair.mate().tipDiameterMm());
        // the tight centre distance of the thinned teeth: backlash 0 there
        double tight = mesh.centreDistanceWithoutBacklash(pair.referenceCentreDistanceMm() - m,
                pair.referenceCentreDistanceMm() + 2 * m);
        assertEquals(0, pair.normalBacklashMm(tight), 3e-5, "backlash at the brute-force tight centre distance");
        // with allowances 0 it is the centre distance the shifts imply
        if (e1 == 0 && e2 == 0) {
            assertEquals(tight, pair.centreDistanceWithoutBacklashMm(x1 + x2), 5e-5, "a without backlash");
            assertEquals(x1 + x2, pair.profileShiftSum(tight), 5e-5, "x₁ + x₂ back from the tight centre distance");
        }
        double open = tight + 0.05 * m;
        assertEquals(mesh.normalBacklash(open), pair.normalBacklashMm(open), 3e-5, "backlash 0.05 m farther apart");
    }

    // At any centre distance, thinning the teeth by the normal allowances E₁ and E₂ opens the normal backlash by
    // −(E₁ + E₂) cos α_n (derived: s_wt changes by E/cos β · d_w/d = E cos α_t/(cos β cos α_wt), times
    // cos α_wt cos β_b, and cos α_t cos β_b = cos α_n cos β); the same relation j_bn = −(E_sn1 + E_sn2) cos α_n
    // at the nominal centre distance is in ISO/TR 10064-2:1996 (clause from memory).
    @Test
    void allowancesOpenTheBacklashByTheirNormalProjection() {
        InvoluteGear g1 = gear(23, 2, 20, 18, 0.2);
        for (double a : new double[] {59.2, 60.0, 61.3}) {
            double nominal = GearPair.of(g1, 35, 0.1, 0).normalBacklashMm(a);
            double thinned = GearPair.of(withAllowance(g1, -0.04), 35, 0.1, -0.06).normalBacklashMm(a);
            assertEquals(0.10 * Math.cos(Math.toRadians(20)), thinned - nominal, 1e-12, "Δj_bn at a " + a);
        }
    }

    @Test
    void tooCloseACentreDistanceHasNoWorkingPressureAngle() {
        GearPair p = GearPair.of(gear(20, 2, 20, 0, 0), 31, 0, 0);
        // a_d cos α_t = 51 cos 20° = 47.924 mm: the base circles would touch
        assertEquals(51 * Math.cos(Math.toRadians(20)), p.smallestCentreDistanceMm(), 1e-9, "a_d cos α_t");
        assertTrue(Double.isNaN(p.workingPressureAngleRad(47.9)), "below it");
        assertEquals(0, p.workingPressureAngleRad(p.smallestCentreDistanceMm()), 1e-12, "at it");
    }

    // Tip clearance c = a − d_a1/2 − d_f2/2 with the diameters of the tooth system: a standard ISO 53 A pair at
    // the reference centre distance has c = h_fP − h_aP = 0.25 m on both sides.
    @Test
    void standardPairHasAQuarterModuleOfTipClearance() {
        GearPair p = GearPair.of(gear(20, 2, 20, 0, 0), 31, 0, 0);
        assertEquals(0.5, p.tipClearanceMm(51, p.gear().tipDiameterMm()), 1e-12, "c₁");
        assertEquals(0.5, p.mateTipClearanceMm(51), 1e-12, "c₂");
    }
}
