package org.hobwright.api.job;

import java.util.OptionalDouble;
import org.hobwright.api.ApiStatus;
import org.hobwright.api.internal.Checks;

/**
 * The times a machine takes for the steps around the cut, seconds, as the shop measured them.
 * An absent time is unknown: the planner counts it as 0 s and says so in a finding.
 *
 * @param loadS       putting a blank in and clamping it
 * @param unloadS     taking the finished part out
 * @param swivelS     one programmed swivel positioning, clamping included
 * @param hobShiftS   one programmed hob-shift move
 * @param hobChangeS  taking a worn hob off and setting a sharp one
 */
@ApiStatus(since = "1.1")
public record MachineTimes(OptionalDouble loadS, OptionalDouble unloadS, OptionalDouble swivelS,
                           OptionalDouble hobShiftS, OptionalDouble hobChangeS) {

    /** No time known. */
    public static final MachineTimes UNKNOWN = new MachineTimes(OptionalDouble.empty(), OptionalDouble.empty(),
            OptionalDouble.empty(), OptionalDouble.empty(), OptionalDouble.empty());

    /**
     * Checks the components: a value out of range throws {@link IllegalArgumentException} naming the field and the
     * value.
     *
     * @param loadS putting a blank in and clamping it
     * @param unloadS taking the finished part out
     * @param swivelS one programmed swivel positioning, clamping included
     * @param hobShiftS one programmed hob-shift move
     * @param hobChangeS taking a worn hob off and setting a sharp one
     */
    public MachineTimes {
        Checks.field(MachineFields.TIME_LOAD, loadS);
        Checks.field(MachineFields.TIME_UNLOAD, unloadS);
        Checks.field(MachineFields.TIME_SWIVEL, swivelS);
        Checks.field(MachineFields.TIME_HOB_SHIFT, hobShiftS);
        Checks.field(MachineFields.TIME_HOB_CHANGE, hobChangeS);
    }
}
