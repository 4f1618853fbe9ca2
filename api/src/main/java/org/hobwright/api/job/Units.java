package org.hobwright.api.job;

import org.hobwright.api.ApiStatus;

/**
 * The length unit a job, template or report is written in. Everything inside Hobwright is in
 * millimetres; this enum is the one place where lengths cross between the user's unit and
 * millimetres.
 */
@ApiStatus(since = "1.0")
public enum Units {
    /** Millimetres. */
    MM("mm", 1.0),
    /** Inches (exactly 25.4 mm, by the 1959 international yard and pound agreement). */
    IN("in", 25.4);

    private final String symbol;
    private final double mmPerUnit;

    Units(String symbol, double mmPerUnit) {
        this.symbol = symbol;
        this.mmPerUnit = mmPerUnit;
    }

    /** The symbol used in files and on screen: {@code mm} or {@code in}. */
    public String symbol() {
        return symbol;
    }

    /** Converts a length in this unit to millimetres. */
    public double toMm(double value) {
        return value * mmPerUnit;
    }

    /** Converts a length in millimetres to this unit. */
    public double fromMm(double mm) {
        return mm / mmPerUnit;
    }

    /**
     * Reads a unit symbol as written in a job file.
     *
     * @throws IllegalArgumentException naming the symbol when it is neither {@code mm} nor {@code in}
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
