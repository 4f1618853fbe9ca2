package org.hobwright.hosttest;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Collectors;
import java.util.stream.Stream;
import jdk.jshell.JShell;
import jdk.jshell.Snippet;
import jdk.jshell.SnippetEvent;
import jdk.jshell.SourceCodeAnalysis;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Every JShell script under {@code samples/scripts/} runs through the JDK's {@code jdk.jshell}
 * API in a JVM of its own whose class path is the api jar and the plugin jar, as
 * {@code jshell --class-path API_JAR:wizard/target/hobwright-plugin.jar SCRIPT} gives it: every
 * snippet is accepted and none throws.
 */
class JShellScriptsTest {

    static List<Path> scripts() throws IOException {
        try (Stream<Path> s = Files.list(Path.of(System.getProperty("hobwright.scripts")))) {
            return s.filter(p -> p.toString().endsWith(".jsh")).sorted().toList();
        }
    }

    @ParameterizedTest
    @MethodSource("scripts")
    void runsWithoutAnException(Path script) throws IOException {
        ByteArrayOutputStream printed = new ByteArrayOutputStream();
        String classPath = System.getProperty("hobwright.apiJar") + java.io.File.pathSeparator + Host.pluginJar();
        try (PrintStream out = new PrintStream(printed, true, StandardCharsets.UTF_8);
             JShell shell = JShell.builder().out(out).err(out)
                     .remoteVMOptions("-Dhobwright.samples=" + Host.samples()).build()) {
            shell.addToClasspath(classPath);
            // commands (/exit) are the tool's, not Java: the API runs the Java snippets
            String source = Files.readAllLines(script).stream().filter(l -> !l.startsWith("/"))
                    .collect(Collectors.joining("\n"));
            SourceCodeAnalysis analysis = shell.sourceCodeAnalysis();
            int snippets = 0;
            while (!source.isBlank()) {
                SourceCodeAnalysis.CompletionInfo info = analysis.analyzeCompletion(source);
                assertTrue(info.completeness().isComplete(), () -> script + ": incomplete snippet at " + info.remaining());
                for (SnippetEvent e : shell.eval(info.source())) {
                    String what = script.getFileName() + ": " + info.source().strip();
                    assertNull(e.exception(), () -> what + " threw " + e.exception() + "\n" + printed);
                    if (e.snippet() != null && e.causeSnippet() == null) {
                        assertFalse(e.status() == Snippet.Status.REJECTED, () -> what + " was rejected: "
                                + shell.diagnostics(e.snippet()).map(d -> d.getMessage(null)).toList());
                    }
                }
                snippets++;
                source = info.remaining();
            }
            assertTrue(snippets > 5, "the script has snippets: " + snippets);
        }
        String text = printed.toString(StandardCharsets.UTF_8);
        assertFalse(text.contains("Exception"), text);
        assertTrue(text.contains("cycle:"), "a cycle summary was printed:\n" + text);
        assertEquals(-1, text.indexOf("\tat "), "no stack trace:\n" + text);
    }
}
