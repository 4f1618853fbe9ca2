package org.hobwright.wizard.cli;

import java.io.BufferedReader;
import java.io.PrintWriter;
import java.io.StringReader;
import java.io.StringWriter;
import java.nio.file.Path;
import java.time.Clock;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.Map;
import picocli.CommandLine;

/** Runs the tool in-process with captured output, a fixed clock and an empty library folder. */
final class Cli {
    /** A fixed instant, 2026-12-01 UTC, so outputs carry a known date. */
    static final Clock CLOCK = Clock.fixed(Instant.parse("2026-12-01T10:00:00Z"), ZoneOffset.UTC);

    private Cli() {
    }

    /** The outcome of one run. */
    record Run(int code, String out, String err) {
        @Override
        public String toString() {
            return "exit " + code + "\n--- out\n" + out + "--- err\n" + err;
        }
    }

    /** Runs with the library in {@code home} and {@code input} as the piped answers. */
    static Run piped(Path home, String input, String... args) {
        return run(home, input, Cli.class.getClassLoader(), args);
    }

    /** Runs with the library in {@code home}, piped answers, and providers found with {@code loader}. */
    static Run run(Path home, String input, ClassLoader loader, String... args) {
        return run(Map.of("HOBWRIGHT_HOME", home.toString()), input, loader, args);
    }

    /** Runs with the given environment variables, piped answers and providers found with {@code loader}. */
    static Run run(Map<String, String> variables, String input, ClassLoader loader, String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        CliEnvironment env = new CliEnvironment(new BufferedReader(new StringReader(input)), CLOCK, variables,
                loader, true);
        CommandLine cl = HobwrightCommand.commandLine(env);
        cl.setOut(new PrintWriter(out, true));
        cl.setErr(new PrintWriter(err, true));
        int code = cl.execute(args);
        return new Run(code, out.toString(), err.toString());
    }

    /** Runs with no piped input. */
    static Run run(Path home, String... args) {
        return piped(home, "", args);
    }
}
