package org.hobwright.wizard.setup;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.geometry.euclidean.threed.Rotation;
import org.apache.commons.math3.geometry.euclidean.threed.RotationConvention;
import org.apache.commons.math3.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The hob lead angle and the swivel angle (FORMULAS.md §4.1, §4.2; check cases 26 and 27 of §10) against
 * a construction of the hob thread and the gear's tooth trace as helices in space, with commons-math3's
 * rotations and root finder. Nothing here uses sin γ = z₀ m_n / d_m0 or η = β − γ.
 */
class HobThreadCrossCheckTest {

    /** Unit tangent of a helix of signed lead (positive: right hand) about {@code axis}, at the point on radius {@code radial}. */
    private static Vector3D helixTangent(Vector3D axis, Vector3D radial, double radius, double signedLead) {
        Vector3D e2 = axis.crossProduct(radial);
        return new Vector3D(radius, e2, signedLead / (2 * Math.PI), axis).normalize();
    }

    // The hob thread is a helix on the reference cylinder d_m0 whose lead is z₀ axial pitches; its pitch measured
    // square to the thread must be the gear's normal pitch π m_n. Solve that for the axial pitch with a root
    // finder, then read the lead angle off the helix: m_n 2, d_m0 65 → 1.76323° (case 26).
    @ParameterizedTest(name = "z₀ {0}, m_n {1}, d_m0 {2}")
    @CsvSource({"1, 2, 65", "2, 2, 65", "3, 4, 80", "1, 0.8, 22", "1, 1, 29.5"})
    void leadAngleMakesTheNormalPitchOfTheThreadTheGearsPitch(int starts, double mn, double dm0) {
        Vector3D axis = Vector3D.PLUS_J;
        Vector3D radial = Vector3D.MINUS_I;
        double axialPitch = new BrentSolver(1e-14).solve(200, px -> {
            Vector3D t = helixTangent(axis, radial, dm0 / 2, starts * px);
            // adjacent threads are one axial pitch apart along the axis; square to the thread that is px·|t × axis|
            return px * t.crossProduct(axis).getNorm() - Math.PI * mn;
        }, Math.PI * mn * 0.5, Math.PI * mn * 2);
        Vector3D t = helixTangent(axis, radial, dm0 / 2, starts * axialPitch);
        double gamma = Math.toDegrees(Math.asin(Math.abs(t.dotProduct(axis))));
        assertEquals(gamma, HobSetup.leadAngleDeg(starts, mn, dm0), 1e-9);
    }

    // Swivel: gear axis Z, hob on the +X side, its axis along Y before it is swivelled about X (the common
    // perpendicular of the two axes). At the contact point the hob thread (on the hob's side facing the gear)
    // must run along the gear's tooth trace. The root finder gives the swivel that makes them parallel; its
    // magnitude is the setting, and its sign relative to the formula's is the same in every case
    // (case 27: β +15°, RH hob 13.2368°, LH hob 16.7632°; spur gear η = ∓γ).
    @ParameterizedTest(name = "β {0}°, γ {1}°")
    @CsvSource({"15, 1.76323", "15, -1.76323", "0, 1.76323", "0, -1.76323", "-15, -1.76323", "-15, 1.76323",
        "30, 3.52812", "-22.5, 2.5", "8, -4"})
    void swivelPutsTheThreadAlongTheToothTrace(double beta, double gamma) {
        double r = 30;
        double hobRadius = 32.5;
        Vector3D trace = helixTangent(Vector3D.PLUS_K, Vector3D.PLUS_I, r,
                beta == 0 ? Double.POSITIVE_INFINITY : 2 * Math.PI * r / Math.tan(Math.toRadians(beta)));
        if (beta == 0) {
            trace = Vector3D.PLUS_K;
        }
        double hobLead = 2 * Math.PI * hobRadius * Math.tan(Math.toRadians(gamma));
        Vector3D target = trace;
        double eta = new BrentSolver(1e-14).solve(200, s -> {
            Rotation swivel = new Rotation(Vector3D.PLUS_I, s, RotationConvention.VECTOR_OPERATOR);
            Vector3D thread = helixTangent(swivel.applyTo(Vector3D.PLUS_J), Vector3D.MINUS_I, hobRadius, hobLead);
            // signed angle from the trace to the thread about X (both lie in the YZ plane)
            return Vector3D.PLUS_I.dotProduct(target.crossProduct(thread));
        }, -1.2, 1.2);
        double formula = HobSetup.swivelAngleDeg(beta, gamma);
        assertEquals(Math.abs(Math.toDegrees(eta)), Math.abs(formula), 1e-9, "magnitude");
        if (formula != 0) {
            assertEquals(-Math.signum(formula), Math.signum(eta), "one sign convention for every case");
        }
    }
}
