package org.hobwright.post.sheet;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.File;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.TimeUnit;
import org.hobwright.post.Fixtures;
import org.hobwright.post.Fixtures.Fixture;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Renders each setup sheet in headless Chromium (a screenshot; the helical one also printed to PDF). Skipped when no
 * Chromium is found on the PATH (or named by the environment variable {@code HOBWRIGHT_CHROMIUM}).
 * The PNG files are kept in {@code target/sheet-screenshots} for a person to look at.
 */
class SetupSheetBrowserTest {

    static List<Fixture> fixtures() {
        return Fixtures.all();
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("fixtures")
    void rendersAndPrintsInHeadlessChromium(Fixture f, @TempDir Path tmp) throws Exception {
        Optional<Path> chromium = chromium();
        Assumptions.assumeTrue(chromium.isPresent(), "Chromium not found; set HOBWRIGHT_CHROMIUM or install it");
        Path html = tmp.resolve(f.id() + ".html");
        Files.writeString(html, SetupSheetTest.sheet(f), StandardCharsets.UTF_8);
        Path shots = Files.createDirectories(Path.of("target", "sheet-screenshots"));
        Path png = shots.resolve(f.id() + ".png").toAbsolutePath();
        Path pdf = tmp.resolve(f.id() + ".pdf");
        run(tmp, chromium.get().toString(), "--window-size=900,2000", "--screenshot=" + png, html.toUri().toString());
        assertTrue(Files.size(png) > 10_000, "a screenshot with content");
        if (f.cycle().simulation().isPresent()) {
            // one print is enough to prove the page prints; each Chromium start costs seconds
            run(tmp, chromium.get().toString(), "--no-pdf-header-footer", "--print-to-pdf=" + pdf,
                    html.toUri().toString());
            assertTrue(Files.size(pdf) > 10_000, "a printed PDF with content");
        }
    }

    private static void run(Path dir, String... args) throws Exception {
        List<String> cmd = new ArrayList<>(List.of(args[0], "--headless", "--no-sandbox", "--disable-gpu",
                "--disable-background-networking", "--user-data-dir=" + dir.resolve("profile")));
        cmd.addAll(List.of(args).subList(1, args.length));
        Process p = new ProcessBuilder(cmd).directory(dir.toFile()).redirectErrorStream(true)
                .redirectOutput(dir.resolve("chromium.log").toFile()).start();
        assertTrue(p.waitFor(120, TimeUnit.SECONDS), "Chromium finished");
        assertEquals(0, p.exitValue(), () -> "Chromium exit code; log: " + read(dir.resolve("chromium.log")));
    }

    private static String read(Path p) {
        try {
            return Files.readString(p);
        } catch (Exception e) {
            return e.toString();
        }
    }

    private static Optional<Path> chromium() {
        String named = System.getenv("HOBWRIGHT_CHROMIUM");
        if (named != null && !named.isBlank()) {
            return Optional.of(Path.of(named));
        }
        for (String dir : System.getenv().getOrDefault("PATH", "").split(File.pathSeparator)) {
            for (String name : List.of("chromium", "chromium-browser", "google-chrome")) {
                Path p = Path.of(dir, name);
                if (Files.isExecutable(p)) {
                    return Optional.of(p);
                }
            }
        }
        return Optional.empty();
    }
}
