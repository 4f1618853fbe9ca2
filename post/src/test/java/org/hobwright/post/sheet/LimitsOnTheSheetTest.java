package org.hobwright.post.sheet;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Optional;
import org.hobwright.api.cycle.GearPairData;
import org.hobwright.api.cycle.HobCycle;
import org.hobwright.api.cycle.InspectionData;
import org.hobwright.api.cycle.InspectionLimits;
import org.hobwright.post.Fixtures;
import org.hobwright.post.Fixtures.Fixture;
import org.hobwright.post.report.ReportWriter;
import org.junit.jupiter.api.Test;
import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.NodeList;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/**
 * The inspection limits, the mating gear and the first-article record as the report and the setup sheet
 * show them. The numbers are the writers' input (their computation is tested in the wizard against published
 * relations and brute force); here: every one reaches the report in job units and the sheet, and the record
 * has a blank field for each measured value and lines for the date and the signatures.
 */
class LimitsOnTheSheetTest {

    /** A fixture's cycle with limits and a mate (values in mm, as a planner gives them). */
    private static HobCycle withLimits(Fixture f) {
        HobCycle c = f.cycle();
        InspectionData i = c.inspection().orElseThrow();
        InspectionLimits l = new InspectionLimits(-0.04, -0.1, "drawing", i.spanWidthMm(), i.spanWidthMm() - 0.0563816,
                i.overPinsMm(), i.overPinsMm() - 0.1612, 3.1016, 3.0418, 34.89, 34.725);
        InspectionData limited = new InspectionData(i.spanTeeth(), i.spanWidthMm(), i.spanContactDiameterMm(),
                i.pinDiameterMm(), i.overPinsMm(), i.balls(), i.chordalThicknessMm(), i.chordalHeightMm(),
                Optional.of(l));
        GearPairData pair = new GearPairData(31, 0, true, 51, 51, false, 20, 0, 0.0846, 0.2067, 66, 56.4, 0.5, 0.5);
        return new HobCycle(c.gear(), Optional.of(limited), c.tolerances(), c.setup(), c.steps(), c.summary(),
                c.simulation(), c.findings(), c.plannedFor(), Optional.of(pair));
    }

    private static JsonNode report(Fixture f) {
        return JsonMapper.builder().build().readTree(new ReportWriter().write(withLimits(f), f.plainContext())
                .files().get(0).text());
    }

    private static String sheet(Fixture f) {
        return new SetupSheetWriter().write(withLimits(f), f.plainContext()).files().get(0).text();
    }

    @Test
    void theReportHasTheLimitsAndThePairInJobUnits() {
        JsonNode mm = report(Fixtures.spurMetric());
        InspectionData i = Fixtures.spurMetric().cycle().inspection().orElseThrow();
        assertEquals(i.spanWidthMm(), mm.at("/inspection/spanWidthUpper").asDouble(), 1e-9);
        assertEquals(i.spanWidthMm() - 0.0563816, mm.at("/inspection/spanWidthLower").asDouble(), 1e-9);
        assertEquals(i.overPinsMm(), mm.at("/inspection/overPinsUpper").asDouble(), 1e-9);
        assertEquals(i.overPinsMm() - 0.1612, mm.at("/inspection/overPinsLower").asDouble(), 1e-9);
        assertEquals(3.0418, mm.at("/inspection/chordalThicknessLower").asDouble(), 1e-9);
        assertEquals(-0.1, mm.at("/inspection/thicknessAllowanceLower").asDouble(), 1e-9);
        assertEquals("drawing", mm.at("/inspection/limitsFrom").asString());
        assertEquals(51, mm.at("/pair/centreDistance").asDouble(), 1e-9);
        assertEquals(20, mm.at("/pair/workingPressureAngle").asDouble(), 1e-9);
        assertEquals(0.2067, mm.at("/pair/backlashMax").asDouble(), 1e-9);
        // an inch job reports lengths in inches: 1 in = 25.4 mm exactly
        JsonNode in = report(Fixtures.spurInch());
        InspectionData j = Fixtures.spurInch().cycle().inspection().orElseThrow();
        assertEquals((j.overPinsMm() - 0.1612) / 25.4, in.at("/inspection/overPinsLower").asDouble(), 1e-9);
        assertEquals(51 / 25.4, in.at("/pair/centreDistance").asDouble(), 1e-9);
        assertEquals(20, in.at("/pair/workingPressureAngle").asDouble(), 1e-9, "angles stay degrees");
    }

    @Test
    void withoutLimitsTheReportHasNone() {
        JsonNode plain = JsonMapper.builder().build().readTree(new ReportWriter().write(Fixtures.spurMetric().cycle(),
                Fixtures.spurMetric().plainContext()).files().get(0).text());
        assertTrue(plain.at("/inspection/spanWidthLower").isMissingNode());
        assertTrue(plain.at("/pair").isMissingNode());
    }

    @Test
    void theSheetShowsTheLimitsAndTheMate() throws Exception {
        Fixture f = Fixtures.spurMetric();
        String text = SetupSheetTest.parse(sheet(f)).getDocumentElement().getTextContent();
        InspectionData i = f.cycle().inspection().orElseThrow();
        String lower = org.hobwright.text.Decimal.fixed(i.spanWidthMm() - 0.0563816, 3);
        String upper = org.hobwright.text.Decimal.fixed(i.spanWidthMm(), 3);
        assertTrue(text.contains(lower + " … " + upper + " mm"), "span range " + lower + " … " + upper);
        assertTrue(text.contains("Mating gear"), "mate section");
        assertTrue(text.contains("51.000 mm (without backlash)"), "centre distance and where it comes from");
    }

    @Test
    void theFirstArticleRecordHasBlankFieldsAndSignOffLines() throws Exception {
        Document d = SetupSheetTest.parse(sheet(Fixtures.spurMetric()));
        Element record = null;
        NodeList tables = d.getElementsByTagName("table");
        for (int t = 0; t < tables.getLength(); t++) {
            if ("record".equals(((Element) tables.item(t)).getAttribute("class"))) {
                record = (Element) tables.item(t);
            }
        }
        assertTrue(record != null, "a first-article table");
        String text = record.getTextContent();
        for (String what : new String[] {"Span over", "Over two pins", "Tip ⌀", "Root ⌀", "Measured"}) {
            assertTrue(text.contains(what), what);
        }
        NodeList rows = ((Element) record.getElementsByTagName("tbody").item(0)).getElementsByTagName("tr");
        int blanks = 0;
        for (int r = 0; r < rows.getLength(); r++) {
            NodeList cells = ((Element) rows.item(r)).getElementsByTagName("td");
            for (int c = 0; c < cells.getLength(); c++) {
                Element cell = (Element) cells.item(c);
                if ("blank".equals(cell.getAttribute("class"))) {
                    assertEquals("", cell.getTextContent(), "a field to write in is empty");
                    blanks++;
                }
            }
        }
        assertEquals(2 * rows.getLength(), blanks, "measured value and verdict for every row");
        String all = d.getDocumentElement().getTextContent();
        assertTrue(all.contains("Date") && all.contains("Signature") && all.contains("Measured by"), "sign-off");
        assertFalse(text.contains("NaN"));
    }
}
