package org.hobwright.wizard.spline;

import java.util.List;
import java.util.OptionalDouble;

/**
 * The ISO system of limits and fits as the spline standards use it: the standard tolerance grades IT10,
 * IT11, IT12 and the shaft fundamental deviations d, e, f, h, for nominal sizes up to 500 mm.
 *
 * <p>Values in µm, ISO 286-1:2010 Table 1 (IT grades) and Table 2 (fundamental deviations for shafts,
 * es); ISO 4156-1:2005 Table 5 repeats the deviations for the pitch diameter (from memory). The size
 * ranges are "over ... up to and including": 3, 6, 10, 18, 30, 50, 80, 120, 180, 250, 315, 400, 500.
 */
public final class IsoFits {
    private static final double[] UPPER = {3, 6, 10, 18, 30, 50, 80, 120, 180, 250, 315, 400, 500};
    private static final int[] IT10 = {40, 48, 58, 70, 84, 100, 120, 140, 160, 185, 210, 230, 250};
    private static final int[] IT11 = {60, 75, 90, 110, 130, 160, 190, 220, 250, 290, 320, 360, 400};
    private static final int[] IT12 = {100, 120, 150, 180, 210, 250, 300, 350, 400, 460, 520, 570, 630};
    private static final int[] DEV_D = {-20, -30, -40, -50, -65, -80, -100, -120, -145, -170, -190, -210, -230};
    private static final int[] DEV_E = {-14, -20, -25, -32, -40, -50, -60, -72, -85, -100, -110, -125, -135};
    private static final int[] DEV_F = {-6, -10, -13, -16, -20, -25, -30, -36, -43, -50, -56, -62, -68};

    /** The fit classes (shaft deviations) these tables hold. */
    public static final List<String> FIT_CLASSES = List.of("h", "f", "e", "d");

    private IsoFits() {
    }

    /** Index of the size range holding a size, or −1 outside 0 … 500 mm. */
    static int range(double sizeMm) {
        if (!(sizeMm > 0)) {
            return -1;
        }
        for (int i = 0; i < UPPER.length; i++) {
            if (sizeMm <= UPPER[i] + 1e-9) {
                return i;
            }
        }
        return -1;
    }

    /** Upper limit of each size range, mm (for tests and tables). */
    static double[] upperLimits() {
        return UPPER.clone();
    }

    /**
     * Standard tolerance IT10, IT11 or IT12 for a size, mm.
     *
     * @param grade  10, 11 or 12
     * @param sizeMm nominal size, mm
     * @return empty outside 0 … 500 mm or for another grade
     */
    public static OptionalDouble tolerance(int grade, double sizeMm) {
        int r = range(sizeMm);
        int[] table = grade == 10 ? IT10 : grade == 11 ? IT11 : grade == 12 ? IT12 : null;
        return r < 0 || table == null ? OptionalDouble.empty() : OptionalDouble.of(table[r] / 1000.0);
    }

    /**
     * Upper fundamental deviation es of a shaft fit class for a size, mm (0 for h, negative for f, e, d).
     *
     * @param fit    h, f, e or d
     * @param sizeMm nominal size, mm
     * @return empty outside 0 … 500 mm or for another fit class
     */
    public static OptionalDouble deviation(String fit, double sizeMm) {
        int r = range(sizeMm);
        if (r < 0) {
            return OptionalDouble.empty();
        }
        return switch (fit) {
            case "h" -> OptionalDouble.of(0);
            case "f" -> OptionalDouble.of(DEV_F[r] / 1000.0);
            case "e" -> OptionalDouble.of(DEV_E[r] / 1000.0);
            case "d" -> OptionalDouble.of(DEV_D[r] / 1000.0);
            default -> OptionalDouble.empty();
        };
    }
}
