package org.hobwright.wizard.store;

import java.util.Objects;
import org.hobwright.api.job.CycleSettings;
import org.hobwright.api.job.Units;
import tools.jackson.databind.node.ObjectNode;

/**
 * A saved set of cycle values for one machine: its values fill the cycle keys a job leaves out.
 * Stored as {@code templates/MACHINE/NAME.json}.
 *
 * @param name        template name (letters, digits, '.', '_', '-')
 * @param machine     name of the machine profile it belongs to
 * @param description one line saying what it is for (may be empty)
 * @param units       the unit its lengths and cutting speed are written in
 * @param cycle       the cycle keys, as in a job file (checked when read)
 */
public record CycleTemplate(String name, String machine, String description, Units units, ObjectNode cycle) {
    public CycleTemplate {
        if (!Names.valid(name)) {
            throw new IllegalArgumentException("template name \"" + name + "\" is not a library name");
        }
        if (!Names.valid(machine)) {
            throw new IllegalArgumentException("machine name \"" + machine + "\" is not a library name");
        }
        Objects.requireNonNull(description, "description");
        Objects.requireNonNull(units, "units");
        cycle = Objects.requireNonNull(cycle, "cycle").deepCopy();
    }

    /**
     * A template holding the given cycle settings, written in {@code units} (for saving the
     * wizard's answers).
     */
    public static CycleTemplate of(String name, String machine, String description, CycleSettings settings,
                                   Units units) {
        return new CycleTemplate(name, machine, description, units, JobWriter.cycleTree(settings, units));
    }

    /** The cycle keys converted to {@code target} units (a copy). */
    public ObjectNode cycleIn(Units target) {
        return CycleReader.convert(cycle, units, target);
    }

    /** The cycle keys (a copy). */
    @Override
    public ObjectNode cycle() {
        return cycle.deepCopy();
    }
}
