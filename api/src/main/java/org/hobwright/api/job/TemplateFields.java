package org.hobwright.api.job;

import org.hobwright.api.ApiStatus;

import static org.hobwright.api.wizard.FieldType.CHOICE;
import static org.hobwright.api.wizard.FieldType.TEXT;
import static org.hobwright.api.job.UnitKind.NONE;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * The fields of a cycle template (format {@code hobwright-template}, version 1): its own four and
 * the job's cycle fields ({@link JobFields#cycle()}), which it fills in a job that leaves them out.
 */
@ApiStatus(since = "1.1")
public final class TemplateFields {
    /** The field {@code units}. */
    public static final FieldDef UNITS = FieldDef.of("units", CHOICE, NONE).choices(JobFields.UNIT_WORDS)
            .required(FieldDefault.convention("mm", "millimetres, the SI unit of length"))
            .text("Length unit", "The unit of the template's lengths and cutting speed.");
    /** The field {@code machine}. */
    public static final FieldDef MACHINE = FieldDef.of("machine", TEXT, NONE).mustGive().namesLibraryEntry()
            .text("Machine", "The machine profile the template belongs to.");
    /** The field {@code name}. */
    public static final FieldDef NAME = FieldDef.of("name", TEXT, NONE).mustGive().namesLibraryEntry()
            .text("Template name", "Names the template in the library.");
    /** The field {@code description}. */
    public static final FieldDef DESCRIPTION = FieldDef.of("description", TEXT, NONE)
            .optional(FieldDefault.unused("no description")).text("Description", "One line saying what it is for.");

    private static final List<FieldDef> ALL = all(UNITS, MACHINE, NAME, DESCRIPTION);

    private TemplateFields() {
    }

    private static List<FieldDef> all(FieldDef... own) {
        List<FieldDef> out = new ArrayList<>(List.of(own));
        out.addAll(JobFields.cycle());
        return List.copyOf(out);
    }

    /** {@return every field of a template, in the order written} */
    public static List<FieldDef> all() {
        return ALL;
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
