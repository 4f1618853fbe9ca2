package org.hobwright.wizard.plan;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The cutting-data file: the shipped table, user overrides, and errors that name the key. */
class CuttingDataTableTest {

    private static CuttingDataTable read(String json) {
        return CuttingDataTable.read(new ByteArrayInputStream(json.getBytes(StandardCharsets.UTF_8)), "user.json");
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
    void unknownKeysAndBadValuesNameTheKey() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> read(HEAD + "\"rows\":[],"
                + "\"speed\":1}"));
        assertTrue(e.getMessage().contains("user.json: speed is not a known key"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> read(HEAD + "\"rows\":[{\"workMaterial\":\"brass\","
                + "\"hobMaterial\":\"hss\",\"cuttingSpeed\":[60,50],\"roughFeed\":[1,2],\"finishFeed\":[0.5,1],"
                + "\"maxChipThickness\":0.1}]}"));
        assertTrue(e.getMessage().contains("rows[0].cuttingSpeed"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> read("{\"format\":\"other\"}"));
        assertTrue(e.getMessage().contains("format"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> read("{"));
        assertTrue(e.getMessage().contains("not valid JSON"), e.getMessage());
    }

    @Test
    void libraryFolderTableOverridesWhenPresent(@TempDir Path home) throws Exception {
        assertSame(CuttingDataTable.builtIn(), CuttingDataTable.forLibrary(home));
        Files.writeString(home.resolve(CuttingDataTable.FILE_NAME), HEAD + "\"qualityDefaults\":{\"feedMarkDepth\":2,"
                + "\"envelopingDepth\":1,\"toleranceShare\":0.5},\"rows\":[]}");
        assertEquals(new QualityDefaults(2, 1, 0.5), CuttingDataTable.forLibrary(home).qualityDefaults());
    }
}
