package org.hobwright.api.job;

import org.hobwright.api.ApiStatus;

import static org.hobwright.api.wizard.FieldType.ANGLE;
import static org.hobwright.api.wizard.FieldType.BOOLEAN;
import static org.hobwright.api.wizard.FieldType.CHOICE;
import static org.hobwright.api.wizard.FieldType.NUMBER;
import static org.hobwright.api.wizard.FieldType.TEXT;
import static org.hobwright.api.job.UnitKind.LENGTH;
import static org.hobwright.api.job.UnitKind.LENGTH_PER_MIN;
import static org.hobwright.api.job.UnitKind.NONE;
import static org.hobwright.api.job.UnitKind.RPM;
import static org.hobwright.api.job.UnitKind.SECONDS;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * The fields of a machine profile (format {@code hobwright-machine}, version 1), also the keys of
 * a job's inline machine (there under {@code machine.}). Limits only keep out values that cannot
 * be meant (common practice, no source); what a machine can do is its builder's data.
 */
@ApiStatus(since = "1.1")
public final class MachineFields {
    private static final List<FieldDef> ALL = new ArrayList<>();

    /** How the teeth of a clockwise-turning hob move at the work. */
    public static final List<String> TEETH_MOVES = List.of("away-from-chuck", "toward-chuck");

    /** Scales of a swivel holder. */
    public static final List<String> SCALES = List.of("degrees-minutes", "decimal-degrees");

    private static final String NOT_UNLESS = "not unless the profile says so (common practice)";

    /** The field {@code units}. */
    public static final FieldDef UNITS = add(FieldDef.of("units", CHOICE, NONE).choices(JobFields.UNIT_WORDS)
            .required(FieldDefault.convention("mm", "millimetres, the SI unit of length"))
            .text("Length unit", "Length unit of this profile; an inline machine of a job takes the job's unit"
                    + " when it leaves this out."));
    /** The field {@code name}. */
    public static final FieldDef NAME = add(FieldDef.of("name", TEXT, NONE).mustGive().namesLibraryEntry()
            .text("Machine name", "Names the profile in the library; letters, digits, '.', '_' and '-'."));
    /** The field {@code description}. */
    public static final FieldDef DESCRIPTION = add(FieldDef.of("description", TEXT, NONE)
            .optional(FieldDefault.unused("no description")).text("Description", "One line saying which machine."));
    /** The field {@code dialect}. */
    public static final FieldDef DIALECT = add(FieldDef.of("dialect", TEXT, NONE).mustGive().namesLibraryEntry()
            .text("NC dialect", "Name of the dialect file of this machine's control."));
    /** The field {@code workSpindle.minRpm}. */
    public static final FieldDef WORK_MIN_RPM = add(FieldDef.of("workSpindle.minRpm", NUMBER, RPM)
            .range(FieldRange.NON_NEGATIVE).mustGive().text("Work spindle: lowest speed", "Lowest stable speed."));
    /** The field {@code workSpindle.maxRpm}. */
    public static final FieldDef WORK_MAX_RPM = add(FieldDef.of("workSpindle.maxRpm", NUMBER, RPM)
            .range(FieldRange.POSITIVE).mustGive().text("Work spindle: highest speed", "Highest speed."));
    /** The field {@code workSpindle.phasedSync}. */
    public static final FieldDef WORK_PHASED_SYNC = add(FieldDef.of("workSpindle.phasedSync", BOOLEAN, NONE)
            .optional(FieldDefault.convention("no", NOT_UNLESS))
            .text("Phased synchronisation", "True when the control can start the synchronisation at a set"
                    + " work-spindle angle."));
    /** The field {@code hobSpindle.minRpm}. */
    public static final FieldDef HOB_MIN_RPM = add(FieldDef.of("hobSpindle.minRpm", NUMBER, RPM)
            .range(FieldRange.NON_NEGATIVE).mustGive().text("Hob spindle: lowest speed", "Lowest stable speed."));
    /** The field {@code hobSpindle.maxRpm}. */
    public static final FieldDef HOB_MAX_RPM = add(FieldDef.of("hobSpindle.maxRpm", NUMBER, RPM)
            .range(FieldRange.POSITIVE).mustGive().text("Hob spindle: highest speed", "Highest speed."));
    /** The field {@code hobSpindle.clockwiseTeethMove}. */
    public static final FieldDef HOB_CLOCKWISE_TEETH_MOVE = add(FieldDef.of("hobSpindle.clockwiseTeethMove", CHOICE,
            NONE).choices(TEETH_MOVES).optional(FieldDefault.convention(TEETH_MOVES.get(0), "the usual mounting,"
                    + " unless the profile says otherwise"))
            .text("Clockwise hob: teeth move", "With the hob spindle turning clockwise seen from its drive end, the"
                    + " way the hob teeth at the work move along the work axis."));
    /** The field {@code maxSyncRatio}. */
    public static final FieldDef MAX_SYNC_RATIO = add(FieldDef.of("maxSyncRatio", NUMBER, NONE)
            .range(FieldRange.POSITIVE).mustGive()
            .text("Largest sync ratio", "Largest hob turns per work turn the synchronisation accepts."));
    /** The field {@code followsHelix}. */
    public static final FieldDef FOLLOWS_HELIX = add(FieldDef.of("followsHelix", BOOLEAN, NONE)
            .optional(FieldDefault.convention("no", NOT_UNLESS))
            .text("Follows a helix", "True when the control adds the helical (differential) work rotation."));
    /** The field {@code swivel.scale}. */
    public static final FieldDef SWIVEL_SCALE = add(FieldDef.of("swivel.scale", CHOICE, NONE).choices(SCALES)
            .mustGive().text("Swivel scale", "How the holder's scale or the control counts the swivel."));
    /** The field {@code swivel.resolution}. */
    public static final FieldDef SWIVEL_RESOLUTION = add(FieldDef.of("swivel.resolution", ANGLE, UnitKind.ANGLE)
            .range(new FieldRange(0, true, 1)).optional(FieldDefault.computed("0°1' on a degrees-minutes scale,"
                    + " 0.001° on a decimal-degrees one"))
            .text("Swivel resolution", "Smallest settable step, degrees."));
    /** The field {@code swivel.programmable}. */
    public static final FieldDef SWIVEL_PROGRAMMABLE = add(FieldDef.of("swivel.programmable", BOOLEAN, NONE)
            .optional(FieldDefault.convention("no", NOT_UNLESS))
            .text("Programmable swivel", "True when the control positions the swivel axis from the program."));
    /** The field {@code swivel.maxAngle}. */
    public static final FieldDef SWIVEL_MAX_ANGLE = add(FieldDef.of("swivel.maxAngle", ANGLE, UnitKind.ANGLE)
            .range(0, 90).mustGive().text("Largest swivel", "Largest swivel either way, 0 to 90 degrees."));
    /** The field {@code swivel.positiveSense}. */
    public static final FieldDef SWIVEL_POSITIVE_SENSE = add(FieldDef.of("swivel.positiveSense", TEXT, NONE)
            .mustGive().text("Positive swivel sense", "Which way a positive setting turns the hob on this machine,"
                    + " in words."));
    /** The field {@code swivel.positiveIsRight}. */
    public static final FieldDef SWIVEL_POSITIVE_IS_RIGHT = add(FieldDef.of("swivel.positiveIsRight", BOOLEAN, NONE)
            .optional(FieldDefault.convention("yes", "a positive setting is a right-hand swivel unless the"
                    + " profile says otherwise"))
            .text("Positive is right hand", "True when a positive setting equals a positive (right-hand) swivel"
                    + " angle."));
    /** The field {@code travel.radialMin}. */
    public static final FieldDef RADIAL_MIN = add(FieldDef.of("travel.radialMin", NUMBER, LENGTH)
            .range(FieldRange.NON_NEGATIVE).optional(FieldDefault.convention("0", "down to the centre line"))
            .text("Radial travel: smallest", "Smallest reachable work diameter of the hob axis path."));
    /** The field {@code travel.radialMax}. */
    public static final FieldDef RADIAL_MAX = add(FieldDef.of("travel.radialMax", NUMBER, LENGTH)
            .range(FieldRange.POSITIVE).mustGive()
            .text("Radial travel: largest", "Largest reachable work diameter for the hob."));
    /** The field {@code travel.axialMin}. */
    public static final FieldDef AXIAL_MIN = add(FieldDef.of("travel.axialMin", NUMBER, LENGTH).mustGive()
            .text("Axial travel toward the chuck", "Axial limit toward the chuck, from the entry face."));
    /** The field {@code travel.axialMax}. */
    public static final FieldDef AXIAL_MAX = add(FieldDef.of("travel.axialMax", NUMBER, LENGTH).mustGive()
            .text("Axial travel away from the chuck", "Axial limit away from the chuck, from the entry face."));
    /** The field {@code travel.hobShift}. */
    public static final FieldDef SHIFT_TRAVEL = add(FieldDef.of("travel.hobShift", NUMBER, LENGTH)
            .range(FieldRange.NON_NEGATIVE).optional(FieldDefault.unused("no hob-shift axis (also 0)"))
            .text("Hob-shift travel", "Travel of a hob-shift axis; 0 or empty: none."));
    /** The field {@code rapid}. */
    public static final FieldDef RAPID = add(FieldDef.of("rapid", NUMBER, LENGTH_PER_MIN).range(FieldRange.POSITIVE)
            .mustGive().text("Rapid traverse", "Rapid traverse rate, for time estimates."));
    /** The field {@code maxFeed}. */
    public static final FieldDef MAX_FEED = add(FieldDef.of("maxFeed", NUMBER, LENGTH_PER_MIN)
            .range(FieldRange.POSITIVE).mustGive().text("Highest feed rate", "Highest programmable feed rate."));
    /** The field {@code syncSettle}. */
    public static final FieldDef SYNC_SETTLE = add(FieldDef.of("syncSettle", NUMBER, SECONDS)
            .range(FieldRange.NON_NEGATIVE).optional(FieldDefault.convention("0", "no dwell unless the machine"
                    + " needs one"))
            .text("Sync settle dwell", "Dwell after switching synchronisation on."));
    /** The field {@code maxHobDiameter}. */
    public static final FieldDef MAX_HOB_DIAMETER = add(FieldDef.of("maxHobDiameter", NUMBER, LENGTH)
            .range(FieldRange.POSITIVE).mustGive().text("Largest hob", "Largest hob the holder takes."));

    /** The field {@code times.load}. */
    public static final FieldDef TIME_LOAD = add(time("load", "Load time", "Putting a blank in and clamping it."));
    /** The field {@code times.unload}. */
    public static final FieldDef TIME_UNLOAD = add(time("unload", "Unload time", "Taking the finished part out."));
    /** The field {@code times.swivel}. */
    public static final FieldDef TIME_SWIVEL = add(time("swivel", "Swivel time", "One programmed swivel positioning."));
    /** The field {@code times.hobShift}. */
    public static final FieldDef TIME_HOB_SHIFT = add(time("hobShift", "Hob-shift time", "One hob shift."));
    /** The field {@code times.hobChange}. */
    public static final FieldDef TIME_HOB_CHANGE = add(time("hobChange", "Hob change time", "Taking a worn hob off"
            + " and setting a sharp one."));

    private MachineFields() {
    }

    private static FieldDef add(FieldDef f) {
        ALL.add(f);
        return f;
    }

    private static FieldDef time(String leaf, String label, String help) {
        return FieldDef.of("times." + leaf, NUMBER, SECONDS).range(FieldRange.NON_NEGATIVE)
                .optional(FieldDefault.computed("0 s, with a remark")).text(label, help + " Measured by the shop.");
    }

    /** {@return every field of a machine profile, in the order written} */
    public static List<FieldDef> all() {
        return List.copyOf(ALL);
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
