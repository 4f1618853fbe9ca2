package org.hobwright.samples.host;

import java.io.IOException;
import java.io.PrintWriter;
import java.net.URL;
import java.net.URLClassLoader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.hobwright.api.Hobwright;
import org.hobwright.api.spi.ProviderMissingException;

/**
 * Command-line entry of the example host:
 * {@code java -cp hobwright-api.jar:hobwright-samples.jar org.hobwright.samples.host.ExampleHost ANSWERS.properties OUT_DIR [PLUGIN_JAR]}.
 * The plugin jar (default {@value #DEFAULT_PLUGIN}) goes on a class loader of the host's own, whose
 * parent gives it the api; the host closes the façade and then the loader, so the jar can be
 * replaced while the host runs on. Exit codes as Hobwright's own tool: 0 done, 1 the job has
 * errors, 2 usage or unreadable input.
 */
public final class ExampleHost {
    /** Where the plugin jar is when the host runs from the top folder of a Hobwright checkout. */
    public static final String DEFAULT_PLUGIN = "wizard/target/hobwright-plugin.jar";

    private ExampleHost() {
    }

    /**
     * Runs the host.
     *
     * @param args the answers file, the output folder and optionally the plugin jar
     */
    public static void main(String[] args) {
        PrintWriter out = new PrintWriter(System.out, true, StandardCharsets.UTF_8);
        System.exit(run(args, out));
    }

    /**
     * Runs the host and returns its exit code.
     *
     * @param args the answers file, the output folder and optionally the plugin jar
     * @param out  where to show the steps
     * @return 0 done, 1 the job has errors, 2 usage or unreadable input
     */
    public static int run(String[] args, PrintWriter out) {
        if (args.length != 2 && args.length != 3) {
            out.println("usage: ExampleHost ANSWERS.properties OUT_DIR [PLUGIN_JAR]");
            return 2;
        }
        AnswerSheet sheet;
        try {
            sheet = AnswerSheet.read(Path.of(args[0]));
        } catch (IOException | IllegalArgumentException e) {
            out.println("cannot read the answers file " + args[0] + ": " + e.getMessage());
            return 2;
        }
        Path jar = Path.of(args.length == 3 ? args[2] : DEFAULT_PLUGIN);
        if (!Files.isRegularFile(jar)) {
            out.println("cannot find the plugin jar " + jar + " (build it with: mvn -B -q -DskipTests package)");
            return 2;
        }
        Path home = sheet.setting("home").map(Path::of)
                .orElse(Path.of(System.getProperty("user.home"), ".hobwright"));
        try (URLClassLoader plugins = new URLClassLoader("hobwright", new URL[] {jar.toUri().toURL()},
                ExampleHost.class.getClassLoader());
             Hobwright hw = Hobwright.open(plugins, home)) {
            hw.problems().forEach(p -> out.println("   ! " + p.line()));
            HostSession.Result r = new HostSession(hw, out).run(sheet, Path.of(args[1]));
            return r.status() == HostSession.Status.DONE ? 0 : 1;
        } catch (ProviderMissingException e) {
            out.println(e.getMessage());
            return 2;
        } catch (IOException e) {
            out.println("cannot use " + args[1] + " or " + jar + ": " + e.getMessage());
            return 2;
        }
    }
}
