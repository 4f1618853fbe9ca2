package org.hobwright.wizard.plan;

import java.util.ArrayList;
import java.util.List;
import org.hobwright.api.cycle.CycleStep;
import org.hobwright.api.cycle.PassSummary;

/**
 * Builds the ordered steps of a cycle.
 *
 * <pre>
 * header steps (comments, swivel, hob shift)
 * sync on → settle dwell → coolant on
 * per pass k (depth h_k, feed f_k, approach E_k, overrun U_k, clearances c_ax and c_r), in the
 * cut's own coordinate u (0 at the face where the hob enters, b at the face where it leaves):
 *   rapid to start          at the safe diameter (the machine's radial maximum, never below the retract
 *                           diameter; first pass only: the axis along the work alone), u = −(E_k + c_ax)
 *   rapid down              to the retract diameter (the radial axis alone)
 *   rapid in air            (pass diameter + 2 c_r, same axial position)
 *   radial infeed in air    feed to the pass diameter
 *   axial feed              to u = b + U_k + c_ax (approach + face + overrun), cutting
 *   retract                 rapid to the retract diameter
 *   return                  rapid back to u = −(E_k + c_ax)
 * rapid out to the safe diameter (the radial axis alone)
 * coolant off → sync off → spindles stop
 * axial position from the front face: u when the hob feeds toward the back face (feed sign +1),
 * b − u when it feeds toward the front face (feed sign −1); approach and overrun are the same from
 * either face (the hob envelope turned half a turn about the radial axis is the same body).
 * </pre>
 * Times: a feed of length L takes 60 L / (f n₂) s; a rapid moves both axes together at the rapid
 * rate, 60 max(|Δr|, |Δz|) / v_rapid s (common practice, no source); the first rapid to the start
 * is counted from where the last pass of the part before ended; the settle dwell is the machine's;
 * swivel and hob-shift steps take the machine's times ({@link HeaderSteps}); other steps take no
 * time in this estimate.
 */
public final class ToolpathBuilder {
    private ToolpathBuilder() {
    }

    /**
     * Builds the steps.
     *
     * @param g        the fixed geometry
     * @param drive    ratio, senses and differential
     * @param s        speeds, feeds and passes
     * @param header   steps before the synchronisation (comments, swivel, hob shift)
     * @param coolant  true to switch coolant on for the cut
     */
    public static Toolpath build(CycleGeometry g, Drive drive, PlanSettings s, List<CycleStep> header,
                                 boolean coolant) {
        double workRpm = drive.workRpm(s.hobRpm());
        List<CycleStep> steps = new ArrayList<>(header.size() + 8 + 6 * s.passes().count());
        steps.addAll(header);
        steps.add(new CycleStep.SyncOn(drive.ratio().hobTurns(), drive.ratio().workTurns(), s.hobRpm(), workRpm,
                drive.senses().hob(), drive.senses().work(), drive.differentialDegPerMm(), 0));
        steps.add(new CycleStep.Dwell(g.syncSettleS()));
        if (coolant) {
            steps.add(new CycleStep.Coolant(true));
        }
        double retract = g.retractDiameterMm();
        double safe = Math.max(g.safeDiameterMm(), retract);
        int sign = drive.senses().feedSign();
        double t = 0;               // the seconds of steps[0, counted): each step is added once
        int counted = 0;
        List<PassSummary> passes = new ArrayList<>(s.passes().count());
        double ax = Double.NaN;
        for (int i = 0; i < s.passes().count(); i++) {
            int pass = i + 1;
            double depth = s.passes().depth(i);
            double feed = s.feed(i);
            double approach = g.approachMm(depth);
            double overrun = g.overrunMm(depth);
            double start = axial(g, sign, -(approach + g.axialClearanceMm()));
            double end = axial(g, sign, g.faceWidthMm() + overrun + g.axialClearanceMm());
            double passDia = g.touchOffDiameterMm() - 2 * depth;
            double t0 = sum(steps, counted, t);
            counted = steps.size();
            t = t0;
            if (Double.isNaN(ax)) {
                double lastEnd = axial(g, sign, g.faceWidthMm() + g.overrunMm(s.passes().depth(s.passes().count() - 1))
                        + g.axialClearanceMm());
                steps.add(rapid(g, pass, safe, lastEnd, safe, start));
                steps.add(rapid(g, pass, safe, start, retract, start));
            } else {
                steps.add(rapid(g, pass, retract, ax, retract, start));
            }
            steps.add(rapid(g, pass, retract, start, passDia + 2 * g.radialClearanceMm(), start));
            steps.add(new CycleStep.Feed(pass, passDia, start, feed, false,
                    Kinematics.feedSeconds(g.radialClearanceMm(), feed, workRpm), g.hobOutsideDiameterMm()));
            steps.add(new CycleStep.Feed(pass, passDia, end, feed, true,
                    Kinematics.feedSeconds(Math.abs(end - start), feed, workRpm), g.hobOutsideDiameterMm()));
            steps.add(rapid(g, pass, passDia, end, retract, end));
            steps.add(rapid(g, pass, retract, end, retract, start));
            ax = start;
            t = sum(steps, counted, t);
            counted = steps.size();
            passes.add(new PassSummary(pass, passDia, depth, feed, approach, overrun, Math.abs(end - start),
                    t - t0));
        }
        steps.add(rapid(g, 0, retract, ax, safe, ax));
        if (coolant) {
            steps.add(new CycleStep.Coolant(false));
        }
        steps.add(new CycleStep.SyncOff(0));
        steps.add(new CycleStep.SpindlesStop(0));
        return new Toolpath(steps, passes, sum(steps, counted, t));
    }

    /** Axial position from the front face of a position u in the cut's own coordinate. */
    private static double axial(CycleGeometry g, int feedSign, double u) {
        return feedSign > 0 ? u : g.faceWidthMm() - u;
    }

    private static CycleStep.Rapid rapid(CycleGeometry g, int pass, double fromDia, double fromAx, double toDia,
                                         double toAx) {
        double move = Math.max(Math.abs(fromDia - toDia) / 2, Math.abs(fromAx - toAx));
        return new CycleStep.Rapid(pass, toDia, toAx, 60.0 * move / g.rapidMmPerMin(), g.hobOutsideDiameterMm());
    }

    /** {@code before} plus the seconds of the steps from {@code from} on. */
    private static double sum(List<CycleStep> steps, int from, double before) {
        double t = before;
        for (int i = from; i < steps.size(); i++) {
            t += steps.get(i).seconds();
        }
        return t;
    }
}
