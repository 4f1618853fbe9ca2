package org.hobwright.wizard.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/** A shop's own cutting-data table in the library folder replaces the built-in row for its materials. */
class ShopCuttingDataTest {

    private static final String SAMPLE = Path.of("../samples/scenario/jobs/metering-pump-gear.json").toString();

    private static final String TABLE = """
            { "format": "hobwright-cutting-data", "version": 1, "units": "mm",
              "rows": [ { "workMaterial": "steel-free-machining", "hobMaterial": "hss-coated",
                          "cuttingSpeed": [40, 40], "roughFeed": [1.0, 1.0], "finishFeed": [0.8, 0.8],
                          "maxChipThickness": 0.2, "status": "our own trials" } ] }
            """;

    @Test
    void shopTableSetsTheCuttingSpeed(@TempDir Path home) throws IOException {
        Files.writeString(home.resolve("cutting-data.json"), TABLE);
        Cli.Run r = Cli.run(home, "plan", SAMPLE, "--json", "--out", home.resolve("out").toString());
        assertEquals(ExitCodes.OK, r.code(), r::toString);
        JsonNode report = JsonMapper.builder().build().readTree(r.out());
        // hob speed n₀ = 1000 v_c / (π d_a0): v_c 40 m/min from the shop's row, d_a0 32 mm (sample hob)
        assertEquals(1000 * 40 / (Math.PI * 32), report.at("/cycle/hobRpm").asDouble(Double.NaN), 1e-9,
                r::toString);
    }

    @Test
    void brokenShopTableIsOneLineAndExitTwo(@TempDir Path home) throws IOException {
        Files.writeString(home.resolve("cutting-data.json"), "{ \"format\": \"hobwright-cutting-data\", ");
        Cli.Run r = Cli.run(home, "plan", SAMPLE, "--out", home.resolve("out").toString());
        assertEquals(ExitCodes.USAGE, r.code(), r::toString);
        assertTrue(r.err().startsWith("hobwright: the shop's cutting-data table"), r::toString);
        assertEquals(1, r.err().strip().lines().count(), r::toString);
        assertTrue(Files.notExists(home.resolve("out")), "nothing written");
    }

    @Test
    void wrongValuesAreAllShownWithLineKeyAndFix(@TempDir Path home) throws IOException {
        Files.writeString(home.resolve("cutting-data.json"), TABLE.replace("[40, 40]", "[40, 30]")
                .replace("\"maxChipThickness\": 0.2", "\"maxChipThickness\": 0"));
        Cli.Run r = Cli.run(home, "plan", SAMPLE, "--out", home.resolve("out").toString());
        assertEquals(ExitCodes.USAGE, r.code(), r::toString);
        assertTrue(r.err().startsWith("hobwright: the shop's cutting-data table cannot be used: "), r::toString);
        assertTrue(r.err().contains("cutting-data.json:3: rows[0].cuttingSpeed starts above its end: [40, 30]"
                + " (write [min, max])"), r::toString);
        assertTrue(r.err().contains("cutting-data.json:4: rows[0].maxChipThickness must be greater than 0, was 0"
                + " (give a positive value)"), r::toString);
        assertTrue(Files.notExists(home.resolve("out")), "nothing written");
    }
}
