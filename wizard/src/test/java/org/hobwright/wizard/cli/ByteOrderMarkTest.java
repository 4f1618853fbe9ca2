package org.hobwright.wizard.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/**
 * Every file Hobwright reads may start with the UTF-8 byte-order mark EF BB BF that some editors
 * write: RFC 8259 (2017), clause 8.1, lets a parser ignore it. Job, machine, template, dialect,
 * cutting-data table and piped answers are each read with one.
 */
class ByteOrderMarkTest {
    private static final byte[] BOM = {(byte) 0xEF, (byte) 0xBB, (byte) 0xBF};

    @TempDir
    Path dir;

    private Path withMark(String name, String text) throws IOException {
        byte[] body = text.getBytes(StandardCharsets.UTF_8);
        byte[] all = new byte[BOM.length + body.length];
        System.arraycopy(BOM, 0, all, 0, BOM.length);
        System.arraycopy(body, 0, all, BOM.length, body.length);
        Path file = dir.resolve(name);
        Files.createDirectories(file.getParent());
        return Files.write(file, all);
    }

    @Test
    void aJobFileWithAByteOrderMarkIsPlanned() throws IOException {
        Path job = withMark("job.json", Store.builtinText("jobs/metering-pump-gear.json"));
        Cli.Run r = Cli.run(dir.resolve("home"), "plan", job.toString(), "--out", dir.resolve("out").toString());
        assertEquals(ExitCodes.OK, r.code(), r::toString);
    }

    @Test
    void libraryFilesWithAByteOrderMarkAreSavedAndUsed() throws IOException {
        Path home = dir.resolve("home");
        Path dialect = withMark("home/dialects/shop-ctl.json", Store.builtinText("dialects/varrow-ctl.json")
                .replace("\"varrow-ctl\"", "\"shop-ctl\""));
        assertTrue(Files.exists(dialect));
        Path machine = withMark("machine.json", Store.builtinText("machines/varrow-1605.json")
                .replace("\"varrow-1605\"", "\"shop-lathe\"").replace("\"varrow-ctl\"", "\"shop-ctl\""));
        Cli.Run saveMachine = Cli.run(home, "machines", "save", machine.toString());
        assertEquals(ExitCodes.OK, saveMachine.code(), saveMachine::toString);
        Path template = withMark("template.json", Store.builtinText("templates/varrow-1605/brass-fine.json")
                .replace("\"varrow-1605\"", "\"shop-lathe\""));
        Cli.Run saveTemplate = Cli.run(home, "templates", "save", template.toString());
        assertEquals(ExitCodes.OK, saveTemplate.code(), saveTemplate::toString);
        withMark("home/cutting-data.json", """
                { "format": "hobwright-cutting-data", "version": 1, "units": "mm",
                  "rows": [ { "workMaterial": "steel-free-machining", "hobMaterial": "hss-coated",
                              "cuttingSpeed": [40, 40], "roughFeed": [1.0, 1.0], "finishFeed": [0.8, 0.8],
                              "maxChipThickness": 0.2, "status": "our own trials" } ] }
                """);

        Path job = Files.writeString(dir.resolve("job.json"), Store.builtinText("jobs/metering-pump-gear.json"));
        Cli.Run plan = Cli.run(home, "plan", job.toString(), "--machine", "shop-lathe", "--json", "--out",
                dir.resolve("out").toString());
        assertEquals(ExitCodes.OK, plan.code(), plan::toString);
        JsonNode report = JsonMapper.shared().readTree(plan.out());
        // hob speed n0 = 1000 v_c / (pi d_a0): v_c 40 m/min from the shop's row, d_a0 32 mm (sample hob)
        assertEquals(1000 * 40 / (Math.PI * 32), report.at("/cycle/hobRpm").asDouble(Double.NaN), 1e-9,
                plan::toString);
        assertTrue(Files.exists(dir.resolve("out/metering-pump-gear.nc")), "the dialect was read");
        assertTrue(Files.exists(home.resolve("templates/shop-lathe/brass-fine.json")));
    }

    @Test
    void pipedAnswersStartingWithAByteOrderMarkAreRead() {
        Cli.Run r = Cli.piped(dir.resolve("home"), "\uFEFFbom-job\n", "wizard");
        assertTrue(r.out().contains("Length unit"), r::toString);
        assertTrue(!r.out().contains("! Job name"), r::toString);
    }
}
