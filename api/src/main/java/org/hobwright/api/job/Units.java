package org.hobwright.api.job;

import org.hobwright.api.ApiStatus;

/**
 * The length unit a job, template or report is written in. Everything inside Hobwright is in
 * millimetres; this enum is the one place where lengths cross between the user's unit and
 * millimetres.
 */
@ApiStatus(since = "1.0")
public enum Units {
    /** Millimetres; cutting speeds in metres per minute. */
    MM("mm", 1.0, 1.0),
    /**
     * Inches (exactly 25.4 mm); cutting speeds in feet per minute (1 ft = 0.3048 m exactly). Both
     * by the international yard and pound agreement of 1959.
     */
    IN("in", 25.4, 0.3048);

    private final String symbol;
    private final double mmPerUnit;
    private final double metresPerSpeedLength;

    Units(String symbol, double mmPerUnit, double metresPerSpeedLength) {
        this.symbol = symbol;
        this.mmPerUnit = mmPerUnit;
        this.metresPerSpeedLength = metresPerSpeedLength;
    }

    /** {@return the symbol used in files and on screen: {@code mm} or {@code in}} */
    public String symbol() {
        return symbol;
    }

    /**
     * Converts a length in this unit to millimetres.
     *
     * @param value value
     * @return converts a length in this unit to millimetres
     */
    public double toMm(double value) {
        return value * mmPerUnit;
    }

    /**
     * Converts a length in millimetres to this unit.
     *
     * @param mm mm
     * @return converts a length in millimetres to this unit
     */
    public double fromMm(double mm) {
        return mm / mmPerUnit;
    }

    /**
     * Converts a cutting speed in this unit system (m/min or ft/min) to metres per minute.
     *
     * @param value value
     * @return converts a cutting speed in this unit system (m/min or ft/min) to metres per minute
     */
    @ApiStatus(since = "1.1")
    public double cuttingSpeedToMPerMin(double value) {
        return value * metresPerSpeedLength;
    }

    /**
     * Converts a cutting speed in metres per minute to this unit system's (m/min or ft/min).
     *
     * @param metresPerMinute metresPerMinute
     * @return converts a cutting speed in metres per minute to this unit system's (m/min or ft/min)
     */
    @ApiStatus(since = "1.1")
    public double cuttingSpeedFromMPerMin(double metresPerMinute) {
        return metresPerMinute / metresPerSpeedLength;
    }

    /**
     * Reads a unit symbol as written in a job file.
     *
     * @throws IllegalArgumentException naming the symbol when it is neither {@code mm} nor {@code in}
     * @param symbol symbol
     * @return reads a unit symbol as written in a job file
     */
    public static Units fromSymbol(String symbol) {
        for (Units u : values()) {
            if (u.symbol.equals(symbol)) {
                return u;
            }
        }
        throw new IllegalArgumentException("units must be \"mm\" or \"in\", was \"" + symbol + "\"");
    }
}
