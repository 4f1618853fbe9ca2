package org.hobwright.wizard.steps;

import java.util.HashMap;
import java.util.Map;
import java.util.Optional;
import org.hobwright.api.check.Finding;
import org.hobwright.api.job.FieldDef;
import org.hobwright.api.job.UnitKind;
import org.hobwright.api.job.Units;
import org.hobwright.text.Decimal;

/**
 * Keeps length, feed and cutting-speed answers meaning the same when the job's unit changes: a
 * face width answered as 20 mm becomes 0.787401575 in, not 20 in. Each answer is converted from
 * the text as it was typed, in the unit it was typed in, so switching back restores that text
 * exactly. Conversions through {@link Units} (25.4 mm to the inch, 0.3048 m to the foot); converted
 * values keep 10 significant digits.
 */
final class UnitSwitch {
    private record Typed(String text, Units units) {
    }

    private final Map<String, Typed> typed = new HashMap<>();

    /** Remembers an answer as typed, in the unit of the job at that moment. */
    void typed(FieldDef field, String text, Units units) {
        if (converts(field.unit())) {
            typed.put(field.key(), new Typed(text, units));
        }
    }

    /**
     * Rewrites the answers of every length, feed and cutting-speed field for a change of unit.
     *
     * @return an info finding that says how many answers were converted, when any were
     */
    Optional<Finding> switchUnits(Answers answers, Units from, Units to) {
        if (from == to) {
            return Optional.empty();
        }
        int converted = 0;
        for (FieldDef f : StepFields.all()) {
            String now = answers.get(f.key());
            if (!converts(f.unit()) || now.isEmpty()) {
                continue;
            }
            Typed source = typed.getOrDefault(f.key(), new Typed(now, from));
            Optional<String> text = source.units() == to ? Optional.of(source.text())
                    : convert(source.text(), f.unit(), source.units(), to);
            if (text.isPresent()) {
                typed.putIfAbsent(f.key(), source);
                answers.put(f.key(), text.get());
                converted++;
            }
        }
        if (converted == 0) {
            return Optional.empty();
        }
        return Optional.of(WizardCode.WIZARD_UNITS_CONVERTED.at(StepFields.UNITS, converted + " length, feed and speed answer"
                + (converted == 1 ? " was" : "s were") + " converted to " + (to == Units.IN ? "inch" : "millimetre")
                + " units; check them on their steps", null));
    }

    private static boolean converts(UnitKind kind) {
        return kind.followsUnits();
    }

    /** The text of a number in another unit; empty when the text is not a number. */
    static Optional<String> convert(String text, UnitKind kind, Units from, Units to) {
        double v;
        try {
            v = Double.parseDouble(text.strip());
        } catch (NumberFormatException e) {
            return Optional.empty();
        }
        if (!Double.isFinite(v)) {
            return Optional.empty();
        }
        double out = kind.fromCanonical(kind.toCanonical(v, from), to);
        return Optional.of(Decimal.significant(out, 10));
    }
}
