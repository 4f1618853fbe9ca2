package org.hobwright.wizard.steps;

import java.math.BigDecimal;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import org.hobwright.api.check.Finding;
import org.hobwright.text.Decimal;
import org.hobwright.wizard.setup.Angles;

/**
 * Checks one answer as soon as it is typed: its type, its range, its choice. Whether the values
 * fit together is left to the job checks.
 */
public final class FieldCheck {
    private FieldCheck() {
    }

    /**
     * Checks an answer.
     *
     * @param field   the field
     * @param text    the answer, stripped; empty means no value
     * @param choices the choices allowed now (for a choice field)
     * @return an error finding naming the field, or empty when the answer is fine
     */
    public static Optional<Finding> check(Field field, String text, List<String> choices) {
        if (text.isEmpty()) {
            return field.required()
                    ? error(WizardCode.WIZARD_VALUE_MISSING, field, "a value is needed", "enter a value")
                    : Optional.empty();
        }
        return switch (field.type()) {
            case NUMBER -> number(text).map(v -> range(field, v))
                    .orElseGet(() -> error(WizardCode.WIZARD_NOT_A_NUMBER, field, "\"" + text + "\" is not a number",
                            "enter a number with a point as the decimal mark, e.g. 1.25"));
            case INTEGER -> integer(text).map(v -> range(field, v))
                    .orElseGet(() -> error(WizardCode.WIZARD_NOT_A_WHOLE_NUMBER, field,
                            "\"" + text + "\" is not a whole number", "enter a whole number, e.g. 24"));
            case ANGLE -> Angles.parse(text).map(v -> range(field, v))
                    .orElseGet(() -> error(WizardCode.WIZARD_NOT_AN_ANGLE, field, "\"" + text + "\" is not an angle",
                            "enter decimal degrees (13.2368) or degrees, minutes, seconds (13°14'12\" or 13 14 12)"));
            case CHOICE -> choices.contains(text) ? Optional.empty()
                    : error(WizardCode.WIZARD_NOT_A_CHOICE, field, "\"" + text + "\" is not one of the choices",
                            "enter one of " + String.join(", ", choices));
            case BOOLEAN -> yesNo(text).isPresent() ? Optional.empty()
                    : error(WizardCode.WIZARD_NOT_YES_OR_NO, field, "\"" + text + "\" is neither yes nor no",
                            "enter yes or no");
            case TEXT -> Optional.empty();
        };
    }

    /** Reads a decimal number written with a point, or empty. */
    public static Optional<Double> number(String text) {
        try {
            double v = new BigDecimal(text.strip()).doubleValue();
            return Double.isFinite(v) ? Optional.of(v) : Optional.empty();
        } catch (NumberFormatException e) {
            return Optional.empty();
        }
    }

    /** Reads a whole number, or empty. */
    public static Optional<Double> integer(String text) {
        try {
            return Optional.of((double) Integer.parseInt(text.strip()));
        } catch (NumberFormatException e) {
            return Optional.empty();
        }
    }

    /** Reads yes/no, y/n, true/false in any case, or empty. */
    public static Optional<Boolean> yesNo(String text) {
        return switch (text.strip().toLowerCase(Locale.ROOT)) {
            case "yes", "y", "true" -> Optional.of(true);
            case "no", "n", "false" -> Optional.of(false);
            default -> Optional.empty();
        };
    }

    private static Optional<Finding> range(Field field, double v) {
        if (field.positive() && v <= 0) {
            return error(WizardCode.WIZARD_OUT_OF_RANGE, field, "must be greater than 0, was " + plain(v),
                    "enter a number greater than 0");
        }
        boolean low = field.min().isPresent() && v < field.min().getAsDouble();
        boolean high = field.max().isPresent() && v > field.max().getAsDouble();
        if (low || high) {
            return error(WizardCode.WIZARD_OUT_OF_RANGE, field, "must be " + limits(field) + ", was " + plain(v),
                    "enter a value " + limits(field));
        }
        return Optional.empty();
    }

    private static String limits(Field field) {
        if (field.max().isEmpty()) {
            return "at least " + plain(field.min().orElse(0));
        }
        return "from " + plain(field.min().orElse(0)) + " to " + plain(field.max().getAsDouble());
    }

    /** A number without a needless ".0", e.g. {@code 1}, {@code 0.25}. */
    public static String plain(double v) {
        return Decimal.exact(v);
    }

    private static Optional<Finding> error(WizardCode code, Field field, String message, String fix) {
        return Optional.of(code.at(field.key(), field.label() + ": " + message, fix));
    }
}
