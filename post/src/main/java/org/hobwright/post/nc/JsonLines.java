package org.hobwright.post.nc;

import java.util.HashMap;
import java.util.Map;
import org.hobwright.text.JsonTrees;
import tools.jackson.core.JacksonException;
import tools.jackson.core.JsonParser;
import tools.jackson.core.JsonToken;

/**
 * The line of every value in a JSON text, by JSON Pointer ({@code /templates/feed/0}), so that
 * a finding about a value can name its line. Field names map to the line of their value.
 */
final class JsonLines {
    private final Map<String, Integer> lines;

    private JsonLines(Map<String, Integer> lines) {
        this.lines = Map.copyOf(lines);
    }

    /**
     * Indexes a JSON text. A text that does not parse gives the lines up to the problem; the
     * binding step reports the problem itself.
     */
    static JsonLines of(String json) {
        Map<String, Integer> lines = new HashMap<>();
        try (JsonParser p = JsonTrees.parser(json)) {
            JsonToken t;
            while ((t = p.nextToken()) != null) {
                if (t == JsonToken.PROPERTY_NAME) {
                    continue;
                }
                String pointer = p.streamReadContext().pathAsPointer().toString();
                if (t == JsonToken.START_OBJECT || t == JsonToken.START_ARRAY) {
                    pointer = p.streamReadContext().getParent() == null ? ""
                            : p.streamReadContext().getParent().pathAsPointer().toString();
                }
                lines.putIfAbsent(pointer, p.currentTokenLocation().getLineNr());
            }
        } catch (JacksonException e) {
            // the binding step names this problem with its line
        }
        return new JsonLines(lines);
    }

    /** The line of the value at a pointer, or of its nearest parent that has one; 1 when unknown. */
    int line(String pointer) {
        String p = pointer;
        while (true) {
            Integer l = lines.get(p);
            if (l != null) {
                return l;
            }
            if (p.isEmpty()) {
                return 1;
            }
            p = p.substring(0, p.lastIndexOf('/'));
        }
    }
}
