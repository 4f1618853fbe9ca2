package org.hobwright.wizard.simulate;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import org.hobwright.api.cycle.Point;
import org.hobwright.api.cycle.SimulationData;

/**
 * Detailed results of one simulated tooth space. Gear frame: centre at the origin, tooth space
 * centred on +y, mm. Deviations are positive where material is left standing.
 */
public final class ToothSpaceSimulation {
    private final NominalPath path;
    private final FlankCut right;
    private final FlankCut left;
    private final double undercutDepthMm;

    ToothSpaceSimulation(NominalPath path, FlankCut right, FlankCut left, double undercutDepthMm) {
        this.path = path;
        this.right = right;
        this.left = left;
        this.undercutDepthMm = undercutDepthMm;
    }

    /** The inputs. */
    public GeneratingSetup setup() {
        return path.setup;
    }

    /** Largest deviation of either cut flank from the true involute over the active involute, transverse plane, mm. */
    public double profileDeviationMaxMm() {
        return Math.max(right.maxInvoluteExcess(), left.maxInvoluteExcess());
    }

    /** Roll length of the reference circle on the involute, r_b tan α_t, mm. */
    public double referenceRollMm() {
        return path.rb * Math.tan(path.setup.transversePressureAngleRad());
    }

    /**
     * Enveloping-cut depth at the reference circle measured on the cut right flank, transverse
     * plane, mm (NaN when no two cuts meet on the involute).
     */
    public double envelopingDepthTransverseMm() {
        return right.cuspHeightAt(referenceRollMm());
    }

    /** The same normal to the flank: transverse depth · cos β_b, mm. */
    public double envelopingDepthMm() {
        return envelopingDepthTransverseMm() * Math.cos(path.setup.baseHelixAngleRad());
    }

    /** {@link EnvelopingDepth#closedFormMm} for these inputs, normal to the flank, mm. */
    public double closedFormEnvelopingDepthMm() {
        GeneratingSetup s = path.setup;
        return EnvelopingDepth.closedFormMm(s.normalModuleMm(), s.teeth(), s.starts(), s.gashes(), s.pressureAngleRad(),
                s.helixAngleRad());
    }

    /** True when a cut reaches inside the true involute (deeper than {@link UndercutCheck#TOLERANCE_MM}). */
    public boolean undercut() {
        return undercutDepthMm > UndercutCheck.TOLERANCE_MM;
    }

    /** Deepest reach of a cut inside the true involute, mm (0 without undercut). */
    public double undercutDepthMm() {
        return undercutDepthMm;
    }

    /** Diameter where the cut flanks become involute (the larger of the two flanks), mm. */
    public double activeInvoluteStartDiameterMm() {
        return 2 * Math.max(right.involuteStartRadius, left.involuteStartRadius);
    }

    /**
     * Root form diameter from the rack alone: where the straight flank's end point meets the
     * involute, d_Ff = 2 √(r_b² + L_E²), L_E its roll length; the base diameter when L_E ≤ 0 (the
     * flank then works past the interference point). mm.
     */
    public double rootFormDiameterMm() {
        return 2 * Math.hypot(path.rb, Math.max(0, path.rollAtFlankEnd));
    }

    /** The cut outline, left tip to root to right tip. */
    public List<Point> simulatedProfile() {
        return outline(left.bx, left.by, right.bx, right.by);
    }

    /** The outline continuous rolling would cut (involute, fillet, root), left tip to right tip. */
    public List<Point> nominalProfile() {
        return outline(path.x, path.y, path.x, path.y);
    }

    /** The cut outline with every deviation multiplied by {@code factor}, for drawing. */
    public List<Point> exaggeratedProfile(double factor) {
        int n = path.size;
        double[] lx = new double[n];
        double[] ly = new double[n];
        double[] rx = new double[n];
        double[] ry = new double[n];
        for (int i = 0; i < n; i++) {
            lx[i] = path.x[i] + factor * left.excess[i] * path.nx[i];
            ly[i] = path.y[i] + factor * left.excess[i] * path.ny[i];
            rx[i] = path.x[i] + factor * right.excess[i] * path.nx[i];
            ry[i] = path.y[i] + factor * right.excess[i] * path.ny[i];
        }
        return outline(lx, ly, rx, ry);
    }

    /**
     * Deviation of the right flank from the true involute: x = roll length, y = deviation, mm; the
     * exact cusps and the touching points of the cuts included, so even a coarse sampling shows
     * every scallop.
     */
    public List<Point> deviation() {
        List<Point> pts = new ArrayList<>();
        for (int i = 0; i < path.size; i++) {
            if (path.kind[i] == NominalPath.FLANK) {
                pts.add(new Point(path.rollOfLambda(path.param[i]), right.excess[i]));
            }
        }
        for (double[] c : right.cusps) {
            pts.add(new Point(c[0], c[1]));
        }
        // where each cut touches the involute the deviation is 0
        double first = path.rollOfLambda(path.lambdaStart);
        double last = path.rollOfLambda(path.lambdaEnd);
        CutEnvelope env = new CutEnvelope(path, path.setup.phase());
        for (int k = env.firstPosition(); k <= env.lastPosition(); k++) {
            double roll = path.rollOfPosition(env.angle(k));
            if (roll > first && roll < last) {
                pts.add(new Point(roll, 0));
            }
        }
        pts.sort(Comparator.comparingDouble(Point::x));
        return pts;
    }

    /** Cut right-flank points below the active involute (the fillet and root), gear frame, root first. */
    public List<Point> rightRoot() {
        List<Point> pts = new ArrayList<>();
        for (int i = 0; i < path.size && path.kind[i] != NominalPath.FLANK; i++) {
            pts.add(new Point(right.bx[i], right.by[i]));
        }
        return pts;
    }

    /** Cut right-flank points on the involute, gear frame, root to tip. */
    public List<Point> rightInvolute() {
        List<Point> pts = new ArrayList<>();
        for (int i = 0; i < path.size; i++) {
            if (path.kind[i] == NominalPath.FLANK) {
                pts.add(new Point(right.bx[i], right.by[i]));
            }
        }
        return pts;
    }

    /**
     * The true involute of the right flank from the base circle to the tip, gear frame:
     * polar angle ψ₀ + inv α at radius r_b / cos α ({@link GeneratingSetup#flankBaseAngleRad}).
     *
     * @param points number of points, at least 2
     */
    public List<Point> trueInvolute(int points) {
        GeneratingSetup s = path.setup;
        double rollTip = Math.sqrt(Math.max(0, s.tipRadiusMm() * s.tipRadiusMm() - path.rb * path.rb));
        List<Point> pts = new ArrayList<>(points);
        for (int i = 0; i < points; i++) {
            double alpha = Math.atan(rollTip * i / (points - 1) / path.rb);
            double rr = path.rb / Math.cos(alpha);
            double psi = s.flankBaseAngleRad() + Math.tan(alpha) - alpha;
            pts.add(new Point(rr * Math.sin(psi), rr * Math.cos(psi)));
        }
        return pts;
    }

    /** The results as the api carries them. */
    public SimulationData toData() {
        double measured = envelopingDepthMm();
        return new SimulationData(profileDeviationMaxMm(), Double.isFinite(measured) ? Math.max(0, measured) : 0,
                closedFormEnvelopingDepthMm(), undercut(), activeInvoluteStartDiameterMm(), simulatedProfile(),
                nominalProfile(), deviation());
    }

    private List<Point> outline(double[] lx, double[] ly, double[] rx, double[] ry) {
        int n = path.size;
        List<Point> pts = new ArrayList<>(2 * n);
        for (int i = n - 1; i >= 1; i--) {
            pts.add(new Point(-lx[i], ly[i]));
        }
        pts.add(new Point((rx[0] - lx[0]) / 2, (ry[0] + ly[0]) / 2));
        for (int i = 1; i < n; i++) {
            pts.add(new Point(rx[i], ry[i]));
        }
        return pts;
    }
}
