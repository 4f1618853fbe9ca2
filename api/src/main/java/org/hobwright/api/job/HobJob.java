package org.hobwright.api.job;

import java.util.Optional;
import org.hobwright.api.ApiStatus;
import org.hobwright.api.internal.Checks;

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
@ApiStatus(since = "1.0")
public record HobJob(String name, Units units, GearSpec gear, HobSpec hob, MachineProfile machine,
                     CycleSettings cycle, @ApiStatus(since = "1.1") Optional<SplineSpec> spline) {
    /**
     * Checks the components: a value out of range throws {@link IllegalArgumentException} naming the field and the
     * value.
     *
     * @param name job name, used for output file names
     * @param units the user's length unit
     * @param gear the gear (for a spline, its spur-gear frame)
     * @param hob the hob
     * @param machine the machine profile
     * @param cycle the cycle settings
     * @param spline for a spline job, what makes the part a spline; empty for a gear
     */
    public HobJob {
        Checks.text("name", name);
        Checks.present("units", units);
        Checks.present("gear", gear);
        Checks.present("hob", hob);
        Checks.present("machine", machine);
        Checks.present("cycle", cycle);
        Checks.present("spline", spline);
    }

    /**
     * A gear job, as api 1.0 built it.
     *
     * @param name job name, used for output file names
     * @param units the user's length unit
     * @param gear the gear
     * @param hob the hob
     * @param machine the machine profile
     * @param cycle the cycle settings
     */
    public HobJob(String name, Units units, GearSpec gear, HobSpec hob, MachineProfile machine, CycleSettings cycle) {
        this(name, units, gear, hob, machine, cycle, Optional.empty());
    }

    /** {@return what the job cuts: {@code gear} or {@code spline}} */
    @ApiStatus(since = "1.1")
    public String part() {
        return spline.isPresent() ? "spline" : "gear";
    }

    /**
     * This hob job with another {@code spline}.
     *
     * @param spline what makes the part a spline, or empty for a gear
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public HobJob withSpline(Optional<SplineSpec> spline) {
        return new HobJob(name, units, gear, hob, machine, cycle, spline);
    }

    /**
     * This hob job with another {@code name}.
     *
     * @param name job name, used for output file names
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public HobJob withName(String name) {
        return new HobJob(name, units, gear, hob, machine, cycle, spline);
    }

    /**
     * This hob job with another {@code units}.
     *
     * @param units the user's length unit
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public HobJob withUnits(Units units) {
        return new HobJob(name, units, gear, hob, machine, cycle, spline);
    }

    /**
     * This hob job with another {@code gear}.
     *
     * @param gear the gear
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public HobJob withGear(GearSpec gear) {
        return new HobJob(name, units, gear, hob, machine, cycle, spline);
    }

    /**
     * This hob job with another {@code hob}.
     *
     * @param hob the hob
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public HobJob withHob(HobSpec hob) {
        return new HobJob(name, units, gear, hob, machine, cycle, spline);
    }

    /**
     * This hob job with another {@code machine}.
     *
     * @param machine the machine profile
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public HobJob withMachine(MachineProfile machine) {
        return new HobJob(name, units, gear, hob, machine, cycle, spline);
    }

    /**
     * This hob job with another {@code cycle}.
     *
     * @param cycle the cycle settings
     * @return the copy, checked like any new one
     */
    @ApiStatus(since = "1.1")
    public HobJob withCycle(CycleSettings cycle) {
        return new HobJob(name, units, gear, hob, machine, cycle, spline);
    }
}
