package org.hobwright.wizard.store;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.hobwright.api.check.Finding;
import tools.jackson.databind.JsonNode;

/**
 * The structure of a file format: which keys an object may hold and the JSON type of each value.
 * Checking a tree against its shape finds unknown keys and wrong types, the problems that make a
 * file unreadable; values are checked later, when the records are built.
 */
final class Shape {
    /** JSON types of values. */
    enum Type {
        /** A number. */
        NUMBER("a number"),
        /** A whole number (a number with no fraction). */
        INTEGER("a whole number"),
        /** A text. */
        TEXT("a text"),
        /** true or false. */
        BOOLEAN("true or false"),
        /** Degrees as a number or a degrees-minutes-seconds text. */
        ANGLE("an angle (a number of degrees or a text like \"13°14'12\\\"\")"),
        /** A number, or a text such as a pitch written "16/32". */
        NUMBER_OR_TEXT("a number or a text like \"16/32\""),
        /** An object with the keys of the shape. */
        OBJECT("an object { ... }"),
        /** The name of a library entry, or an object with the keys of the shape. */
        NAME_OR_OBJECT("a name or an object { ... }");

        final String words;

        Type(String words) {
            this.words = words;
        }
    }

    final Type type;
    final Map<String, Shape> keys;

    private Shape(Type type, Map<String, Shape> keys) {
        this.type = type;
        this.keys = Collections.unmodifiableMap(keys);
    }

    static final Shape NUMBER = new Shape(Type.NUMBER, Map.of());
    static final Shape INTEGER = new Shape(Type.INTEGER, Map.of());
    static final Shape TEXT = new Shape(Type.TEXT, Map.of());
    static final Shape BOOLEAN = new Shape(Type.BOOLEAN, Map.of());
    static final Shape ANGLE = new Shape(Type.ANGLE, Map.of());
    static final Shape NUMBER_OR_TEXT = new Shape(Type.NUMBER_OR_TEXT, Map.of());

    /** An object; {@code pairs} alternates key names and shapes, in the order files write them. */
    static Shape object(Object... pairs) {
        return new Shape(Type.OBJECT, pairsToMap(pairs));
    }

    /** A name or an object of the given shape. */
    static Shape nameOr(Shape object) {
        return new Shape(Type.NAME_OR_OBJECT, object.keys);
    }

    /** This object shape with more keys (first) or some keys left out. */
    Shape with(Map<String, Shape> extraFirst, Set<String> without) {
        Map<String, Shape> m = new LinkedHashMap<>(extraFirst);
        keys.forEach((k, v) -> {
            if (!without.contains(k)) {
                m.put(k, v);
            }
        });
        return new Shape(type, m);
    }

    private static Map<String, Shape> pairsToMap(Object... pairs) {
        Map<String, Shape> m = new LinkedHashMap<>();
        for (int i = 0; i < pairs.length; i += 2) {
            m.put((String) pairs[i], (Shape) pairs[i + 1]);
        }
        return m;
    }

    /**
     * Checks a document's tree against this (object) shape.
     *
     * @return one unreadable finding per unknown key or wrong type; empty when the structure is right
     */
    List<Finding> check(JsonDocument doc) {
        List<Finding> out = new ArrayList<>();
        checkObject(doc, doc.root(), "", out);
        return out;
    }

    private void checkObject(JsonDocument doc, JsonNode node, String path, List<Finding> out) {
        for (Map.Entry<String, JsonNode> e : node.properties()) {
            String key = e.getKey();
            String child = path.isEmpty() ? key : path + "." + key;
            Shape s = keys.get(key);
            if (s == null) {
                out.add(InputCode.INPUT_UNKNOWN_KEY.at(child,
                        doc.at(child) + ": unknown key \"" + key + "\"" + (path.isEmpty() ? "" : " in " + path),
                        "allowed here: " + String.join(", ", keys.keySet())));
            } else {
                s.checkValue(doc, e.getValue(), child, out);
            }
        }
    }

    private void checkValue(JsonDocument doc, JsonNode v, String path, List<Finding> out) {
        boolean ok = switch (type) {
            case NUMBER -> v.isNumber();
            case INTEGER -> v.isIntegralNumber() || v.isNumber() && v.doubleValue() == Math.rint(v.doubleValue())
                    && Math.abs(v.doubleValue()) < 1e9;
            case TEXT -> v.isString();
            case BOOLEAN -> v.isBoolean();
            case ANGLE, NUMBER_OR_TEXT -> v.isNumber() || v.isString();
            case OBJECT -> v.isObject();
            case NAME_OR_OBJECT -> v.isString() || v.isObject();
        };
        if (!ok) {
            out.add(InputCode.INPUT_WRONG_TYPE.at(path,
                    doc.at(path) + ": " + path + " must be " + type.words + ", was " + describe(v), null));
        } else if (v.isObject()) {
            checkObject(doc, v, path, out);
        }
    }

    private static String describe(JsonNode v) {
        if (v.isNull()) {
            return "null";
        }
        if (v.isString()) {
            String s = v.stringValue();
            return "the text \"" + (s.length() > 30 ? s.substring(0, 30) + "..." : s) + "\"";
        }
        if (v.isObject()) {
            return "an object";
        }
        if (v.isArray()) {
            return "a list";
        }
        return v.toString();
    }
}
