package org.hobwright.wizard.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import picocli.CommandLine;
import org.junit.jupiter.api.Test;

class HobwrightCommandTest {

    private record Run(int code, String out, String err) {
    }

    private static Run run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        CommandLine cl = HobwrightCommand.commandLine();
        cl.setOut(new PrintWriter(out, true));
        cl.setErr(new PrintWriter(err, true));
        int code = cl.execute(args);
        return new Run(code, out.toString(), err.toString());
    }

    @Test
    void helpListsUsageAndCautions() {
        Run r = run("--help");
        assertEquals(ExitCodes.OK, r.code());
        assertTrue(r.out().contains("Usage: hobwright"), r.out());
        assertTrue(r.out().contains("Caution"), r.out());
    }

    @Test
    void unknownOptionIsUsageError() {
        Run r = run("--no-such-option");
        assertEquals(ExitCodes.USAGE, r.code());
        assertTrue(r.err().contains("--no-such-option"), r.err());
    }

    @Test
    void versionIsPrinted() {
        Run r = run("--version");
        assertEquals(ExitCodes.OK, r.code());
        assertTrue(r.out().startsWith("hobwright "), r.out());
    }
}
