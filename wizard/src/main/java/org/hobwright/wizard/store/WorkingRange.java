package org.hobwright.wizard.store;

import java.util.Optional;
import org.hobwright.api.job.FieldDef;
import org.hobwright.api.job.FieldRange;
import org.hobwright.api.job.Units;
import org.hobwright.text.Decimal;

/**
 * The sizes of number Hobwright computes with. A field whose table range has no upper limit
 * (a face width, a rapid rate, a time) holds at most {@value #LARGEST} of its canonical unit (mm,
 * mm/min, m/min, rpm, s, µm); a field that must be greater than 0 holds at least
 * {@value #SMALLEST}. Far beyond any machine or gear, and far inside what double arithmetic
 * keeps: products and quotients of such numbers (a cycle time, a rapid at the slowest rate over
 * the longest travel) stay finite (common practice, no source). Fields with limits of their own
 * in the table keep them.
 */
public final class WorkingRange {
    /** Largest size of a number without a limit of its own, in its canonical unit. */
    public static final double LARGEST = 1e6;
    /** Smallest number that must be greater than 0, in its canonical unit. */
    public static final double SMALLEST = 1e-6;

    private WorkingRange() {
    }

    /**
     * Why a value the field's table range allows is outside the working range, or empty.
     *
     * @param f         the field
     * @param canonical the value in the field's canonical unit, within its table range or infinite
     * @return the reason in words (the limit with its canonical unit), or empty
     */
    public static Optional<String> violation(FieldDef f, double canonical) {
        FieldRange r = f.range();
        String unit = RangeWords.suffix(f.unit().symbol(Units.MM));
        if (Double.isNaN(canonical)) {
            return Optional.of("must be a finite number");
        }
        // a finite value given in inches can overflow to infinity in mm: too large, not "not a number"
        if (Double.isInfinite(r.max()) && canonical > LARGEST || Double.isInfinite(r.min()) && canonical < -LARGEST
                || Double.isInfinite(canonical)) {
            return Optional.of("must be at most " + Decimal.readable(LARGEST) + unit
                    + " in size (Hobwright's working range)");
        }
        if (r.min() == 0 && r.minOpen() && canonical < SMALLEST) {
            return Optional.of("must be at least " + Decimal.readable(SMALLEST) + unit
                    + " (Hobwright's working range)");
        }
        return Optional.empty();
    }
}
