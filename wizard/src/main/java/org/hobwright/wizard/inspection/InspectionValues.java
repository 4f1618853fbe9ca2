package org.hobwright.wizard.inspection;

import java.util.OptionalDouble;
import org.hobwright.api.cycle.InspectionData;
import org.hobwright.wizard.geometry.InvoluteGear;

/**
 * Every inspection value of one gear, with the intermediate results the checks look at. All values
 * are for the thinned tooth (thickness allowance applied through x_E).
 *
 * @param data     the values for the report
 * @param span     the span measurement
 * @param pins     the over-pins (or over-balls) measurement
 * @param pin      how the pin was chosen
 * @param chordal  chordal thickness and height
 * @param tipDiameterMm actual tip diameter used, mm
 * @param formDiameterMm root form diameter d_Ff, where the usable involute begins, mm
 */
public record InspectionValues(InspectionData data, SpanMeasurement span, OverPins pins, PinChoice pin,
                               ChordalThickness chordal, double tipDiameterMm, double formDiameterMm) {

    /**
     * Computes the inspection values.
     *
     * @param g             the gear
     * @param tipDiameterMm actual tip diameter (the smaller of d_a and the blank), mm
     * @param jobPinMm      the job's pin or ball, if given
     * @param shopStepMm    rounding step for a computed pin, mm
     */
    public static InspectionValues of(InvoluteGear g, double tipDiameterMm, OptionalDouble jobPinMm,
                                      double shopStepMm) {
        double form = g.rootFormDiameterMm();
        SpanMeasurement span = SpanMeasurement.of(g, form, tipDiameterMm);
        PinChoice pin = PinChoice.choose(g, jobPinMm, form, tipDiameterMm, shopStepMm);
        OverPins pins = OverPins.of(g, pin.diameterMm());
        ChordalThickness chordal = ChordalThickness.of(g, tipDiameterMm);
        InspectionData data = new InspectionData(span.teeth(), span.widthMm(), span.contactDiameterMm(),
                pins.pinDiameterMm(), pins.overPinsMm(), pins.balls(), chordal.thicknessMm(), chordal.heightMm());
        return new InspectionValues(data, span, pins, pin, chordal, tipDiameterMm, form);
    }

    /** These values with their upper and lower limits. */
    public InspectionValues withLimits(org.hobwright.api.cycle.InspectionLimits limits) {
        InspectionData d = data;
        return new InspectionValues(new InspectionData(d.spanTeeth(), d.spanWidthMm(), d.spanContactDiameterMm(),
                d.pinDiameterMm(), d.overPinsMm(), d.balls(), d.chordalThicknessMm(), d.chordalHeightMm(),
                java.util.Optional.of(limits)), span, pins, pin, chordal, tipDiameterMm, formDiameterMm);
    }
}
