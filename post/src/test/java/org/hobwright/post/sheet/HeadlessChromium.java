package org.hobwright.post.sheet;

import java.io.File;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.TimeUnit;

/**
 * Headless Chromium for the tests that look at a setup sheet as a browser shows and prints it: found on the
 * PATH (or named by the environment variable {@code HOBWRIGHT_CHROMIUM}); started with a new profile folder
 * and without any network or update activity. Tests are skipped where it is absent.
 */
public final class HeadlessChromium {
    private final Path executable;

    private HeadlessChromium(Path executable) {
        this.executable = executable;
    }

    /** The Chromium of this machine, if any. */
    public static Optional<HeadlessChromium> find() {
        String named = System.getenv("HOBWRIGHT_CHROMIUM");
        if (named != null && !named.isBlank()) {
            return Optional.of(new HeadlessChromium(Path.of(named)));
        }
        for (String dir : System.getenv().getOrDefault("PATH", "").split(File.pathSeparator)) {
            for (String name : List.of("chromium", "chromium-browser", "google-chrome")) {
                Path p = Path.of(dir, name);
                if (Files.isExecutable(p)) {
                    return Optional.of(new HeadlessChromium(p));
                }
            }
        }
        return Optional.empty();
    }

    /**
     * Prints a page to PDF without the browser's header and footer.
     *
     * @param page a local HTML file
     * @param pdf  the PDF to write
     * @param work a fresh folder for the profile and the log
     */
    public void printToPdf(Path page, Path pdf, Path work) throws IOException, InterruptedException {
        run(work, "--no-pdf-header-footer", "--print-to-pdf=" + pdf.toAbsolutePath(), page.toUri().toString());
    }

    /** Runs Chromium headless with the given arguments; fails with its log when it does not end cleanly. */
    public void run(Path work, String... args) throws IOException, InterruptedException {
        Path profile = Files.createTempDirectory(work, "profile");
        List<String> cmd = new ArrayList<>(List.of(executable.toString(), "--headless", "--no-sandbox",
                "--disable-gpu", "--no-first-run", "--disable-background-networking", "--disable-component-update",
                "--disable-sync", "--user-data-dir=" + profile));
        cmd.addAll(List.of(args));
        Path log = work.resolve("chromium.log");
        Process p = new ProcessBuilder(cmd).directory(work.toFile()).redirectErrorStream(true)
                .redirectOutput(log.toFile()).start();
        if (!p.waitFor(120, TimeUnit.SECONDS)) {
            p.destroyForcibly();
            throw new AssertionError("Chromium did not finish within 120 s; log: " + read(log));
        }
        if (p.exitValue() != 0) {
            throw new AssertionError("Chromium exit code " + p.exitValue() + "; log: " + read(log));
        }
    }

    private static String read(Path p) {
        try {
            return Files.readString(p);
        } catch (IOException e) {
            return e.toString();
        }
    }
}
