package org.hobwright.post.sheet;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.Locale;
import javax.xml.parsers.DocumentBuilderFactory;
import org.hobwright.api.job.Units;
import org.hobwright.api.spi.WriteResult;
import org.hobwright.post.Cautions;
import org.hobwright.post.Fixtures;
import org.hobwright.post.Fixtures.Fixture;
import org.hobwright.post.report.ReportWriter;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.NodeList;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/** The setup sheet: well-formed XHTML with inline SVG, carrying the report's numbers and the cautions. */
class SetupSheetTest {

    static List<Fixture> fixtures() {
        return Fixtures.all();
    }

    static String sheet(Fixture f) {
        WriteResult r = new SetupSheetWriter().write(f.cycle(), f.plainContext());
        assertEquals(f.job().name() + ".setup.html", r.files().get(0).fileName());
        return r.files().get(0).text();
    }

    static Document parse(String xhtml) throws Exception {
        DocumentBuilderFactory dbf = DocumentBuilderFactory.newInstance();
        dbf.setNamespaceAware(true);
        dbf.setFeature("http://apache.org/xml/features/nonvalidating/load-external-dtd", false);
        return dbf.newDocumentBuilder().parse(new ByteArrayInputStream(xhtml.getBytes(StandardCharsets.UTF_8)));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("fixtures")
    void isWellFormedXhtmlWithTheDrawings(Fixture f) throws Exception {
        Document d = parse(sheet(f));
        assertEquals("html", d.getDocumentElement().getLocalName());
        NodeList svgs = d.getElementsByTagNameNS("http://www.w3.org/2000/svg", "svg");
        assertEquals(2, svgs.getLength(), "tooth space and swivel pictures");
        List<String> classes = polylineClasses(d);
        assertTrue(classes.containsAll(List.of("tip", "ref", "base", "root")), classes::toString);
        assertEquals(f.cycle().simulation().isPresent(), classes.contains("simulated"), classes::toString);
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("fixtures")
    void containsTheReportsNumbers(Fixture f) throws Exception {
        String text = parse(sheet(f)).getDocumentElement().getTextContent();
        JsonNode report = JsonMapper.builder().build().readTree(
                new ReportWriter().write(f.cycle(), f.plainContext()).files().get(0).text());
        String lengthFormat = f.job().units() == Units.MM ? "%.3f" : "%.4f";
        for (String p : List.of("/gear/referenceDiameter", "/gear/baseDiameter", "/gear/tipDiameter",
                "/gear/rootDiameter", "/gear/wholeDepth", "/gear/toothThickness", "/inspection/spanWidth",
                "/inspection/pinDiameter", "/inspection/overPins", "/setup/blankDiameter", "/setup/touchOffDiameter",
                "/setup/finalInfeedDiameter", "/cycle/approachLength", "/cycle/overrunLength", "/cycle/axialFeed")) {
            contains(text, p, String.format(Locale.ROOT, lengthFormat, report.at(p).asDouble()));
        }
        contains(text, "/setup/swivelAngle", String.format(Locale.ROOT, "%.4f°", report.at("/setup/swivelAngle").asDouble()));
        contains(text, "/setup/leadAngle", String.format(Locale.ROOT, "%.4f°", report.at("/setup/leadAngle").asDouble()));
        contains(text, "/setup/hobRpm", String.format(Locale.ROOT, "%.1f rpm", report.at("/setup/hobRpm").asDouble()));
        contains(text, "/setup/workRpm", String.format(Locale.ROOT, "%.3f rpm", report.at("/setup/workRpm").asDouble()));
        contains(text, "/cycle/feedMarkDepth", String.format(Locale.ROOT, "%.2f µm", report.at("/cycle/feedMarkDepth").asDouble()));
        contains(text, "/cycle/envelopingDepth",
                String.format(Locale.ROOT, "%.2f µm", report.at("/cycle/envelopingDepth").asDouble()));
        contains(text, "/cycle/cycleTime", String.format(Locale.ROOT, "%.1f s", report.at("/cycle/cycleTime").asDouble()));
        for (String p : List.of("/setup/swivelAngleDms", "/setup/swivelDirection", "/setup/swivelSettingText",
                "/setup/swivelPositiveSense")) {
            contains(text, p, report.at(p).asString());
        }
        contains(text, "/inspection/spanTeeth", "k = " + report.at("/inspection/spanTeeth").asInt());
        contains(text, "sync ratio", report.at("/setup/syncHobTurns").asInt() + " : " + report.at("/setup/syncWorkTurns").asInt());
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("fixtures")
    void carriesCautionsAndOpenWarnings(Fixture f) throws Exception {
        String text = parse(sheet(f)).getDocumentElement().getTextContent();
        Cautions.LINES.forEach(c -> assertTrue(text.contains(c), c));
        f.cycle().findings().forEach(x -> assertTrue(text.contains(x.code()), x.code()));
    }

    @Test
    void printsOnA4AndLetter() {
        String html = sheet(Fixtures.helicalMetric());
        assertTrue(html.contains("@page { margin: 12mm; }"), "page margins for printing, paper size left to the printer");
        assertTrue(html.contains("max-width: 186mm"), "content narrower than A4 (210 mm) and Letter (215.9 mm) less margins");
        assertFalse(html.contains("<script"), "self-contained, no scripts");
        assertFalse(html.contains("href=\"http") || html.contains("src=\"http"), "no external resources");
    }

    @Test
    void targetsAreComparedWithThePrediction() throws Exception {
        // helical fixture: predicted feed-mark depth 2.94570 µm (FORMULAS.md §6.1) against a 3.0 µm target
        String text = parse(sheet(Fixtures.helicalMetric())).getDocumentElement().getTextContent();
        assertTrue(text.contains("Feed-mark depth on the flank2.95 µm3.00 µmwithin"), text);
    }

    /** The drawing's caption gives the simulated departure from the involute, the number the drawing cannot show. */
    @Test
    void theDrawingCaptionGivesTheSimulatedDeparture() throws Exception {
        Fixture f = Fixtures.helicalMetric();
        double um = f.cycle().simulation().orElseThrow().profileDeviationMaxMm() * 1000;
        String text = parse(sheet(f)).getDocumentElement().getTextContent();
        String expected = "depart from the true involute by at most "
                + org.hobwright.text.Decimal.fixed(um, 2) + " µm";
        assertTrue(text.contains(expected), () -> "caption with \"" + expected + "\"");
    }

    private static void contains(String text, String pointer, String value) {
        assertTrue(text.contains(value), () -> pointer + " = \"" + value + "\" is on the sheet");
    }

    private static List<String> polylineClasses(Document d) {
        NodeList lines = d.getElementsByTagNameNS("http://www.w3.org/2000/svg", "polyline");
        List<String> out = new java.util.ArrayList<>();
        for (int i = 0; i < lines.getLength(); i++) {
            out.add(((Element) lines.item(i)).getAttribute("class"));
        }
        return out;
    }
}
