package org.hobwright.wizard.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.BufferedReader;
import java.io.StringReader;
import java.util.Map;
import java.util.Optional;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import picocli.CommandLine;

/** The picocli-free path reads every form it accepts exactly as the picocli command line does. */
class QuickArgsTest {
    private static PlanRequest picocli(String[] args) {
        CliEnvironment env = new CliEnvironment(new BufferedReader(new StringReader("")), Cli.CLOCK, Map.of(),
                QuickArgsTest.class.getClassLoader(), true);
        CommandLine.ParseResult parsed = HobwrightCommand.commandLine(env).parseArgs(args);
        Object verb = parsed.subcommand().commandSpec().userObject();
        return verb instanceof PlanCommand p ? p.request() : ((DemoCommand) verb).request();
    }

    @ParameterizedTest
    @ValueSource(strings = {
        "plan a.json",
        "plan a.json b.json jobs --out o",
        "plan a.json --machine varrow-1605 --template brass-fine --json --fastest",
        "plan --json a.json --date 2026-12-01",
        "plan a.json --out=o --machine=m.json --date=2026-01-31",
        "--home h plan a.json",
        "plan a.json --home h",
        "--home=h demo",
        "demo --out o --date 2026-12-01",
        "demo"})
    void acceptedFormsMatchPicocli(String line) {
        String[] args = line.split(" ");
        Optional<PlanRequest> quick = QuickArgs.parse(args);
        assertTrue(quick.isPresent(), line);
        assertEquals(picocli(args), quick.get(), line);
    }

    @ParameterizedTest
    @ValueSource(strings = {
        "plan", "plan --help", "plan a.json --verbose", "plan a.json --out", "plan a.json --out o --out p",
        "plan a.json --json --json", "demo a.json", "demo --json", "--version", "wizard", "machines list",
        "plan a.json -- b.json", "--home h --home i plan a.json", "plan a.json --json=true"})
    void everythingElseIsLeftToPicocli(String line) {
        assertEquals(Optional.empty(), QuickArgs.parse(line.split(" ")), line);
    }
}
