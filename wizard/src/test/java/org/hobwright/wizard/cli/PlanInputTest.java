package org.hobwright.wizard.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.junit.jupiter.api.io.TempDir;

/** Inputs that cannot be read end with one line and exit 2; a job with errors exits 1; nothing is written. */
class PlanInputTest {
    @TempDir
    Path dir;

    private Path out() {
        return dir.resolve("out");
    }

    private void assertUnreadable(Cli.Run r, String mention) {
        assertEquals(ExitCodes.USAGE, r.code(), r::toString);
        assertEquals(1, r.err().lines().count(), r::toString);
        assertTrue(r.err().startsWith("hobwright: "), r::toString);
        assertTrue(r.err().contains(mention), r::toString);
        assertFalse(r.err().contains("Exception"), r::toString);
        assertFalse(Files.exists(out()), "nothing may be written");
    }

    @Test
    void malformedJson() throws IOException {
        Path job = Files.writeString(dir.resolve("broken.json"), "{ \"format\": \"hobwright-job\", \"version\": 1,\n");
        assertUnreadable(Cli.run(dir, "plan", job.toString(), "--out", out().toString()), "broken.json");
    }

    @Test
    void missingFile() {
        assertUnreadable(Cli.run(dir, "plan", dir.resolve("nowhere.json").toString(), "--out", out().toString()),
                "nowhere.json");
    }

    @Test
    void folderWithoutJobs() throws IOException {
        Path empty = Files.createDirectory(dir.resolve("empty"));
        assertUnreadable(Cli.run(dir, "plan", empty.toString(), "--out", out().toString()), "empty");
    }

    @Test
    void folderInsteadOfMachineFile() throws IOException {
        Path job = Files.writeString(dir.resolve("job.json"), Store.builtinText("jobs/metering-pump-gear.json"));
        Path folder = Files.createDirectory(dir.resolve("machine.json"));
        assertUnreadable(Cli.run(dir, "plan", job.toString(), "--machine", folder.toString(), "--out",
                out().toString()), "machine.json");
    }

    @Test
    void fiftyMegabyteFile() throws IOException {
        Path big = dir.resolve("big.json");
        byte[] block = new byte[1 << 20];
        java.util.Arrays.fill(block, (byte) ' ');
        try (OutputStream o = Files.newOutputStream(big)) {
            o.write('{');
            for (int i = 0; i < 50; i++) {
                o.write(block);
            }
            o.write('}');
        }
        assertUnreadable(Cli.run(dir, "plan", big.toString(), "--out", out().toString()), "big.json");
    }

    @Test
    void unknownKeyIsAJobErrorNamingTheKey() throws IOException {
        String text = Store.builtinText("jobs/metering-pump-gear.json").replace("\"teeth\"", "\"teeht\"");
        Path job = Files.writeString(dir.resolve("typo.json"), text);
        Cli.Run r = Cli.run(dir, "plan", job.toString(), "--out", out().toString());
        assertEquals(ExitCodes.JOB_ERRORS, r.code(), r::toString);
        assertTrue(r.out().contains("unknown key \"teeht\""), r::toString);
        assertTrue(r.out().contains("gear.teeth is required"), r::toString);
        assertFalse(Files.exists(out()), "nothing may be written");
    }

    /**
     * One rule for wrong values: a number out of the field's range and a value of the wrong type are
     * both errors of a readable job (exit 1, every finding printed), with the limits of the field table.
     */
    @ParameterizedTest
    @ValueSource(strings = {"-3", "\"forty\"", "3", "2001", "24.5", "1e300"})
    void everyWrongTeethValueIsAJobError(String teeth) throws IOException {
        String text = Store.builtinText("jobs/metering-pump-gear.json").replace("\"teeth\": 24", "\"teeth\": " + teeth);
        Path job = Files.writeString(dir.resolve("teeth.json"), text);
        Cli.Run r = Cli.run(dir, "plan", job.toString(), "--out", out().toString());
        assertEquals(ExitCodes.JOB_ERRORS, r.code(), r::toString);
        assertTrue(r.out().contains("gear.teeth must be"), r::toString);
        assertTrue(r.out().length() < 2000, "a short message: " + r);
        assertFalse(Files.exists(out()), "nothing may be written");
    }

    @Test
    void jobWithErrorsExitsOneAndWritesNothing() throws IOException {
        String text = Store.builtinText("jobs/metering-pump-gear.json").replace("\"teeth\": 24", "\"teeth\": 0");
        Path job = Files.writeString(dir.resolve("zero-teeth.json"), text);
        Cli.Run r = Cli.run(dir, "plan", job.toString(), "--out", out().toString());
        assertEquals(ExitCodes.JOB_ERRORS, r.code(), r::toString);
        assertTrue(r.out().contains("gear.teeth"), r::toString);
        assertTrue(r.out().contains("Nothing written"), r::toString);
        assertFalse(Files.exists(out()), "nothing may be written");
    }

    @Test
    void jsonReportOfAJobWithErrorsListsTheFindings() throws IOException {
        String text = Store.builtinText("jobs/metering-pump-gear.json").replace("\"teeth\": 24", "\"teeth\": 0");
        Path job = Files.writeString(dir.resolve("zero-teeth.json"), text);
        Cli.Run r = Cli.run(dir, "plan", job.toString(), "--json");
        assertEquals(ExitCodes.JOB_ERRORS, r.code(), r::toString);
        var report = tools.jackson.databind.json.JsonMapper.shared().readTree(r.out());
        assertEquals("gear.teeth", report.at("/findings/0/field").asString(), r::toString);
        assertEquals("error", report.at("/findings/0/severity").asString(), r::toString);
    }
}
