package org.hobwright.post.nc;

import java.util.Arrays;
import java.util.Optional;

/**
 * The fixed set of placeholders a dialect template may use, written {@code {name}} in a template.
 * Coordinates ({@code radial}, {@code axial}, {@code swivel}, {@code shift}) give the axis letter
 * and the number; every other placeholder gives the bare value.
 */
public enum Placeholder {
    /** The program number: the job's or its template's, else the dialect's default. */
    PROGRAM_NUMBER("programNumber", "the program number: the job's or its template's, else programNumber.default"),
    /** The job name, cleaned like comment text. */
    PROGRAM_NAME("programName", "the job name, cleaned like comment text"),
    /** Comment text, cleaned by the dialect's comment rules. */
    TEXT("text", "comment text"),
    /** Work spindle speed, rpm. */
    WORK_RPM("workRpm", "work spindle speed, rpm, decimals.rpm"),
    /** Hob spindle speed, rpm. */
    HOB_RPM("hobRpm", "hob spindle speed, rpm, decimals.rpm"),
    /** The work spindle's direction word. */
    WORK_DIR("workDir", "the work spindle's direction word from rotation.work"),
    /** The hob spindle's direction word. */
    HOB_DIR("hobDir", "the hob spindle's direction word from rotation.hob"),
    /** Hob turns of the synchronisation ratio. */
    HOB_TURNS("hobTurns", "hob turns of the ratio hob:work, whole number"),
    /** Work turns of the synchronisation ratio. */
    WORK_TURNS("workTurns", "work turns of the ratio hob:work, whole number"),
    /** Helical addition, degrees of work rotation per length unit of axial travel. */
    DIFFERENTIAL("differential", "helical addition, degrees of work rotation per mm (or in) of axial travel "
            + "toward the back face, signed in the work's rotation sense, decimals.differential"),
    /** Dwell time, seconds. */
    SECONDS("seconds", "dwell time, s, decimals.s"),
    /** Dwell time, whole milliseconds. */
    MILLISECONDS("milliseconds", "dwell time, whole ms"),
    /** Radial axis word. */
    RADIAL("radial", "radial axis letter and value (diameter or radius, with the axis sign), length decimals"),
    /** Axial axis word. */
    AXIAL("axial", "axial axis letter and value (with the axis sign), length decimals"),
    /** Feed per work revolution. */
    FEED("feed", "feed per work revolution in the job's unit, decimals.mmPerRev or decimals.inPerRev"),
    /** Swivel axis word. */
    SWIVEL("swivel", "swivel axis letter and the machine's setting, degrees, decimals.deg"),
    /** Hob-shift axis word. */
    SHIFT("shift", "hob-shift axis letter and position, length decimals"),
    /** The hob's tool station. */
    TOOL("tool", "the hob's tool station: the job's or its template's, else toolStation.default"),
    /** Radial axis word at the safe diameter. */
    SAFE_RADIAL("safeRadial", "radial axis letter and the machine's largest radial position (travel.radialMax),"
            + " rounded toward the work, never past the limit");

    private final String key;
    private final String meaning;

    Placeholder(String key, String meaning) {
        this.key = key;
        this.meaning = meaning;
    }

    /** The name written between braces. */
    public String key() {
        return key;
    }

    /** What the placeholder stands for, for messages and the documentation. */
    public String meaning() {
        return meaning;
    }

    /** The placeholder with this name, if any. */
    public static Optional<Placeholder> byKey(String key) {
        return Arrays.stream(values()).filter(p -> p.key.equals(key)).findFirst();
    }
}
