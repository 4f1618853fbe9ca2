package org.hobwright.samples.e2e;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.apache.pdfbox.text.TextPosition;
import org.hobwright.post.sheet.HeadlessChromium;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * The demo's setup sheet as a setter prints it: headless Chromium prints it on A4 and on Letter (the page size
 * is what the printer dialog would choose; the sheet itself leaves it open), and PDFBox reads the result. At most
 * two pages, and no page but the last is left partly empty (its lowest line of text is in the bottom quarter of
 * the printable area), so no section refuses to break and leaves a gap. Skipped without Chromium.
 */
class SetupSheetPrintTest {
    /** The sheet's page margin, 12 mm, in PDF points. */
    private static final double MARGIN_PT = 12 / 25.4 * 72;

    @ParameterizedTest(name = "{0}")
    @ValueSource(strings = {"A4", "letter"})
    void demoSheetPrintsOnTwoWellFilledPages(String paper, @TempDir Path tmp) throws Exception {
        Optional<HeadlessChromium> chromium = HeadlessChromium.find();
        Assumptions.assumeTrue(chromium.isPresent(), "Chromium not found; set HOBWRIGHT_CHROMIUM or install it");
        PlanRun run = PlanRun.of("metering-pump-gear.json", tmp);
        String html = Files.readString(run.file(".setup.html"), StandardCharsets.UTF_8);
        Path page = tmp.resolve("sheet-" + paper + ".html");
        Files.writeString(page, html.replace("</style>", "@page { size: " + paper + "; }</style>"),
                StandardCharsets.UTF_8);
        Path pdf = tmp.resolve("sheet-" + paper + ".pdf");
        chromium.get().printToPdf(page, pdf, tmp);
        List<Double> fill = fill(pdf);
        assertTrue(fill.size() <= 2, paper + ": " + fill.size() + " pages");
        for (int i = 0; i < fill.size() - 1; i++) {
            assertTrue(fill.get(i) > 0.75, paper + ": page " + (i + 1) + " filled only to " + fill.get(i));
        }
    }

    /** For each page, how far down its printable area its lowest text reaches (0 top, 1 bottom). */
    private static List<Double> fill(Path pdf) throws IOException {
        try (PDDocument doc = Loader.loadPDF(pdf.toFile())) {
            List<Double> out = new ArrayList<>();
            for (int p = 1; p <= doc.getNumberOfPages(); p++) {
                double height = doc.getPage(p - 1).getMediaBox().getHeight();
                double[] lowest = {0};
                PDFTextStripper stripper = new PDFTextStripper() {
                    @Override
                    protected void writeString(String text, List<TextPosition> positions) throws IOException {
                        for (TextPosition t : positions) {
                            lowest[0] = Math.max(lowest[0], t.getYDirAdj());
                        }
                        super.writeString(text, positions);
                    }
                };
                stripper.setStartPage(p);
                stripper.setEndPage(p);
                stripper.getText(doc);
                out.add((lowest[0] - MARGIN_PT) / (height - 2 * MARGIN_PT));
            }
            return out;
        }
    }
}
