package org.hobwright.hosttest;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.File;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.stream.Collectors;
import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Every JShell script under {@code samples/scripts/} runs without an exception: through the JDK's
 * {@code jdk.jshell} api in a JVM whose class path is the api jar and the plugin jar, and through the
 * {@code jshell} tool from the top folder of the checkout with the very command line the script's
 * header gives.
 */
class JShellScriptsTest {
    /** The header line that says how to run a script from the top folder. */
    private static final String COMMAND = "//   jshell ";

    static List<Path> scripts() throws IOException {
        try (Stream<Path> s = Files.list(Path.of(System.getProperty("hobwright.scripts")))) {
            return s.filter(p -> p.toString().endsWith(".jsh")).sorted().toList();
        }
    }

    @ParameterizedTest
    @MethodSource("scripts")
    void runsWithoutAnException(Path script) throws IOException {
        String classPath = System.getProperty("hobwright.apiJar") + File.pathSeparator + Host.pluginJar();
        String text;
        try (JShellRun shell = new JShellRun(classPath, "-Dhobwright.samples=" + Host.samples())) {
            // commands (/exit) are the tool's, not Java: the api runs the Java snippets
            String source = Files.readAllLines(script).stream().filter(l -> !l.startsWith("/"))
                    .collect(Collectors.joining("\n"));
            int snippets = shell.run(script.getFileName().toString(), source);
            assertTrue(snippets > 5, "the script has snippets: " + snippets);
            text = shell.printed();
        }
        assertClean(text);
    }

    @ParameterizedTest
    @MethodSource("scripts")
    void runsWithTheToolFromTheTopFolder(Path script) throws IOException, InterruptedException {
        List<String> header = Files.readAllLines(script).stream().filter(l -> l.startsWith(COMMAND)).toList();
        assertEquals(1, header.size(), script + " says once how to run it: " + COMMAND + "...");
        List<String> words = List.of(header.get(0).substring(COMMAND.length()).strip().split(" +"));
        assertEquals(List.of("--class-path", "api/target/hobwright-api-" + Host.version() + ".jar"
                + ":wizard/target/hobwright-plugin.jar", "samples/scripts/" + script.getFileName()), words,
                "the command line of the guide, with this build's api jar");
        Path top = Host.samples().toAbsolutePath().normalize().getParent().getParent();
        List<String> command = new ArrayList<>();
        command.add(Path.of(System.getProperty("java.home"), "bin", "jshell").toString());
        command.addAll(List.of("-J-Duser.language=en", "-R-Duser.language=en"));
        command.add(words.get(0));
        command.add(words.get(1).replace(":", File.pathSeparator));
        command.add(words.get(2));
        Path log = Files.createTempFile("jshell", ".log");
        try {
            Process p = new ProcessBuilder(command).directory(top.toFile()).redirectErrorStream(true)
                    .redirectOutput(log.toFile()).start();
            p.getOutputStream().close();
            assertTrue(p.waitFor(180, TimeUnit.SECONDS), "jshell finished");
            String text = Files.readString(log, StandardCharsets.UTF_8);
            assertEquals(0, p.exitValue(), text);
            assertClean(text);
        } finally {
            Files.deleteIfExists(log);
        }
    }

    private static void assertClean(String text) {
        assertFalse(text.contains("Exception") || text.contains("Error:"), text);
        assertTrue(text.contains("cycle:"), "a cycle summary was printed:\n" + text);
        assertEquals(-1, text.indexOf("\tat "), "no stack trace:\n" + text);
    }
}
