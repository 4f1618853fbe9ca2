package org.hobwright.hosttest;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import jdk.jshell.JShell;
import jdk.jshell.Snippet;
import jdk.jshell.SnippetEvent;
import jdk.jshell.SourceCodeAnalysis;

/**
 * A JShell of the JDK's {@code jdk.jshell} api, running Java text snippet by snippet in a JVM of its
 * own, as the {@code jshell} tool does: a snippet that is rejected or throws fails the test.
 */
final class JShellRun implements AutoCloseable {
    private final ByteArrayOutputStream printed = new ByteArrayOutputStream();
    private final PrintStream out = new PrintStream(printed, true, StandardCharsets.UTF_8);
    private final JShell shell;

    /**
     * @param classPath the remote JVM's class path, as {@code jshell --class-path} gives it
     * @param vmOptions options of the remote JVM
     */
    JShellRun(String classPath, String... vmOptions) {
        shell = JShell.builder().out(out).err(out).remoteVMOptions(vmOptions).build();
        shell.addToClasspath(classPath);
    }

    /**
     * Runs Java text (no JShell commands) snippet by snippet.
     *
     * @param name   what the text is, for messages
     * @param source the text
     * @return the number of snippets run
     */
    int run(String name, String source) {
        SourceCodeAnalysis analysis = shell.sourceCodeAnalysis();
        int snippets = 0;
        String rest = source;
        while (!rest.isBlank()) {
            SourceCodeAnalysis.CompletionInfo info = analysis.analyzeCompletion(rest);
            assertTrue(info.completeness().isComplete(), () -> name + ": incomplete snippet at " + info.remaining());
            for (SnippetEvent e : shell.eval(info.source())) {
                String what = name + ": " + info.source().strip();
                assertNull(e.exception(), () -> what + " threw " + e.exception() + "\n" + printed());
                if (e.snippet() != null && e.causeSnippet() == null) {
                    assertFalse(e.status() == Snippet.Status.REJECTED, () -> what + " was rejected: "
                            + shell.diagnostics(e.snippet()).map(d -> d.getMessage(null)).toList());
                }
            }
            snippets++;
            rest = info.remaining();
        }
        return snippets;
    }

    /** {@return what the snippets printed so far} */
    String printed() {
        return printed.toString(StandardCharsets.UTF_8);
    }

    @Override
    public void close() {
        shell.close();
        out.close();
    }
}
