package org.hobwright.wizard.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

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
        for (String verb : new String[] {"wizard", "demo", "plan", "machines", "templates"}) {
            assertTrue(r.out().contains(verb), verb + " missing from\n" + r.out());
        }
        assertTrue(r.out().contains("Caution"), r.out());
    }

    @ParameterizedTest
    @ValueSource(strings = {"wizard", "demo", "plan", "machines", "templates"})
    void everyVerbHasHelp(String verb) {
        Cli.Run r = Cli.run(home, verb, "--help");
        assertEquals(ExitCodes.OK, r.code(), r::toString);
        assertTrue(r.out().contains("Usage: hobwright " + verb), r.out());
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
