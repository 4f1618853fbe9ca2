package org.hobwright.text;

import java.io.StringWriter;
import java.util.Map;
import tools.jackson.core.JacksonException;
import tools.jackson.core.JsonGenerator;
import tools.jackson.core.JsonParser;
import tools.jackson.core.JsonToken;
import tools.jackson.core.ObjectReadContext;
import tools.jackson.core.ObjectWriteContext;
import tools.jackson.core.PrettyPrinter;
import tools.jackson.core.exc.StreamReadException;
import tools.jackson.core.json.JsonFactory;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.node.ArrayNode;
import tools.jackson.databind.node.JsonNodeFactory;
import tools.jackson.databind.node.ObjectNode;

/**
 * JSON trees read and written with the streaming parser and generator alone. Building an object
 * mapper (its serializer and deserializer machinery, type factory, default date format with the
 * JDK's calendar data) is most of a short run's start-up, and reading or writing a plain tree needs
 * none of it. The texts are the same as an object mapper's: {@code JsonTreesTest} compares them.
 *
 * <p>Reading rejects a key that appears twice in one object ({@link DuplicateKey}) and text after the
 * value; malformed JSON throws the parser's {@link JacksonException}, with its line.
 */
public final class JsonTrees {

    /** Told the path and line of every key and array element while a tree is read. */
    @FunctionalInterface
    public interface KeyLines {
        /**
         * @param path dotted path with brackets for array elements: {@code gear.module}, {@code list[2]}
         * @param line 1-based line of the key or element
         */
        void at(String path, int line);
    }

    private static final JsonFactory FACTORY = new JsonFactory();
    private static final JsonNodeFactory NODES = JsonNodeFactory.instance;
    private static final KeyLines NO_LINES = (path, line) -> {
    };

    private JsonTrees() {
    }

    /**
     * A parser over a text, from a bare factory (no object mapper behind it). A leading UTF-8
     * byte-order mark (U+FEFF, which some editors write at the start of a file) is skipped.
     */
    public static JsonParser parser(String json) {
        return FACTORY.createParser(ObjectReadContext.empty(), withoutByteOrderMark(json));
    }

    /** The text without a leading byte-order mark (U+FEFF), as JSON texts are read (RFC 8259, 8.1). */
    public static String withoutByteOrderMark(String text) {
        return text.startsWith("\uFEFF") ? text.substring(1) : text;
    }

    /**
     * Reads a whole text holding one JSON value.
     *
     * @return the tree; a missing node for an empty text
     * @throws JacksonException for malformed JSON or text after the value
     * @throws DuplicateKey     for a key that appears twice in one object
     */
    public static JsonNode parse(String json) {
        try (JsonParser p = parser(json)) {
            if (p.nextToken() == null) {
                return NODES.missingNode();
            }
            JsonNode value = readValue(p, "", NO_LINES);
            if (p.nextToken() != null) {
                throw new StreamReadException(p, "text after the end of the JSON value");
            }
            return value;
        }
    }

    /**
     * The first line of Jackson's description of a problem, without the {@code (... at [Source: ...])}
     * parts that name no line (the exception's location has it).
     */
    public static String message(JacksonException e) {
        String text = e.getOriginalMessage() == null ? e.getClass().getSimpleName() : e.getOriginalMessage();
        int nl = text.indexOf('\n');
        return (nl < 0 ? text : text.substring(0, nl)).replaceAll("\\s*\\([^()\\[]*\\[Source:[^\\]]*\\]\\)", "").replaceAll("\\s+", " ").strip();
    }

    /** The line a parser problem is on, or 0 when it is not known. */
    public static int line(JacksonException e) {
        return e.getLocation() == null || e.getLocation().getLineNr() < 1 ? 0 : e.getLocation().getLineNr();
    }

    /**
     * Reads the object whose start token the parser has just returned.
     *
     * @param p     a parser positioned on {@code START_OBJECT}
     * @param path  the object's own path ("" for the root)
     * @param lines told of every key and element read
     * @throws DuplicateKey for a key that appears twice in one object
     */
    public static ObjectNode readObject(JsonParser p, String path, KeyLines lines) {
        ObjectNode node = NODES.objectNode();
        JsonToken t;
        while ((t = p.nextToken()) == JsonToken.PROPERTY_NAME) {
            String key = p.currentName();
            String child = path.isEmpty() ? key : path + "." + key;
            int line = p.currentTokenLocation().getLineNr();
            if (node.has(key)) {
                throw new DuplicateKey(child, line);
            }
            lines.at(child, line);
            p.nextToken();
            node.set(key, readValue(p, child, lines));
        }
        if (t != JsonToken.END_OBJECT) {
            throw new IllegalStateException("parser gave " + t + " inside an object");
        }
        return node;
    }

    private static JsonNode readValue(JsonParser p, String path, KeyLines lines) {
        JsonToken t = p.currentToken();
        switch (t) {
            case START_OBJECT:
                return readObject(p, path, lines);
            case START_ARRAY: {
                ArrayNode a = NODES.arrayNode();
                int i = 0;
                while (p.nextToken() != JsonToken.END_ARRAY) {
                    String child = path + "[" + i++ + "]";
                    lines.at(child, p.currentTokenLocation().getLineNr());
                    a.add(readValue(p, child, lines));
                }
                return a;
            }
            case VALUE_STRING:
                return NODES.stringNode(p.getString());
            case VALUE_NUMBER_INT:
                return p.getNumberType() == JsonParser.NumberType.INT ? NODES.numberNode(p.getIntValue())
                        : p.getNumberType() == JsonParser.NumberType.LONG ? NODES.numberNode(p.getLongValue())
                        : NODES.numberNode(p.getDoubleValue()); // beyond long: kept as a double, like a float
            case VALUE_NUMBER_FLOAT:
                return NODES.numberNode(p.getDoubleValue());
            case VALUE_TRUE:
                return NODES.booleanNode(true);
            case VALUE_FALSE:
                return NODES.booleanNode(false);
            case VALUE_NULL:
                return NODES.nullNode();
            default:
                throw new IllegalStateException("unexpected token " + t + " at " + path);
        }
    }

    /**
     * Writes a tree as text.
     *
     * @param tree   the tree
     * @param layout how it is laid out; null for compact text
     */
    public static String write(JsonNode tree, Layout layout) {
        StringWriter out = new StringWriter();
        try (JsonGenerator g = FACTORY.createGenerator(new Settings(layout == null ? null : new Printer(layout)),
                out)) {
            write(g, tree);
        }
        return out.toString();
    }

    private static void write(JsonGenerator g, JsonNode n) {
        switch (n.getNodeType()) {
            case OBJECT:
                g.writeStartObject(n);
                for (Map.Entry<String, JsonNode> e : n.properties()) {
                    g.writeName(e.getKey());
                    write(g, e.getValue());
                }
                g.writeEndObject();
                break;
            case ARRAY:
                g.writeStartArray(n, n.size());
                for (JsonNode c : n) {
                    write(g, c);
                }
                g.writeEndArray();
                break;
            case STRING:
                g.writeString(n.stringValue());
                break;
            case NUMBER:
                number(g, n);
                break;
            case BOOLEAN:
                g.writeBoolean(n.booleanValue());
                break;
            case NULL:
                g.writeNull();
                break;
            default:
                throw new IllegalArgumentException("a " + n.getNodeType() + " node has no JSON text");
        }
    }

    private static void number(JsonGenerator g, JsonNode n) {
        switch (n.numberType()) {
            case INT:
                g.writeNumber(n.intValue());
                break;
            case LONG:
                g.writeNumber(n.longValue());
                break;
            case BIG_INTEGER:
                g.writeNumber(n.bigIntegerValue());
                break;
            case FLOAT:
                g.writeNumber(n.floatValue());
                break;
            case BIG_DECIMAL:
                g.writeNumber(n.decimalValue());
                break;
            default:
                g.writeNumber(n.doubleValue());
        }
    }

    /**
     * A pretty layout: every object entry on its own line, indented two spaces a level; arrays on
     * lines too or inline ({@code [ 1, 2 ]}); {@code "name" : value} or {@code "name": value}. The
     * texts are those of Jackson's {@code DefaultPrettyPrinter} set up the same way ({@code JsonTreesTest}),
     * written by an own printer: building a {@code DefaultPrettyPrinter} runs a string concatenation
     * compiled to {@code invokedynamic}, whose first bootstrap is about 10 ms of a short run.
     *
     * @param arraysOnLines true to put every array element on its own line
     * @param spaceBeforeColon true for {@code "name" : value}, false for {@code "name": value}
     */
    public record Layout(boolean arraysOnLines, boolean spaceBeforeColon) {
        /** Jackson's default pretty layout: {@code "name" : value}, arrays inline. */
        public static final Layout DEFAULT = new Layout(false, true);
    }

    /** Writes the whitespace of a {@link Layout}; one instance per text (it counts the nesting). */
    private static final class Printer implements PrettyPrinter {
        private static final String INDENT = "                                ";
        private final Layout layout;
        private int nesting;

        Printer(Layout layout) {
            this.layout = layout;
        }

        private void newLine(JsonGenerator g) {
            g.writeRaw('\n');
            for (int left = 2 * nesting; left > 0; left -= INDENT.length()) {
                g.writeRaw(INDENT, 0, Math.min(left, INDENT.length()));
            }
        }

        private void arrayGap(JsonGenerator g) {
            if (layout.arraysOnLines()) {
                newLine(g);
            } else {
                g.writeRaw(' ');
            }
        }

        @Override
        public void writeRootValueSeparator(JsonGenerator g) {
            g.writeRaw(' ');
        }

        @Override
        public void writeStartObject(JsonGenerator g) {
            g.writeRaw('{');
            nesting++;
        }

        @Override
        public void beforeObjectEntries(JsonGenerator g) {
            newLine(g);
        }

        @Override
        public void writeObjectNameValueSeparator(JsonGenerator g) {
            g.writeRaw(layout.spaceBeforeColon() ? " : " : ": ");
        }

        @Override
        public void writeObjectEntrySeparator(JsonGenerator g) {
            g.writeRaw(',');
            newLine(g);
        }

        @Override
        public void writeEndObject(JsonGenerator g, int entries) {
            nesting--;
            if (entries > 0) {
                newLine(g);
            } else {
                g.writeRaw(' ');
            }
            g.writeRaw('}');
        }

        @Override
        public void writeStartArray(JsonGenerator g) {
            g.writeRaw('[');
            if (layout.arraysOnLines()) {
                nesting++;
            }
        }

        @Override
        public void beforeArrayValues(JsonGenerator g) {
            arrayGap(g);
        }

        @Override
        public void writeArrayValueSeparator(JsonGenerator g) {
            g.writeRaw(',');
            arrayGap(g);
        }

        @Override
        public void writeEndArray(JsonGenerator g, int values) {
            if (layout.arraysOnLines()) {
                nesting--;
            }
            if (values > 0) {
                arrayGap(g);
            } else {
                g.writeRaw(' ');
            }
            g.writeRaw(']');
        }
    }

    /** The generator's settings: the factory's defaults and the given printer. */
    private static final class Settings extends ObjectWriteContext.Base {
        private final PrettyPrinter printer;

        Settings(PrettyPrinter printer) {
            this.printer = printer;
        }

        @Override
        public PrettyPrinter getPrettyPrinter() {
            return printer;
        }

        @Override
        public boolean hasPrettyPrinter() {
            return printer != null;
        }
    }

    /** A key that appears twice in one object. */
    public static final class DuplicateKey extends RuntimeException {
        private static final long serialVersionUID = 1L;
        private final String path;
        private final int line;

        DuplicateKey(String path, int line) {
            super("key \"" + path + "\" appears twice", null, false, false);
            this.path = path;
            this.line = line;
        }

        /** The key's path. */
        public String path() {
            return path;
        }

        /** The line of the second occurrence. */
        public int line() {
            return line;
        }
    }
}
