package org.hobwright.wizard.steps;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStream;
import java.util.ArrayList;
import java.util.List;
import org.hobwright.api.job.FieldDefault;
import org.junit.jupiter.api.Test;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;
import tools.jackson.databind.node.ObjectNode;

class AnswersTest {
    @Test
    void theSampleJobComesBackUnchangedFromItsAnswers() throws IOException {
        JsonNode sample;
        try (InputStream in = getClass().getClassLoader().getResourceAsStream(StepWizardFactory.SAMPLE)) {
            sample = JsonMapper.shared().readTree(in);
        }
        ObjectNode back = Answers.fromTree(sample).toTree();
        // every value of the file (samples/scenario/jobs/metering-pump-gear.json) is in the tree again; the keys
        // it leaves out come back with the field table's defaults, the values the job reader takes for them
        List<String> expected = new ArrayList<>(leaves(sample, "").stream().filter(l -> !l.startsWith("$schema"))
                .toList());
        expected.addAll(List.of("cycle.axialClearance=1", "cycle.fastest=false", "cycle.finishStock=0",
                "cycle.hobShift.everyParts=1", "cycle.hobShift.perPart=0", "cycle.radialClearance=1", "gear.hand=right",
                "cycle.batchSize=1", "cycle.hobTurnedRound=false", "part=gear"));
        expected.sort(null);
        assertEquals(expected, leaves(back, ""));
    }

    /** The keys a job file leaves out are answered with the table's defaults, in the job's units. */
    @Test
    void keysLeftOutTakeTheTableDefaultsInTheJobsUnits() {
        JsonNode inch = JsonMapper.shared().readTree("{\"units\": \"in\", \"gear\": {\"teeth\": 20}}");
        Answers a = Answers.fromTree(inch);
        assertEquals("20", a.get("gear.teeth"));
        assertEquals("0", a.get("gear.helixAngle"));
        assertEquals("0", a.get("gear.profileShift"));
        assertEquals("0.04", a.get("cycle.axialClearance"), "the inch default of the clearances");
        assertEquals("", a.get("gear.faceWidth"), "no default for what the drawing must give");
    }

    /** A blank start fills only the fields whose default comes from a standard or the trade's convention. */
    @Test
    void aBlankStartHoldsOnlyDefaultsWithASource() {
        Answers a = Answers.blank();
        assertEquals("", a.get("name"));
        assertEquals("", a.get("gear.partName"));
        assertEquals("", a.get("gear.teeth"));
        assertEquals("", a.get("machine"));
        assertEquals("", a.get("cycle.workMaterial"));
        assertEquals("mm", a.get("units"));
        assertEquals("20", a.get("gear.pressureAngle"), "ISO 53:1998 standard basic rack");
        assertEquals("20", a.get("hob.pressureAngle"));
        assertEquals("1", a.get("hob.starts"));
        assertEquals("climb", a.get("cycle.method"));
        for (var f : StepFields.all()) {
            if (!a.get(f.key()).isEmpty()) {
                assertTrue(f.dflt().origin() == FieldDefault.Origin.STANDARD
                        || f.dflt().origin() == FieldDefault.Origin.CONVENTION, f.key() + " " + f.dflt());
                assertFalse(f.dflt().source().isBlank(), f.key());
            }
        }
    }

    /** "path=value" of every leaf, numbers compared by value. */
    private static List<String> leaves(JsonNode node, String path) {
        List<String> out = new ArrayList<>();
        if (node.isObject()) {
            node.properties().forEach(e -> out.addAll(leaves(e.getValue(), path.isEmpty() ? e.getKey()
                    : path + "." + e.getKey())));
        } else {
            out.add(path + "=" + (node.isNumber() ? node.decimalValue().stripTrailingZeros().toPlainString()
                    : node.asString()));
        }
        out.sort(null);
        return out;
    }

    @Test
    void anAngleInDegreesMinutesSecondsIsKeptAsText() {
        Answers a = new Answers();
        a.put("hob.leadAngle", "1°54'");
        a.put("gear.helixAngle", "15");
        ObjectNode tree = a.toTree();
        assertEquals("1°54'", tree.path("hob").path("leadAngle").stringValue());
        assertEquals(15, tree.path("gear").path("helixAngle").intValue());
    }
}
