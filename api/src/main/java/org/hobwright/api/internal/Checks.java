package org.hobwright.api.internal;

import java.util.Objects;
import java.util.OptionalDouble;
import java.util.OptionalInt;

/**
 * Argument checks used by the compact constructors of the api records. <strong>Not part of the
 * api:</strong> this package may change in any release; hosts and providers must not call it.
 *
 * <p>Every failure is an {@link IllegalArgumentException} whose message names the field and
 * the offending value, so a caller that breaks the contract learns exactly what to fix. The
 * wizard never lets user input reach these checks unvalidated: it turns bad input into
 * findings first.
 */
public final class Checks {
    private Checks() {
    }

    /** Requires a finite number. */
    public static double finite(String field, double value) {
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException(field + " must be a finite number, was " + value);
        }
        return value;
    }

    /** Requires a finite number greater than zero. */
    public static double positive(String field, double value) {
        finite(field, value);
        if (value <= 0) {
            throw new IllegalArgumentException(field + " must be greater than 0, was " + value);
        }
        return value;
    }

    /** Requires a finite number of zero or more. */
    public static double nonNegative(String field, double value) {
        finite(field, value);
        if (value < 0) {
            throw new IllegalArgumentException(field + " must be 0 or more, was " + value);
        }
        return value;
    }

    /** Requires a finite number in the closed range [min, max]. */
    public static double range(String field, double value, double min, double max) {
        finite(field, value);
        if (value < min || value > max) {
            throw new IllegalArgumentException(
                    field + " must be between " + min + " and " + max + ", was " + value);
        }
        return value;
    }

    /** Requires an absent value or a finite number greater than zero. */
    public static OptionalDouble positive(String field, OptionalDouble value) {
        if (present(field, value).isPresent()) {
            positive(field, value.getAsDouble());
        }
        return value;
    }

    /** Requires an absent value or a finite number in the closed range [min, max]. */
    public static OptionalDouble range(String field, OptionalDouble value, double min, double max) {
        if (present(field, value).isPresent()) {
            range(field, value.getAsDouble(), min, max);
        }
        return value;
    }

    /** Requires an absent value or a whole number in the closed range [min, max]. */
    public static OptionalInt range(String field, OptionalInt value, int min, int max) {
        if (present(field, value).isPresent()) {
            range(field, value.getAsInt(), min, max);
        }
        return value;
    }

    /** Requires a finite number inside the field's range (job, machine or template table), naming the field's key. */
    public static double field(org.hobwright.api.job.FieldDef f, double value) {
        org.hobwright.api.job.FieldRange r = f.range();
        if (!r.contains(value)) {
            finite(f.key(), value);
            throw new IllegalArgumentException(f.key() + " must be " + words(r) + ", was " + value);
        }
        return value;
    }

    /** Requires an absent value or a number inside the field's range. */
    public static OptionalDouble field(org.hobwright.api.job.FieldDef f, OptionalDouble value) {
        if (present(f.key(), value).isPresent()) {
            field(f, value.getAsDouble());
        }
        return value;
    }

    /** Requires a whole number inside the field's range. */
    public static int field(org.hobwright.api.job.FieldDef f, int value) {
        field(f, (double) value);
        return value;
    }

    /** Requires an absent value or a whole number inside the field's range. */
    public static OptionalInt field(org.hobwright.api.job.FieldDef f, OptionalInt value) {
        if (present(f.key(), value).isPresent()) {
            field(f, (double) value.getAsInt());
        }
        return value;
    }

    private static String words(org.hobwright.api.job.FieldRange r) {
        if (!r.hasMax()) {
            return r.minOpen() ? "greater than " + r.min() : "at least " + r.min();
        }
        if (!r.hasMin()) {
            return "at most " + r.max();
        }
        return (r.minOpen() ? "greater than " + r.min() + " and at most " : "between " + r.min() + " and ") + r.max();
    }

    /** Requires a whole number of at least {@code min}. */
    public static int atLeast(String field, int value, int min) {
        if (value < min) {
            throw new IllegalArgumentException(field + " must be at least " + min + ", was " + value);
        }
        return value;
    }

    /** Requires a non-null value. */
    public static <T> T present(String field, T value) {
        return Objects.requireNonNull(value, () -> field + " is required, was null");
    }

    /** Requires a non-blank text. */
    public static String text(String field, String value) {
        present(field, value);
        if (value.isBlank()) {
            throw new IllegalArgumentException(field + " must not be blank");
        }
        return value;
    }
}
