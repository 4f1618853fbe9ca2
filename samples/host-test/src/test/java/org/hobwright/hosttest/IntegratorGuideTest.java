package org.hobwright.hosttest;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.hobwright.api.spi.Spi;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The Java blocks of the integrator's guide ({@code samples/README.md}) run as they stand, in a JVM
 * whose class path holds the api alone, as a host's does: each block puts the plugin jar on a class
 * loader of its own. The blocks may use {@code pluginJar}, {@code libraryFolder}, {@code jobFile} and
 * {@code outputFolder}, which a host has in some form; this test defines them.
 */
class IntegratorGuideTest {
    private static final String GUIDE = "## Integrator's guide";
    private static final String IMPORTS = """
            import java.net.URL;
            import java.net.URLClassLoader;
            import java.nio.file.Path;
            import java.time.LocalDate;
            import java.time.ZoneOffset;
            import java.util.List;
            import org.hobwright.api.Hobwright;
            import org.hobwright.api.check.Finding;
            import org.hobwright.api.host.Outcome;
            import org.hobwright.api.host.PlannedJob;
            import org.hobwright.api.host.Written;
            import org.hobwright.api.job.HobJob;
            import org.hobwright.api.spi.CyclePlanner;
            import org.hobwright.api.spi.CycleWriter;
            import org.hobwright.api.spi.Providers;
            import org.hobwright.api.wizard.StepView;
            import org.hobwright.api.wizard.Wizard;
            import org.hobwright.api.wizard.WizardFactory;
            """;

    @TempDir
    Path work;

    /** The Java blocks of the guide's section, in order. */
    static List<String> javaBlocks() throws IOException {
        String readme = Files.readString(Host.samples().resolveSibling("README.md"));
        int start = readme.indexOf(GUIDE);
        assertTrue(start >= 0, "samples/README.md has the integrator's guide");
        int end = readme.indexOf("\n## ", start + GUIDE.length());
        String guide = readme.substring(start, end < 0 ? readme.length() : end);
        List<String> blocks = new ArrayList<>();
        for (int at = guide.indexOf("```java\n"); at >= 0; at = guide.indexOf("```java\n", at)) {
            int close = guide.indexOf("\n```", at + 8);
            blocks.add(guide.substring(at + 8, close + 1));
            at = close + 4;
        }
        return blocks;
    }

    @Test
    void everyJavaBlockRuns() throws IOException {
        List<String> blocks = javaBlocks();
        assertTrue(blocks.size() >= 3, "open-plan-write, the version check and the wizard: " + blocks.size());
        Path out = work.resolve("out");
        String variables = "Path pluginJar = Path.of(" + literal(Host.pluginJar()) + ");\n"
                + "Path libraryFolder = Path.of(" + literal(Host.shopLibrary(work.resolve("home"))) + ");\n"
                + "Path jobFile = Path.of(" + literal(Host.samples().resolve("jobs/metering-pump-gear.json")) + ");\n"
                + "Path outputFolder = Path.of(" + literal(out) + ");\n";
        try (JShellRun shell = new JShellRun(System.getProperty("hobwright.apiJar"))) {
            shell.run("imports", IMPORTS);
            shell.run("the variables", variables);
            for (int i = 0; i < blocks.size(); i++) {
                shell.run("block " + (i + 1) + " of the guide", blocks.get(i));
            }
            String printed = shell.printed();
            assertTrue(Files.isRegularFile(out.resolve("metering-pump-gear.nc")), printed);
            assertTrue(printed.contains("built against api " + Spi.API_VERSION), printed);
            assertEquals(-1, printed.indexOf("Exception"), printed);
        }
    }

    @Test
    void theGuidesCommandsNameThisBuildsJars() throws IOException {
        String readme = Files.readString(Host.samples().resolveSibling("README.md"));
        String api = "api/target/hobwright-api-" + Host.version() + ".jar";
        assertTrue(readme.contains("jshell --class-path " + api + ":wizard/target/hobwright-plugin.jar"
                + " samples/scripts/"), "the JShell command");
        assertTrue(readme.contains("java -cp " + api + ":samples/target/hobwright-samples-" + Host.version()
                + ".jar"), "the example host's command");
    }

    private static String literal(Path p) {
        return "\"" + p.toAbsolutePath().toString().replace("\\", "\\\\").replace("\"", "\\\"") + "\"";
    }
}
