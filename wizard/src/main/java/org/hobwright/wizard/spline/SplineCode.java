package org.hobwright.wizard.spline;

import org.hobwright.api.check.FindingCode;
import org.hobwright.api.check.Severity;

/**
 * The stable finding codes of the spline checks, each with its severity, meaning and source; listed in
 * {@code wizard/FINDINGS.md}. Codes are never reused for another meaning.
 */
public enum SplineCode implements FindingCode {
    SPLINE_PRESSURE_ANGLE(Severity.ERROR, "pressure angle not one the standard defines",
            "ISO 4156-1:2005 clause 1, ANSI B92.1-1996 clause 1, DIN 5480-1:2006 clause 1 (from memory)"),
    SPLINE_ROOT_FORM(Severity.ERROR, "a flat root is defined for 30° only", "ISO 4156-1:2005, ANSI B92.1-1996 (from memory)"),
    SPLINE_TOLERANCE_CLASS(Severity.ERROR, "tolerance class not one the standard defines",
            "ISO 4156-1:2005, ANSI B92.1-1996: classes 4 to 7 (from memory)"),
    SPLINE_FIT_CLASS(Severity.ERROR, "fit class not one Hobwright has the deviations of",
            "ISO 286-1:2010 Table 2 shaft deviations d, e, f, h; ANSI B92.1 side fit h"),
    SPLINE_TOLERANCE_VALUES(Severity.ERROR, "the drawing's tooth-thickness deviation and tolerances are needed",
            "DIN 5480-1:2006 drawing data (s_v max, s_max, s_min); Hobwright holds no DIN 5480 tolerance tables"),
    SPLINE_PITCH(Severity.ERROR, "diametral pitch not in the standard's tolerance tables", "ANSI B92.1-1996 (from memory)"),
    SPLINE_SIZE(Severity.ERROR, "size outside the ISO 286 tables the limits are taken from (pitch diameter up to 500 mm)",
            "ISO 286-1:2010 Tables 1 and 2"),
    SPLINE_REFERENCE_DIAMETER(Severity.ERROR, "DIN 5480 reference diameter missing or gives a profile shift outside −0.05 … +0.45",
            "x m = (d_B − m z − 1.1 m)/2, DIN 5480-1:2006 (from memory); shift range common practice, no source"),
    SPLINE_TOOTH_TOO_THIN(Severity.ERROR, "the tolerances leave no tooth", "S_min = S_v max − (T + λ) must be positive"),
    SPLINE_TEETH_RANGE(Severity.ERROR, "number of teeth outside 6 … 100", "ISO 4156-1:2005 and ANSI B92.1-1996 tables (from memory)"),
    SPLINE_PIN_CONTACT(Severity.WARNING, "pin does not touch the involute between form and major diameter, or does not stand above the major diameter",
            "pin contact from the involute relation, derived; common practice, no source"),
    SPLINE_PIN_FROM_SHOP_SET(Severity.INFO, "the pin is the shop's nearest pin, not the standard's size",
            "common practice, no source"),
    SPLINE_HOB_PITCH(Severity.ERROR, "hob module or diametral pitch differs from the spline's",
            "generating condition: hob pitch = spline pitch"),
    SPLINE_HOB_PRESSURE_ANGLE(Severity.ERROR, "hob pressure angle differs from the spline's",
            "generating condition: hob profile angle = spline pressure angle"),
    SPLINE_HOB_ROOT_FORM(Severity.ERROR, "hob root form (flat or fillet) differs from the spline's", "the hob tip forms the spline root"),
    SPLINE_HOB_TIP_RADIUS_SMALL(Severity.WARNING, "hob tip radius below the standard's smallest root radius",
            "minimum root radius ρ_Fe of the standard (from memory)"),
    SPLINE_HOB_TIP_RADIUS_LARGE(Severity.ERROR, "hob tip radius leaves no tip flat on the hob tooth", "rack geometry, derived"),
    SPLINE_FORM_NOT_REACHED(Severity.ERROR, "the true involute does not reach down to the form diameter",
            "generating simulation (FORMULAS.md, splines: form check)"),
    SPLINE_ROOT_BELOW_MINOR(Severity.ERROR, "the hob cuts below the minimum minor diameter",
            "generating simulation (FORMULAS.md, splines: form check)"),
    SPLINE_ROOT_ABOVE_MINOR(Severity.WARNING, "the hob leaves the root above the maximum minor diameter",
            "generating simulation (FORMULAS.md, splines: form check)"),
    SPLINE_STANDARD(Severity.ERROR, "the spline standard or root form is not one Hobwright knows",
            "Hobwright spline standards: iso4156, ansi-b92.1, din5480; roots flat, fillet"),
    SPLINE_HOB_NOT_SPLINE(Severity.ERROR, "a spline job needs a spline hob (its root form and tip radius)",
            "the hob tip forms the spline root"),
    SPLINE_HELIX(Severity.ERROR, "splines are straight: the helix angle must be 0",
            "ISO 4156-1:2005, ANSI B92.1-1996, DIN 5480-1:2006 cover straight splines (from memory)"),
    SPLINE_BLANK_BELOW_MAJOR(Severity.ERROR, "blank below the minimum major diameter: the teeth would be too short",
            "D_ee min of the standard"),
    SPLINE_BLANK_ABOVE_MAJOR(Severity.WARNING, "blank above the maximum major diameter: turn it to size before hobbing",
            "D_ee max of the standard");

    private final Severity severity;
    private final String meaning;
    private final String source;

    SplineCode(Severity severity, String meaning, String source) {
        this.severity = severity;
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

    @Override
    public String meaning() {
        return meaning;
    }

    @Override
    public String source() {
        return source;
    }
}
