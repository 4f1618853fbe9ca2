package org.hobwright.api.job;

import org.hobwright.api.ApiStatus;

/**
 * What a field's number measures, so that its unit follows the file's length unit. Every
 * conversion goes through {@link Units}, the one place where unit facts live.
 */
@ApiStatus(since = "1.1")
public enum UnitKind {
    /** No unit (counts, words, factors, ratios). */
    NONE("", ""),
    /** A length in the file's unit; canonical mm. */
    LENGTH("mm", "in"),
    /** A module, always millimetres. */
    MODULE("mm", "mm"),
    /** A diametral pitch, always teeth per inch. */
    DIAMETRAL_PITCH("1/in", "1/in"),
    /** An angle in degrees. */
    ANGLE("°", "°"),
    /** A cutting speed: m/min in mm files, ft/min in inch files; canonical m/min. */
    CUTTING_SPEED("m/min", "ft/min"),
    /** A feed per work revolution in the file's unit; canonical mm per revolution. */
    FEED("mm/rev", "in/rev"),
    /** A traverse rate in the file's unit per minute; canonical mm/min. */
    LENGTH_PER_MIN("mm/min", "in/min"),
    /** A quality value, always micrometres. */
    MICROMETRE("µm", "µm"),
    /** A spindle speed, revolutions per minute. */
    RPM("rpm", "rpm"),
    /** A time in seconds. */
    SECONDS("s", "s"),
    /** A length in metres in every file (a wear length of the flank). */
    METRE("m", "m");

    private final String metric;
    private final String inch;

    UnitKind(String metric, String inch) {
        this.metric = metric;
        this.inch = inch;
    }

    /**
     * The unit shown beside a value of a file or job in the given units (empty when none).
     *
     * @param units units
     * @return the unit shown beside a value of a file or job in the given units (empty when none)
     */
    public String symbol(Units units) {
        return units == Units.IN ? inch : metric;
    }

    /** {@return true when the value's unit changes with the file's length unit} */
    public boolean followsUnits() {
        return !metric.equals(inch);
    }

    /**
     * A value written in {@code units} converted to the canonical unit (mm, m/min, mm/min, ...).
     *
     * @param value value
     * @param units units
     * @return A value written in {@code units} converted to the canonical unit (mm, m/min, mm/min, ...)
     */
    public double toCanonical(double value, Units units) {
        return switch (this) {
            case LENGTH, FEED, LENGTH_PER_MIN -> units.toMm(value);
            case CUTTING_SPEED -> units.cuttingSpeedToMPerMin(value);
            default -> value;
        };
    }

    /**
     * A canonical value converted to {@code units}.
     *
     * @param canonical canonical
     * @param units units
     * @return A canonical value converted to {@code units}
     */
    public double fromCanonical(double canonical, Units units) {
        return switch (this) {
            case LENGTH, FEED, LENGTH_PER_MIN -> units.fromMm(canonical);
            case CUTTING_SPEED -> units.cuttingSpeedFromMPerMin(canonical);
            default -> canonical;
        };
    }
}
