package org.hobwright.post.sheet;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import org.hobwright.post.Fixtures;
import org.hobwright.post.Fixtures.Fixture;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Renders each setup sheet in headless Chromium (a screenshot; the helical one also printed to PDF). Skipped when no
 * Chromium is found ({@link HeadlessChromium}).
 * The PNG files are kept in {@code target/sheet-screenshots} for a person to look at.
 */
class SetupSheetBrowserTest {

    static List<Fixture> fixtures() {
        return Fixtures.all();
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("fixtures")
    void rendersAndPrintsInHeadlessChromium(Fixture f, @TempDir Path tmp) throws Exception {
        Optional<HeadlessChromium> chromium = HeadlessChromium.find();
        Assumptions.assumeTrue(chromium.isPresent(), "Chromium not found; set HOBWRIGHT_CHROMIUM or install it");
        Path html = tmp.resolve(f.id() + ".html");
        Files.writeString(html, SetupSheetTest.sheet(f), StandardCharsets.UTF_8);
        Path shots = Files.createDirectories(Path.of("target", "sheet-screenshots"));
        Path png = shots.resolve(f.id() + ".png").toAbsolutePath();
        Path pdf = tmp.resolve(f.id() + ".pdf");
        chromium.get().run(tmp, "--window-size=900,2000", "--screenshot=" + png, html.toUri().toString());
        assertTrue(Files.size(png) > 10_000, "a screenshot with content");
        if (f.cycle().simulation().isPresent()) {
            // one print is enough to prove the page prints; each Chromium start costs seconds
            chromium.get().printToPdf(html, pdf, tmp);
            assertTrue(Files.size(pdf) > 10_000, "a printed PDF with content");
        }
    }
}
