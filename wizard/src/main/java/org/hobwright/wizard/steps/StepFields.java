package org.hobwright.wizard.steps;

import static org.hobwright.api.wizard.FieldType.ANGLE;
import static org.hobwright.api.wizard.FieldType.BOOLEAN;
import static org.hobwright.api.wizard.FieldType.CHOICE;
import static org.hobwright.api.wizard.FieldType.INTEGER;
import static org.hobwright.api.wizard.FieldType.NUMBER;
import static org.hobwright.api.wizard.FieldType.TEXT;
import static org.hobwright.wizard.steps.UnitKind.CUTTING_SPEED;
import static org.hobwright.wizard.steps.UnitKind.DIAMETRAL_PITCH;
import static org.hobwright.wizard.steps.UnitKind.FEED;
import static org.hobwright.wizard.steps.UnitKind.LENGTH;
import static org.hobwright.wizard.steps.UnitKind.MICROMETRE;
import static org.hobwright.wizard.steps.UnitKind.MODULE;
import static org.hobwright.wizard.steps.UnitKind.NONE;
import static org.hobwright.wizard.steps.UnitKind.RPM;

import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.stream.Stream;
import org.hobwright.api.check.Finding;
import org.hobwright.api.wizard.StepId;
import org.hobwright.wizard.geometry.ToothSystem;

/**
 * The fields of each step, keyed by their job-file paths (file format version 1, see the
 * contributor guide). Ranges here are only what a value can be at all; whether the numbers fit
 * together is for the checks.
 */
public final class StepFields {
    /** Key of the machine choice. */
    public static final String MACHINE = "machine";
    /** Key of the cycle template choice. */
    public static final String TEMPLATE = "cycle.template";
    /** Key of the job's length unit. */
    public static final String UNITS = "units";

    private static final List<String> HANDS = List.of("right", "left");

    private static final List<Field> GEAR = List.of(
            Field.of("name", "Job name", NONE, TEXT,
                    "Names the output files; letters, digits, '.', '_' and '-'."),
            Field.of(UNITS, "Length unit", NONE, CHOICE,
                    "The unit every length of this job is entered and printed in.").choices(List.of("mm", "in")),
            Field.of("gear.partName", "Part name or number", NONE, TEXT,
                    "As on the drawing; printed in the program header and on the setup sheet."),
            Field.of("gear.teeth", "Number of teeth", NONE, INTEGER, "Tooth count z from the drawing.")
                    .range(1, 10000),
            Field.of("gear.module", "Normal module", MODULE, NUMBER,
                    "Normal module m_n in mm. Give the module or the diametral pitch, not both"
                            + " ('-' clears a value).").aboveZero().optional(),
            Field.of("gear.diametralPitch", "Normal diametral pitch", DIAMETRAL_PITCH, NUMBER,
                    "Normal diametral pitch P_n in teeth per inch, instead of the module.").aboveZero().optional(),
            Field.of("gear.pressureAngle", "Normal pressure angle", UnitKind.ANGLE, ANGLE,
                    "Normal pressure angle α_n, usually 20°; decimal or degrees-minutes-seconds.").range(1, 45),
            Field.of("gear.helixAngle", "Helix angle", UnitKind.ANGLE, ANGLE,
                    "Helix angle β at the reference diameter; 0 for a spur gear.").range(0, 60),
            Field.of("gear.hand", "Helix hand", NONE, CHOICE, "Hand of the helix; ignored for a spur gear.")
                    .choices(HANDS).optional(),
            Field.of("gear.faceWidth", "Face width", LENGTH, NUMBER, "Face width b of the gear.").aboveZero(),
            Field.of("gear.profileShift", "Profile shift coefficient", NONE, NUMBER,
                    "Profile shift x in modules; 0 for a standard gear.").range(-3, 3),
            Field.of("gear.thicknessAllowance", "Tooth thickness allowance", LENGTH, NUMBER,
                    "Normal tooth thickness allowance E_sn; negative thins the tooth for backlash.")
                    .range(-10, 10),
            Field.of("gear.toothSystem", "Tooth system", NONE, CHOICE,
                    "Basic rack the gear is cut to; 'custom' asks for the factors below.")
                    .choices(ToothSystem.ids()),
            Field.of("gear.custom.addendum", "Custom addendum factor", NONE, NUMBER,
                    "Addendum h_aP / m_n, only for the custom tooth system.").range(0.3, 2).optional(),
            Field.of("gear.custom.dedendum", "Custom dedendum factor", NONE, NUMBER,
                    "Dedendum h_fP / m_n, only for the custom tooth system.").range(0.3, 3).optional(),
            Field.of("gear.custom.rootRadius", "Custom root radius factor", NONE, NUMBER,
                    "Root fillet radius ρ_fP / m_n, only for the custom tooth system.").range(0, 1).optional(),
            Field.of("gear.blankDiameter", "Blank diameter", LENGTH, NUMBER,
                    "Diameter the blank is turned to; empty takes the tip diameter.").aboveZero().optional(),
            Field.of("gear.pinDiameter", "Pin or ball diameter", LENGTH, NUMBER,
                    "Pin the inspector uses for the over-pins value; empty lets Hobwright choose.")
                    .aboveZero().optional(),
            Field.of("gear.toleranceClass", "Flank tolerance class", NONE, INTEGER,
                    "ISO 1328-1 flank tolerance class 1 to 11, if the drawing gives one.").range(1, 11).optional(),
            Field.of("gear.drawing.pitchDiameter", "Drawing: pitch diameter", LENGTH, NUMBER,
                    "As printed on the drawing, to be compared with the computed value.").aboveZero().optional(),
            Field.of("gear.drawing.outsideDiameter", "Drawing: outside diameter", LENGTH, NUMBER,
                    "As printed on the drawing.").aboveZero().optional(),
            Field.of("gear.drawing.rootDiameter", "Drawing: root diameter", LENGTH, NUMBER,
                    "As printed on the drawing.").aboveZero().optional(),
            Field.of("gear.drawing.wholeDepth", "Drawing: whole depth", LENGTH, NUMBER,
                    "As printed on the drawing.").aboveZero().optional(),
            Field.of("gear.drawing.spanTeeth", "Drawing: teeth spanned", NONE, INTEGER,
                    "Number of teeth of the printed span measurement.").range(1, 1000).optional(),
            Field.of("gear.drawing.span", "Drawing: span measurement", LENGTH, NUMBER,
                    "Span (base tangent length) as printed.").aboveZero().optional(),
            Field.of("gear.drawing.pinDiameter", "Drawing: pin diameter", LENGTH, NUMBER,
                    "Pin or ball diameter of the printed over-pins value.").aboveZero().optional(),
            Field.of("gear.drawing.overPins", "Drawing: over pins", LENGTH, NUMBER,
                    "Measurement over two pins or balls as printed.").aboveZero().optional());

    private static final List<Field> CUTTER = List.of(
            Field.of("hob.module", "Hob normal module", MODULE, NUMBER,
                    "Normal module of the hob in mm; must match the gear's pitch.").aboveZero().optional(),
            Field.of("hob.diametralPitch", "Hob normal diametral pitch", DIAMETRAL_PITCH, NUMBER,
                    "Normal diametral pitch of the hob, instead of the module.").aboveZero().optional(),
            Field.of("hob.pressureAngle", "Hob pressure angle", UnitKind.ANGLE, ANGLE,
                    "Normal pressure angle of the hob profile.").range(1, 45),
            Field.of("hob.starts", "Number of starts", NONE, INTEGER, "Threads of the hob, usually 1.")
                    .range(1, 12),
            Field.of("hob.hand", "Hob thread hand", NONE, CHOICE, "Hand of the hob thread, as marked.")
                    .choices(HANDS),
            Field.of("hob.outsideDiameter", "Hob outside diameter", LENGTH, NUMBER,
                    "Tip diameter of the hob.").aboveZero(),
            Field.of("hob.leadAngle", "Hob lead angle", UnitKind.ANGLE, ANGLE,
                    "Lead angle as marked on the hob; empty computes it from the reference diameter.")
                    .range(0, 45).optional(),
            Field.of("hob.referenceDiameter", "Hob reference diameter", LENGTH, NUMBER,
                    "Pitch diameter of the hob, if known; empty derives it from the outside diameter.")
                    .aboveZero().optional(),
            Field.of("hob.gashes", "Number of gashes", NONE, INTEGER, "Flutes of the hob.").range(1, 100),
            Field.of("hob.length", "Hob length", LENGTH, NUMBER, "Usable length of the hob.").aboveZero(),
            Field.of("hob.maxRpm", "Hob speed limit", RPM, NUMBER, "The hob maker's speed limit, if given.")
                    .aboveZero().optional(),
            Field.of("hob.material", "Hob material", NONE, CHOICE, "Cutting material of the hob.")
                    .choices(List.of("hss", "hss-coated", "carbide")),
            Field.of("hob.cuttingSense", "Hob cutting sense", NONE, CHOICE,
                    "The sense the hob cuts in, seen from its own drive end: its cutting faces lead. "
                            + "Empty takes clockwise and says so.")
                    .choices(List.of("clockwise", "counter-clockwise")).optional(),
            Field.of("hob.identifier", "Hob identifier", NONE, TEXT,
                    "Your tool number or serial of the hob, for the setup sheet.").optional());

    private static final List<Field> MACHINE_FIELDS = List.of(
            Field.of(MACHINE, "Machine", NONE, CHOICE,
                    "A saved or built-in machine profile; 'machines save' adds your own."));

    private static final List<Field> CYCLE = List.of(
            Field.of(TEMPLATE, "Cycle template", NONE, CHOICE,
                    "A saved template of this machine fills the values you leave empty; '-' for none.").optional(),
            Field.of("cycle.workMaterial", "Work material", NONE, TEXT,
                    "Work material of the cutting-data table, e.g. steel-free-machining or brass.").optional(),
            Field.of("cycle.cuttingSpeed", "Cutting speed", CUTTING_SPEED, NUMBER,
                    "Cutting speed at the hob tip; empty takes the cutting-data table.").aboveZero().optional(),
            Field.of("cycle.roughFeed", "Roughing feed", FEED, NUMBER,
                    "Axial feed per work revolution for roughing passes.").aboveZero().optional(),
            Field.of("cycle.finishFeed", "Finishing feed", FEED, NUMBER,
                    "Axial feed per work revolution for the finishing pass.").aboveZero().optional(),
            Field.of("cycle.roughDepth", "Roughing depth per pass", LENGTH, NUMBER,
                    "Largest radial depth of one roughing pass.").aboveZero().optional(),
            Field.of("cycle.finishStock", "Finishing stock", LENGTH, NUMBER,
                    "Radial stock left for the finishing pass; 0 cuts to full depth in one pass.")
                    .atLeast(0).optional(),
            Field.of("cycle.method", "Hobbing method", NONE, CHOICE,
                    "Climb (the usual choice) or conventional.").choices(List.of("climb", "conventional")).optional(),
            Field.of("cycle.axialClearance", "Axial clearance", LENGTH, NUMBER,
                    "Air gap before the approach and after the overrun.").atLeast(0).optional(),
            Field.of("cycle.radialClearance", "Radial clearance", LENGTH, NUMBER,
                    "Gap between hob tip and blank for rapid moves.").atLeast(0).optional(),
            Field.of("cycle.coolant", "Coolant", NONE, BOOLEAN, "Coolant on during the cut (yes or no).")
                    .optional(),
            Field.of("cycle.targets.feedMarkDepth", "Largest feed-mark depth", MICROMETRE, NUMBER,
                    "Quality target for feed marks on the flank; empty takes it from the tolerance class.")
                    .aboveZero().optional(),
            Field.of("cycle.targets.envelopingDepth", "Largest enveloping-cut depth", MICROMETRE, NUMBER,
                    "Quality target for the generating flats.").aboveZero().optional(),
            Field.of("cycle.targets.maxChipThickness", "Largest chip thickness", LENGTH, NUMBER,
                    "Limit for the undeformed chip thickness.").aboveZero().optional(),
            Field.of("cycle.hobShift.perPart", "Hob shift per step", LENGTH, NUMBER,
                    "Shift along the hob between parts to spread wear; 0 for none.")
                    .atLeast(0).optional(),
            Field.of("cycle.hobShift.everyParts", "Shift every so many parts", NONE, INTEGER,
                    "How many parts are cut between shifts.").range(1, 1_000_000).optional(),
            Field.of("cycle.fastest", "Propose the fastest cycle", NONE, BOOLEAN,
                    "Yes to have the optimiser propose the shortest cycle beside yours.").optional(),
            Field.of("cycle.batchSize", "Parts in the batch", NONE, INTEGER,
                    "How many parts to cut; the review gives the time per part, the batch time and the hob life.")
                    .range(1, 1_000_000).optional(),
            Field.of("cycle.programNumber", "Program number", NONE, INTEGER,
                    "The program number; empty takes the dialect's.").range(0, 99_999_999).optional(),
            Field.of("cycle.toolStation", "Hob tool station", NONE, INTEGER,
                    "The tool station the hob sits in; empty takes the dialect's.").range(0, 99_999).optional(),
            Field.of("cycle.hobTurnedRound", "Hob turned round on its arbor", NONE, BOOLEAN,
                    "Yes only when the hob is mounted the other way round: the hob spindle then runs against "
                            + "the hob's marked sense.").optional());

    private static final Map<StepId, List<Field>> BY_STEP = Map.of(StepId.GEAR, GEAR, StepId.CUTTER, CUTTER,
            StepId.MACHINE, MACHINE_FIELDS, StepId.CYCLE, CYCLE, StepId.REVIEW, List.of());

    private StepFields() {
    }

    /** The fields of a step, in the order they are asked. */
    public static List<Field> of(StepId step) {
        return BY_STEP.get(step);
    }

    /** Every field of every step, in order. */
    public static List<Field> all() {
        return Stream.of(StepId.values()).flatMap(s -> of(s).stream()).toList();
    }

    /** The field with this key. */
    public static Optional<Field> find(String key) {
        return all().stream().filter(f -> f.key().equals(key)).findFirst();
    }

    /** The step a job-file path (or a finding's field) belongs to; REVIEW for whole-job fields. */
    public static StepId stepOf(String path) {
        if (path.equals("name") || path.equals(UNITS) || path.startsWith("gear")) {
            return StepId.GEAR;
        }
        if (path.startsWith("hob")) {
            return StepId.CUTTER;
        }
        if (path.startsWith(MACHINE)) {
            return StepId.MACHINE;
        }
        if (path.startsWith("cycle")) {
            return StepId.CYCLE;
        }
        return StepId.REVIEW;
    }

    /**
     * The step at which a finding is shown and may block: the later of its field's step and the
     * step whose answers its check depends on, told by the code's prefix ({@code HOB_} needs the
     * hob, {@code MACHINE_} the machine, {@code PLAN_} the cycle). So a helical gear is not refused
     * at GEAR for a machine that has not been chosen yet; the finding waits for MACHINE.
     */
    public static StepId stepOf(Finding finding) {
        StepId field = stepOf(finding.field());
        String code = finding.code();
        StepId needs = code.startsWith("HOB_") ? StepId.CUTTER : code.startsWith("MACHINE_") ? StepId.MACHINE
                : code.startsWith("PLAN_") ? StepId.CYCLE : StepId.GEAR;
        return field.compareTo(needs) >= 0 ? field : needs;
    }

    /** A title for a step. */
    public static String title(StepId step) {
        return switch (step) {
            case GEAR -> "Gear from the drawing";
            case CUTTER -> "Hob";
            case MACHINE -> "Machine";
            case CYCLE -> "Cutting cycle";
            case REVIEW -> "Review";
        };
    }
}
