package org.hobwright.wizard.spline;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * The ISO 286 tables against the formulas they are rounded from (ISO 286-1:2010 Annex and Table, from
 * memory): the tolerance unit i = 0.45 ∛D + 0.001 D (µm, D the geometric mean of the size range, the first
 * range 1 … 3 mm), IT10 = 64 i, IT11 = 100 i, IT12 = 160 i; shaft deviations d = −16 D^0.44,
 * e = −11 D^0.41, f = −5.5 D^0.41. The standard rounds to its own preferred steps, so each table value is
 * held within 6 % of its formula: a mistyped digit or a shifted row cannot pass. The first range (up to
 * 3 mm) is left out: its IT values (IT10 40 µm) are set above the formula (64 i = 35 µm) in the table.
 */
class IsoFitsTest {

    @Test
    void tablesFollowTheirFormulas() {
        double[] upper = IsoFits.upperLimits();
        double lower = upper[0];
        for (int k = 1; k < upper.length; k++) {
            double up = upper[k];
            double mean = Math.sqrt(lower * up);
            double mid = (lower + up) / 2;
            double unit = 0.45 * Math.cbrt(mean) + 0.001 * mean;
            close(64 * unit, 1000 * IsoFits.tolerance(10, mid).orElseThrow(), "IT10 at " + mid);
            close(100 * unit, 1000 * IsoFits.tolerance(11, mid).orElseThrow(), "IT11 at " + mid);
            close(160 * unit, 1000 * IsoFits.tolerance(12, mid).orElseThrow(), "IT12 at " + mid);
            close(-16 * Math.pow(mean, 0.44), 1000 * IsoFits.deviation("d", mid).orElseThrow(), "d at " + mid);
            close(-11 * Math.pow(mean, 0.41), 1000 * IsoFits.deviation("e", mid).orElseThrow(), "e at " + mid);
            close(-5.5 * Math.pow(mean, 0.41), 1000 * IsoFits.deviation("f", mid).orElseThrow(), "f at " + mid);
            assertEquals(0, IsoFits.deviation("h", mid).orElseThrow(), "h at " + mid);
            lower = up;
        }
    }

    // "Over ... up to and including": 6 mm is in the 3 … 6 range, 6.001 in the next (ISO 286-1:2010 Table 1).
    @Test
    void rangeEndsBelongToTheLowerRange() {
        assertEquals(0.048, IsoFits.tolerance(10, 6).orElseThrow(), 1e-12);
        assertEquals(0.058, IsoFits.tolerance(10, 6.001).orElseThrow(), 1e-12);
        assertTrue(IsoFits.tolerance(10, 500.5).isEmpty());
        assertTrue(IsoFits.deviation("g", 20).isEmpty());
    }

    private static void close(double formula, double table, String what) {
        assertTrue(Math.abs(table - formula) <= 0.06 * Math.abs(formula), what + ": table " + table + ", formula "
                + formula);
    }
}
