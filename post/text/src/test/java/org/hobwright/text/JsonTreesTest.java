package org.hobwright.text;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import tools.jackson.core.JacksonException;
import tools.jackson.core.PrettyPrinter;
import tools.jackson.core.util.DefaultIndenter;
import tools.jackson.core.util.DefaultPrettyPrinter;
import tools.jackson.core.util.Separators;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/**
 * The mapper-free reader and writer against Jackson's own object mapper (jackson-databind from
 * Maven Central): the same trees from the same texts, the same texts from the same trees, with
 * each layout the project writes.
 */
class JsonTreesTest {
    private static final JsonMapper MAPPER = JsonMapper.shared();

    private static final String SAMPLE = """
            {"format": "x", "version": 1, "empty": {}, "none": [], "list": [1, -2, 3.25, 1e-7, 123456789012,
             "text with \\"quotes\\", a / slash and \\u00e9", true, false, null, {"a": [[]]}],
             "nested": {"deep": {"deeper": [0.1, 2.5e300, -0.0]}}, "unicode": "Ø 25 µm"}
            """;

    @Test
    void readsTheSameTreeAsTheMapper() {
        assertEquals(MAPPER.readTree(SAMPLE), JsonTrees.parse(SAMPLE));
        assertEquals(MAPPER.readTree("[1, 2]"), JsonTrees.parse("[1, 2]"));
        assertEquals(MAPPER.readTree("\"x\""), JsonTrees.parse("\"x\""));
    }

    @Test
    void writesTheSameTextAsTheMapperInEveryLayout() {
        JsonNode tree = MAPPER.readTree(SAMPLE);
        Map<JsonTrees.Layout, PrettyPrinter> layouts = Map.of(
                JsonTrees.Layout.DEFAULT, new DefaultPrettyPrinter(),
                new JsonTrees.Layout(true, true), new DefaultPrettyPrinter()
                        .withObjectIndenter(new DefaultIndenter("  ", "\n"))
                        .withArrayIndenter(new DefaultIndenter("  ", "\n")),
                new JsonTrees.Layout(false, false), new DefaultPrettyPrinter(Separators.createDefaultInstance()
                        .withObjectNameValueSpacing(Separators.Spacing.AFTER)),
                new JsonTrees.Layout(true, false), new DefaultPrettyPrinter(Separators.createDefaultInstance()
                        .withObjectNameValueSpacing(Separators.Spacing.AFTER))
                        .withArrayIndenter(new DefaultIndenter("  ", "\n")));
        for (Map.Entry<JsonTrees.Layout, PrettyPrinter> e : layouts.entrySet()) {
            for (JsonNode t : List.of(tree, MAPPER.readTree("{}"), MAPPER.readTree("[]"), MAPPER.readTree("[{}, [], 1]"),
                    deep())) {
                assertEquals(MAPPER.writer().with(e.getValue()).writeValueAsString(t), JsonTrees.write(t, e.getKey()),
                        e.getKey() + " of " + t);
            }
        }
        assertEquals(MAPPER.writeValueAsString(tree), JsonTrees.write(tree, null));
        assertEquals(MAPPER.writerWithDefaultPrettyPrinter().writeValueAsString(tree),
                JsonTrees.write(tree, JsonTrees.Layout.DEFAULT));
    }

    /** Nested deeper than the printer's run of spaces, so the indentation is written in pieces. */
    private static JsonNode deep() {
        StringBuilder sb = new StringBuilder();
        for (int i = 0; i < 40; i++) {
            sb.append("{\"k").append(i).append("\": [");
        }
        sb.append("1");
        for (int i = 0; i < 40; i++) {
            sb.append("]}");
        }
        return MAPPER.readTree(sb.toString());
    }

    @Test
    void aLayoutCanBeSharedBetweenWrites() {
        JsonNode tree = JsonTrees.parse(SAMPLE);
        assertEquals(JsonTrees.write(tree, JsonTrees.Layout.DEFAULT), JsonTrees.write(tree, JsonTrees.Layout.DEFAULT));
    }

    @Test
    void tellsTheLineOfEveryKeyAndElement() {
        List<String> seen = new ArrayList<>();
        try (var p = JsonTrees.parser("{\n\"a\": 1,\n\"b\": [\n2,\n{\"c\": 3}]}")) {
            p.nextToken();
            JsonTrees.readObject(p, "", (path, line) -> seen.add(path + "@" + line));
        }
        assertEquals(List.of("a@2", "b@3", "b[0]@4", "b[1]@5", "b[1].c@5"), seen);
    }

    @Test
    void rejectsRepeatedKeysTrailingTextAndMalformedText() {
        JsonTrees.DuplicateKey twice = assertThrows(JsonTrees.DuplicateKey.class,
                () -> JsonTrees.parse("{\"a\": {\"b\": 1,\n \"b\": 2}}"));
        assertEquals("a.b", twice.path());
        assertEquals(2, twice.line());
        assertThrows(JacksonException.class, () -> JsonTrees.parse("{} {}"));
        JacksonException bad = assertThrows(JacksonException.class, () -> JsonTrees.parse("{\n\"a\": 1,,}"));
        assertEquals(2, bad.getLocation().getLineNr());
        assertTrue(JsonTrees.parse("  ").isMissingNode());
    }

    /** A parser's message is one plain line without the source notes that name no line. */
    @Test
    void messagesAreOnePlainLine() {
        JacksonException open = assertThrows(JacksonException.class, () -> JsonTrees.parse("{\n\"a\": [ }"));
        assertEquals("Unexpected close marker '}': expected ']'", JsonTrees.message(open));
        assertEquals(2, JsonTrees.line(open));
        JacksonException end = assertThrows(JacksonException.class, () -> JsonTrees.parse("{\"a\": 1"));
        assertEquals("Unexpected end-of-input: expected close marker for Object", JsonTrees.message(end));
    }
}
