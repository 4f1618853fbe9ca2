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
import org.hobwright.text.JsonTrees;
import org.junit.jupiter.api.Test;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;
import tools.jackson.databind.node.ArrayNode;
import tools.jackson.databind.node.JsonNodeFactory;
import tools.jackson.databind.node.ObjectNode;

/**
 * The dialect JSON Schema (samples/scenario/schema/dialect.schema.json) says what the loader
 * accepts: it is the schema built here from the one definition of the dialect's keys
 * ({@link DialectKeys}, {@link TemplateKey}, {@link Placeholder}), key by key, with the same kinds,
 * ranges, choices, required keys and the placeholders of each template. To rewrite the file after a
 * change of the definition: {@code HOBWRIGHT_WRITE_SCHEMA=1 mvn -pl post verify -Dtest=DialectSchemaTest}.
 */
class DialectSchemaTest {
    private static final Path FILE = Path.of("..", "samples", "scenario", "schema", "dialect.schema.json");
    private static final JsonNodeFactory NODES = JsonNodeFactory.instance;

    /** The schema the definition gives. */
    static ObjectNode fromDefinition() {
        ObjectNode root = NODES.objectNode();
        root.put("$schema", "https://json-schema.org/draft/2020-12/schema");
        root.put("$id", "https://hobwright.invalid/schema/dialect.schema.json");
        root.put("title", "Hobwright NC dialect, version " + DialectKeys.VERSION);
        root.put("description", "Line templates and conventions that turn a planned hobbing cycle into an NC"
                + " program for one control. Documented in post/README.md; built from the dialect's key definition"
                + " (DialectKeys).");
        root.setAll(object(""));
        return root;
    }

    private static ObjectNode object(String path) {
        ObjectNode o = NODES.objectNode();
        o.put("type", "object");
        o.put("additionalProperties", false);
        ArrayNode required = o.putArray("required");
        ObjectNode props = o.putObject("properties");
        for (DialectKeys.Key k : DialectKeys.children(path)) {
            if (k.required()) {
                required.add(k.name());
            }
            props.set(k.name(), value(k));
        }
        return o;
    }

    private static ObjectNode value(DialectKeys.Key k) {
        ObjectNode v = switch (k.kind()) {
            case OBJECT -> object(k.path());
            case TEXT -> {
                ObjectNode t = NODES.objectNode();
                if (k.choices().size() == 1) {
                    t.put("const", k.choices().get(0));
                } else if (!k.choices().isEmpty()) {
                    ArrayNode e = t.putArray("enum");
                    k.choices().forEach(e::add);
                } else {
                    t.put("type", "string");
                    t.put("minLength", 1);
                }
                yield t;
            }
            case ANY_TEXT -> NODES.objectNode().put("type", "string");
            case LETTERS -> NODES.objectNode().put("type", "string").put("pattern", "^[A-Za-z]{1,3}$");
            case INTEGER -> {
                ObjectNode t = NODES.objectNode();
                if (k.min() == k.max()) {
                    t.put("const", k.min());
                } else if (!k.choices().isEmpty()) {
                    ArrayNode e = t.putArray("enum");
                    k.choices().forEach(c -> e.add(Long.parseLong(c)));
                } else {
                    t.put("type", "integer").put("minimum", k.min()).put("maximum", k.max());
                }
                yield t;
            }
            case BOOLEAN -> NODES.objectNode().put("type", "boolean");
            case LINES -> lines(NODES.objectNode().put("type", "string"));
            case TEMPLATES -> templates();
        };
        v.put("description", k.meaning());
        return v;
    }

    private static ObjectNode lines(ObjectNode line) {
        ObjectNode v = NODES.objectNode();
        ArrayNode one = v.putArray("oneOf");
        one.add(line.deepCopy());
        ObjectNode list = one.addObject();
        list.put("type", "array");
        list.set("items", line);
        return v;
    }

    private static ObjectNode templates() {
        ObjectNode o = NODES.objectNode();
        o.put("type", "object");
        o.put("additionalProperties", false);
        ArrayNode required = o.putArray("required");
        ObjectNode props = o.putObject("properties");
        for (TemplateKey k : TemplateKey.values()) {
            if (k.required()) {
                required.add(k.key());
            }
            String names = k.allowed().stream().map(Placeholder::key).sorted().collect(Collectors.joining("|"));
            String pattern = names.isEmpty() ? "^[^{}]*$" : "^[^{}]*(\\{(" + names + ")\\}[^{}]*)*$";
            props.set(k.key(), lines(NODES.objectNode().put("type", "string").put("minLength", 1)
                    .put("pattern", pattern)));
        }
        return o;
    }

    @Test
    void theFileIsTheSchemaOfTheDefinition() throws IOException {
        String text = JsonTrees.write(fromDefinition(), new JsonTrees.Layout(true, false)) + "\n";
        if (System.getenv("HOBWRIGHT_WRITE_SCHEMA") != null) {
            Files.writeString(FILE, text);
        }
        JsonMapper json = JsonMapper.builder().build();
        assertTrue(json.readTree(text).equals(json.readTree(Files.readString(FILE))),
                "dialect.schema.json differs from the key definition; rewrite it with HOBWRIGHT_WRITE_SCHEMA=1");
    }

    private static JsonNode schema() throws IOException {
        return JsonMapper.builder().build().readTree(Files.readString(FILE));
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
