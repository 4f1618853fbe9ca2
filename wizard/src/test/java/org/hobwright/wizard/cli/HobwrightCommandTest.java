package org.hobwright.wizard.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

class HobwrightCommandTest {
    @TempDir
    Path home;

    @Test
    void helpListsEveryVerbAndTheCautions() {
        Cli.Run r = Cli.run(home, "--help");
        assertEquals(ExitCodes.OK, r.code(), r::toString);
        for (String verb : new String[] {"wizard", "demo", "plan", "machines", "templates", "dialects"}) {
            assertTrue(r.out().contains(verb), verb + " missing from\n" + r.out());
        }
        assertTrue(r.out().contains("Caution"), r.out());
    }

    @ParameterizedTest
    @ValueSource(strings = {"wizard", "demo", "plan", "machines", "templates", "dialects"})
    void everyVerbHasHelp(String verb) {
        Cli.Run r = Cli.run(home, verb, "--help");
        assertEquals(ExitCodes.OK, r.code(), r::toString);
        assertTrue(r.out().contains("Usage: hobwright " + verb), r.out());
    }

    /** Only plan has --json: the other verbs' help does not speak of it. */
    @ParameterizedTest
    @ValueSource(strings = {"wizard", "demo"})
    void helpOfTheOtherVerbsDoesNotSpeakOfPlanOptions(String verb) {
        Cli.Run r = Cli.run(home, verb, "--help");
        assertFalse(r.out().contains("--json"), r.out());
    }

    /** Every exit code of {@link ExitCodes} is in the tool's --help and in the README's list. */
    @Test
    void exitCodesAgreeInHelpReadmeAndCode() throws IOException {
        String help = Cli.run(home, "--help").out().replaceAll("\\s+", " ");
        String readme = Files.readString(Path.of("../README.md")).replaceAll("\\s+", " ");
        String list = readme.substring(readme.indexOf("Exit codes:"));
        list = list.substring(0, list.indexOf(". "));
        for (int code : new int[] {ExitCodes.OK, ExitCodes.JOB_ERRORS, ExitCodes.USAGE, ExitCodes.INTERNAL}) {
            assertTrue(help.contains(", " + code + " ") || help.contains("Exit codes: " + code + " "), code + " " + help);
            assertTrue(list.contains(", " + code + " ") || list.contains("Exit codes: " + code + " "), code + " " + list);
        }
    }

    @Test
    void unknownOptionIsAOneLineUsageError() {
        Cli.Run r = Cli.run(home, "--no-such-option");
        assertEquals(ExitCodes.USAGE, r.code(), r::toString);
        assertEquals(1, r.err().lines().count(), r.err());
        assertTrue(r.err().contains("--no-such-option"), r.err());
    }

    @Test
    void planWithoutJobIsAUsageError() {
        Cli.Run r = Cli.run(home, "plan");
        assertEquals(ExitCodes.USAGE, r.code(), r::toString);
        assertEquals(1, r.err().lines().count(), r.err());
    }

    @Test
    void versionIsPrinted() {
        Cli.Run r = Cli.run(home, "--version");
        assertEquals(ExitCodes.OK, r.code(), r::toString);
        assertEquals("hobwright " + ToolVersion.VERSION, r.out().strip());
    }

    @Test
    void badDateIsAUsageError() {
        Cli.Run r = Cli.run(home, "demo", "--date", "1st of May", "--out", home.resolve("out").toString());
        assertEquals(ExitCodes.USAGE, r.code(), r::toString);
        assertTrue(r.err().contains("--date"), r.err());
    }
}
