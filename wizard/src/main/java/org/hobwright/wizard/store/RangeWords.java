package org.hobwright.wizard.store;

import org.hobwright.api.job.FieldDef;
import org.hobwright.api.job.FieldRange;
import org.hobwright.api.job.UnitKind;
import org.hobwright.api.job.Units;
import org.hobwright.text.Decimal;

/**
 * The allowed values of a field in words, in the units of the file or job ("between 5 and 2000",
 * "greater than 0 in"), for the messages of the readers and the wizard alike.
 */
public final class RangeWords {
    private RangeWords() {
    }

    /** The range of {@code f} in words, its limits converted to {@code units}. */
    public static String of(FieldDef f, Units units) {
        return of(f.range(), f.unit(), units);
    }

    /** A range in words, its limits converted from canonical units to {@code units}. */
    public static String of(FieldRange r, UnitKind unit, Units units) {
        String suffix = suffix(unit.symbol(units));
        String lo = Decimal.readable(unit.fromCanonical(r.min(), units));
        String hi = Decimal.readable(unit.fromCanonical(r.max(), units));
        if (!r.hasMin() && !r.hasMax()) {
            return "a finite number";
        }
        if (!r.hasMax()) {
            return r.minOpen() ? "greater than " + lo + suffix : lo + suffix + " or more";
        }
        if (!r.hasMin()) {
            return "at most " + hi + suffix;
        }
        return r.minOpen() ? "greater than " + lo + suffix + " and at most " + hi + suffix
                : "between " + lo + " and " + hi + suffix;
    }

    /** A unit as it follows a number: {@code " mm"}, {@code "°"}, or nothing. */
    public static String suffix(String unit) {
        return unit.isEmpty() ? "" : unit.equals("°") ? unit : " " + unit;
    }
}
