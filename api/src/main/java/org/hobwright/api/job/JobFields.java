package org.hobwright.api.job;

import org.hobwright.api.ApiStatus;

import static org.hobwright.api.wizard.FieldType.ANGLE;
import static org.hobwright.api.wizard.FieldType.BOOLEAN;
import static org.hobwright.api.wizard.FieldType.CHOICE;
import static org.hobwright.api.wizard.FieldType.INTEGER;
import static org.hobwright.api.wizard.FieldType.NUMBER;
import static org.hobwright.api.wizard.FieldType.TEXT;
import static org.hobwright.api.job.UnitKind.CUTTING_SPEED;
import static org.hobwright.api.job.UnitKind.DIAMETRAL_PITCH;
import static org.hobwright.api.job.UnitKind.FEED;
import static org.hobwright.api.job.UnitKind.LENGTH;
import static org.hobwright.api.job.UnitKind.MICROMETRE;
import static org.hobwright.api.job.UnitKind.MODULE;
import static org.hobwright.api.job.UnitKind.NONE;
import static org.hobwright.api.job.UnitKind.RPM;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * The fields of a job file (format {@code hobwright-job}, version 1), in the order they are
 * written and asked. Adding a field is one line here; the wizard asks it, the schema lists it,
 * and the table tests fail until the reader and the writer handle it (DEVELOPERS.md).
 *
 * <p>Ranges are the limits Hobwright accepts; the api records refuse values outside them, the
 * readers and the wizard report them as findings first. Numbers of teeth, module and pressure
 * angle: the range Hobwright hobs (common practice, no source; ISO 1328-1:2013 also starts at 5
 * teeth). The other limits only keep out values that cannot be meant (common practice, no source).
 */
@ApiStatus(since = "1.1")
public final class JobFields {
    private static final List<FieldDef> ALL = new ArrayList<>();

    /** Tooth systems of a job: the identifiers of the tooth-system table (wizard.geometry). */
    public static final List<String> TOOTH_SYSTEMS = List.of("iso53-a", "iso53-b", "iso53-c", "iso53-d",
            "agma-coarse", "agma-fine", "full-depth-14.5", "custom");
    /** Hands of a helix or hob thread. */
    public static final List<String> HANDS = List.of("right", "left");
    /** Cutting materials of a hob. */
    public static final List<String> HOB_MATERIALS = List.of("hss", "hss-coated", "carbide");
    /** Hobbing methods. */
    public static final List<String> METHODS = List.of("climb", "conventional");
    /** Senses a hob cuts in, seen from its own drive end. */
    public static final List<String> SENSES = List.of("clockwise", "counter-clockwise");
    /** What a job cuts. */
    public static final List<String> PARTS = List.of("gear", "spline");
    /** The spline standards (identifiers of wizard.spline). */
    public static final List<String> SPLINE_STANDARDS = List.of("iso4156", "ansi-b92.1", "din5480");
    /** Root forms of a spline and of a spline hob. */
    public static final List<String> SPLINE_ROOTS = List.of("flat", "fillet");
    /** Length units of a file. */
    public static final List<String> UNIT_WORDS = List.of("mm", "in");

    private static final String SPUR = "a spur gear unless the drawing gives a helix (common practice)";
    private static final String PLANNER = "the planner takes it from the cutting-data table";
    private static final FieldDefault PITCH = new FieldDefault("", "", FieldDefault.Origin.NONE,
            "none: give the module or the diametral pitch, exactly one");
    private static final FieldDefault ISO53_20 = FieldDefault.standard("20",
            "ISO 53:1998 standard basic rack, pressure angle 20°");

    // ---------------------------------------------------------------- job
    /** The field {@code name}. */
    public static final FieldDef NAME = add(FieldDef.of("name", TEXT, NONE).mustGive().namesLibraryEntry()
            .text("Job name", "Names the output files; letters, digits, '.', '_' and '-'."));
    /** The field {@code units}. */
    public static final FieldDef UNITS = add(FieldDef.of("units", CHOICE, NONE).choices(UNIT_WORDS)
            .required(FieldDefault.convention("mm", "millimetres, the SI unit of length"))
            .text("Length unit", "The unit every length of this job is entered and printed in."));

    /** The field {@code part}. */
    public static final FieldDef PART = add(FieldDef.of("part", CHOICE, NONE).choices(PARTS)
            .optional(FieldDefault.convention("gear", "a gear unless the job says spline"))
            .text("Part kind", "What the job cuts: gear, or spline (an external involute spline; the spline"
                    + " questions replace the gear's)."));

    // ---------------------------------------------------------------- gear
    /** The field {@code gear.partName}. */
    public static final FieldDef GEAR_PART_NAME = add(FieldDef.of("gear.partName", TEXT, NONE)
            .optional(FieldDefault.computed("the job name"))
            .text("Part name or number", "As on the drawing; printed in the program header and on the setup sheet."));
    /** The field {@code gear.teeth}. */
    public static final FieldDef GEAR_TEETH = add(FieldDef.of("gear.teeth", INTEGER, NONE).range(5, 2000).mustGive()
            .text("Number of teeth", "Tooth count z from the drawing."));
    /** The field {@code gear.module}. */
    public static final FieldDef GEAR_MODULE = add(FieldDef.of("gear.module", NUMBER, MODULE).range(0.05, 100)
            .optional(PITCH)
            .text("Normal module", "Normal module m_n in mm. Give the module or the diametral pitch, not both."));
    /** The field {@code gear.diametralPitch}. */
    public static final FieldDef GEAR_DIAMETRAL_PITCH = add(FieldDef.of("gear.diametralPitch", NUMBER,
            DIAMETRAL_PITCH).range(0.254, 508)
            .optional(PITCH)
            .text("Normal diametral pitch", "Normal diametral pitch P_n in teeth per inch, instead of the module."));
    /** The field {@code gear.pressureAngle}. */
    public static final FieldDef GEAR_PRESSURE_ANGLE = add(FieldDef.of("gear.pressureAngle", ANGLE, UnitKind.ANGLE)
            .range(10, 45).required(ISO53_20)
            .text("Normal pressure angle", "Normal pressure angle α_n, usually 20°; decimal or degrees-minutes-seconds."));
    /** The field {@code gear.helixAngle}. */
    public static final FieldDef GEAR_HELIX_ANGLE = add(FieldDef.of("gear.helixAngle", ANGLE, UnitKind.ANGLE)
            .range(0, 60).optional(FieldDefault.convention("0", SPUR))
            .text("Helix angle", "Helix angle β at the reference diameter; 0 for a spur gear."));
    /** The field {@code gear.hand}. */
    public static final FieldDef GEAR_HAND = add(FieldDef.of("gear.hand", CHOICE, NONE).choices(HANDS)
            .optional(FieldDefault.convention("right", "used only for a helical gear, which must state its hand"))
            .text("Helix hand", "Hand of the helix; ignored for a spur gear, required for a helical one."));
    /** The field {@code gear.faceWidth}. */
    public static final FieldDef GEAR_FACE_WIDTH = add(FieldDef.of("gear.faceWidth", NUMBER, LENGTH)
            .range(FieldRange.POSITIVE).mustGive().text("Face width", "Face width b of the gear."));
    /** The field {@code gear.profileShift}. */
    public static final FieldDef GEAR_PROFILE_SHIFT = add(FieldDef.of("gear.profileShift", NUMBER, NONE)
            .range(-3, 3).optional(FieldDefault.convention("0", "a gear without profile shift unless the drawing"
                    + " gives one (common practice)"))
            .text("Profile shift coefficient", "Profile shift x in modules; 0 for a standard gear."));
    /** The field {@code gear.thicknessSeries}. */
    public static final FieldDef GEAR_THICKNESS_SERIES = add(FieldDef.of("gear.thicknessSeries", TEXT, NONE)
            .optional(FieldDefault.unused("the drawing's allowances"))
            .text("Tooth thickness series", "Leave empty to enter the drawing's allowances. Only for a drawing"
                    + " without them: a DIN 3967 allowance and tolerance series such as din3967-cd25."));
    /** The field {@code gear.thicknessAllowance}. */
    public static final FieldDef GEAR_THICKNESS_ALLOWANCE = add(FieldDef.of("gear.thicknessAllowance", NUMBER,
            LENGTH).range(-10, 10).optional(FieldDefault.convention("0", "the nominal tooth thickness unless the"
                    + " drawing gives an allowance (common practice)"))
            .text("Tooth thickness allowance", "Upper normal tooth thickness allowance E_sn from the drawing;"
                    + " negative thins the tooth for backlash."));
    /** The field {@code gear.thicknessAllowanceLower}. */
    public static final FieldDef GEAR_THICKNESS_ALLOWANCE_LOWER = add(FieldDef.of("gear.thicknessAllowanceLower",
            NUMBER, LENGTH).range(-10, 10).optional(FieldDefault.unused("no limits, only nominal inspection values"))
            .text("Lower tooth thickness allowance", "Lower normal allowance E_sni from the drawing, not above the"
                    + " upper one; gives the inspection values their lower limits."));
    /** The field {@code gear.toothSystem}. */
    public static final FieldDef GEAR_TOOTH_SYSTEM = add(FieldDef.of("gear.toothSystem", CHOICE, NONE)
            .choices(TOOTH_SYSTEMS).required(FieldDefault.standard("", "by the pitch: iso53-a for a module"
                    + " (ISO 53:1998 profile A), agma-coarse below 20 diametral pitch, agma-fine from 20"
                    + " (the coarse- and fine-pitch ranges of AGMA 201.02 and 207.04, from memory)"))
            .text("Tooth system", "Basic rack the gear is cut to; 'custom' asks for the factors below."));
    /** The field {@code gear.custom.addendum}. */
    public static final FieldDef GEAR_CUSTOM_ADDENDUM = add(FieldDef.of("gear.custom.addendum", NUMBER, NONE)
            .range(0.3, 2).required(FieldDefault.standard("1", "ISO 53:1998 profile A, h_aP = 1.0 m"))
            .text("Custom addendum factor", "Addendum h_aP / m_n, only for the custom tooth system."));
    /** The field {@code gear.custom.dedendum}. */
    public static final FieldDef GEAR_CUSTOM_DEDENDUM = add(FieldDef.of("gear.custom.dedendum", NUMBER, NONE)
            .range(0.3, 3).required(FieldDefault.standard("1.25", "ISO 53:1998 profile A, h_fP = 1.25 m"))
            .text("Custom dedendum factor", "Dedendum h_fP / m_n, only for the custom tooth system."));
    /** The field {@code gear.custom.rootRadius}. */
    public static final FieldDef GEAR_CUSTOM_ROOT_RADIUS = add(FieldDef.of("gear.custom.rootRadius", NUMBER, NONE)
            .range(0, 1).required(FieldDefault.standard("0.38", "ISO 53:1998 profile A, ρ_fP = 0.38 m"))
            .text("Custom root radius factor", "Root fillet radius ρ_fP / m_n, only for the custom tooth system."));
    /** The field {@code gear.blankDiameter}. */
    public static final FieldDef GEAR_BLANK_DIAMETER = add(FieldDef.of("gear.blankDiameter", NUMBER, LENGTH)
            .range(FieldRange.POSITIVE).optional(FieldDefault.computed("the tip diameter"))
            .text("Blank diameter", "Diameter the blank is turned to; empty takes the tip diameter."));
    /** The field {@code gear.pinDiameter}. */
    public static final FieldDef GEAR_PIN_DIAMETER = add(FieldDef.of("gear.pinDiameter", NUMBER, LENGTH)
            .range(FieldRange.POSITIVE).optional(FieldDefault.computed("1.728 m_n (US wire tables), or a pin"
                    + " that touches the flank"))
            .text("Pin or ball diameter", "Pin the inspector uses for the over-pins value; empty lets Hobwright"
                    + " choose."));
    /** The field {@code gear.toleranceClass}. */
    public static final FieldDef GEAR_TOLERANCE_CLASS = add(FieldDef.of("gear.toleranceClass", INTEGER, NONE)
            .range(1, 11).optional(FieldDefault.unused("no flank tolerances"))
            .text("Flank tolerance class", "ISO 1328-1 flank tolerance class 1 to 11, if the drawing gives one."));
    /** The field {@code gear.drawing.pitchDiameter}. */
    public static final FieldDef DRAWING_PITCH_DIAMETER = add(drawing("pitchDiameter", "Drawing: pitch diameter",
            "As printed on the drawing, to be compared with the computed value."));
    /** The field {@code gear.drawing.outsideDiameter}. */
    public static final FieldDef DRAWING_OUTSIDE_DIAMETER = add(drawing("outsideDiameter",
            "Drawing: outside diameter", "As printed on the drawing."));
    /** The field {@code gear.drawing.rootDiameter}. */
    public static final FieldDef DRAWING_ROOT_DIAMETER = add(drawing("rootDiameter", "Drawing: root diameter",
            "As printed on the drawing."));
    /** The field {@code gear.drawing.wholeDepth}. */
    public static final FieldDef DRAWING_WHOLE_DEPTH = add(drawing("wholeDepth", "Drawing: whole depth",
            "As printed on the drawing."));
    /** The field {@code gear.drawing.spanTeeth}. */
    public static final FieldDef DRAWING_SPAN_TEETH = add(FieldDef.of("gear.drawing.spanTeeth", INTEGER, NONE)
            .range(1, 2000).optional(FieldDefault.unused("not compared"))
            .text("Drawing: teeth spanned", "Number of teeth of the printed span measurement."));
    /** The field {@code gear.drawing.span}. */
    public static final FieldDef DRAWING_SPAN = add(drawing("span", "Drawing: span measurement",
            "Span (base tangent length) as printed."));
    /** The field {@code gear.drawing.pinDiameter}. */
    public static final FieldDef DRAWING_PIN_DIAMETER = add(drawing("pinDiameter", "Drawing: pin diameter",
            "Pin or ball diameter of the printed over-pins value."));
    /** The field {@code gear.drawing.overPins}. */
    public static final FieldDef DRAWING_OVER_PINS = add(drawing("overPins", "Drawing: over pins",
            "Measurement over two pins or balls as printed."));

    /** The field {@code gear.mate.teeth}. */
    public static final FieldDef MATE_TEETH = add(FieldDef.of("gear.mate.teeth", INTEGER, NONE).range(1, 2000)
            .optional(FieldDefault.unused("no mating gear"))
            .text("Mating gear: teeth", "Tooth count of the gear this one runs with, if the drawing gives it;"
                    + " needed for the other mating-gear values."));
    /** The field {@code gear.mate.profileShift}. */
    public static final FieldDef MATE_PROFILE_SHIFT = add(FieldDef.of("gear.mate.profileShift", NUMBER, NONE)
            .range(-3, 3).optional(FieldDefault.computed("from the centre distance, else 0"))
            .text("Mating gear: profile shift", "The mate's profile shift coefficient; empty works it out from the"
                    + " centre distance."));
    /** The field {@code gear.mate.centreDistance}. */
    public static final FieldDef MATE_CENTRE_DISTANCE = add(FieldDef.of("gear.mate.centreDistance", NUMBER, LENGTH)
            .range(FieldRange.POSITIVE).optional(FieldDefault.computed("the centre distance without backlash"))
            .text("Mating gear: centre distance", "Centre distance of the pair as drawn."));
    /** The field {@code gear.mate.thicknessAllowance}. */
    public static final FieldDef MATE_THICKNESS_ALLOWANCE = add(FieldDef.of("gear.mate.thicknessAllowance", NUMBER,
            LENGTH).range(-10, 10).optional(FieldDefault.convention("0", "the nominal tooth thickness unless the"
                    + " drawing gives an allowance (common practice)"))
            .text("Mating gear: upper allowance", "The mate's upper normal tooth thickness allowance."));
    /** The field {@code gear.mate.thicknessAllowanceLower}. */
    public static final FieldDef MATE_THICKNESS_ALLOWANCE_LOWER = add(FieldDef.of("gear.mate.thicknessAllowanceLower",
            NUMBER, LENGTH).range(-10, 10).optional(FieldDefault.computed("the mate's upper allowance"))
            .text("Mating gear: lower allowance", "The mate's lower normal tooth thickness allowance, not above its"
                    + " upper one."));

    // ---------------------------------------------------------------- spline
    /** The field {@code spline.partName}. */
    public static final FieldDef SPLINE_PART_NAME = add(FieldDef.of("spline.partName", TEXT, NONE)
            .optional(FieldDefault.computed("the job name"))
            .text("Part name or number", "As on the drawing; printed in the program header and on the setup sheet."));
    /** The field {@code spline.standard}. */
    public static final FieldDef SPLINE_STANDARD = add(FieldDef.of("spline.standard", CHOICE, NONE)
            .choices(SPLINE_STANDARDS).mustGive()
            .text("Spline standard", "iso4156 (ISO 4156-1, module, side fit), ansi-b92.1 (inch, side fit) or din5480"
                    + " (reference diameter)."));
    /** The field {@code spline.teeth}. */
    public static final FieldDef SPLINE_TEETH = add(FieldDef.of("spline.teeth", INTEGER, NONE).range(5, 2000)
            .mustGive().text("Number of teeth", "Tooth count z of the spline."));
    /** The field {@code spline.module}. */
    public static final FieldDef SPLINE_MODULE = add(FieldDef.of("spline.module", NUMBER, MODULE).range(0.05, 100)
            .optional(PITCH)
            .text("Module", "Module m in mm (ISO 4156, DIN 5480). Give the module or the diametral pitch, not both."));
    /** The field {@code spline.diametralPitch}. */
    public static final FieldDef SPLINE_DIAMETRAL_PITCH = add(FieldDef.of("spline.diametralPitch", TEXT, NONE)
            .optional(PITCH)
            .text("Diametral pitch", "ANSI B92.1 pitch as the drawing writes it, e.g. 16/32 (the stub pitch is"
                    + " twice the pitch)."));
    /** The field {@code spline.pressureAngle}. */
    public static final FieldDef SPLINE_PRESSURE_ANGLE = add(FieldDef.of("spline.pressureAngle", ANGLE,
            UnitKind.ANGLE).range(10, 45).required(FieldDefault.standard("30", "ISO 4156-1, ANSI B92.1 and DIN 5480:"
                    + " 30° (37.5° and 45° in ISO 4156 and ANSI B92.1)"))
            .text("Pressure angle", "30, 37.5 or 45°."));
    /** The field {@code spline.root}. */
    public static final FieldDef SPLINE_ROOT = add(FieldDef.of("spline.root", CHOICE, NONE).choices(SPLINE_ROOTS)
            .required(FieldDefault.standard("fillet", "every pressure angle has a fillet root; flat only at 30°"))
            .text("Root form", "flat (30° only) or fillet."));
    /** The field {@code spline.toleranceClass}. */
    public static final FieldDef SPLINE_TOLERANCE_CLASS = add(FieldDef.of("spline.toleranceClass", INTEGER, NONE)
            .range(1, 16).required(FieldDefault.standard("5", "ISO 4156-1 and ANSI B92.1 class 5, the former single"
                    + " class"))
            .text("Tolerance class", "4 to 7 (ISO 4156, ANSI B92.1); the quality for DIN 5480."));
    /** The field {@code spline.fitClass}. */
    public static final FieldDef SPLINE_FIT_CLASS = add(FieldDef.of("spline.fitClass", TEXT, NONE)
            .optional(FieldDefault.convention("h", "the standards' fit without clearance allowance"))
            .text("Fit class", "As the standard names it: h, f, e or d (ANSI B92.1: h)."));
    /** The field {@code spline.referenceDiameter}. */
    public static final FieldDef SPLINE_REFERENCE_DIAMETER = add(FieldDef.of("spline.referenceDiameter", NUMBER,
            LENGTH).range(FieldRange.POSITIVE).optional(FieldDefault.unused("only DIN 5480 uses it"))
            .text("Reference diameter", "DIN 5480 reference diameter d_B (the first number of W d_B × m × z)."));
    /** The field {@code spline.faceWidth}. */
    public static final FieldDef SPLINE_FACE_WIDTH = add(FieldDef.of("spline.faceWidth", NUMBER, LENGTH)
            .range(FieldRange.POSITIVE).mustGive().text("Spline length", "Length of the splined section."));
    /** The field {@code spline.pinDiameter}. */
    public static final FieldDef SPLINE_PIN_DIAMETER = add(FieldDef.of("spline.pinDiameter", NUMBER, LENGTH)
            .range(FieldRange.POSITIVE).optional(FieldDefault.computed("the standard's pin"))
            .text("Pin diameter", "Pin for the measurement over pins; empty takes the standard's."));
    /** The field {@code spline.blankDiameter}. */
    public static final FieldDef SPLINE_BLANK_DIAMETER = add(FieldDef.of("spline.blankDiameter", NUMBER, LENGTH)
            .range(FieldRange.POSITIVE).optional(FieldDefault.computed("the maximum major diameter"))
            .text("Blank diameter", "Major diameter the shaft is turned to before hobbing."));
    /** The field {@code spline.allowance}. */
    public static final FieldDef SPLINE_ALLOWANCE = add(FieldDef.of("spline.allowance", NUMBER, LENGTH)
            .range(-10, 10).optional(FieldDefault.computed("the fit class's deviation (ISO 4156, ANSI B92.1)"))
            .text("Tooth thickness deviation", "es (DIN 5480: A_s = s_v max − s) from the drawing; negative thins"
                    + " the tooth."));
    /** The field {@code spline.totalTolerance}. */
    public static final FieldDef SPLINE_TOTAL_TOLERANCE = add(FieldDef.of("spline.totalTolerance", NUMBER, LENGTH)
            .range(FieldRange.POSITIVE).optional(FieldDefault.computed("the tolerance class (ISO 4156, ANSI B92.1)"))
            .text("Total tooth thickness tolerance", "T + λ (DIN 5480: T_G = s_v max − s_min) from the drawing."));
    /** The field {@code spline.effectiveVariation}. */
    public static final FieldDef SPLINE_EFFECTIVE_VARIATION = add(FieldDef.of("spline.effectiveVariation", NUMBER,
            LENGTH).range(0, 10).optional(FieldDefault.computed("the tolerance class (ISO 4156, ANSI B92.1)"))
            .text("Effective variation", "λ (DIN 5480: T_eff = s_v max − s_max) from the drawing."));

    // ---------------------------------------------------------------- hob
    /** The field {@code hob.module}. */
    public static final FieldDef HOB_MODULE = add(FieldDef.of("hob.module", NUMBER, MODULE).range(0.05, 100)
            .optional(PITCH)
            .text("Hob normal module", "Normal module of the hob in mm; must match the gear's pitch."));
    /** The field {@code hob.diametralPitch}. */
    public static final FieldDef HOB_DIAMETRAL_PITCH = add(FieldDef.of("hob.diametralPitch", NUMBER,
            DIAMETRAL_PITCH).range(0.254, 508)
            .optional(PITCH)
            .text("Hob normal diametral pitch", "Normal diametral pitch of the hob, instead of the module."));
    /** The field {@code hob.pressureAngle}. */
    public static final FieldDef HOB_PRESSURE_ANGLE = add(FieldDef.of("hob.pressureAngle", ANGLE, UnitKind.ANGLE)
            .range(10, 45).required(ISO53_20)
            .text("Hob pressure angle", "Normal pressure angle of the hob profile; must match the gear's."));
    /** The field {@code hob.starts}. */
    public static final FieldDef HOB_STARTS = add(FieldDef.of("hob.starts", INTEGER, NONE).range(1, 12)
            .required(FieldDefault.convention("1", "single-start hobs are the usual choice for accuracy"))
            .text("Number of starts", "Threads of the hob, usually 1."));
    /** The field {@code hob.hand}. */
    public static final FieldDef HOB_HAND = add(FieldDef.of("hob.hand", CHOICE, NONE).choices(HANDS)
            .required(FieldDefault.convention("right", "right-hand hobs are the usual stock"))
            .text("Hob thread hand", "Hand of the hob thread, as marked."));
    /** The field {@code hob.outsideDiameter}. */
    public static final FieldDef HOB_OUTSIDE_DIAMETER = add(FieldDef.of("hob.outsideDiameter", NUMBER, LENGTH)
            .range(FieldRange.POSITIVE).mustGive().text("Hob outside diameter", "Tip diameter of the hob."));
    /** The field {@code hob.leadAngle}. */
    public static final FieldDef HOB_LEAD_ANGLE = add(FieldDef.of("hob.leadAngle", ANGLE, UnitKind.ANGLE)
            .range(0, 45).optional(FieldDefault.computed("asin(z₀ m_n / d_m0) from the reference diameter"))
            .text("Hob lead angle", "Lead angle as marked on the hob; empty computes it from the reference diameter."));
    /** The field {@code hob.referenceDiameter}. */
    public static final FieldDef HOB_REFERENCE_DIAMETER = add(FieldDef.of("hob.referenceDiameter", NUMBER, LENGTH)
            .range(FieldRange.POSITIVE).optional(FieldDefault.computed("the outside diameter less twice the hob"
                    + " addendum"))
            .text("Hob reference diameter", "Pitch diameter of the hob, if known; empty derives it from the outside"
                    + " diameter."));
    /** The field {@code hob.gashes}. */
    public static final FieldDef HOB_GASHES = add(FieldDef.of("hob.gashes", INTEGER, NONE).range(1, 1000).mustGive()
            .text("Number of gashes", "Flutes of the hob."));
    /** The field {@code hob.length}. */
    public static final FieldDef HOB_LENGTH = add(FieldDef.of("hob.length", NUMBER, LENGTH)
            .range(FieldRange.POSITIVE).mustGive().text("Hob length", "Usable length of the hob."));
    /** The field {@code hob.maxRpm}. */
    public static final FieldDef HOB_MAX_RPM = add(FieldDef.of("hob.maxRpm", NUMBER, RPM).range(FieldRange.POSITIVE)
            .optional(FieldDefault.unused("no limit of the hob maker"))
            .text("Hob speed limit", "The hob maker's speed limit, if given."));
    /** The field {@code hob.material}. */
    public static final FieldDef HOB_MATERIAL = add(FieldDef.of("hob.material", CHOICE, NONE).choices(HOB_MATERIALS)
            .mustGive().text("Hob material", "Cutting material of the hob."));
    /** The field {@code hob.cuttingSense}. */
    public static final FieldDef HOB_CUTTING_SENSE = add(FieldDef.of("hob.cuttingSense", CHOICE, NONE).choices(SENSES)
            .optional(FieldDefault.computed("clockwise, with a remark"))
            .text("Hob cutting sense", "The sense the hob cuts in, seen from its own drive end: its cutting faces"
                    + " lead."));
    /** The field {@code hob.identifier}. */
    public static final FieldDef HOB_IDENTIFIER = add(FieldDef.of("hob.identifier", TEXT, NONE)
            .optional(FieldDefault.unused("no identifier on the setup sheet"))
            .text("Hob identifier", "Your tool number or serial of the hob, for the setup sheet."));

    /** The field {@code hob.root}. */
    public static final FieldDef HOB_ROOT = add(FieldDef.of("hob.root", CHOICE, NONE).choices(SPLINE_ROOTS)
            .optional(FieldDefault.unused("a gear hob"))
            .text("Spline hob root form", "The root form the spline hob's tip cuts: flat or fillet."));
    /** The field {@code hob.tipRadius}. */
    public static final FieldDef HOB_TIP_RADIUS = add(FieldDef.of("hob.tipRadius", NUMBER, LENGTH)
            .range(0, 100).optional(FieldDefault.unused("a gear hob; a spline hob must give it"))
            .text("Spline hob tip radius", "Tip corner radius of the spline hob, as the hob maker states it."));
    /** The field {@code hob.addendum}. */
    public static final FieldDef HOB_ADDENDUM = add(FieldDef.of("hob.addendum", NUMBER, LENGTH)
            .range(FieldRange.POSITIVE).optional(FieldDefault.computed("the standard's: the hob cuts the minor"
                    + " diameter limit"))
            .text("Spline hob addendum", "Tip line below the datum line, where the hob tooth is π m / 2 thick."));

    // ---------------------------------------------------------------- machine
    /** The field {@code machine}. */
    public static final FieldDef MACHINE = add(FieldDef.of("machine", CHOICE, NONE).mustGive().namesLibraryEntry()
            .text("Machine", "A saved or built-in machine profile; 'machines save' adds your own. A job file may"
                    + " also describe the machine inline."));

    // ---------------------------------------------------------------- cycle
    /** The field {@code cycle.template}. */
    public static final FieldDef CYCLE_TEMPLATE = add(FieldDef.of("cycle.template", CHOICE, NONE).namesLibraryEntry()
            .optional(FieldDefault.unused("no template"))
            .text("Cycle template", "A saved template of this machine fills the values you leave empty; '-' for"
                    + " none."));
    /** The field {@code cycle.workMaterial}. */
    public static final FieldDef CYCLE_WORK_MATERIAL = add(FieldDef.of("cycle.workMaterial", TEXT, NONE)
            .optional(new FieldDefault("", "", FieldDefault.Origin.NONE, "none: must be given in the job or its"
                    + " template"))
            .text("Work material", "Work material of the cutting-data table, e.g. steel-free-machining or brass;"
                    + " the job's or its template's."));
    /** The field {@code cycle.cuttingSpeed}. */
    public static final FieldDef CYCLE_CUTTING_SPEED = add(FieldDef.of("cycle.cuttingSpeed", NUMBER, CUTTING_SPEED)
            .range(FieldRange.POSITIVE).optional(FieldDefault.computed(PLANNER))
            .text("Cutting speed", "Cutting speed at the hob tip; empty takes the cutting-data table."));
    /** The field {@code cycle.roughFeed}. */
    public static final FieldDef CYCLE_ROUGH_FEED = add(FieldDef.of("cycle.roughFeed", NUMBER, FEED)
            .range(FieldRange.POSITIVE).optional(FieldDefault.computed(PLANNER))
            .text("Roughing feed", "Axial feed per work revolution for roughing passes."));
    /** The field {@code cycle.finishFeed}. */
    public static final FieldDef CYCLE_FINISH_FEED = add(FieldDef.of("cycle.finishFeed", NUMBER, FEED)
            .range(FieldRange.POSITIVE).optional(FieldDefault.computed(PLANNER))
            .text("Finishing feed", "Axial feed per work revolution for the finishing pass."));
    /** The field {@code cycle.roughDepth}. */
    public static final FieldDef CYCLE_ROUGH_DEPTH = add(FieldDef.of("cycle.roughDepth", NUMBER, LENGTH)
            .range(FieldRange.POSITIVE).optional(FieldDefault.computed("one pass up to module 2.5, else 1.25 m_n"))
            .text("Roughing depth per pass", "Largest radial depth of one roughing pass."));
    /** The field {@code cycle.finishStock}. */
    public static final FieldDef CYCLE_FINISH_STOCK = add(FieldDef.of("cycle.finishStock", NUMBER, LENGTH)
            .range(FieldRange.NON_NEGATIVE).optional(FieldDefault.convention("0", "one pass to full depth"
                    + " (common practice)"))
            .text("Finishing stock", "Radial stock left for the finishing pass; 0 cuts to full depth in one pass."));
    /** The field {@code cycle.method}. */
    public static final FieldDef CYCLE_METHOD = add(FieldDef.of("cycle.method", CHOICE, NONE).choices(METHODS)
            .optional(FieldDefault.convention("climb", "climb hobbing, the usual choice (common practice)"))
            .text("Hobbing method", "Climb (the usual choice) or conventional."));
    /** The field {@code cycle.axialClearance}. */
    public static final FieldDef CYCLE_AXIAL_CLEARANCE = add(FieldDef.of("cycle.axialClearance", NUMBER, LENGTH)
            .range(FieldRange.NON_NEGATIVE).optional(new FieldDefault("1", "0.04", FieldDefault.Origin.CONVENTION,
                    "1 mm (0.04 in) of air (common practice)"))
            .text("Axial clearance", "Air gap before the approach and after the overrun."));
    /** The field {@code cycle.radialClearance}. */
    public static final FieldDef CYCLE_RADIAL_CLEARANCE = add(FieldDef.of("cycle.radialClearance", NUMBER, LENGTH)
            .range(FieldRange.NON_NEGATIVE).optional(new FieldDefault("1", "0.04", FieldDefault.Origin.CONVENTION,
                    "1 mm (0.04 in) of air (common practice)"))
            .text("Radial clearance", "Gap between hob tip and blank for rapid moves."));
    /** The field {@code cycle.coolant}. */
    public static final FieldDef CYCLE_COOLANT = add(FieldDef.of("cycle.coolant", BOOLEAN, NONE)
            .optional(FieldDefault.convention("yes", "coolant on (common practice)"))
            .text("Coolant", "Coolant on during the cut (yes or no)."));
    /** The field {@code cycle.targets.feedMarkDepth}. */
    public static final FieldDef TARGET_FEED_MARK_DEPTH = add(FieldDef.of("cycle.targets.feedMarkDepth", NUMBER,
            MICROMETRE).range(FieldRange.POSITIVE).optional(FieldDefault.computed("a share of the flank tolerance"
                    + " class, else the cutting-data table's quality default"))
            .text("Largest feed-mark depth", "Quality target for feed marks on the flank; empty takes it from the"
                    + " tolerance class."));
    /** The field {@code cycle.targets.envelopingDepth}. */
    public static final FieldDef TARGET_ENVELOPING_DEPTH = add(FieldDef.of("cycle.targets.envelopingDepth", NUMBER,
            MICROMETRE).range(FieldRange.POSITIVE).optional(FieldDefault.computed("a share of the flank"
                    + " tolerance class, else the cutting-data table's quality default"))
            .text("Largest enveloping-cut depth", "Quality target for the generating flats."));
    /** The field {@code cycle.targets.maxChipThickness}. */
    public static final FieldDef TARGET_MAX_CHIP_THICKNESS = add(FieldDef.of("cycle.targets.maxChipThickness",
            NUMBER, LENGTH).range(FieldRange.POSITIVE).optional(FieldDefault.computed("the cutting-data table"))
            .text("Largest chip thickness", "Limit for the undeformed chip thickness."));
    /** The field {@code cycle.hobShift.perPart}. */
    public static final FieldDef HOB_SHIFT_PER_PART = add(FieldDef.of("cycle.hobShift.perPart", NUMBER, LENGTH)
            .range(FieldRange.NON_NEGATIVE).optional(FieldDefault.convention("0", "no shifting"))
            .text("Hob shift per step", "Shift along the hob between parts to spread wear; 0 for none."));
    /** The field {@code cycle.hobShift.everyParts}. */
    public static final FieldDef HOB_SHIFT_EVERY_PARTS = add(FieldDef.of("cycle.hobShift.everyParts", INTEGER, NONE)
            .range(1, 1_000_000).optional(FieldDefault.convention("1", "after every part"))
            .text("Shift every so many parts", "How many parts are cut between shifts."));
    /** The field {@code cycle.fastest}. */
    public static final FieldDef CYCLE_FASTEST = add(FieldDef.of("cycle.fastest", BOOLEAN, NONE)
            .optional(FieldDefault.convention("no", "only the cycle asked for"))
            .text("Propose the fastest cycle", "Yes to have the optimiser propose the shortest cycle beside yours."));
    /** The field {@code cycle.batchSize}. */
    public static final FieldDef CYCLE_BATCH_SIZE = add(FieldDef.of("cycle.batchSize", INTEGER, NONE)
            .range(1, 1_000_000).optional(FieldDefault.convention("1", "one part"))
            .text("Parts in the batch", "How many parts to cut; the review gives the time per part, the batch time"
                    + " and the hob life."));
    /** The field {@code cycle.programNumber}. */
    public static final FieldDef CYCLE_PROGRAM_NUMBER = add(FieldDef.of("cycle.programNumber", INTEGER, NONE)
            .range(0, 99_999_999).optional(FieldDefault.computed("the dialect's program number"))
            .text("Program number", "The program number; it must lie in the dialect's range."));
    /** The field {@code cycle.toolStation}. */
    public static final FieldDef CYCLE_TOOL_STATION = add(FieldDef.of("cycle.toolStation", INTEGER, NONE)
            .range(0, 99_999).optional(FieldDefault.computed("the dialect's tool station"))
            .text("Hob tool station", "The tool station the hob sits in; it must lie in the dialect's range."));
    /** The field {@code cycle.hobTurnedRound}. */
    public static final FieldDef CYCLE_HOB_TURNED_ROUND = add(FieldDef.of("cycle.hobTurnedRound", BOOLEAN, NONE)
            .optional(FieldDefault.convention("no", "the hob mounted the usual way"))
            .text("Hob turned round on its arbor", "Yes only when the hob is mounted the other way round: the hob"
                    + " spindle then runs against the hob's marked sense."));
    /** The field {@code cycle.hobLife.lengthPerTooth}. */
    public static final FieldDef HOB_LIFE_PER_TOOTH = add(FieldDef.of("cycle.hobLife.lengthPerTooth", NUMBER,
            UnitKind.METRE).range(FieldRange.POSITIVE).optional(FieldDefault.computed("a typical value by hob"
                    + " material"))
            .text("Hob life per tooth", "Wear criterion: metres of gear tooth flank one hob tooth cuts before the"
                    + " hob must be sharpened."));

    private JobFields() {
    }

    private static FieldDef add(FieldDef f) {
        ALL.add(f);
        return f;
    }

    private static FieldDef drawing(String leaf, String label, String help) {
        return FieldDef.of("gear.drawing." + leaf, NUMBER, LENGTH).range(FieldRange.POSITIVE)
                .optional(FieldDefault.unused("not compared")).text(label, help);
    }

    /** {@return every field of a job file, in the order written and asked} */
    public static List<FieldDef> all() {
        return List.copyOf(ALL);
    }

    /** {@return the cycle fields (also a template's), in order, without {@code cycle.template}} */
    public static List<FieldDef> cycle() {
        List<FieldDef> out = new ArrayList<>();
        for (FieldDef f : ALL) {
            if (f.key().startsWith("cycle.") && f != CYCLE_TEMPLATE) {
                out.add(f);
            }
        }
        return List.copyOf(out);
    }

    /**
     * The field with this key.
     *
     * @param key key
     * @return the field with this key
     */
    public static Optional<FieldDef> find(String key) {
        return FieldDef.find(ALL, key);
    }
}
