package org.hobwright.wizard.store;

import java.util.ArrayList;
import java.util.List;
import org.hobwright.api.check.Finding;
import org.hobwright.api.job.JobFields;
import org.hobwright.api.job.MachineFields;
import org.hobwright.api.job.TemplateFields;
import tools.jackson.databind.JsonNode;

/**
 * The three file formats this package reads, version {@value #VERSION}, with their structure
 * (wizard/README.md, "File formats, version 1"). Opening a document checks {@code format} and
 * {@code version}, migrates an older version in memory, and checks the structure.
 */
public enum FileFormat {
    /** A hobbing job. */
    JOB("hobwright-job"),
    /** A machine profile. */
    MACHINE("hobwright-machine"),
    /** A cycle template of one machine. */
    TEMPLATE("hobwright-template");

    /** The version this program writes and the newest it reads. */
    public static final int VERSION = 1;

    private static final List<String> HEADER = List.of("$schema", "format", "version");

    /** The keys of a machine profile other than the header (also a job's inline machine). */
    private static final Shape MACHINE_BODY = Shape.of(List.of(), MachineFields.all());

    private static final Shape JOB_SHAPE = Shape.of(HEADER, JobFields.all()).withNameOr("machine", MACHINE_BODY);

    private static final Shape MACHINE_SHAPE = Shape.of(HEADER, MachineFields.all());

    private static final Shape TEMPLATE_SHAPE = Shape.of(HEADER, TemplateFields.all());

    private final String word;

    FileFormat(String word) {
        this.word = word;
    }

    /** The value of the {@code format} key, e.g. {@code hobwright-job}. */
    public String word() {
        return word;
    }

    /**
     * The structure problems of a document of this format: unknown keys and plain values where
     * objects belong (errors of a readable file, like wrong values).
     */
    List<Finding> structure(JsonDocument doc) {
        return shape().check(doc);
    }

    Shape shape() {
        return switch (this) {
            case JOB -> JOB_SHAPE;
            case MACHINE -> MACHINE_SHAPE;
            case TEMPLATE -> TEMPLATE_SHAPE;
        };
    }

    /**
     * Checks format and version and migrates an older version; the keys are checked by
     * {@link #structure} when the document is read.
     *
     * @return the (migrated) document, with an info finding when it was migrated; unreadable
     *         when the format or the version is wrong
     */
    Loaded<JsonDocument> open(JsonDocument doc) {
        JsonNode format = doc.root().get("format");
        if (format == null || !format.isString()) {
            return Loaded.unreadable(InputCode.INPUT_FORMAT.at("format",
                    doc.at("format") + ": \"format\" is missing or not a text; this should be a " + word + " file",
                    "add \"format\": \"" + word + "\""));
        }
        if (!format.stringValue().equals(word)) {
            return Loaded.unreadable(InputCode.INPUT_FORMAT.at("format",
                    doc.at("format") + ": this is a \"" + format.stringValue() + "\" file, expected \"" + word + "\"",
                    "give a " + word + " file here"));
        }
        JsonNode version = doc.root().get("version");
        if (version == null || !version.isNumber() || version.doubleValue() != Math.rint(version.doubleValue())) {
            return Loaded.unreadable(InputCode.INPUT_VERSION.at("version",
                    doc.at("version") + ": \"version\" is missing or not a whole number",
                    "add \"version\": " + VERSION));
        }
        double asNumber = version.doubleValue();
        int v = asNumber > VERSION || asNumber < 0 ? -1 : (int) asNumber;
        if (v < 0) {
            return Loaded.unreadable(InputCode.INPUT_VERSION.at("version",
                    doc.at("version") + ": version " + version + " of " + word + " is not one this program reads"
                            + " (0 to " + VERSION + ")",
                    asNumber > VERSION ? "use a newer Hobwright, or save the file as version " + VERSION : null));
        }
        List<Finding> findings = new ArrayList<>();
        JsonDocument current = doc;
        if (v < VERSION) {
            current = Migrations.migrate(this, v, doc);
            findings.add(InputCode.INPUT_MIGRATED.at("version",
                    doc.source() + ": version " + v + " read and migrated to version " + VERSION,
                    "save the file again to store it as version " + VERSION));
        }
        return Loaded.of(current, findings);
    }
}
