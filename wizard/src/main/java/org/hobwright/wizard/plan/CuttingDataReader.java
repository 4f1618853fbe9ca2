package org.hobwright.wizard.plan;

import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Set;
import org.hobwright.api.job.Units;
import tools.jackson.databind.JsonNode;

/**
 * Turns the JSON tree of a cutting-data file into a {@link CuttingDataTable}, naming the file and
 * the key of every problem. Values a user's file leaves out come from the fallback table.
 *
 * @param source   file name for messages
 * @param fallback the table that fills what the file leaves out (the built-in table), or null for
 *                 the built-in table itself
 */
record CuttingDataReader(String source, CuttingDataTable fallback) {
    private static final Set<String> TOP_KEYS = Set.of("$schema", "format", "version", "units", "note",
            "qualityDefaults", "fineModule", "rows");
    private static final Set<String> ROW_KEYS = Set.of("workMaterial", "hobMaterial", "cuttingSpeed", "roughFeed",
            "finishFeed", "maxChipThickness", "status");
    private static final Set<String> QUALITY_KEYS = Set.of("feedMarkDepth", "envelopingDepth", "toleranceShare");
    private static final Set<String> FINE_KEYS = Set.of("below", "roughFeed", "finishFeed");
    /** An empty base for reading the built-in table itself. */
    private static final CuttingDataTable NONE = new CuttingDataTable(Map.of(), null, 0, null, null);

    CuttingDataTable table(JsonNode root) {
        object(root, "(top level)", TOP_KEYS);
        if (!CuttingDataTable.FORMAT.equals(text(root, "format"))) {
            throw problem("format", "must be \"" + CuttingDataTable.FORMAT + "\"");
        }
        if (!root.path("version").isInt() || root.get("version").intValue() != 1) {
            throw problem("version", "must be 1");
        }
        Units units = units(text(root, "units"));
        double mmPerUnit = units.toMm(1);
        double speedFactor = units.cuttingSpeedToMPerMin(1); // ft/min to m/min in inch tables
        CuttingDataTable base = fallback != null ? fallback : NONE;
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
            if (rows.put(CuttingDataTable.key(row.workMaterial(), row.hobMaterial()), row) != null) {
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
