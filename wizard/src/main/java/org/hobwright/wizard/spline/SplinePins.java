package org.hobwright.wizard.spline;

import java.util.List;
import java.util.OptionalDouble;
import org.hobwright.api.check.Finding;
import org.hobwright.wizard.check.Wording;
import org.hobwright.wizard.geometry.InvoluteGear;
import org.hobwright.wizard.geometry.ToothSystem;
import org.hobwright.wizard.inspection.OverPins;

/**
 * Measurement over two pins of an external spline at its largest and smallest actual tooth thickness.
 *
 * <pre>
 * inv α_y = inv α_D + S/D + D_Re/D_b − π/z        pressure angle at the pin centres
 * even z:  M_Re = D_b / cos α_y + D_Re
 * odd z:   M_Re = D_b cos(90°/z) / cos α_y + D_Re
 * </pre>
 * ISO 4156-3:2005 and ANSI B92.1-1996 measurement-over-pins relation (from memory); it is the gear
 * relation of {@link OverPins} with x = (S − π m/2)/(2 m tan α_D), which is what this class uses.
 *
 * @param pinMm   the pin diameter D_Re, mm
 * @param origin  how the pin was chosen
 * @param atMax   the measurement at S_max (the upper limit)
 * @param atMin   the measurement at S_min (the lower limit)
 */
public record SplinePins(double pinMm, String origin, OverPins atMax, OverPins atMin) {

    /** The R40 preferred numbers of one decade (ISO 3:1973). */
    private static final double[] R40 = {1.00, 1.06, 1.12, 1.18, 1.25, 1.32, 1.40, 1.50, 1.60, 1.70, 1.80, 1.90, 2.00,
        2.12, 2.24, 2.36, 2.50, 2.65, 2.80, 3.00, 3.15, 3.35, 3.55, 3.75, 4.00, 4.25, 4.50, 4.75, 5.00, 5.30, 5.60, 6.00,
        6.30, 6.70, 7.10, 7.50, 8.00, 8.50, 9.00, 9.50};

    /** The upper limit of the measurement over pins, mm. */
    public double overPinsMaxMm() {
        return atMax.overPinsMm();
    }

    /** The lower limit of the measurement over pins, mm. */
    public double overPinsMinMm() {
        return atMin.overPinsMm();
    }

    /**
     * The measurement over pins of a pin at a tooth thickness.
     *
     * @param limits        the spline
     * @param pinMm         D_Re, mm
     * @param thicknessMm   actual circular tooth thickness S at D, mm
     */
    public static OverPins measure(SplineLimits limits, double pinMm, double thicknessMm) {
        SplineDrawing s = limits.spec();
        ToothSystem rack = new ToothSystem("spline", 1, 1, 0, 0, s.pressureAngleDeg(), "spline: only the flank is used");
        InvoluteGear g = new InvoluteGear(s.teeth(), s.moduleMm(), s.pressureAngleRad(), 0,
                limits.shiftFor(thicknessMm), 0, rack);
        return OverPins.of(g, pinMm);
    }

    /**
     * The pin that touches the flank at the pitch diameter when the space is E wide there, rounded up to
     * the R40 series: D_Re = D_b (tan(α_D + E/D) − tan α_D). Derived from the relation above with the
     * contact at D; ISO 4156-3:2005 rounds the computed pin to a preferred size (from memory).
     *
     * @param d            pitch diameter D, mm
     * @param db           base diameter D_b, mm
     * @param alphaRad     α_D, rad
     * @param spaceWidthMm space width E at D, mm
     */
    public static double pitchContactPinR40(double d, double db, double alphaRad, double spaceWidthMm) {
        return upR40(pitchContactPin(d, db, alphaRad, spaceWidthMm));
    }

    /** The pin touching at D, not rounded, mm (see {@link #pitchContactPinR40}). */
    public static double pitchContactPin(double d, double db, double alphaRad, double spaceWidthMm) {
        return db * (Math.tan(alphaRad + spaceWidthMm / d) - Math.tan(alphaRad));
    }

    /** The smallest R40 number at or above a value (value greater than 0). */
    static double upR40(double value) {
        double decade = Math.pow(10, Math.floor(Math.log10(value)));
        for (int pass = 0; pass < 2; pass++, decade *= 10) {
            for (double r : R40) {
                if (r * decade >= value * (1 - 1e-12)) {
                    return r * decade;
                }
            }
        }
        return value;
    }

    /**
     * Chooses the pin and measures over it. Order: the job's pin; else the standard's pin, or the pin
     * touching at the pitch diameter when the standard's does not fit; then, when the shop lists its pins,
     * the listed pin nearest to that one which fits at both limits (an info finding says so). A pin that
     * does not touch the involute between D_Fe and D_ee max at both limits, or does not stand above
     * D_ee max, gets a warning.
     *
     * @param limits   the spline
     * @param jobPinMm the pin the job gives
     * @param shopPins the shop's pin diameters, mm (empty: any size)
     * @param words    numbers in the job's units for the messages
     * @param findings receives the findings
     */
    public static SplinePins choose(SplineLimits limits, OptionalDouble jobPinMm, List<Double> shopPins,
                                    Wording words, List<Finding> findings) {
        if (jobPinMm.isPresent()) {
            return checked(limits, jobPinMm.getAsDouble(), "the job's pin", words, findings);
        }
        double pin = limits.recommendedPinMm();
        String origin = limits.pinRule();
        if (!fits(limits, pin)) {
            double space = limits.circularPitchMm() - limits.effectiveThicknessMaxMm();
            pin = pitchContactPinR40(limits.pitchDiameterMm(), limits.baseDiameterMm(),
                    limits.spec().pressureAngleRad(), space);
            origin = "the pin touching at the pitch diameter, rounded up to the R40 series ("
                    + limits.pinRule() + " does not fit)";
        }
        if (!shopPins.isEmpty()) {
            double best = Double.NaN;
            for (double p : shopPins) {
                if (fits(limits, p) && !(Math.abs(p - pin) >= Math.abs(best - pin))) {
                    best = p;
                }
            }
            if (Double.isFinite(best) && best != pin) {
                findings.add(SplineCode.SPLINE_PIN_FROM_SHOP_SET.at("spline.pinDiameter", "pin " + words.length(best)
                        + " from the shop's pins instead of " + words.length(pin) + " (" + origin + ").",
                        "Give spline.pinDiameter to use another pin."));
                return checked(limits, best, "the shop's pin nearest to " + words.length(pin), words, findings);
            }
        }
        return checked(limits, pin, origin, words, findings);
    }

    private static boolean fits(SplineLimits limits, double pin) {
        double top = limits.majorDiameterMaxMm();
        return measure(limits, pin, limits.toothThicknessMaxMm()).fits(limits.formDiameterMm(), top)
                && measure(limits, pin, limits.toothThicknessMinMm()).fits(limits.formDiameterMm(), top);
    }

    private static SplinePins checked(SplineLimits limits, double pin, String origin, Wording words,
                                      List<Finding> findings) {
        if (!fits(limits, pin)) {
            findings.add(SplineCode.SPLINE_PIN_CONTACT.at("spline.pinDiameter", "a " + words.length(pin) + " pin does not"
                    + " touch the flank between the form diameter " + words.length(limits.formDiameterMm())
                    + " and the major diameter " + words.length(limits.majorDiameterMaxMm()) + ", or does not stand"
                    + " above the teeth", "use a pin near " + words.length(limits.recommendedPinMm())));
        }
        return new SplinePins(pin, origin, measure(limits, pin, limits.toothThicknessMaxMm()),
                measure(limits, pin, limits.toothThicknessMinMm()));
    }
}
