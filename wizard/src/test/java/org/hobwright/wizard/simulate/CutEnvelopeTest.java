package org.hobwright.wizard.simulate;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/** The fast parts of the simulation against slow, obvious versions of themselves. */
class CutEnvelopeTest {
    private static final GeneratingSetup[] SETUPS = {
        Jobs.setup(24, 2, 0, 0.1, "iso53-a", 1, 12),
        Jobs.setup(12, 1, 0, 0, "iso53-a", 1, 12),      // undercut
        Jobs.setup(15, 4, 30, 0.3, "iso53-d", 3, 10),   // helical, three starts, few gashes
        Jobs.setup(40, 1, 0, 0, "iso53-c", 2, 9),
    };

    /** The search outward from the nominal contact finds the same boundary as trying every position. */
    @Test
    void windowedSearchEqualsTheFullScan() {
        for (GeneratingSetup s : SETUPS) {
            NominalPath path = new NominalPath(s);
            for (double phase : new double[] {0, 0.37, -0.61}) {
                CutEnvelope env = new CutEnvelope(path, phase);
                int[] out = new int[2];
                int[] hit = new int[1];
                for (int i = 0; i < path.size; i += 7) {
                    double fast = env.boundary(path.x[i], path.y[i], path.nx[i], path.ny[i], path.phi[i], out);
                    double slow = Double.POSITIVE_INFINITY;
                    for (int k = env.firstPosition() - 20; k <= env.lastPosition() + 20; k++) {
                        double t = env.entry(k, path.x[i], path.y[i], path.nx[i], path.ny[i], hit);
                        // only entries near the profile count: a far tooth crossing the same line is not this flank
                        if (t > -0.2 * s.normalModuleMm()) {
                            slow = Math.min(slow, t);
                        }
                    }
                    assertEquals(slow, fast, 1e-12, "point " + i + " of " + s);
                }
            }
        }
    }

    /**
     * The analytic entry of a line into the rounded rack tooth equals the first sign change of the
     * point-in-tooth depth found by stepping along the line (brute force, 1 µm steps, then bisection).
     */
    @Test
    void lineEntryMatchesSteppingAlongTheLine() {
        SplittableRandom random = new SplittableRandom(7L);
        for (GeneratingSetup s : SETUPS) {
            TransverseRack rack = s.rack();
            int[] hit = new int[1];
            int entered = 0;
            for (int n = 0; n < 300; n++) {
                double px = (random.nextDouble() - 0.5) * 4 * s.normalModuleMm();
                double py = -3 * s.normalModuleMm() + random.nextDouble() * 4 * s.normalModuleMm();
                double ang = random.nextDouble() * 2 * Math.PI;
                double dx = Math.cos(ang);
                double dy = Math.sin(ang);
                double t = rack.entry(px, py, dx, dy, hit);
                double stepped = stepEntry(rack, px, py, dx, dy, 6 * s.normalModuleMm());
                if (Double.isInfinite(stepped)) {
                    assertTrue(t > 6 * s.normalModuleMm() || Double.isInfinite(t) || t < -6 * s.normalModuleMm()
                            || rack.depthInside(px + t * dx, py + t * dy) > -1e-9, "missed, but entry " + t);
                } else {
                    assertEquals(stepped, Math.max(t, -6 * s.normalModuleMm()), 1e-9, "line " + n);
                    entered++;
                }
            }
            assertTrue(entered > 100, "most lines meet the tooth: " + entered);
        }
    }

    private static double stepEntry(TransverseRack rack, double px, double py, double dx, double dy, double reach) {
        double step = 1e-3;
        double prev = -reach;
        if (rack.depthInside(px + prev * dx, py + prev * dy) >= 0) {
            return prev;
        }
        for (double t = -reach + step; t <= reach; t += step) {
            if (rack.depthInside(px + t * dx, py + t * dy) >= 0) {
                double lo = prev;
                double hi = t;
                for (int i = 0; i < 80; i++) {
                    double mid = (lo + hi) / 2;
                    if (rack.depthInside(px + mid * dx, py + mid * dy) >= 0) {
                        hi = mid;
                    } else {
                        lo = mid;
                    }
                }
                return hi;
            }
            prev = t;
        }
        return Double.POSITIVE_INFINITY;
    }

    /**
     * Each cusp the simulation reports (crossing of two neighbouring flank lines) is a local maximum
     * of the material measured along the involute normals, and has that height.
     */
    @Test
    void cuspsAreTheLocalMaximaOfTheEnvelope() {
        for (GeneratingSetup s : SETUPS) {
            NominalPath path = new NominalPath(s);
            FlankCut cut = new FlankCut(path, 0.2);
            CutEnvelope env = new CutEnvelope(path, 0.2);
            double[] c = new double[7];
            int[] out = new int[2];
            assertTrue(cut.cusps.size() > 3);
            for (double[] cusp : cut.cusps) {
                double lambda = (cusp[0] - path.rollAtFlankEnd) * path.rack.sinA / path.rack.cosA;
                double[] t = new double[3];
                for (int j = -1; j <= 1; j++) {
                    path.contact(NominalPath.FLANK, lambda + j * 1e-4, c);
                    t[j + 1] = env.boundary(c[0], c[1], c[2], c[3], c[4], out);
                }
                assertEquals(cusp[1], t[1], 1e-9 * s.normalModuleMm() + 1e-6 * cusp[1], "cusp height at " + cusp[0]);
                assertTrue(t[0] < t[1] && t[2] < t[1], "local maximum at " + cusp[0]);
            }
        }
    }
}
