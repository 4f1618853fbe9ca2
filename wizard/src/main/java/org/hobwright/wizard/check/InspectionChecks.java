package org.hobwright.wizard.check;

import java.util.List;
import org.hobwright.api.check.Finding;
import org.hobwright.wizard.geometry.InvoluteGear;
import org.hobwright.wizard.inspection.InspectionValues;
import org.hobwright.wizard.inspection.OverPins;
import org.hobwright.wizard.inspection.PinChoice;

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
            String where = !pins.touchesInvolute() ? "would touch below the base circle"
                    : pins.contactDiameterMm() < form ? "touches at " + words.length(pins.contactDiameterMm())
                            + ", below the root form diameter " + words.length(form)
                    : pins.contactDiameterMm() > tip ? "would touch above the tip diameter " + words.length(tip)
                    : "reaches only " + words.length(2 * pins.reachRadiusMm()) + ", not above the tip diameter "
                            + words.length(tip);
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
}
