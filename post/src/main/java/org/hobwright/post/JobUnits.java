package org.hobwright.post;

import org.hobwright.api.job.Units;

/**
 * The job's units for everything the writers print: lengths in millimetres or inches, cutting
 * speed in m/min or ft/min. Canonical values (mm, m/min) come in; the job's values go out.
 *
 * <p>1 in = 25.4 mm and 1 ft = 0.3048 m exactly (1959 international yard and pound agreement).
 *
 * @param units the job's length unit
 */
public record JobUnits(Units units) {

    /** Metres per foot, exact by definition. */
    private static final double M_PER_FT = 0.3048;

    /** A length in the job's unit. */
    public double length(double mm) {
        return units.fromMm(mm);
    }

    /** Cutting speed in the job's speed unit (m/min for mm jobs, ft/min for inch jobs). */
    public double cuttingSpeed(double metresPerMinute) {
        return units == Units.MM ? metresPerMinute : metresPerMinute / M_PER_FT;
    }

    /** Symbol of lengths: {@code mm} or {@code in}. */
    public String lengthSymbol() {
        return units.symbol();
    }

    /** Symbol of cutting speed: {@code m/min} or {@code ft/min}. */
    public String speedSymbol() {
        return units == Units.MM ? "m/min" : "ft/min";
    }

    /** True for an inch job. */
    public boolean inch() {
        return units == Units.IN;
    }
}
