package org.hobwright.post;

import org.hobwright.api.job.Units;

/**
 * The job's units for everything the writers print: lengths in millimetres or inches, cutting
 * speed in m/min or ft/min. Canonical values (mm, m/min) come in; the job's values go out.
 *
 * <p>Every conversion goes through {@link Units}, where the unit facts live.
 *
 * @param units the job's length unit
 */
public record JobUnits(Units units) {

    /** A length in the job's unit. */
    public double length(double mm) {
        return units.fromMm(mm);
    }

    /** Cutting speed in the job's speed unit (m/min for mm jobs, ft/min for inch jobs). */
    public double cuttingSpeed(double metresPerMinute) {
        return units.cuttingSpeedFromMPerMin(metresPerMinute);
    }

    /** Symbol of lengths: {@code mm} or {@code in}. */
    public String lengthSymbol() {
        return units.symbol();
    }

    /** Symbol of cutting speed: {@code m/min} or {@code ft/min}. */
    public String speedSymbol() {
        return org.hobwright.api.job.UnitKind.CUTTING_SPEED.symbol(units);
    }

    /** True for an inch job. */
    public boolean inch() {
        return units == Units.IN;
    }
}
