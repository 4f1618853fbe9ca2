package org.hobwright.wizard.plan;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Optional;
import org.hobwright.text.JsonTrees;
import tools.jackson.core.JacksonException;
import tools.jackson.databind.JsonNode;

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
            root = JsonTrees.parse(new String(in.readAllBytes(), StandardCharsets.UTF_8));
        } catch (JacksonException e) {
            throw new IllegalArgumentException(source + ":" + JsonTrees.line(e) + ": not valid JSON: "
                    + JsonTrees.message(e), e);
        } catch (JsonTrees.DuplicateKey e) {
            throw new IllegalArgumentException(source + ":" + e.line() + ": not valid JSON: " + e.getMessage(), e);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read " + source, e);
        }
        return new CuttingDataReader(source, builtIn()).table(root);
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
                JsonNode root = JsonTrees.parse(new String(in.readAllBytes(), StandardCharsets.UTF_8));
                return new CuttingDataReader("built-in " + FILE_NAME, null).table(root);
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
        }
    }
}
