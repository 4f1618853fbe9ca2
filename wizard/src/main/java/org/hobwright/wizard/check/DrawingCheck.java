package org.hobwright.wizard.check;

import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;
import java.util.function.DoubleUnaryOperator;
import org.hobwright.api.check.Finding;
import org.hobwright.api.job.DrawingValues;
import org.hobwright.wizard.geometry.InvoluteGear;
import org.hobwright.wizard.inspection.OverPins;
import org.hobwright.wizard.inspection.SpanMeasurement;

/**
 * Compares the values printed on the drawing with the computed ones. Each value that differs by more
 * than max(0.01 mm, 1e-4 × value) is an error saying which number is off, by how much, what it should
 * be and, where the profile shift explains it, which shift the printed value would fit. Root diameter
 * and whole depth may also match the tooth without the thickness allowance (drawings often print the
 * nominal); span and over-pins values are what the inspector measures, so they must include it.
 * Common practice, no source.
 */
public final class DrawingCheck {
    private DrawingCheck() {
    }

    /** The comparison tolerance for a value, mm: max(0.01 mm, 1e-4 × |value|). */
    public static double tolerance(double valueMm) {
        return Math.max(0.01, 1e-4 * Math.abs(valueMm));
    }

    /**
     * Checks every printed value.
     *
     * @param dv         the printed values
     * @param g          the gear
     * @param pinMm      the pin the job uses, when the drawing names none
     * @param words      wording in the job's units
     * @param out        findings
     */
    public static void check(DrawingValues dv, InvoluteGear g, double pinMm, Wording words, List<Finding> out) {
        InvoluteGear nominal = g.withoutAllowance();
        Checker c = new Checker(g, words, out);
        dv.pitchDiameterMm().ifPresent(v -> c.compare(EngineeringCode.DRAWING_PITCH_DIAMETER, "pitchDiameter",
                "pitch diameter", v, g.referenceDiameterMm(), g.referenceDiameterMm(), false, null, null,
                "check the tooth count, the pitch and the helix angle"));
        dv.outsideDiameterMm().ifPresent(v -> c.compare(EngineeringCode.DRAWING_OUTSIDE_DIAMETER, "outsideDiameter",
                "outside diameter", v, g.tipDiameterMm(), g.tipDiameterMm(), false,
                x -> g.withProfileShift(x).tipDiameterMm(), null, "check the profile shift and the tooth system"));
        dv.rootDiameterMm().ifPresent(v -> c.compare(EngineeringCode.DRAWING_ROOT_DIAMETER, "rootDiameter",
                "root diameter", v, g.rootDiameterMm(), nominal.rootDiameterMm(), false,
                x -> g.withProfileShift(x).rootDiameterMm(), x -> nominal.withProfileShift(x).rootDiameterMm(),
                "check the profile shift and the tooth system"));
        dv.wholeDepthMm().ifPresent(v -> c.compare(EngineeringCode.DRAWING_WHOLE_DEPTH, "wholeDepth",
                "whole depth", v, g.wholeDepthMm(), nominal.wholeDepthMm(), false, null, null, "check the tooth system"));
        dv.spanWidthMm().ifPresent(v -> span(dv, g, nominal, v, c, words, out));
        dv.overPinsMm().ifPresent(v -> {
            double pin = dv.pinDiameterMm().orElse(pinMm);
            c.compare(EngineeringCode.DRAWING_OVER_PINS, "overPins", "measurement over "
                    + (g.isSpur() ? "pins" : "balls") + " of " + words.length(pin), v, OverPins.of(g, pin).overPinsMm(),
                    OverPins.of(nominal, pin).overPinsMm(), true, x -> OverPins.of(g.withProfileShift(x), pin).overPinsMm(),
                    null, "check the pin diameter, the profile shift and the thickness allowance");
        });
        c.consistency();
    }

    private static void span(DrawingValues dv, InvoluteGear g, InvoluteGear nominal, double v, Checker c,
                             Wording words, List<Finding> out) {
        int k = dv.spanTeeth().orElse(SpanMeasurement.of(g).teeth());
        if (k < 1 || k > g.teeth() - 1) {
            out.add(EngineeringCode.DRAWING_SPAN_TEETH.at("gear.drawing.spanTeeth", "span over "
                    + Wording.teeth(k) + " is not possible on a gear of " + Wording.teeth(g.teeth()) + " (1 to "
                    + (g.teeth() - 1) + ")", "use " + Wording.teeth(SpanMeasurement.of(g).teeth())));
            return;
        }
        c.compare(EngineeringCode.DRAWING_SPAN, "span", "span over " + Wording.teeth(k), v,
                SpanMeasurement.widthMm(g, k), SpanMeasurement.widthMm(nominal, k), true,
                x -> SpanMeasurement.widthMm(g.withProfileShift(x), k), null,
                "check the number of teeth spanned, the profile shift and the thickness allowance");
    }

    /** A printed value that depends on the profile shift. */
    private record Implied(String name, double printed, DoubleUnaryOperator ofShift) {
    }

    /** Compares values one by one, then whether the shift-dependent ones fit one profile shift. */
    private static final class Checker {
        private final InvoluteGear g;
        private final Wording words;
        private final List<Finding> out;
        private final List<Implied> implied = new ArrayList<>();
        private int mismatches;

        Checker(InvoluteGear g, Wording words, List<Finding> out) {
            this.g = g;
            this.words = words;
            this.out = out;
        }

        void compare(EngineeringCode code, String key, String name, double printed, double computed,
                     double withoutAllowance, boolean allowanceMatters, DoubleUnaryOperator ofShift,
                     DoubleUnaryOperator nominalOfShift, String hint) {
            boolean nominalFits = Math.abs(printed - withoutAllowance) <= tolerance(withoutAllowance);
            boolean fits = Math.abs(printed - computed) <= tolerance(computed);
            if (ofShift != null) {
                boolean nominalForm = !fits && nominalFits && nominalOfShift != null;
                implied.add(new Implied(name, printed, nominalForm ? nominalOfShift : ofShift));
            }
            if (fits || nominalFits && !allowanceMatters) {
                return;
            }
            mismatches++;
            String field = "gear.drawing." + key;
            String off = name + " on the drawing " + words.length(printed) + " differs from the computed "
                    + words.length(computed) + " by " + signed(printed - computed);
            String why = nominalFits
                    ? "; it fits the tooth without the thickness allowance " + words.length(g.thicknessAllowanceMm())
                    : impliedShift(ofShift, printed);
            out.add(code.at(field, off + why, "the " + name + " should be " + words.length(computed) + "; " + hint));
        }

        /**
         * With a mismatch and two or more shift-dependent values: either they all fit one profile shift
         * (then the job's shift is probably wrong) or no gear has all of them (the drawing contradicts itself).
         */
        void consistency() {
            if (mismatches == 0 || implied.size() < 2) {
                return;
            }
            double sum = 0;
            List<String> each = new ArrayList<>();
            for (Implied i : implied) {
                OptionalDouble x = solve(i.ofShift(), i.printed());
                if (x.isEmpty()) {
                    return;
                }
                sum += x.getAsDouble();
                each.add(i.name() + " " + words.number(x.getAsDouble()));
            }
            double mean = sum / implied.size();
            boolean one = implied.stream().allMatch(
                    i -> Math.abs(i.ofShift().applyAsDouble(mean) - i.printed()) <= tolerance(i.printed()));
            if (one) {
                out.add(EngineeringCode.DRAWING_IMPLIES_SHIFT.at("gear.profileShift", "the drawing's values ("
                        + String.join(", ", implied.stream().map(Implied::name).toList())
                        + ") all fit a profile shift of " + words.number(mean) + "; the job has "
                        + words.number(g.profileShift()), "if the drawing is right, set gear.profileShift to "
                        + words.number(mean)));
            } else {
                out.add(EngineeringCode.DRAWING_INCONSISTENT.at("gear.drawing", "the drawing's values fit different"
                        + " profile shifts (" + String.join(", ", each) + "): no gear has all of them",
                        "ask the designer which value is right before a hob is ordered"));
            }
        }

        private String signed(double mm) {
            return (mm > 0 ? "+" : "") + words.length(mm);
        }

        private String impliedShift(DoubleUnaryOperator ofShift, double target) {
            if (ofShift == null) {
                return "";
            }
            OptionalDouble x = solve(ofShift, target);
            return x.isPresent() ? "; it would fit a profile shift of " + words.number(x.getAsDouble())
                    + " (the job has " + words.number(g.profileShift()) + ")" : "";
        }
    }

    /** Bisection for an increasing function of the profile shift on −3 … 3. */
    static OptionalDouble solve(DoubleUnaryOperator f, double target) {
        double lo = -3;
        double hi = 3;
        double flo = f.applyAsDouble(lo) - target;
        double fhi = f.applyAsDouble(hi) - target;
        if (!(flo < 0 && fhi > 0)) {
            return OptionalDouble.empty();
        }
        for (int i = 0; i < 80; i++) {
            double mid = (lo + hi) / 2;
            if (f.applyAsDouble(mid) - target < 0) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        return OptionalDouble.of((lo + hi) / 2);
    }
}
