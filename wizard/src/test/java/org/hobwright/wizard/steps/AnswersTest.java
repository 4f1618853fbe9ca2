package org.hobwright.wizard.steps;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.io.InputStream;
import java.util.ArrayList;
import java.util.List;
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
        // every value of the file (samples/scenario/jobs/metering-pump-gear.json) is in the tree again
        assertEquals(leaves(sample, "").stream().filter(l -> !l.startsWith("$schema")).toList(), leaves(back, ""));
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
