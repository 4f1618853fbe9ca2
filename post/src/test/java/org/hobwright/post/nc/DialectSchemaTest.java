package org.hobwright.post.nc;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.Set;
import java.util.TreeSet;
import java.util.regex.Pattern;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Test;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/**
 * The dialect JSON Schema (samples/scenario/schema/dialect.schema.json) says what the loader
 * accepts: the same templates, the same required ones, the same placeholders per template.
 */
class DialectSchemaTest {

    private static JsonNode schema() throws IOException {
        return JsonMapper.builder().build().readTree(Files.readString(
                Path.of("..", "samples", "scenario", "schema", "dialect.schema.json")));
    }

    @Test
    void isDraft202012AndFixesFormatAndVersion() throws IOException {
        JsonNode s = schema();
        assertEquals("https://json-schema.org/draft/2020-12/schema", s.get("$schema").asString());
        assertEquals(DialectLoader.FORMAT, s.at("/properties/format/const").asString());
        assertEquals(DialectLoader.VERSION, s.at("/properties/version/const").asInt());
    }

    @Test
    void listsTheLoadersTemplatesAndRequiredOnes() throws IOException {
        JsonNode t = schema().at("/properties/templates");
        Set<String> names = new TreeSet<>();
        t.get("properties").propertyNames().forEach(names::add);
        assertEquals(Arrays.stream(TemplateKey.values()).map(TemplateKey::key).collect(Collectors.toCollection(TreeSet::new)),
                names);
        Set<String> required = new TreeSet<>();
        t.get("required").forEach(n -> required.add(n.asString()));
        assertEquals(Arrays.stream(TemplateKey.values()).filter(TemplateKey::required).map(TemplateKey::key)
                .collect(Collectors.toCollection(TreeSet::new)), required);
    }

    @Test
    void templatePatternsAcceptExactlyTheAllowedPlaceholders() throws IOException {
        JsonNode t = schema().at("/properties/templates/properties");
        for (TemplateKey k : TemplateKey.values()) {
            Pattern p = Pattern.compile(t.get(k.key()).at("/oneOf/0/pattern").asString());
            for (Placeholder ph : Placeholder.values()) {
                boolean accepted = p.matcher("G1 {" + ph.key() + "}").find();
                assertEquals(k.allowed().contains(ph), accepted, k.key() + " with {" + ph.key() + "}");
            }
            assertTrue(p.matcher("M8").matches(), k.key() + " accepts literal words");
        }
    }
}
