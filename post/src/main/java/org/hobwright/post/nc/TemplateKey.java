package org.hobwright.post.nc;

import static org.hobwright.post.nc.Placeholder.AXIAL;
import static org.hobwright.post.nc.Placeholder.SAFE_RADIAL;
import static org.hobwright.post.nc.Placeholder.TOOL;
import static org.hobwright.post.nc.Placeholder.DIFFERENTIAL;
import static org.hobwright.post.nc.Placeholder.FEED;
import static org.hobwright.post.nc.Placeholder.HOB_DIR;
import static org.hobwright.post.nc.Placeholder.HOB_RPM;
import static org.hobwright.post.nc.Placeholder.HOB_TURNS;
import static org.hobwright.post.nc.Placeholder.MILLISECONDS;
import static org.hobwright.post.nc.Placeholder.PROGRAM_NAME;
import static org.hobwright.post.nc.Placeholder.PROGRAM_NUMBER;
import static org.hobwright.post.nc.Placeholder.RADIAL;
import static org.hobwright.post.nc.Placeholder.SECONDS;
import static org.hobwright.post.nc.Placeholder.SHIFT;
import static org.hobwright.post.nc.Placeholder.SWIVEL;
import static org.hobwright.post.nc.Placeholder.TEXT;
import static org.hobwright.post.nc.Placeholder.WORK_DIR;
import static org.hobwright.post.nc.Placeholder.WORK_RPM;
import static org.hobwright.post.nc.Placeholder.WORK_TURNS;

import java.util.Arrays;
import java.util.EnumSet;
import java.util.Optional;
import java.util.Set;

/**
 * The templates of a dialect, each with the placeholders it may use. {@link #required()}
 * templates must be in every dialect; the others only when a cycle needs them (a helical cycle,
 * a programmable swivel, a hob-shift axis).
 */
public enum TemplateKey {
    /** First block(s) of the program. */
    PROGRAM_START("programStart", true, PROGRAM_NUMBER, PROGRAM_NAME),
    /** Metric input. */
    UNITS_MM("unitsMm", true),
    /** Inch input. */
    UNITS_IN("unitsIn", true),
    /** Feed per revolution mode. */
    FEED_PER_REV("feedPerRev", true),
    /** Work offset and retract to the safe position, one axis at a time where the machine needs it. */
    SAFE_START("safeStart", true, SAFE_RADIAL),
    /** Call of the hob as a tool. */
    TOOL_CALL("toolCall", true, TOOL),
    /** One comment line. */
    COMMENT("comment", true, TEXT),
    /** Work spindle on, before the synchronisation. */
    WORK_SPINDLE("workSpindle", true, WORK_RPM, WORK_DIR),
    /** Synchronisation on for a spur gear. */
    SYNC_ON("syncOn", true, HOB_TURNS, WORK_TURNS, HOB_RPM, WORK_RPM, HOB_DIR, WORK_DIR),
    /** Synchronisation on with the helical addition. */
    SYNC_ON_HELIX("syncOnHelix", false, HOB_TURNS, WORK_TURNS, HOB_RPM, WORK_RPM, HOB_DIR, WORK_DIR, DIFFERENTIAL),
    /** Synchronisation off, spindles still turning. */
    SYNC_OFF("syncOff", true),
    /** Both spindles stop. */
    SPINDLES_STOP("spindlesStop", true),
    /** Swivel axis positioning. */
    SWIVEL_TO("swivel", false, SWIVEL),
    /** Hob-shift axis positioning. */
    HOB_SHIFT("hobShift", false, SHIFT),
    /** Dwell. */
    DWELL("dwell", true, SECONDS, MILLISECONDS),
    /** Rapid move. */
    RAPID("rapid", true, RADIAL, AXIAL),
    /** Feed move. */
    FEED_MOVE("feed", true, RADIAL, AXIAL, FEED),
    /** Coolant on. */
    COOLANT_ON("coolantOn", true),
    /** Coolant off. */
    COOLANT_OFF("coolantOff", true),
    /** Retract clear of the part, then home. */
    SAFE_END("safeEnd", true, SAFE_RADIAL),
    /** Last block(s) of the program. */
    PROGRAM_END("programEnd", true, PROGRAM_NUMBER, PROGRAM_NAME);

    private final String key;
    private final boolean required;
    private final Set<Placeholder> allowed;

    TemplateKey(String key, boolean required, Placeholder... allowed) {
        this.key = key;
        this.required = required;
        this.allowed = allowed.length == 0 ? EnumSet.noneOf(Placeholder.class) : EnumSet.of(allowed[0], allowed);
    }

    /** The name in the dialect's {@code templates} object. */
    public String key() {
        return key;
    }

    /** True when every dialect must have this template. */
    public boolean required() {
        return required;
    }

    /** The placeholders this template may use. */
    public Set<Placeholder> allowed() {
        return Set.copyOf(allowed);
    }

    /** The template with this name, if any. */
    public static Optional<TemplateKey> byKey(String key) {
        return Arrays.stream(values()).filter(t -> t.key.equals(key)).findFirst();
    }
}
