package org.hobwright.wizard.geometry;

import static org.hobwright.wizard.geometry.TestGears.assertRelative;

import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.geometry.euclidean.threed.Line;
import org.apache.commons.math3.geometry.euclidean.threed.Plane;
import org.apache.commons.math3.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The ISO 21771 relations of FORMULAS.md §1.2 (check cases 2-4, 6 and 22 of §10) against a second
 * derivation that shares no formula with the production code: sections of the basic rack's flank plane
 * and its line of action (commons-math3 3-D geometry), the helix on the base cylinder, the axial pitch,
 * and a general-purpose root finder for the inverse involute. A wrong relation in
 * {@link InvoluteGear} cannot agree with these.
 */
class SecondDerivationTest {

    private static final double TIGHT = 1e-10;

    // The rack of a helical gear, in the frame of its pitch plane: x across the teeth (transverse), y along the
    // gear axis, z the depth. Its flank plane contains the tooth direction (at β to the axis, in the pitch plane)
    // and rises at α_n in the normal section. Cut by the transverse plane y = 0 it gives a line whose angle to the
    // depth direction is the transverse pressure angle α_t (case 2).
    @ParameterizedTest(name = "α_n {0}°, β {1}°")
    @CsvSource({"20, 15", "20, 0", "14.5, 30", "20, 45", "25, 8"})
    void transversePressureAngleIsTheTransverseSectionOfTheRackFlank(double alphaN, double beta) {
        double a = Math.toRadians(alphaN);
        double b = Math.toRadians(beta);
        Vector3D toothDirection = new Vector3D(Math.sin(b), Math.cos(b), 0);
        Vector3D normalInPitchPlane = new Vector3D(Math.cos(b), -Math.sin(b), 0);
        // in the normal section the flank leans by α_n from the depth direction
        Vector3D flankDown = new Vector3D(Math.sin(a), normalInPitchPlane, Math.cos(a), Vector3D.PLUS_K);
        Plane flank = new Plane(Vector3D.ZERO, toothDirection, flankDown, TIGHT);
        Plane transverse = new Plane(Vector3D.ZERO, Vector3D.PLUS_J, TIGHT);
        Line section = flank.intersection(transverse);
        Vector3D d = section.getDirection();
        double alphaT = Math.atan2(Math.abs(d.getX()), Math.abs(d.getZ()));
        InvoluteGear g = TestGears.gear(30, 2, alphaN, beta, 0);
        assertRelative(alphaT, g.transversePressureAngleRad(), 1e-12, "α_t");
    }

    // Law of gearing: the common normal of the rack flank at the pitch point (the line of action) is tangent to
    // the base circle, so the base radius is the distance from the gear centre to that normal in the transverse
    // plane (case 3, d_b 58.1269 for the §1.5 gear). The reference circle is where z transverse pitches fit.
    @ParameterizedTest(name = "z {0}, m_n {1}, α_n {2}°, β {3}°")
    @CsvSource({"30, 2, 20, 15", "20, 2, 20, 0", "17, 1.5, 14.5, 30", "100, 0.5, 20, 45"})
    void baseCircleIsTheDistanceToTheLineOfAction(int z, double mn, double alphaN, double beta) {
        double b = Math.toRadians(beta);
        double transversePitch = Math.PI * mn / Math.cos(b);
        double r = z * transversePitch / (2 * Math.PI);
        double alphaT = Math.atan(Math.tan(Math.toRadians(alphaN)) / Math.cos(b));
        Vector3D pitchPoint = new Vector3D(r, 0, 0);
        // the flank leans by α_t from the radial (depth) direction; its normal is turned a right angle from it
        Vector3D flankDirection = new Vector3D(-Math.cos(alphaT), Math.sin(alphaT), 0);
        Vector3D normal = Vector3D.PLUS_K.crossProduct(flankDirection);
        Line lineOfAction = new Line(pitchPoint, pitchPoint.add(normal), TIGHT);
        double baseRadius = lineOfAction.distance(Vector3D.ZERO);
        InvoluteGear g = TestGears.gear(z, mn, alphaN, beta, 0);
        assertRelative(2 * r, g.referenceDiameterMm(), 1e-12, "d");
        assertRelative(2 * baseRadius, g.baseDiameterMm(), 1e-12, "d_b");
    }

    // Every helix of the flank has the gear's lead. The lead is z axial pitches, the axial pitch being the normal
    // pitch π m_n divided by sin β (case 6, p_z 728.291); on the base cylinder the same lead gives the base
    // helix angle, tan β_b = π d_b / p_z (case 4, β_b 14.0761°).
    @ParameterizedTest(name = "z {0}, m_n {1}, α_n {2}°, β {3}°")
    @CsvSource({"30, 2, 20, 15", "17, 1.5, 14.5, 30", "100, 0.5, 20, 45", "12, 3, 25, 8"})
    void leadAndBaseHelixFromTheAxialPitch(int z, double mn, double alphaN, double beta) {
        double axialPitch = Math.PI * mn / Math.sin(Math.toRadians(beta));
        double lead = z * axialPitch;
        InvoluteGear g = TestGears.gear(z, mn, alphaN, beta, 0);
        assertRelative(lead, g.leadMm(), 1e-12, "p_z");
        assertRelative(Math.atan(Math.PI * g.baseDiameterMm() / lead), g.baseHelixAngleRad(), 1e-12, "β_b");
    }

    // Inverse involute (case 22, inv α = 0.05 → 29.3377°) against commons-math3's Brent root finder.
    @ParameterizedTest(name = "inv α = {0}")
    @CsvSource({"0.05", "0.0149044", "1e-6", "0.3", "1.2"})
    void inverseInvoluteAgreesWithARootFinder(double q) {
        double alpha = new BrentSolver(1e-15).solve(200, a -> Math.tan(a) - a - q, 1e-9, 1.4);
        assertRelative(alpha, Involute.inverse(q), 1e-12, "α");
    }
}
