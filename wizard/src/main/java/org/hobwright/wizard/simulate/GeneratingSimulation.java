package org.hobwright.wizard.simulate;

import java.util.List;
import java.util.Optional;
import org.hobwright.api.check.Finding;
import org.hobwright.api.cycle.GearData;
import org.hobwright.api.cycle.SimulationData;
import org.hobwright.api.job.GearSpec;
import org.hobwright.api.job.HobJob;
import org.hobwright.wizard.geometry.ToothSystem;

/**
 * Generating simulation of one tooth space: the hob as its straight-sided basic rack, cutting
 * only where a gash's edges pass (z₀ · i times per hob turn, the work turning Δφ = 2π z₀/(i z)
 * between two passes), in the transverse plane of the gear.
 *
 * <p>The cut profile is found along the normals of the profile continuous rolling would generate
 * (involute, fillet, root): along each normal the boundary is where the line first enters one of
 * the cut rack positions. Lines meet straight flanks, tip lines and (after scaling X by cos β)
 * circles, so every boundary point is exact; only the spacing of the normals is a resolution.
 */
public final class GeneratingSimulation {
    /** Default spacing of the profile points, mm. */
    public static final double RESOLUTION_MM = 0.001;
    /** Most points per side of the tooth space before the spacing is widened. */
    static final int MAX_POINTS_PER_SIDE = 8000;
    /** Spacing of the profile points in {@link #simulate}, as a fraction of the module (about 75 points a side). */
    static final double REPORT_SPACING = 0.04;

    private GeneratingSimulation() {
    }

    /**
     * Simulates the job's gear as its hob generates it, for the cycle report: profile points about
     * m_n/25 apart (every cusp and touching point is still computed exactly, so the numbers do not
     * depend on the spacing; only the drawn outlines are coarser than {@link #setupOf}'s).
     *
     * @param job  the job (gear, hob)
     * @param gear its computed geometry ({@link org.hobwright.wizard.geometry.GearGeometry})
     * @return the simulation results
     * @throws SimulationInputException when the job cannot be simulated (names the field and the fix)
     */
    public static SimulationData simulate(HobJob job, GearData gear) {
        double mn = job.gear().moduleMm();
        return run(setupOf(job, gear, Math.max(RESOLUTION_MM, REPORT_SPACING * mn))).toData();
    }

    /**
     * {@link #simulate} for a cycle planner: a job the simulation cannot run on gives a
     * {@link SimulationCode#SIM_NOT_RUN} warning (naming the field and the fix) and no simulation.
     *
     * @param job      the job
     * @param gear     its geometry
     * @param findings receives the warning
     * @return the simulation, when it ran
     */
    public static Optional<SimulationData> forCycle(HobJob job, GearData gear, List<Finding> findings) {
        try {
            return Optional.of(simulate(job, gear));
        } catch (SimulationInputException e) {
            findings.add(SimulationCode.SIM_NOT_RUN.at(e.field(), "the generating simulation cannot run: "
                    + e.getMessage(), e.fix()));
            return Optional.empty();
        }
    }

    /**
     * The simulation inputs of a job: the gear's tooth system gives the hob addendum h_aP0 = h_fP and
     * tip radius ρ_aP0 = ρ_fP; the thickness allowance E_sn enters as extra shift E_sn / (2 m_n tan α_n)
     * (FORMULAS.md §2.1); the cuts are phased to put one on the centre of the space. Points 1 µm apart,
     * or wider when a side would need more than {@value #MAX_POINTS_PER_SIDE}.
     */
    public static GeneratingSetup setupOf(HobJob job, GearData gear) {
        return setupOf(job, gear, Math.max(RESOLUTION_MM, 6 * job.gear().moduleMm() / MAX_POINTS_PER_SIDE));
    }

    /** As {@link #setupOf(HobJob, GearData)} with the spacing of the profile points given, mm. */
    public static GeneratingSetup setupOf(HobJob job, GearData gear, double resolutionMm) {
        GearSpec g = job.gear();
        Optional<ToothSystem> system = ToothSystem.of(g);
        if (system.isEmpty()) {
            throw new SimulationInputException("gear.toothSystem", "tooth system \"" + g.toothSystem()
                    + "\" is not known", "use one of " + String.join(", ", ToothSystem.ids()));
        }
        double mn = g.moduleMm();
        if (Math.abs(job.hob().moduleMm() - mn) > 1e-9 * mn) {
            throw new SimulationInputException("hob.module", "the hob's module " + job.hob().moduleMm()
                    + " mm differs from the gear's " + mn + " mm", "use a hob of the gear's pitch");
        }
        if (Math.abs(job.hob().pressureAngleDeg() - g.pressureAngleDeg()) > 1e-9) {
            throw new SimulationInputException("hob.pressureAngle", "the hob's pressure angle "
                    + job.hob().pressureAngleDeg() + "° differs from the gear's " + g.pressureAngleDeg() + "°",
                    "use a hob of the gear's pressure angle");
        }
        double alphaN = Math.toRadians(g.pressureAngleDeg());
        double shift = g.profileShift() + g.thicknessAllowanceMm() / (2 * mn * Math.tan(alphaN));
        ToothSystem ts = system.get();
        GeneratingSetup setup = new GeneratingSetup(g.teeth(), mn, alphaN, Math.toRadians(g.helixAngleDeg()), shift,
                ts.dedendumMm(mn), ts.rootRadiusFactor() * mn, gear.tipDiameterMm(), job.hob().starts(),
                job.hob().gashes(), 0, resolutionMm);
        if (!setup.rack().hasTipFlat()) {
            throw new SimulationInputException("gear.toothSystem", "the hob tip radius " + ts.rootRadiusFactor()
                    + "·m leaves no room on the hob tooth tip", "use a smaller root radius factor");
        }
        return setup;
    }

    /**
     * Runs the simulation on explicit inputs.
     *
     * @param setup the inputs
     * @return the detailed results
     */
    public static ToothSpaceSimulation run(GeneratingSetup setup) {
        NominalPath path = new NominalPath(setup);
        FlankCut right = new FlankCut(path, setup.phase());
        double undercutDepth = UndercutCheck.depth(path, setup.phase());
        // the left flank is the mirror image cut at phase −p; with p a multiple of ½ that is the same cut
        boolean symmetric = Math.rint(2 * setup.phase()) == 2 * setup.phase();
        FlankCut left = symmetric ? right : new FlankCut(path, -setup.phase());
        if (!symmetric) {
            undercutDepth = Math.max(undercutDepth, UndercutCheck.depth(path, -setup.phase()));
        }
        return new ToothSpaceSimulation(path, right, left, Math.max(0, undercutDepth));
    }
}
