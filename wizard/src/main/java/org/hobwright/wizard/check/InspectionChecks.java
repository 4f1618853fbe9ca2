package org.hobwright.wizard.check;

import java.util.List;
import org.hobwright.api.check.Finding;
import org.hobwright.wizard.geometry.InvoluteGear;
import org.hobwright.wizard.inspection.InspectionValues;
import org.hobwright.wizard.inspection.OverPins;
import org.hobwright.wizard.inspection.PinChoice;
import org.hobwright.wizard.inspection.SpanMeasurement;
import org.hobwright.wizard.tolerance.ThicknessSeries;

/**
 * Can the inspector take the measurements? The pin or ball must touch the involute between the root
 * form diameter and the tip and stand above the tip; the span anvils must touch the involute and, on
 * a helical gear, fit on the face width: b &gt; W_k sin β_b + 2 mm (anvil margin from memory).
 */
public final class InspectionChecks {
    /** Face width the span anvils need beyond W_k sin β_b, mm (from memory). */
    public static final double ANVIL_MARGIN_MM = 2.0;

    private InspectionChecks() {
    }

    /** Checks the pins and the span of computed inspection values. */
    public static void check(InvoluteGear g, double faceWidthMm, InspectionValues v, Wording words, List<Finding> out) {
        double form = v.formDiameterMm();
        double tip = v.tipDiameterMm();
        OverPins pins = v.pins();
        String what = pins.balls() ? "ball" : "pin";
        if (v.pin().origin() == PinChoice.Origin.CONTACT_AT_SHIFTED_REFERENCE) {
            out.add(EngineeringCode.INSPECTION_PIN_COMPUTED.at("gear.pinDiameter", "the usual " + what + " of 1.728 module ("
                    + words.length(PinChoice.ruleDiameter(g)) + ") does not touch this gear's flanks properly; the "
                    + what + " touching at the shifted reference circle is used: " + words.length(pins.pinDiameterMm()),
                    "enter the " + what + " the inspector owns in gear.pinDiameter"));
        } else if (!pins.fits(form, tip)) {
            String where = misfit(pins, form, tip, words);
            double ideal = OverPins.idealPinMm(g, form);
            out.add(EngineeringCode.INSPECTION_PIN_CONTACT.at("gear.pinDiameter", "the " + what + " of "
                    + words.length(pins.pinDiameterMm()) + " " + where, ideal > 0 && Double.isFinite(ideal)
                            ? "use a " + what + " near " + words.length(ideal)
                            : "no " + what + " touches this gear's flanks properly: measure the span instead"));
        }
        double w = v.span().widthMm();
        double dc = v.span().contactDiameterMm();
        if (!v.span().touchesBetween(form, tip)) {
            out.add(EngineeringCode.INSPECTION_SPAN_CONTACT.at("gear.profileShift", "the span anvils over "
                    + Wording.teeth(v.span().teeth()) + " touch at " + words.length(dc) + ", outside the involute ("
                    + words.length(form) + " to " + words.length(tip) + ")", "measure over pins or balls instead"));
        }
        if (tip <= g.referenceDiameterMm()) {
            out.add(EngineeringCode.INSPECTION_CHORDAL_ABOVE_TIP.at("gear.profileShift", "the reference circle "
                    + words.length(g.referenceDiameterMm()) + " lies at or above the tip diameter " + words.length(tip)
                    + ": a tooth caliper cannot take the chordal thickness there, so its value is only nominal",
                    "measure the span or over " + what + "s"));
        }
        double needed = w * Math.sin(g.baseHelixAngleRad()) + ANVIL_MARGIN_MM;
        if (!g.isSpur() && faceWidthMm < needed) {
            out.add(EngineeringCode.INSPECTION_SPAN_FACE_WIDTH.at("gear.faceWidth", "face width "
                    + words.length(faceWidthMm) + " is too narrow for span anvils over "
                    + Wording.teeth(v.span().teeth())
                    + " (needs about " + words.length(needed) + ")", "measure over balls instead"));
        }
    }

    /** What is wrong with a pin or ball that does not fit, in words. */
    private static String misfit(OverPins pins, double form, double tip, Wording words) {
        return !pins.touchesInvolute() ? "would touch below the base circle"
                : pins.contactDiameterMm() < form ? "touches at " + words.length(pins.contactDiameterMm())
                        + ", below the root form diameter " + words.length(form)
                : pins.contactDiameterMm() > tip ? "would touch above the tip diameter " + words.length(tip)
                : "reaches only " + words.length(2 * pins.reachRadiusMm()) + ", not above the tip diameter "
                        + words.length(tip);
    }

    /**
     * Can the limits be measured? At the lower allowance the tooth is thinner and the hob cut deeper, so the
     * span anvils and the pin or ball touch lower on the flank and the pin or ball sinks deeper: at the lower
     * limit the contact must still lie on the involute of that tooth (between its root form diameter and the
     * tip) and the pin or ball must still stand above the tip. Reported only when the nominal
     * contact was fine (otherwise {@link #check} already said so).
     *
     * @param g                the gear with its upper allowance
     * @param v                the inspection values made for it
     * @param lowerAllowanceMm the lower normal allowance, mm
     */
    public static void checkLowerLimit(InvoluteGear g, InspectionValues v, double lowerAllowanceMm, Wording words,
                                       List<Finding> out) {
        InvoluteGear lower = g.withThicknessAllowance(lowerAllowanceMm);
        double form = lower.rootFormDiameterMm();
        double tip = v.tipDiameterMm();
        SpanMeasurement span = SpanMeasurement.over(lower, v.span().teeth());
        if (v.span().touchesBetween(v.formDiameterMm(), tip) && !span.touchesBetween(form, tip)) {
            out.add(EngineeringCode.INSPECTION_SPAN_CONTACT.at("gear.thicknessAllowanceLower", "at the lower"
                    + " tooth-thickness limit the span anvils over " + span.teeth() + " teeth touch at "
                    + words.length(span.contactDiameterMm()) + ", outside the involute of the thinner tooth ("
                    + words.length(form) + " to " + words.length(tip) + "): the lower span limit cannot be measured",
                    "measure over pins or balls instead"));
        }
        OverPins pins = OverPins.of(lower, v.pins().pinDiameterMm());
        if (v.pins().fits(v.formDiameterMm(), tip) && !pins.fits(form, tip)) {
            String what = pins.balls() ? "ball" : "pin";
            out.add(EngineeringCode.INSPECTION_PIN_CONTACT.at("gear.thicknessAllowanceLower", "at the lower"
                    + " tooth-thickness limit the " + what + " of " + words.length(pins.pinDiameterMm()) + " "
                    + misfit(pins, form, tip, words), "use a larger " + what + " or measure the span"));
        }
    }

    /**
     * Where the tooth-thickness allowances come from, for the report: {@code drawing}, or the DIN 3967 series
     * with a warning that its values are from memory.
     */
    public static String limitsBasis(org.hobwright.api.job.GearSpec spec, Wording words, List<Finding> out) {
        java.util.Optional<ThicknessSeries> series = spec.thicknessSeries().flatMap(ThicknessSeries::parse);
        if (series.isEmpty()) {
            return "drawing";
        }
        out.add(EngineeringCode.INSPECTION_LIMITS_SERIES.at("gear.thicknessSeries", series.get().label()
                + " gives the allowances " + words.length(spec.thicknessAllowanceMm()) + " (upper) and "
                + words.length(spec.thicknessAllowanceLowerMm().orElse(spec.thicknessAllowanceMm()))
                + " (lower) for this reference diameter; Hobwright's table of the series is from memory",
                "check both against DIN 3967 before the limits are used, or enter the drawing's allowances"));
        return series.get().label() + " (from memory)";
    }
}
