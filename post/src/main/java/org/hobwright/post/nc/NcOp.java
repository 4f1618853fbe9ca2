package org.hobwright.post.nc;

import org.hobwright.api.cycle.CycleStep;
import org.hobwright.api.cycle.Rotation;

/**
 * One operation of the program model, in canonical units, before any dialect word is chosen.
 * The safety check reads this model; the renderer turns it into blocks.
 */
public sealed interface NcOp {

    /**
     * A fixed block from a template without placeholders (units, feed mode, tool call, coolant,
     * synchronisation off, spindles stop) or with only the program's name and number.
     *
     * @param key the template
     */
    record Fixed(TemplateKey key) implements NcOp {
    }

    /**
     * The safe start or the safe end: the dialect's template with the machine's safe radial position.
     *
     * @param key        {@link TemplateKey#SAFE_START} or {@link TemplateKey#SAFE_END}
     * @param diameterMm the safe work diameter of the hob tip (the machine's radial maximum), mm
     */
    record Safe(TemplateKey key, double diameterMm) implements NcOp {
    }

    /**
     * A comment line.
     *
     * @param text the text, not yet cleaned
     */
    record Remark(String text) implements NcOp {
    }

    /**
     * Work spindle on, then the synchronisation on.
     *
     * @param sync the cycle's step
     */
    record Synchronise(CycleStep.SyncOn sync) implements NcOp {
        /** True when the helical addition is not zero. */
        public boolean helical() {
            return sync.differentialDegPerMm() != 0;
        }

        /** Work rotation sense. */
        public Rotation workRotation() {
            return sync.workRotation();
        }
    }

    /**
     * A dwell.
     *
     * @param seconds time, s
     */
    record Wait(double seconds) implements NcOp {
    }

    /**
     * Swivel positioning.
     *
     * @param machineAngleDeg the machine's setting, degrees
     */
    record SwivelTo(double machineAngleDeg) implements NcOp {
    }

    /**
     * Hob-shift positioning.
     *
     * @param positionMm position, mm
     */
    record ShiftTo(double positionMm) implements NcOp {
    }

    /**
     * A rapid or feed move.
     *
     * @param rapid        true for a rapid move
     * @param diameterMm   work diameter the hob tip reaches, mm
     * @param axialMm      hob centre along the work axis from the front face, mm
     * @param feedMmPerRev feed per work revolution, mm (0 for a rapid)
     * @param cutting      true when the hob cuts
     */
    record Move(boolean rapid, double diameterMm, double axialMm, double feedMmPerRev, boolean cutting)
            implements NcOp {
    }
}
