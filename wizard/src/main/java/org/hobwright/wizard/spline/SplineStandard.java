package org.hobwright.wizard.spline;

import java.util.Arrays;
import java.util.List;
import java.util.Optional;

/** The standards an external involute spline can be drawn to, with the identifiers job files use. */
public enum SplineStandard {
    /** ISO 4156-1:2005, metric module, side fit. */
    ISO_4156("iso4156", "ISO 4156-1:2005"),
    /** ANSI B92.1-1996, inch diametral pitch, side fit. */
    ANSI_B92_1("ansi-b92.1", "ANSI B92.1-1996"),
    /** DIN 5480-1:2006, metric, based on the reference diameter. */
    DIN_5480("din5480", "DIN 5480-1:2006");

    private final String id;
    private final String title;

    SplineStandard(String id, String title) {
        this.id = id;
        this.title = title;
    }

    /** The identifier in job files. */
    public String id() {
        return id;
    }

    /** The standard's number and year, as findings and sheets print it. */
    public String title() {
        return title;
    }

    /** Every identifier, in the order shown to users. */
    public static List<String> ids() {
        return Arrays.stream(values()).map(SplineStandard::id).toList();
    }

    /** The standard with this identifier. */
    public static Optional<SplineStandard> of(String id) {
        return Arrays.stream(values()).filter(s -> s.id.equals(id)).findFirst();
    }
}
