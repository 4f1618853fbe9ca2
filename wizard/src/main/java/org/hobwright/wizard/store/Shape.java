package org.hobwright.wizard.store;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.hobwright.api.check.Finding;
import org.hobwright.api.job.FieldDef;
import org.hobwright.api.wizard.FieldType;
import tools.jackson.databind.JsonNode;

/**
 * The keys a file format allows, built from its field table: which keys an object may hold and
 * which of them are objects. Checking a tree finds unknown keys and objects given as plain values
 * (or the other way round); the values themselves are checked when they are read
 * ({@link FieldReader}).
 */
final class Shape {
    /** What a key holds. */
    enum Type {
        /** A value (number, text, true or false). */
        VALUE,
        /** An object with the keys of the shape. */
        OBJECT,
        /** The name of a library entry, or an object with the keys of the shape. */
        NAME_OR_OBJECT
    }

    final Type type;
    final Map<String, Shape> keys;

    private Shape(Type type, Map<String, Shape> keys) {
        this.type = type;
        this.keys = Collections.unmodifiableMap(keys);
    }

    private static final Shape VALUE = new Shape(Type.VALUE, Map.of());

    /**
     * The object shape of a table's fields (dotted keys become nested objects), with {@code first}
     * keys ahead of them (e.g. the header keys).
     */
    static Shape of(List<String> first, List<FieldDef> fields) {
        Map<String, Object> tree = new LinkedHashMap<>();
        for (String k : first) {
            tree.put(k, VALUE);
        }
        for (FieldDef f : fields) {
            put(tree, f.key().split("\\."), 0);
        }
        return build(tree);
    }

    @SuppressWarnings("unchecked")
    private static void put(Map<String, Object> tree, String[] parts, int i) {
        if (i == parts.length - 1) {
            tree.putIfAbsent(parts[i], VALUE);
            return;
        }
        Object child = tree.get(parts[i]);
        if (!(child instanceof Map)) {
            child = new LinkedHashMap<String, Object>();
            tree.put(parts[i], child);
        }
        put((Map<String, Object>) child, parts, i + 1);
    }

    @SuppressWarnings("unchecked")
    private static Shape build(Map<String, Object> tree) {
        Map<String, Shape> keys = new LinkedHashMap<>();
        tree.forEach((k, v) -> keys.put(k, v instanceof Map ? build((Map<String, Object>) v) : (Shape) v));
        return new Shape(Type.OBJECT, keys);
    }

    /** This shape with {@code key} holding a name or an object of {@code body}'s keys. */
    Shape withNameOr(String key, Shape body) {
        Map<String, Shape> m = new LinkedHashMap<>(keys);
        m.put(key, new Shape(Type.NAME_OR_OBJECT, body.keys));
        return new Shape(type, m);
    }

    /** The keys allowed at the top, in order. */
    List<String> topKeys() {
        return List.copyOf(keys.keySet());
    }

    /**
     * Checks a document's tree against this (object) shape.
     *
     * @return one error finding per unknown key and per plain value where an object belongs (or
     *         the other way round); empty when the structure is right
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
            case VALUE -> !v.isObject() && !v.isArray() && !v.isNull();
            case OBJECT -> v.isObject();
            case NAME_OR_OBJECT -> v.isString() || v.isObject();
        };
        if (!ok) {
            String words = switch (type) {
                case VALUE -> "a single value";
                case OBJECT -> "an object { ... }";
                case NAME_OR_OBJECT -> "a name or an object { ... }";
            };
            out.add(InputCode.INPUT_WRONG_TYPE.at(path,
                    doc.at(path) + ": " + path + " must be " + words + ", was " + describe(v), null));
        } else if (v.isObject()) {
            checkObject(doc, v, path, out);
        }
    }

    /** What a value of this type is, in words. */
    static String words(FieldType type) {
        return switch (type) {
            case NUMBER -> "a number";
            case INTEGER -> "a whole number";
            case TEXT, CHOICE -> "a text";
            case BOOLEAN -> "true or false";
            case ANGLE -> "an angle (a number of degrees or a text like \"13°14'12\\\"\")";
        };
    }

    /** A JSON value in words, for messages. */
    static String describe(JsonNode v) {
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
        if (v.isNumber()) {
            return org.hobwright.text.Decimal.readable(v.doubleValue());
        }
        return v.toString();
    }
}
