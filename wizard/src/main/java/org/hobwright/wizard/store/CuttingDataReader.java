package org.hobwright.wizard.store;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.hobwright.api.check.Finding;
import org.hobwright.api.job.Units;
import tools.jackson.databind.JsonNode;

/**
 * Reads a cutting-data file ({@code "format": "hobwright-cutting-data"}, version 1) into a
 * {@link CuttingDataTable}. Like the other readers it never throws for bad input: every problem is
 * a finding ({@link InputCode}) that names the file and line, the key, what is wrong and what would
 * fix it, and all problems are found in one reading. Lengths, feeds and chip thicknesses are read in
 * the file's {@code units} (inch tables: in and ft/min) and kept in mm and m/min.
 */
public final class CuttingDataReader {
    /** Name of a user table in a Hobwright library folder. */
    public static final String FILE_NAME = "cutting-data.json";
    /** Value of the {@code format} key. */
    public static final String FORMAT = "hobwright-cutting-data";

    private static final List<String> TOP_KEYS = List.of("$schema", "format", "version", "units", "note",
            "qualityDefaults", "fineModule", "rows");
    private static final List<String> ROW_KEYS = List.of("workMaterial", "hobMaterial", "cuttingSpeed", "roughFeed",
            "finishFeed", "maxChipThickness", "status");
    private static final List<String> QUALITY_KEYS = List.of("feedMarkDepth", "envelopingDepth", "toleranceShare");
    private static final List<String> FINE_KEYS = List.of("below", "roughFeed", "finishFeed");

    private final JsonDocument doc;
    /** Fills what a file leaves out; null while the built-in table itself is read. */
    private final CuttingDataTable fallback;
    private final List<Finding> out = new ArrayList<>();
    private boolean unreadable;
    private double mmPerUnit;
    private double speedFactor;

    private CuttingDataReader(JsonDocument doc, CuttingDataTable fallback) {
        this.doc = doc;
        this.fallback = fallback;
    }

    /**
     * The table of a library folder: the built-in table, overridden row by row by
     * {@code home/cutting-data.json} when that file exists.
     */
    public static Loaded<CuttingDataTable> forLibrary(Path home) {
        Path file = home.resolve(FILE_NAME);
        if (!Files.exists(file)) {
            return Loaded.of(builtIn());
        }
        return JsonDocument.read(file).then(CuttingDataReader::read).map(builtIn()::overriddenBy);
    }

    /**
     * A user's table; {@code qualityDefaults} and {@code fineModule} left out take the built-in
     * values.
     */
    public static Loaded<CuttingDataTable> read(JsonDocument doc) {
        return new CuttingDataReader(doc, builtIn()).table();
    }

    /** The table shipped with Hobwright, read once. */
    static CuttingDataTable builtIn() {
        return BuiltIn.TABLE;
    }

    private Loaded<CuttingDataTable> table() {
        JsonNode root = doc.root();
        keys(root, "", TOP_KEYS);
        JsonNode format = root.get("format");
        if (format == null || !format.isString() || !format.stringValue().equals(FORMAT)) {
            add(InputCode.INPUT_FORMAT, "format", where("format") + ": \"format\" must be \"" + FORMAT + "\"",
                    "put \"format\": \"" + FORMAT + "\" in the file");
        }
        JsonNode version = root.get("version");
        if (version == null || !version.isNumber() || version.doubleValue() != 1) {
            add(InputCode.INPUT_VERSION, "version", where("version") + ": \"version\" must be 1",
                    "put \"version\": 1 in the file");
        }
        JsonNode units = root.get("units");
        if (units == null || !units.isString() || !(units.stringValue().equals("mm") || units.stringValue()
                .equals("in"))) {
            add(InputCode.INPUT_UNITS, "units", where("units") + ": \"units\" must be \"mm\" or \"in\"",
                    "put \"units\": \"mm\" (m/min, mm) or \"units\": \"in\" (ft/min, in) in the file");
        }
        if (unreadable) {
            return Loaded.unreadable(out);
        }
        boolean inch = units.stringValue().equals("in");
        mmPerUnit = inch ? Units.IN.toMm(1) : 1;
        speedFactor = inch ? Units.IN.cuttingSpeedToMPerMin(1) : 1;
        QualityDefaults quality = fallback == null ? null : fallback.qualityDefaults();
        if (root.has("qualityDefaults") || fallback == null) {
            quality = quality(object(root, "qualityDefaults", QUALITY_KEYS));
        }
        double below = fallback == null ? Double.NaN : fallback.fineModuleBelow();
        ValueRange fineRough = fallback == null ? null : fallback.fineRoughFeed();
        ValueRange fineFinish = fallback == null ? null : fallback.fineFinishFeed();
        if (root.has("fineModule") || fallback == null) {
            JsonNode f = object(root, "fineModule", FINE_KEYS);
            below = positive(f, "fineModule", "below", mmPerUnit);
            fineRough = range(f, "fineModule", "roughFeed", mmPerUnit);
            fineFinish = range(f, "fineModule", "finishFeed", mmPerUnit);
        }
        Map<String, CuttingData> rows = rows(root.get("rows"));
        if (Finding.anyError(out)) {
            return unreadable ? Loaded.unreadable(out) : Loaded.failed(out);
        }
        return Loaded.of(new CuttingDataTable(rows, quality, below, fineRough, fineFinish), out);
    }

    private Map<String, CuttingData> rows(JsonNode list) {
        Map<String, CuttingData> rows = new LinkedHashMap<>();
        if (list == null) {
            add(InputCode.INPUT_MISSING, "rows", doc.source() + ": rows is required",
                    "add \"rows\": [ ... ] (an empty list keeps the built-in rows)");
            return rows;
        }
        if (!list.isArray()) {
            add(InputCode.INPUT_WRONG_TYPE, "rows", where("rows") + ": rows must be a list of rows [ { ... } ]",
                    null);
            return rows;
        }
        for (int i = 0; i < list.size(); i++) {
            String at = "rows[" + i + "]";
            JsonNode r = list.get(i);
            if (!r.isObject()) {
                add(InputCode.INPUT_WRONG_TYPE, at, where(at) + ": " + at + " must be an object { ... }", null);
                continue;
            }
            keys(r, at, ROW_KEYS);
            String work = text(r, at, "workMaterial");
            String hob = text(r, at, "hobMaterial");
            ValueRange speed = range(r, at, "cuttingSpeed", speedFactor);
            ValueRange rough = range(r, at, "roughFeed", mmPerUnit);
            ValueRange finish = range(r, at, "finishFeed", mmPerUnit);
            double chip = positive(r, at, "maxChipThickness", mmPerUnit);
            String status = r.has("status") ? text(r, at, "status") : "user table";
            if (work == null || hob == null || speed == null || rough == null || finish == null || status == null
                    || !(chip > 0)) {
                continue;
            }
            String key = CuttingDataTable.key(work, hob);
            if (rows.containsKey(key)) {
                add(InputCode.INPUT_CONFLICT, at, where(at) + ": " + at + " repeats " + work + " with " + hob,
                        "keep one row for each work material and hob material");
                continue;
            }
            rows.put(key, new CuttingData(work, hob, speed, rough, finish, chip, status));
        }
        return rows;
    }

    private QualityDefaults quality(JsonNode q) {
        double mark = positive(q, "qualityDefaults", "feedMarkDepth", 1);
        double envelope = positive(q, "qualityDefaults", "envelopingDepth", 1);
        double share = positive(q, "qualityDefaults", "toleranceShare", 1);
        if (share > 1) {
            add(InputCode.INPUT_VALUE, "qualityDefaults.toleranceShare", where("qualityDefaults.toleranceShare")
                    + ": qualityDefaults.toleranceShare must be at most 1, was " + FieldReader.format(share),
                    "give the share of the tolerance as a fraction, e.g. 0.33");
        }
        return mark > 0 && envelope > 0 && share > 0 && share <= 1 ? new QualityDefaults(mark, envelope, share) : null;
    }

    /** The object at {@code key} with its keys checked; an empty object (and a finding) when absent or not one. */
    private JsonNode object(JsonNode parent, String key, List<String> known) {
        JsonNode n = parent.get(key);
        if (n == null) {
            add(InputCode.INPUT_MISSING, key, doc.source() + ": " + key + " is required in the built-in table",
                    "restore the built-in cutting-data.json");
        } else if (!n.isObject()) {
            add(InputCode.INPUT_WRONG_TYPE, key, where(key) + ": " + key + " must be an object { ... }", null);
        } else {
            keys(n, key, known);
            return n;
        }
        return doc.root().objectNode();
    }

    private void keys(JsonNode n, String at, List<String> known) {
        for (String k : n.propertyNames()) {
            if (!known.contains(k)) {
                String path = path(at, k);
                add(InputCode.INPUT_UNKNOWN_KEY, path, where(path) + ": unknown key \"" + k + "\""
                        + (at.isEmpty() ? "" : " in " + at), "allowed here: " + String.join(", ", known));
            }
        }
    }

    /** A non-blank text; null (and a finding) when absent or not one. */
    private String text(JsonNode n, String at, String key) {
        String path = path(at, key);
        JsonNode v = n.get(key);
        if (v == null) {
            add(InputCode.INPUT_MISSING, path, where(at) + ": " + path + " is required", "add \"" + key + "\"");
        } else if (!v.isString()) {
            add(InputCode.INPUT_WRONG_TYPE, path, where(path) + ": " + path + " must be a text", null);
        } else if (v.stringValue().isBlank()) {
            add(InputCode.INPUT_VALUE, path, where(path) + ": " + path + " must not be empty", "write the name");
        } else {
            return v.stringValue().strip();
        }
        return null;
    }

    /** A number greater than 0 in file units, times {@code factor}; NaN (and a finding) when absent or bad. */
    private double positive(JsonNode n, String at, String key, double factor) {
        String path = path(at, key);
        JsonNode v = n.get(key);
        if (v == null) {
            add(InputCode.INPUT_MISSING, path, where(at) + ": " + path + " is required", "add \"" + key + "\"");
        } else if (!v.isNumber()) {
            add(InputCode.INPUT_WRONG_TYPE, path, where(path) + ": " + path + " must be a number", null);
        } else if (!(v.doubleValue() > 0) || !Double.isFinite(v.doubleValue())) {
            add(InputCode.INPUT_VALUE, path, where(path) + ": " + path + " must be greater than 0, was "
                    + FieldReader.format(v.doubleValue()), "give a positive value");
        } else {
            return v.doubleValue() * factor;
        }
        return Double.NaN;
    }

    /** {@code [min, max]} with 0 < min ≤ max in file units, times {@code factor}; null (and a finding) when bad. */
    private ValueRange range(JsonNode n, String at, String key, double factor) {
        String path = path(at, key);
        JsonNode v = n.get(key);
        if (v == null) {
            add(InputCode.INPUT_MISSING, path, where(at) + ": " + path + " is required",
                    "add \"" + key + "\": [min, max]");
            return null;
        }
        if (!v.isArray() || v.size() != 2 || !v.get(0).isNumber() || !v.get(1).isNumber()) {
            add(InputCode.INPUT_WRONG_TYPE, path, where(path) + ": " + path + " must be a range [min, max] of two"
                    + " numbers", null);
            return null;
        }
        double min = v.get(0).doubleValue();
        double max = v.get(1).doubleValue();
        if (!(min > 0) || !Double.isFinite(max)) {
            add(InputCode.INPUT_VALUE, path, where(path) + ": " + path + " must be two numbers greater than 0, was ["
                    + FieldReader.format(min) + ", " + FieldReader.format(max) + "]", "give a positive range");
            return null;
        }
        if (min > max) {
            add(InputCode.INPUT_CONFLICT, path, where(path) + ": " + path + " starts above its end: ["
                    + FieldReader.format(min) + ", " + FieldReader.format(max) + "]", "write [min, max]");
            return null;
        }
        return new ValueRange(min * factor, max * factor);
    }

    private void add(InputCode code, String path, String message, String fix) {
        out.add(code.at(path, message, fix));
        unreadable |= code.unreadable();
    }

    /** {@code file:line} of a key, or the file when the line is not known. */
    private String where(String path) {
        return doc.at(path);
    }

    private static String path(String at, String key) {
        return at.isEmpty() ? key : at + "." + key;
    }

    /** The built-in table, read once; a table that does not read is a defect of the build. */
    private static final class BuiltIn {
        static final CuttingDataTable TABLE = load();

        private static CuttingDataTable load() {
            String name = "built-in " + FILE_NAME;
            try (InputStream in = CuttingDataTable.class.getResourceAsStream(FILE_NAME)) {
                if (in == null) {
                    throw new IllegalStateException(name + " is missing from the class path");
                }
                Loaded<CuttingDataTable> t = JsonDocument.parse(new String(in.readAllBytes(), StandardCharsets.UTF_8),
                        name).then(d -> new CuttingDataReader(d, null).table());
                if (!t.ok()) {
                    throw new IllegalStateException(name + " does not read: " + t.errorLine());
                }
                return t.get();
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
        }
    }
}
