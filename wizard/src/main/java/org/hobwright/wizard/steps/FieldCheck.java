package org.hobwright.wizard.steps;

import java.math.BigDecimal;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import org.hobwright.api.check.Finding;
import org.hobwright.api.job.FieldDef;
import org.hobwright.api.job.Units;
import org.hobwright.text.Decimal;
import org.hobwright.wizard.setup.Angles;
import org.hobwright.wizard.store.RangeWords;

/**
 * Checks one answer as soon as it is typed: its type, its range, its choice, all from the field
 * table ({@link FieldDef}), so the wizard allows what the job reader and the schema allow. Whether
 * the values fit together is left to the job checks.
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
     * @param units   the job's length unit, which the answer is typed in
     * @return an error finding naming the field, or empty when the answer is fine
     */
    public static Optional<Finding> check(FieldDef field, String text, List<String> choices, Units units) {
        if (text.isEmpty()) {
            return field.required()
                    ? error(WizardCode.WIZARD_VALUE_MISSING, field, "a value is needed", "enter a value")
                    : Optional.empty();
        }
        return switch (field.type()) {
            case NUMBER -> number(text).map(v -> range(field, v, units))
                    .orElseGet(() -> error(WizardCode.WIZARD_NOT_A_NUMBER, field, "\"" + text + "\" is not a number",
                            "enter a number with a point as the decimal mark, e.g. 1.25"));
            case INTEGER -> integer(text).map(v -> range(field, v, units))
                    .orElseGet(() -> error(WizardCode.WIZARD_NOT_A_WHOLE_NUMBER, field,
                            "\"" + text + "\" is not a whole number", "enter a whole number, e.g. 24"));
            case ANGLE -> Angles.parse(text).map(v -> range(field, v, units))
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

    /** Reads a whole number written with digits only (and a sign), or empty. */
    public static Optional<Double> integer(String text) {
        String t = text.strip();
        int start = t.startsWith("-") || t.startsWith("+") ? 1 : 0;
        if (t.length() == start) {
            return Optional.empty();
        }
        for (int i = start; i < t.length(); i++) {
            if (t.charAt(i) < '0' || t.charAt(i) > '9') {
                return Optional.empty();
            }
        }
        return number(t);
    }

    /** Reads yes/no, y/n, true/false in any case, or empty. */
    public static Optional<Boolean> yesNo(String text) {
        return switch (text.strip().toLowerCase(Locale.ROOT)) {
            case "yes", "y", "true" -> Optional.of(true);
            case "no", "n", "false" -> Optional.of(false);
            default -> Optional.empty();
        };
    }

    private static Optional<Finding> range(FieldDef field, double v, Units units) {
        if (field.range().contains(field.unit().toCanonical(v, units))) {
            return Optional.empty();
        }
        String allowed = RangeWords.of(field, units);
        return error(WizardCode.WIZARD_OUT_OF_RANGE, field, "must be " + allowed + ", was " + plain(v)
                + RangeWords.suffix(field.unit().symbol(units)), "enter a value " + allowed);
    }

    /** A number as messages show it, readable at every magnitude, e.g. {@code 1}, {@code 0.25}, {@code 1e300}. */
    public static String plain(double v) {
        return Decimal.readable(v);
    }

    private static Optional<Finding> error(WizardCode code, FieldDef field, String message, String fix) {
        return Optional.of(code.at(field.key(), field.label() + ": " + message, fix));
    }
}
