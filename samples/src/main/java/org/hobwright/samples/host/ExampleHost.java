package org.hobwright.samples.host;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;

/**
 * Command-line entry of the example host:
 * {@code java -cp hobwright.jar:hobwright-samples.jar org.hobwright.samples.host.ExampleHost ANSWERS.properties OUT_DIR}.
 * Exit codes as Hobwright's own tool: 0 done, 1 the job has errors, 2 usage or unreadable input.
 */
public final class ExampleHost {
    private ExampleHost() {
    }

    /**
     * Runs the host.
     *
     * @param args the answers file and the output folder
     */
    public static void main(String[] args) {
        PrintWriter out = new PrintWriter(System.out, true, StandardCharsets.UTF_8);
        System.exit(run(args, out, Thread.currentThread().getContextClassLoader()));
    }

    /**
     * Runs the host and returns its exit code.
     *
     * @param args   the answers file and the output folder
     * @param out    where to show the steps
     * @param loader the class loader that sees the Hobwright jars
     */
    public static int run(String[] args, PrintWriter out, ClassLoader loader) {
        if (args.length != 2) {
            out.println("usage: ExampleHost ANSWERS.properties OUT_DIR");
            return 2;
        }
        AnswerSheet sheet;
        try {
            sheet = AnswerSheet.read(Path.of(args[0]));
        } catch (IOException | IllegalArgumentException e) {
            out.println("cannot read the answers file " + args[0] + ": " + e.getMessage());
            return 2;
        }
        HobwrightPlugin plugin;
        try {
            plugin = HobwrightPlugin.load(loader);
        } catch (IllegalStateException e) {
            out.println(e.getMessage());
            return 2;
        }
        plugin.problems().forEach(p -> out.println("   ! " + p.line()));
        try {
            HostSession.Result r = new HostSession(plugin, out).run(sheet, Path.of(args[1]));
            return r.status() == HostSession.Status.DONE ? 0 : 1;
        } catch (IOException e) {
            out.println("cannot write into " + args[1] + ": " + e.getMessage());
            return 2;
        }
    }
}
