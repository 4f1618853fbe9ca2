package org.hobwright.wizard.check;

import org.hobwright.api.check.FindingCode;
import org.hobwright.api.check.Severity;

/**
 * The stable finding codes of the engineering checks (run by
 * {@link org.hobwright.wizard.analysis.JobAnalyser}), each with its severity, the field it names,
 * its meaning and its source; listed in {@code wizard/FINDINGS.md}. Codes are never reused for
 * another meaning. Retired: {@code GEAR_TEETH_RANGE}, {@code GEAR_MODULE_RANGE} and
 * {@code GEAR_PRESSURE_ANGLE_RANGE}; the ranges of teeth, pitch and pressure angle are those of the
 * field table ({@code org.hobwright.api.job.JobFields}), which the job reader reports
 * ({@code INPUT_VALUE}) and the api records enforce.
 */
public enum EngineeringCode implements FindingCode {
    GEAR_TOOTH_SYSTEM_UNKNOWN(Severity.ERROR, "gear.toothSystem",
            "the tooth system identifier is not known",
            "Hobwright tooth-system table"),
    GEAR_HELIX_ANGLE_RANGE(Severity.WARNING, "gear.helixAngle",
            "helix angle above 45°",
            "ISO 1328-1:2013 scope; common practice, no source"),
    GEAR_FACE_WIDTH_SMALL(Severity.WARNING, "gear.faceWidth",
            "face width below one module (unit mix-up?)",
            Sources.RANGE),
    GEAR_PROFILE_SHIFT_RANGE(Severity.WARNING, "gear.profileShift",
            "profile shift outside −1 … +1.5",
            Sources.RANGE),
    GEAR_THICKNESS_ALLOWANCE_RANGE(Severity.WARNING, "gear.thicknessAllowance",
            "thickness allowance larger than 0.25 m_n",
            Sources.RANGE),
    GEAR_TOOTH_TOO_THIN(Severity.ERROR, "gear.thicknessAllowance",
            "the thickness allowance leaves no tooth",
            "tooth thickness s_n = m_n (π/2 + 2 x tan α_n) + E_sn, ISO 21771"),
    GEAR_ROOT_NOT_POSITIVE(Severity.ERROR, "gear.profileShift",
            "the root diameter would be zero or negative",
            "d_f = d − 2 (h_aP0 − x m_n), ISO 21771 eq. (34)"),
    GEAR_UNDERCUT(Severity.WARNING, "gear.profileShift",
            "the hob undercuts the teeth; states the shift to use",
            "undercut limit for rack generation x_min = h* − z sin² α_t / (2 cos β), derived (FORMULAS.md §2.3)"),
    GEAR_UNDERCUT_SLIGHT(Severity.INFO, "gear.profileShift",
            "slight undercut below the working flank, usually accepted",
            "practical limits 14 teeth at 20°, 26 at 14.5° (Niemann/Winter, Maschinenelemente II, from memory): shift shortfall up to h* ÷ 5"),
    GEAR_TIP_POINTED(Severity.ERROR, "gear.profileShift",
            "the teeth come to a point below the tip diameter",
            "tip thickness s_at = d_a (s_t/d + inv α_t − inv α_at), ISO 21771"),
    GEAR_TIP_THIN(Severity.WARNING, "gear.profileShift",
            "tip thickness below 0.25 m_n (0.4 m_n for case-hardened gears)",
            "design rule for tip thickness, from memory"),
    GEAR_CUSTOM_ROOT_RADIUS(Severity.WARNING, "gear.custom.rootRadius",
            "custom root radius does not fit the clearance",
            "largest fillet radius of the basic rack, derived (FORMULAS.md §1.3; ISO 53:1998 clause 5.9, from memory)"),
    GEAR_BLANK_BELOW_TIP(Severity.WARNING, "gear.blankDiameter",
            "blank smaller than the tip diameter: teeth are topped",
            Sources.BLANK),
    GEAR_BLANK_TOO_SMALL(Severity.ERROR, "gear.blankDiameter",
            "blank at or below the reference diameter",
            Sources.BLANK),
    GEAR_BLANK_ABOVE_TIP(Severity.WARNING, "gear.blankDiameter",
            "blank larger than the tip: stock to turn off first",
            Sources.BLANK),
    GEAR_BLANK_TOO_LARGE(Severity.ERROR, "gear.blankDiameter",
            "blank stock deeper than the hob teeth can reach",
            Sources.BLANK),
    HOB_MODULE_MISMATCH(Severity.ERROR, "hob.module / hob.diametralPitch",
            "hob module or diametral pitch differs from the gear's",
            "generating condition: hob normal pitch = gear normal pitch"),
    HOB_PRESSURE_ANGLE_MISMATCH(Severity.ERROR, "hob.pressureAngle",
            "hob pressure angle differs from the gear's",
            "generating condition: hob profile angle = gear normal pressure angle"),
    HOB_REFERENCE_DIAMETER_INVALID(Severity.ERROR, "hob.referenceDiameter / hob.outsideDiameter",
            "hob reference diameter not between z₀ m_n and the outside diameter",
            "sin γ = z₀ m_n / d_m0, hob lead angle of the hob thread (derived, FORMULAS.md §4.1)"),
    HOB_LEAD_ANGLE_MISMATCH(Severity.WARNING, "hob.leadAngle",
            "marked lead angle disagrees with asin(z₀ m_n / d_m0)",
            "sin γ = z₀ m_n / d_m0, hob lead angle of the hob thread (derived, FORMULAS.md §4.1)"),
    HOB_OPPOSITE_HAND(Severity.INFO, "hob.hand",
            "helical gear cut with an opposite-hand hob (larger swivel)",
            "common practice, no source"),
    HOB_STARTS_COMMON_FACTOR(Severity.INFO, "hob.starts",
            "teeth and hob starts share a factor: each start cuts the same gaps",
            "common practice, no source"),
    MACHINE_NO_HELIX(Severity.ERROR, "gear.helixAngle",
            "helical gear on a machine that cannot follow a helix",
            "machine profile followsHelix"),
    MACHINE_HOB_TOO_LARGE(Severity.ERROR, "hob.outsideDiameter",
            "hob outside diameter above the machine's largest hob",
            "machine profile maxHobDiameter"),
    MACHINE_SWIVEL_LIMIT(Severity.ERROR, "hob.hand / gear.helixAngle",
            "swivel angle beyond the machine's swivel range",
            "machine profile swivel.maxAngle"),
    DRAWING_PITCH_DIAMETER(Severity.ERROR, "gear.drawing.pitchDiameter",
            "drawing pitch diameter disagrees with d",
            Sources.DRAWING),
    DRAWING_OUTSIDE_DIAMETER(Severity.ERROR, "gear.drawing.outsideDiameter",
            "drawing outside diameter disagrees with d_a",
            Sources.DRAWING),
    DRAWING_ROOT_DIAMETER(Severity.ERROR, "gear.drawing.rootDiameter",
            "drawing root diameter disagrees with d_f",
            Sources.DRAWING),
    DRAWING_WHOLE_DEPTH(Severity.ERROR, "gear.drawing.wholeDepth",
            "drawing whole depth disagrees with h",
            Sources.DRAWING),
    DRAWING_SPAN_TEETH(Severity.ERROR, "gear.drawing.spanTeeth",
            "drawing span teeth not between 1 and z − 1",
            Sources.DRAWING),
    DRAWING_SPAN(Severity.ERROR, "gear.drawing.span",
            "drawing span disagrees with W_k",
            Sources.DRAWING),
    DRAWING_OVER_PINS(Severity.ERROR, "gear.drawing.overPins",
            "drawing over-pins value disagrees with M_d",
            Sources.DRAWING),
    DRAWING_IMPLIES_SHIFT(Severity.WARNING, "gear.profileShift",
            "the drawing's values all fit another profile shift than the job's",
            Sources.DRAWING),
    DRAWING_INCONSISTENT(Severity.ERROR, "gear.drawing",
            "the drawing's values fit different profile shifts: no gear has them all",
            Sources.DRAWING),
    INSPECTION_PIN_CONTACT(Severity.WARNING, "gear.pinDiameter",
            "pin or ball does not touch the involute or does not stand above the tip",
            "pin contact d_c = √(d_b² + (d_b tan α_Mt − D_M cos β_b)²), derived; common practice, no source"),
    INSPECTION_PIN_COMPUTED(Severity.INFO, "gear.pinDiameter",
            "the 1.728 m_n pin does not fit; a computed pin is used",
            "US wire tables 1.728/P (Machinery's Handbook, from memory); contact at d + 2 x m_n (derived)"),
    INSPECTION_SPAN_FACE_WIDTH(Severity.WARNING, "gear.faceWidth",
            "face width too narrow for the span anvils on a helical gear",
            "b > W_k sin β_b + 2 mm anvil margin (margin from memory)"),
    INSPECTION_SPAN_CONTACT(Severity.WARNING, "gear.profileShift",
            "span anvils touch outside the involute",
            "anvil contact d_c = √(d_b² + (W_k cos β_b)²), derived"),
    INSPECTION_CHORDAL_ABOVE_TIP(Severity.WARNING, "gear.profileShift",
            "the reference circle lies at or above the tip: no chordal thickness there",
            "chordal thickness at the reference circle, SDP/SI Elements of Metric Gear Technology, Section 10"),
    INSPECTION_LIMITS_SERIES(Severity.WARNING, "gear.thicknessSeries",
            "tooth-thickness allowances of a DIN 3967 series, values from memory: check them",
            "DIN 3967:1978-08 allowance and tolerance series (tables from memory)"),
    GEAR_PAIR_CENTRE_DISTANCE(Severity.ERROR, "gear.mate.centreDistance",
            "the centre distance cannot hold gears of these tooth counts and shifts",
            "cos α_wt = a_d cos α_t / a, ISO 21771:2007 gear-pair relations (clause from memory)"),
    GEAR_PAIR_NO_BACKLASH(Severity.ERROR, "gear.mate.centreDistance",
            "at the drawing's centre distance the teeth at their upper allowances would jam",
            "j_bn = (p_wt − s_wt1 − s_wt2) cos α_wt cos β_b, ISO 21771:2007 gear-pair relations (clause from memory)"),
    GEAR_PAIR_TIP_INTERFERENCE(Severity.ERROR, "gear.blankDiameter / gear.mate.profileShift",
            "a tip runs into the mating gear's root",
            "tip clearance c = a − d_a1/2 − d_f2/2, ISO 21771:2007 (clause from memory)"),
    GEAR_PAIR_TIP_CLEARANCE_SMALL(Severity.WARNING, "gear.blankDiameter / gear.mate.profileShift",
            "tip clearance to the mating gear's root below 0.1 m_n",
            "tip clearance c = a − d_a1/2 − d_f2/2, ISO 21771:2007; 0.1 m_n common practice, no source"),
    GEAR_PAIR_MATE_SHIFT(Severity.INFO, "gear.mate.profileShift",
            "the mate's profile shift is worked out from the centre distance",
            "x₁ + x₂ = (z₁ + z₂)(inv α_wt − inv α_t) / (2 tan α_n), ISO 21771:2007 (clause from memory)"),
    TOLERANCE_OUT_OF_SCOPE(Severity.WARNING, "gear.toleranceClass",
            "gear outside the scope of ISO 1328-1:2013; no tolerances given",
            "ISO 1328-1:2013 clause 1 (scope)");

    private final Severity severity;
    private final String field;
    private final String meaning;
    private final String source;

    EngineeringCode(Severity severity, String field, String meaning, String source) {
        this.severity = severity;
        this.field = field;
        this.meaning = meaning;
        this.source = source;
    }

    @Override
    public String code() {
        return name();
    }

    @Override
    public Severity severity() {
        return severity;
    }

    /** The input field findings of this code name (job-file path; pitch fields follow the form the job used). */
    public String field() {
        return field;
    }

    @Override
    public String meaning() {
        return meaning;
    }

    @Override
    public String source() {
        return source;
    }
}
