package org.hobwright.wizard.inspection;

import java.util.OptionalDouble;
import org.hobwright.wizard.geometry.InvoluteGear;

/**
 * Which pin or ball diameter the inspection values use, and why.
 *
 * <p>Rule, in order: the diameter given in the job; else the US wire-table size D_M = 1.728 m_n
 * (= 1.728/P, Machinery's Handbook wire tables, from memory; FORMULAS.md §3.2); if that pin does
 * not touch the involute between root form and tip or does not stand above the tip (large profile
 * shifts, few teeth), the pin touching at d + 2 x m_n ({@link OverPins#idealPinMm}), rounded to the
 * nearest shop step (0.01 mm in millimetre jobs, 0.0005 in in inch jobs: common practice, no source).
 *
 * @param diameterMm D_M, mm
 * @param origin     how it was chosen
 */
public record PinChoice(double diameterMm, Origin origin) {

    /** How the pin was chosen. */
    public enum Origin {
        /** Given in the job. */
        JOB,
        /** 1.728 m_n, the wire-table rule. */
        WIRE_TABLE_RULE,
        /** The pin that touches at d + 2 x m_n, rounded to a shop step. */
        CONTACT_AT_SHIFTED_REFERENCE
    }

    /**
     * Chooses the pin.
     *
     * @param g             the gear
     * @param jobPinMm      the job's pin, if given
     * @param tipDiameterMm actual tip diameter, mm
     * @param shopStepMm    rounding step for a computed pin, mm
     */
    public static PinChoice choose(InvoluteGear g, OptionalDouble jobPinMm, double tipDiameterMm, double shopStepMm) {
        return choose(g, jobPinMm, g.rootFormDiameterMm(), tipDiameterMm, shopStepMm);
    }

    /**
     * Chooses the pin, with the root form diameter already known.
     *
     * @param formDiameterMm root form diameter d_Ff, where the usable involute begins, mm
     */
    public static PinChoice choose(InvoluteGear g, OptionalDouble jobPinMm, double formDiameterMm, double tipDiameterMm,
                                   double shopStepMm) {
        if (jobPinMm.isPresent()) {
            return new PinChoice(jobPinMm.getAsDouble(), Origin.JOB);
        }
        double rule = ruleDiameter(g);
        if (OverPins.of(g, rule).fits(formDiameterMm, tipDiameterMm)) {
            return new PinChoice(rule, Origin.WIRE_TABLE_RULE);
        }
        double raw = OverPins.idealPinMm(g, formDiameterMm);
        if (!(raw > 0) || !Double.isFinite(raw)) {
            return new PinChoice(rule, Origin.WIRE_TABLE_RULE);
        }
        double ideal = Math.max(shopStepMm, Math.rint(raw / shopStepMm) * shopStepMm);
        return new PinChoice(ideal, Origin.CONTACT_AT_SHIFTED_REFERENCE);
    }

    /** The wire-table rule diameter 1.728 m_n, mm. */
    public static double ruleDiameter(InvoluteGear g) {
        return OverPins.RULE_FACTOR * g.normalModuleMm();
    }
}
