package org.hobwright.post.nc;

import java.util.ArrayList;
import java.util.List;
import org.hobwright.api.cycle.CycleStep;
import org.hobwright.api.cycle.HobCycle;
import org.hobwright.api.job.Units;

/**
 * Builds the program model from a cycle: start, header, units and feed mode, the safe start, the tool
 * call, one or two ops per step, the safe end, the end.
 */
final class NcProgramBuilder {
    private NcProgramBuilder() {
    }

    /**
     * The program model.
     *
     * @param cycle  a cycle without errors
     * @param header the header comment lines
     * @param units  the job's units
     * @param safeDiameterMm the machine's safe radial position, as a work diameter, mm
     */
    static NcProgram build(HobCycle cycle, List<String> header, Units units, double safeDiameterMm) {
        List<NcOp> ops = new ArrayList<>();
        ops.add(new NcOp.Fixed(TemplateKey.PROGRAM_START));
        header.forEach(h -> ops.add(new NcOp.Remark(h)));
        ops.add(new NcOp.Fixed(units == Units.MM ? TemplateKey.UNITS_MM : TemplateKey.UNITS_IN));
        ops.add(new NcOp.Fixed(TemplateKey.FEED_PER_REV));
        ops.add(new NcOp.Safe(TemplateKey.SAFE_START, safeDiameterMm));
        ops.add(new NcOp.Fixed(TemplateKey.TOOL_CALL));
        for (CycleStep step : cycle.steps()) {
            if (step instanceof CycleStep.Swivel s && !s.programmable()) {
                continue;       // a manual holder: the setter sets it (header and setup sheet), no block
            }
            ops.add(op(step));
        }
        ops.add(new NcOp.Safe(TemplateKey.SAFE_END, safeDiameterMm));
        ops.add(new NcOp.Fixed(TemplateKey.PROGRAM_END));
        return new NcProgram(ops);
    }

    private static NcOp op(CycleStep step) {
        if (step instanceof CycleStep.Comment c) {
            return new NcOp.Remark(c.text());
        } else if (step instanceof CycleStep.Coolant c) {
            return new NcOp.Fixed(c.on() ? TemplateKey.COOLANT_ON : TemplateKey.COOLANT_OFF);
        } else if (step instanceof CycleStep.Swivel s) {
            return new NcOp.SwivelTo(s.machineAngleDeg());
        } else if (step instanceof CycleStep.SyncOn s) {
            return new NcOp.Synchronise(s);
        } else if (step instanceof CycleStep.SyncOff) {
            return new NcOp.Fixed(TemplateKey.SYNC_OFF);
        } else if (step instanceof CycleStep.SpindlesStop) {
            return new NcOp.Fixed(TemplateKey.SPINDLES_STOP);
        } else if (step instanceof CycleStep.Dwell d) {
            return new NcOp.Wait(d.seconds());
        } else if (step instanceof CycleStep.HobShift h) {
            return new NcOp.ShiftTo(h.positionMm());
        } else if (step instanceof CycleStep.Rapid r) {
            return new NcOp.Move(true, r.diameterMm(), r.axialMm(), 0, false);
        } else if (step instanceof CycleStep.Feed f) {
            return new NcOp.Move(false, f.diameterMm(), f.axialMm(), f.feedMmPerRev(), f.cutting());
        }
        throw new IllegalArgumentException("unknown cycle step " + step);
    }
}
