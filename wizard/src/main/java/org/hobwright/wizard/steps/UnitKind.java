package org.hobwright.wizard.steps;

import org.hobwright.api.job.Units;

/** What a field's number measures, so its unit can follow the job's length unit. */
public enum UnitKind {
    /** No unit (counts, words, factors). */
    NONE("", ""),
    /** A length in the job's unit. */
    LENGTH("mm", "in"),
    /** A module, always millimetres. */
    MODULE("mm", "mm"),
    /** A diametral pitch, always teeth per inch. */
    DIAMETRAL_PITCH("1/in", "1/in"),
    /** An angle in degrees. */
    ANGLE("°", "°"),
    /** A cutting speed: m/min in mm jobs, ft/min in inch jobs. */
    CUTTING_SPEED("m/min", "ft/min"),
    /** A feed per work revolution in the job's unit. */
    FEED("mm/rev", "in/rev"),
    /** A quality target, always micrometres. */
    MICROMETRE("µm", "µm"),
    /** A spindle speed. */
    RPM("rpm", "rpm");

    private final String metric;
    private final String inch;

    UnitKind(String metric, String inch) {
        this.metric = metric;
        this.inch = inch;
    }

    /** The unit shown beside a field of a job in the given units. */
    public String symbol(Units units) {
        return units == Units.IN ? inch : metric;
    }
}
