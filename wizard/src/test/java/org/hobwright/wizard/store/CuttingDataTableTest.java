package org.hobwright.wizard.store;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Set;
import java.util.stream.Collectors;
import org.hobwright.api.check.Finding;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The cutting-data file: the shipped table, user overrides, and findings that name the line and the key. */
class CuttingDataTableTest {

    private static Loaded<CuttingDataTable> load(String json) {
        return JsonDocument.parse(json, "user.json").then(CuttingDataReader::read);
    }

    private static CuttingDataTable read(String json) {
        return load(json).get();
    }

    private static final String HEAD = "{\"format\":\"hobwright-cutting-data\",\"version\":1,\"units\":\"mm\",";

    @Test
    void everyBuiltInValueIsMarkedTypical() {
        CuttingDataTable t = CuttingDataTable.builtIn();
        assertTrue(t.rows().size() >= 17);
        t.rows().values().forEach(r -> assertTrue(r.status().contains("typical")
                && r.status().contains("confirm with the hob supplier"), r.toString()));
    }

    @Test
    void builtInRowsMatchTheRangesOfTheDesignNotes() {
        // FORMULAS.md §8.2 (from memory, typical values): case-hardening steel, uncoated HSS 25–40 m/min,
        // roughing 1.0–3.0, finishing 0.5–1.5 mm per work revolution; HSS chip limit ≈ 0.20 mm (§8.1)
        CuttingData r = CuttingDataTable.builtIn().find("steel-case-hardening", "hss").orElseThrow();
        assertEquals(new ValueRange(25, 40), r.cuttingSpeed());
        assertEquals(new ValueRange(1.0, 3.0), r.roughFeed());
        assertEquals(new ValueRange(0.5, 1.5), r.finishFeed());
        assertEquals(0.20, r.maxChipThicknessMm());
        // fine modules (m < 1): 0.1–0.5 mm per work revolution (FORMULAS.md §8.2)
        CuttingData fine = CuttingDataTable.builtIn().find("steel-case-hardening", "hss", 0.5).orElseThrow();
        assertEquals(new ValueRange(0.1, 0.5), fine.roughFeed());
    }

    @Test
    void userRowsReplaceAndAdd() {
        CuttingDataTable user = read(HEAD + "\"rows\":[{\"workMaterial\":\"brass\",\"hobMaterial\":\"hss\","
                + "\"cuttingSpeed\":[50,60],\"roughFeed\":[1,2],\"finishFeed\":[0.5,1],\"maxChipThickness\":0.1},"
                + "{\"workMaterial\":\"bronze\",\"hobMaterial\":\"hss\",\"cuttingSpeed\":[30,40],\"roughFeed\":[1,2],"
                + "\"finishFeed\":[0.5,1],\"maxChipThickness\":0.15}]}");
        CuttingDataTable merged = CuttingDataTable.builtIn().overriddenBy(user);
        assertEquals(new ValueRange(50, 60), merged.find("brass", "hss").orElseThrow().cuttingSpeed());
        assertEquals("user table", merged.find("brass", "hss").orElseThrow().status());
        assertTrue(merged.find("bronze", "hss").isPresent());
        assertEquals(CuttingDataTable.builtIn().find("brass", "carbide"), merged.find("brass", "carbide"));
        assertEquals(CuttingDataTable.builtIn().qualityDefaults(), merged.qualityDefaults());
    }

    @Test
    void inchTablesAreConverted() {
        // 1 in = 25.4 mm; 1 ft/min = 0.3048 m/min (international yard and pound, 1959)
        CuttingDataTable t = read("{\"format\":\"hobwright-cutting-data\",\"version\":1,\"units\":\"in\",\"rows\":["
                + "{\"workMaterial\":\"brass\",\"hobMaterial\":\"hss\",\"cuttingSpeed\":[100,200],"
                + "\"roughFeed\":[0.04,0.08],\"finishFeed\":[0.02,0.04],\"maxChipThickness\":0.008}]}");
        CuttingData r = t.find("brass", "hss").orElseThrow();
        assertEquals(30.48, r.cuttingSpeed().min(), 1e-9);
        assertEquals(1.016, r.roughFeed().min(), 1e-9);
        assertEquals(0.2032, r.maxChipThicknessMm(), 1e-9);
    }

    @Test
    void everyBadValueIsAFindingNamingLineKeyAndFix() {
        Loaded<CuttingDataTable> t = load(HEAD + "\n\"rows\":[{\"workMaterial\":\"brass\",\n"
                + "\"hobMaterial\":\"hss\",\"cuttingSpeed\":[60,50],\"roughFeed\":[1,2],\"finishFeed\":[0.5,1],\n"
                + "\"maxChipThickness\":-0.1}],\n\"qualityDefaults\":{\"feedMarkDepth\":2,\"envelopingDepth\":1,"
                + "\"toleranceShare\":1.5}}");
        assertFalse(t.ok());
        assertFalse(t.unreadable(), "a readable file with wrong values");
        List<Finding> errors = t.findings().stream().filter(Finding::isError).toList();
        assertEquals(Set.of("rows[0].cuttingSpeed", "rows[0].maxChipThickness", "qualityDefaults.toleranceShare"),
                errors.stream().map(Finding::field).collect(Collectors.toSet()), t.findings().toString());
        Finding speed = errors.stream().filter(f -> f.field().equals("rows[0].cuttingSpeed")).findFirst().orElseThrow();
        assertEquals(InputCode.INPUT_CONFLICT.code(), speed.code());
        assertTrue(speed.message().startsWith("user.json:3: rows[0].cuttingSpeed starts above its end: [60, 50]"),
                speed.message());
        assertEquals("write [min, max]", speed.fix().orElseThrow());
        Finding chip = errors.stream().filter(f -> f.field().equals("rows[0].maxChipThickness")).findFirst()
                .orElseThrow();
        assertTrue(chip.message().startsWith("user.json:4: rows[0].maxChipThickness must be greater than 0, was -0.1"),
                chip.message());
    }

    @Test
    void fileProblemsMakeTheTableUnreadable() {
        Loaded<CuttingDataTable> t = load(HEAD + "\"rows\":[],\n\"speed\":1}");
        assertTrue(t.value().isEmpty() && t.hasErrors(), "an unknown key is an error of the table");
        assertEquals(InputCode.INPUT_UNKNOWN_KEY.code(), t.findings().get(0).code());
        assertTrue(t.errorLine().startsWith("user.json:2: unknown key \"speed\""), t.errorLine());
        assertTrue(t.errorLine().contains("allowed here: $schema, format, version"), t.errorLine());
        Loaded<CuttingDataTable> other = load("{\"format\":\"other\",\"version\":2,\"units\":\"cm\",\"rows\":[]}");
        assertEquals(List.of("INPUT_FORMAT", "INPUT_VERSION", "INPUT_UNITS"),
                other.findings().stream().map(Finding::code).toList());
        assertTrue(other.unreadable());
        Loaded<CuttingDataTable> malformed = JsonDocument.parse("{", "user.json").then(CuttingDataReader::read);
        assertEquals(InputCode.INPUT_MALFORMED.code(), malformed.findings().get(0).code());
        Loaded<CuttingDataTable> rows = load(HEAD + "\"rows\":[{\"workMaterial\":\"brass\"}, 3]}");
        assertEquals(List.of("rows[0].hobMaterial", "rows[0].cuttingSpeed", "rows[0].roughFeed", "rows[0].finishFeed",
                "rows[0].maxChipThickness", "rows[1]"), rows.findings().stream().map(Finding::field).toList());
    }

    @Test
    void aRepeatedRowIsAConflict() {
        String row = "{\"workMaterial\":\"brass\",\"hobMaterial\":\"hss\",\"cuttingSpeed\":[50,60],"
                + "\"roughFeed\":[1,2],\"finishFeed\":[0.5,1],\"maxChipThickness\":0.1}";
        Loaded<CuttingDataTable> t = load(HEAD + "\"rows\":[" + row + ",\n" + row + "]}");
        assertEquals("rows[1]", t.findings().get(0).field());
        assertTrue(t.errorLine().contains("repeats brass with hss"), t.errorLine());
    }

    @Test
    void libraryFolderTableOverridesWhenPresent(@TempDir Path home) throws Exception {
        assertSame(CuttingDataTable.builtIn(), CuttingDataReader.forLibrary(home).get());
        Files.writeString(home.resolve(CuttingDataReader.FILE_NAME), HEAD + "\"qualityDefaults\":{\"feedMarkDepth\":2,"
                + "\"envelopingDepth\":1,\"toleranceShare\":0.5},\"rows\":[]}");
        assertEquals(new QualityDefaults(2, 1, 0.5), CuttingDataReader.forLibrary(home).get().qualityDefaults());
        Files.delete(home.resolve(CuttingDataReader.FILE_NAME));
        Files.createDirectory(home.resolve(CuttingDataReader.FILE_NAME));
        assertEquals(InputCode.INPUT_NOT_A_FILE.code(), CuttingDataReader.forLibrary(home).findings().get(0).code());
    }
}
