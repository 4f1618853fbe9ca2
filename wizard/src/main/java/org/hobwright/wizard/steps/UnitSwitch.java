package org.hobwright.wizard.steps;

import java.util.HashMap;
import java.util.Map;
import java.util.Optional;
import org.hobwright.api.check.Finding;
import org.hobwright.api.job.Units;
import org.hobwright.text.Decimal;

/**
 * Keeps length, feed and cutting-speed answers meaning the same when the job's unit changes: a
 * face width answered as 20 mm becomes 0.787401575 in, not 20 in. Each answer is converted from
 * the text as it was typed, in the unit it was typed in, so switching back restores that text
 * exactly. Conversions: 25.4 mm to the inch and 0.3048 m to the foot, exact by the international
 * definition of the inch and the foot (1959); converted values keep 10 significant digits.
 */
final class UnitSwitch {
    private record Typed(String text, Units units) {
    }

    private final Map<String, Typed> typed = new HashMap<>();

    /** Remembers an answer as typed, in the unit of the job at that moment. */
    void typed(Field field, String text, Units units) {
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
        for (Field f : StepFields.all()) {
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
        return kind == UnitKind.LENGTH || kind == UnitKind.FEED || kind == UnitKind.CUTTING_SPEED;
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
        double mm = kind == UnitKind.CUTTING_SPEED ? (from == Units.IN ? v * 0.3048 : v) : from.toMm(v);
        double out = kind == UnitKind.CUTTING_SPEED ? (to == Units.IN ? mm / 0.3048 : mm) : to.fromMm(mm);
        return Optional.of(Decimal.significant(out, 10));
    }
}
