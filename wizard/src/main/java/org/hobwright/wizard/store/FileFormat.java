package org.hobwright.wizard.store;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.hobwright.api.check.Finding;
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

    private static final Shape CYCLE_KEYS = Shape.object(
            "workMaterial", Shape.TEXT, "cuttingSpeed", Shape.NUMBER, "roughFeed", Shape.NUMBER,
            "finishFeed", Shape.NUMBER, "roughDepth", Shape.NUMBER, "finishStock", Shape.NUMBER,
            "method", Shape.TEXT, "axialClearance", Shape.NUMBER, "radialClearance", Shape.NUMBER,
            "coolant", Shape.BOOLEAN,
            "targets", Shape.object("feedMarkDepth", Shape.NUMBER, "envelopingDepth", Shape.NUMBER,
                    "maxChipThickness", Shape.NUMBER),
            "hobShift", Shape.object("perPart", Shape.NUMBER, "everyParts", Shape.INTEGER),
            "fastest", Shape.BOOLEAN, "batchSize", Shape.INTEGER, "programNumber", Shape.INTEGER,
            "toolStation", Shape.INTEGER, "hobTurnedRound", Shape.BOOLEAN,
            "hobLife", Shape.object("lengthPerTooth", Shape.NUMBER));

    private static final Shape WORK_SPINDLE = Shape.object("minRpm", Shape.NUMBER, "maxRpm", Shape.NUMBER,
            "phasedSync", Shape.BOOLEAN);
    private static final Shape HOB_SPINDLE = Shape.object("minRpm", Shape.NUMBER, "maxRpm", Shape.NUMBER,
            "clockwiseTeethMove", Shape.TEXT);

    /** The keys of a machine profile other than format and version (an inline machine of a job). */
    static final Shape MACHINE_BODY = Shape.object(
            "units", Shape.TEXT, "name", Shape.TEXT, "description", Shape.TEXT, "dialect", Shape.TEXT,
            "workSpindle", WORK_SPINDLE, "hobSpindle", HOB_SPINDLE, "maxSyncRatio", Shape.NUMBER,
            "followsHelix", Shape.BOOLEAN,
            "swivel", Shape.object("scale", Shape.TEXT, "resolution", Shape.ANGLE, "programmable", Shape.BOOLEAN,
                    "maxAngle", Shape.ANGLE, "positiveSense", Shape.TEXT, "positiveIsRight", Shape.BOOLEAN),
            "travel", Shape.object("radialMin", Shape.NUMBER, "radialMax", Shape.NUMBER, "axialMin", Shape.NUMBER,
                    "axialMax", Shape.NUMBER, "hobShift", Shape.NUMBER),
            "rapid", Shape.NUMBER, "maxFeed", Shape.NUMBER, "syncSettle", Shape.NUMBER,
            "maxHobDiameter", Shape.NUMBER,
            "times", Shape.object("load", Shape.NUMBER, "unload", Shape.NUMBER, "swivel", Shape.NUMBER,
                    "hobShift", Shape.NUMBER, "hobChange", Shape.NUMBER));

    private static final Map<String, Shape> HEADER = header();

    private static Map<String, Shape> header() {
        Map<String, Shape> m = new java.util.LinkedHashMap<>();
        m.put("$schema", Shape.TEXT);
        m.put("format", Shape.TEXT);
        m.put("version", Shape.INTEGER);
        return m;
    }

    private static final Shape SPLINE_KEYS = Shape.object(
            "partName", Shape.TEXT, "standard", Shape.TEXT, "teeth", Shape.INTEGER, "module", Shape.NUMBER,
            "diametralPitch", Shape.NUMBER_OR_TEXT, "pressureAngle", Shape.ANGLE, "root", Shape.TEXT,
            "toleranceClass", Shape.INTEGER, "fitClass", Shape.TEXT, "referenceDiameter", Shape.NUMBER,
            "faceWidth", Shape.NUMBER, "pinDiameter", Shape.NUMBER, "blankDiameter", Shape.NUMBER,
            "allowance", Shape.NUMBER, "totalTolerance", Shape.NUMBER, "effectiveVariation", Shape.NUMBER);

    private static final Shape JOB_SHAPE = Shape.object(
            "name", Shape.TEXT, "units", Shape.TEXT, "part", Shape.TEXT,
            "gear", Shape.object("partName", Shape.TEXT, "teeth", Shape.INTEGER, "module", Shape.NUMBER,
                    "diametralPitch", Shape.NUMBER, "pressureAngle", Shape.ANGLE, "helixAngle", Shape.ANGLE,
                    "hand", Shape.TEXT, "faceWidth", Shape.NUMBER, "profileShift", Shape.NUMBER,
                    "thicknessAllowance", Shape.NUMBER, "toothSystem", Shape.TEXT, "blankDiameter", Shape.NUMBER,
                    "pinDiameter", Shape.NUMBER, "toleranceClass", Shape.INTEGER,
                    "custom", Shape.object("addendum", Shape.NUMBER, "dedendum", Shape.NUMBER,
                            "rootRadius", Shape.NUMBER),
                    "drawing", Shape.object("pitchDiameter", Shape.NUMBER, "outsideDiameter", Shape.NUMBER,
                            "rootDiameter", Shape.NUMBER, "wholeDepth", Shape.NUMBER, "spanTeeth", Shape.INTEGER,
                            "span", Shape.NUMBER, "pinDiameter", Shape.NUMBER, "overPins", Shape.NUMBER)),
            "hob", Shape.object("module", Shape.NUMBER, "diametralPitch", Shape.NUMBER,
                    "pressureAngle", Shape.ANGLE, "starts", Shape.INTEGER, "hand", Shape.TEXT,
                    "outsideDiameter", Shape.NUMBER, "leadAngle", Shape.ANGLE, "referenceDiameter", Shape.NUMBER,
                    "gashes", Shape.INTEGER, "length", Shape.NUMBER, "maxRpm", Shape.NUMBER,
                    "material", Shape.TEXT, "cuttingSense", Shape.TEXT, "identifier", Shape.TEXT,
                    "root", Shape.TEXT, "tipRadius", Shape.NUMBER, "addendum", Shape.NUMBER),
            "spline", SPLINE_KEYS,
            "machine", Shape.nameOr(MACHINE_BODY),
            "cycle", CYCLE_KEYS.with(Map.of("template", Shape.TEXT), Set.of()))
            .with(HEADER, Set.of());

    private static final Shape MACHINE_SHAPE = MACHINE_BODY.with(HEADER, Set.of());

    private static final Shape TEMPLATE_SHAPE = Shape.object(
            "units", Shape.TEXT, "machine", Shape.TEXT, "name", Shape.TEXT, "description", Shape.TEXT,
            "cycle", CYCLE_KEYS).with(HEADER, Set.of());

    private final String word;

    FileFormat(String word) {
        this.word = word;
    }

    /** The value of the {@code format} key, e.g. {@code hobwright-job}. */
    public String word() {
        return word;
    }

    Shape shape() {
        return switch (this) {
            case JOB -> JOB_SHAPE;
            case MACHINE -> MACHINE_SHAPE;
            case TEMPLATE -> TEMPLATE_SHAPE;
        };
    }

    /**
     * Checks format and version, migrates an older version, and checks the structure.
     *
     * @return the (migrated) document, with an info finding when it was migrated; unreadable
     *         when the format, the version or the structure is wrong
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
        List<Finding> structure = shape().check(current);
        if (!structure.isEmpty()) {
            findings.addAll(structure);
            return Loaded.unreadable(findings);
        }
        return Loaded.of(current, findings);
    }
}
