package org.hobwright.wizard.store;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * The editable cutting-data table (file format {@code hobwright-cutting-data}, version 1, described in
 * wizard/README.md, "Cutting-data file"; read by {@link CuttingDataReader}). The built-in table ships as
 * {@code cutting-data.json} beside this class; a user's table overrides it row by row
 * ({@link #overriddenBy}).
 *
 * @param rows             rows by work material and hob material
 * @param qualityDefaults  default quality targets
 * @param fineModuleBelow  modules below this use the fine-module feed ranges, mm
 * @param fineRoughFeed    roughing feed range for fine modules, mm per work revolution
 * @param fineFinishFeed   finishing feed range for fine modules, mm per work revolution
 */
public record CuttingDataTable(Map<String, CuttingData> rows, QualityDefaults qualityDefaults, double fineModuleBelow,
                               ValueRange fineRoughFeed, ValueRange fineFinishFeed) {

    public CuttingDataTable {
        rows = Map.copyOf(rows);
    }

    /** The table shipped with Hobwright. */
    public static CuttingDataTable builtIn() {
        return CuttingDataReader.builtIn();
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

    /** The hob materials that have a row for this work material, sorted; empty when it has none. */
    public List<String> hobMaterialsFor(String workMaterial) {
        String prefix = key(workMaterial, "");
        return rows.keySet().stream().filter(k -> k.startsWith(prefix)).map(k -> k.substring(prefix.length()))
                .sorted().toList();
    }

    /** This table with the rows of {@code user} replacing or adding rows, and the user's defaults winning. */
    public CuttingDataTable overriddenBy(CuttingDataTable user) {
        Map<String, CuttingData> merged = new LinkedHashMap<>(rows);
        merged.putAll(user.rows);
        return new CuttingDataTable(merged, user.qualityDefaults, user.fineModuleBelow, user.fineRoughFeed,
                user.fineFinishFeed);
    }

    static String key(String workMaterial, String hobMaterial) {
        return workMaterial + "|" + hobMaterial;
    }
}
