package org.hobwright.wizard.plan;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import org.hobwright.api.job.Units;
import tools.jackson.core.JacksonException;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/**
 * The editable cutting-data table (file format {@code hobwright-cutting-data}, version 1, described in
 * DEVELOPERS.md). The built-in table ships as {@code cutting-data.json} beside this class; a user's
 * table overrides it row by row ({@link #overriddenBy}).
 *
 * @param rows             rows by work material and hob material
 * @param qualityDefaults  default quality targets
 * @param fineModuleBelow  modules below this use the fine-module feed ranges, mm
 * @param fineRoughFeed    roughing feed range for fine modules, mm per work revolution
 * @param fineFinishFeed   finishing feed range for fine modules, mm per work revolution
 */
public record CuttingDataTable(Map<String, CuttingData> rows, QualityDefaults qualityDefaults, double fineModuleBelow,
                               ValueRange fineRoughFeed, ValueRange fineFinishFeed) {

    /** Name of a user table in a Hobwright library folder. */
    public static final String FILE_NAME = "cutting-data.json";
    /** Value of the {@code format} key. */
    public static final String FORMAT = "hobwright-cutting-data";

    private static final JsonMapper MAPPER = JsonMapper.builder().build();
    private static final Set<String> TOP_KEYS = Set.of("$schema", "format", "version", "units", "note",
            "qualityDefaults", "fineModule", "rows");
    private static final Set<String> ROW_KEYS = Set.of("workMaterial", "hobMaterial", "cuttingSpeed", "roughFeed",
            "finishFeed", "maxChipThickness", "status");
    private static final Set<String> QUALITY_KEYS = Set.of("feedMarkDepth", "envelopingDepth", "toleranceShare");
    private static final Set<String> FINE_KEYS = Set.of("below", "roughFeed", "finishFeed");

    public CuttingDataTable {
        rows = Map.copyOf(rows);
    }

    /** The table shipped with Hobwright. */
    public static CuttingDataTable builtIn() {
        return BuiltIn.TABLE;
    }

    /**
     * The built-in table overridden by {@code home/cutting-data.json} when that file exists.
     *
     * @param home a Hobwright library folder
     * @throws IllegalArgumentException naming the file and the key when the user's table is not valid
     */
    public static CuttingDataTable forLibrary(Path home) {
        Path file = home.resolve(FILE_NAME);
        if (!Files.isRegularFile(file)) {
            return builtIn();
        }
        try (InputStream in = Files.newInputStream(file)) {
            return builtIn().overriddenBy(read(in, file.toString()));
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read " + file, e);
        }
    }

    /** Row for a work material and hob material. */
    public Optional<CuttingData> find(String workMaterial, String hobMaterial) {
        return Optional.ofNullable(rows.get(key(workMaterial, hobMaterial)));
    }

    /** The row with the fine-module feed ranges applied when the module is below the fine-module limit. */
    public Optional<CuttingData> find(String workMaterial, String hobMaterial, double moduleMm) {
        return find(workMaterial, hobMaterial).map(r -> moduleMm < fineModuleBelow ? r.withFeeds(
                fineRoughFeed, fineFinishFeed) : r);
    }

    /** This table with the rows of {@code user} replacing or adding rows, and the user's defaults winning. */
    public CuttingDataTable overriddenBy(CuttingDataTable user) {
        Map<String, CuttingData> merged = new LinkedHashMap<>(rows);
        merged.putAll(user.rows);
        return new CuttingDataTable(merged, user.qualityDefaults, user.fineModuleBelow, user.fineRoughFeed,
                user.fineFinishFeed);
    }

    /**
     * Reads a table. Keys missing from a user table ({@code qualityDefaults}, {@code fineModule}) take
     * the built-in values.
     *
     * @param in     the JSON text
     * @param source file name for messages
     * @throws IllegalArgumentException naming the source and the key when the table is not valid
     */
    public static CuttingDataTable read(InputStream in, String source) {
        JsonNode root;
        try {
            root = MAPPER.readTree(in);
        } catch (JacksonException e) {
            throw new IllegalArgumentException(source + ": not valid JSON: " + e.getOriginalMessage(), e);
        }
        return new Reader(source, builtIn()).table(root);
    }

    static String key(String workMaterial, String hobMaterial) {
        return workMaterial + "|" + hobMaterial;
    }

    /** Lazily loaded built-in table. */
    private static final class BuiltIn {
        static final CuttingDataTable TABLE = load();

        private static CuttingDataTable load() {
            try (InputStream in = CuttingDataTable.class.getResourceAsStream(FILE_NAME)) {
                if (in == null) {
                    throw new IllegalStateException("built-in " + FILE_NAME + " is missing from the class path");
                }
                JsonNode root = MAPPER.readTree(in);
                return new Reader("built-in " + FILE_NAME, null).table(root);
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
        }
    }

    /** Turns the JSON tree into a table, naming the key of every problem. */
    private record Reader(String source, CuttingDataTable fallback) {

        CuttingDataTable table(JsonNode root) {
            object(root, "(top level)", TOP_KEYS);
            if (!FORMAT.equals(text(root, "format"))) {
                throw problem("format", "must be \"" + FORMAT + "\"");
            }
            if (!root.path("version").isInt() || root.get("version").intValue() != 1) {
                throw problem("version", "must be 1");
            }
            Units units = units(text(root, "units"));
            double mmPerUnit = units.toMm(1);
            double speedFactor = units == Units.MM ? 1.0 : 0.3048; // ft/min to m/min
            CuttingDataTable base = fallback != null ? fallback : BuiltInDefaults.NONE;
            QualityDefaults quality = root.has("qualityDefaults") ? quality(root.get("qualityDefaults"))
                    : base.qualityDefaults();
            double below = base.fineModuleBelow();
            ValueRange fineRough = base.fineRoughFeed();
            ValueRange fineFinish = base.fineFinishFeed();
            if (root.has("fineModule")) {
                JsonNode f = root.get("fineModule");
                object(f, "fineModule", FINE_KEYS);
                below = positive(f, "below", "fineModule.below") * mmPerUnit;
                fineRough = range(f, "roughFeed", "fineModule.roughFeed").times(mmPerUnit);
                fineFinish = range(f, "finishFeed", "fineModule.finishFeed").times(mmPerUnit);
            }
            if (quality == null || fineRough == null) {
                throw problem("qualityDefaults", "and fineModule are required in the built-in table");
            }
            Map<String, CuttingData> rows = new LinkedHashMap<>();
            JsonNode list = root.path("rows");
            if (!list.isArray()) {
                throw problem("rows", "must be an array of rows");
            }
            for (int i = 0; i < list.size(); i++) {
                CuttingData row = row(list.get(i), "rows[" + i + "]", mmPerUnit, speedFactor);
                if (rows.put(key(row.workMaterial(), row.hobMaterial()), row) != null) {
                    throw problem("rows[" + i + "]", "repeats " + row.workMaterial() + " with " + row.hobMaterial());
                }
            }
            return new CuttingDataTable(rows, quality, below, fineRough, fineFinish);
        }

        private CuttingData row(JsonNode r, String at, double mmPerUnit, double speedFactor) {
            object(r, at, ROW_KEYS);
            String status = r.has("status") ? text(r, "status", at + ".status") : "user table";
            return new CuttingData(text(r, "workMaterial", at + ".workMaterial"),
                    text(r, "hobMaterial", at + ".hobMaterial"),
                    range(r, "cuttingSpeed", at + ".cuttingSpeed").times(speedFactor),
                    range(r, "roughFeed", at + ".roughFeed").times(mmPerUnit),
                    range(r, "finishFeed", at + ".finishFeed").times(mmPerUnit),
                    positive(r, "maxChipThickness", at + ".maxChipThickness") * mmPerUnit, status);
        }

        private QualityDefaults quality(JsonNode q) {
            object(q, "qualityDefaults", QUALITY_KEYS);
            double share = positive(q, "toleranceShare", "qualityDefaults.toleranceShare");
            if (share > 1) {
                throw problem("qualityDefaults.toleranceShare", "must be at most 1, was " + share);
            }
            return new QualityDefaults(positive(q, "feedMarkDepth", "qualityDefaults.feedMarkDepth"),
                    positive(q, "envelopingDepth", "qualityDefaults.envelopingDepth"), share);
        }

        private void object(JsonNode n, String at, Set<String> known) {
            if (n == null || !n.isObject()) {
                throw problem(at, "must be an object");
            }
            for (String k : n.propertyNames()) {
                if (!known.contains(k)) {
                    throw problem(at.equals("(top level)") ? k : at + "." + k,
                            "is not a known key; known keys: " + String.join(", ", known.stream().sorted().toList()));
                }
            }
        }

        private String text(JsonNode n, String key) {
            return text(n, key, key);
        }

        private String text(JsonNode n, String key, String at) {
            JsonNode v = n.get(key);
            if (v == null || !v.isString() || v.stringValue().isBlank()) {
                throw problem(at, "must be a non-blank text");
            }
            return v.stringValue();
        }

        private double positive(JsonNode n, String key, String at) {
            JsonNode v = n.get(key);
            if (v == null || !v.isNumber() || !(v.doubleValue() > 0) || !Double.isFinite(v.doubleValue())) {
                throw problem(at, "must be a number greater than 0");
            }
            return v.doubleValue();
        }

        private ValueRange range(JsonNode n, String key, String at) {
            JsonNode v = n.get(key);
            if (v == null || !v.isArray() || v.size() != 2 || !v.get(0).isNumber() || !v.get(1).isNumber()) {
                throw problem(at, "must be [min, max]");
            }
            try {
                return new ValueRange(v.get(0).doubleValue(), v.get(1).doubleValue());
            } catch (IllegalArgumentException e) {
                throw problem(at, e.getMessage());
            }
        }

        private Units units(String symbol) {
            try {
                return Units.fromSymbol(symbol);
            } catch (IllegalArgumentException e) {
                throw problem("units", e.getMessage());
            }
        }

        private IllegalArgumentException problem(String at, String what) {
            return new IllegalArgumentException(source + ": " + at + " " + what);
        }
    }

    /** An empty base for reading the built-in table itself. */
    private static final class BuiltInDefaults {
        static final CuttingDataTable NONE = new CuttingDataTable(Map.of(), null, 0, null, null);
    }

    /** Work materials in the table, sorted, for messages. */
    public List<String> workMaterials() {
        return rows.values().stream().map(CuttingData::workMaterial).distinct().sorted().toList();
    }
}
