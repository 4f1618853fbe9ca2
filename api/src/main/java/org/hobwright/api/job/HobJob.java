package org.hobwright.api.job;

import java.util.Optional;
import org.hobwright.api.Validate;

/**
 * One hobbing job: the gear, the hob, the machine and how to cut, all in canonical units, plus
 * the unit the user works in (used for every printed or exported value that is not canonical).
 *
 * @param name    job name, used for output file names
 * @param units   the user's length unit
 * @param gear    the gear
 * @param hob     the hob
 * @param machine the machine profile
 * @param cycle   the cycle settings
 * @param spline  for a spline job, what makes the part a spline; the gear then is its spur-gear frame
 */
public record HobJob(String name, Units units, GearSpec gear, HobSpec hob, MachineProfile machine,
                     CycleSettings cycle, Optional<SplineSpec> spline) {
    public HobJob {
        Validate.text("name", name);
        Validate.present("units", units);
        Validate.present("gear", gear);
        Validate.present("hob", hob);
        Validate.present("machine", machine);
        Validate.present("cycle", cycle);
        Validate.present("spline", spline);
    }

    /** A gear job. */
    public HobJob(String name, Units units, GearSpec gear, HobSpec hob, MachineProfile machine, CycleSettings cycle) {
        this(name, units, gear, hob, machine, cycle, Optional.empty());
    }

    /** What the job cuts: {@code gear} or {@code spline}. */
    public String part() {
        return spline.isPresent() ? "spline" : "gear";
    }
}
