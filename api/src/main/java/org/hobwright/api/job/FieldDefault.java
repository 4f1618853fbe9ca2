package org.hobwright.api.job;

import org.hobwright.api.ApiStatus;

import java.util.Objects;

/**
 * What a field takes when it is left out, or what the wizard proposes, and where that comes from.
 * For a required field the value is only a proposal (a file must state the value); for an
 * optional field it is the value the readers take when the key is left out.
 *
 * @param metric the value in a millimetre file, as written there (empty when there is none)
 * @param inch   the value in an inch file (empty when there is none)
 * @param origin where the default comes from
 * @param source the standard, the convention, or what Hobwright computes instead, in words
 */
@ApiStatus(since = "1.1")
public record FieldDefault(String metric, String inch, Origin origin, String source) {
    /** Where a default comes from. */
    @ApiStatus(since = "1.1")
    public enum Origin {
        /** None: the value must be given. */
        NONE,
        /** A published standard (the source names it). */
        STANDARD,
        /** The trade's convention (common practice, no source). */
        CONVENTION,
        /** Left out, Hobwright works the value out (the source says from what). */
        COMPUTED,
        /** Left out, the value is not used (e.g. nothing to compare with). */
        UNUSED
    }

    /** "None: must be given". */
    public static final FieldDefault NONE = new FieldDefault("", "", Origin.NONE, "none: must be given");

    /**
     * Checks the components: a value out of range throws {@link IllegalArgumentException} naming the field and the
     * value.
     *
     * @param metric the value in a millimetre file, as written there (empty when there is none)
     * @param inch the value in an inch file (empty when there is none)
     * @param origin where the default comes from
     * @param source the standard, the convention, or what Hobwright computes instead, in words
     */
    public FieldDefault {
        Objects.requireNonNull(metric, "metric");
        Objects.requireNonNull(inch, "inch");
        Objects.requireNonNull(origin, "origin");
        Objects.requireNonNull(source, "source");
        if (metric.isEmpty() != inch.isEmpty()) {
            throw new IllegalArgumentException("a default needs a value in both units or in none");
        }
    }

    /**
     * A default from a published standard, the same in both units.
     *
     * @param value value
     * @param standard standard
     * @return A default from a published standard, the same in both units
     */
    public static FieldDefault standard(String value, String standard) {
        return new FieldDefault(value, value, Origin.STANDARD, standard);
    }

    /**
     * The trade's convention, the same in both units.
     *
     * @param value value
     * @param why why
     * @return the trade's convention, the same in both units
     */
    public static FieldDefault convention(String value, String why) {
        return new FieldDefault(value, value, Origin.CONVENTION, why);
    }

    /**
     * A value Hobwright works out when the field is left out.
     *
     * @param how how
     * @return A value Hobwright works out when the field is left out
     */
    public static FieldDefault computed(String how) {
        return new FieldDefault("", "", Origin.COMPUTED, how);
    }

    /**
     * Nothing is used when the field is left out.
     *
     * @param what what
     * @return nothing is used when the field is left out
     */
    public static FieldDefault unused(String what) {
        return new FieldDefault("", "", Origin.UNUSED, what);
    }

    /** {@return true when there is a value (in either unit)} */
    public boolean hasValue() {
        return !metric.isEmpty();
    }

    /**
     * The value as written in a file of the given units (empty when there is none).
     *
     * @param units units
     * @return the value as written in a file of the given units (empty when there is none)
     */
    public String value(Units units) {
        return units == Units.IN ? inch : metric;
    }

    /** {@return where the default comes from, in a few words, e.g. {@code ISO 53:1998 standard basic rack}} */
    public String describe() {
        return switch (origin) {
            case NONE -> source;
            case STANDARD -> "standard: " + source;
            case CONVENTION -> "trade convention: " + source;
            case COMPUTED -> "left out: " + source;
            case UNUSED -> "left out: " + source;
        };
    }
}
