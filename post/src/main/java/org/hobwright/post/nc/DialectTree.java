package org.hobwright.post.nc;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.function.Function;
import java.util.function.Predicate;
import tools.jackson.databind.JsonNode;

/**
 * Binds a dialect read as a JSON tree to {@link DialectFile} by hand, for the plain form only:
 * known keys, strings where text belongs, whole numbers within int range, true or false, arrays
 * of strings or a single string for a list of one. Anything else (an unknown key, a null, a
 * fraction, a duplicate key...) gives empty, and {@link DialectLoader} binds with Jackson instead, which accepts
 * or reports it with its own message. Where both bind, the results are the same records; Jackson's
 * record binding is left for the unusual file because it spins method handles for the record
 * constructors, a start-up cost of every run.
 */
final class DialectTree {
    private DialectTree() {
    }

    /** Signals a value outside the plain form. */
    private static final class NotPlain extends RuntimeException {
        private static final long serialVersionUID = 1L;

        NotPlain() {
            super(null, null, false, false);
        }
    }

    /** The bound file, or empty when the text is not in the plain form. */
    static Optional<DialectFile> bind(JsonNode root) {
        try {
            return Optional.of(file(root));
        } catch (NotPlain e) {
            return Optional.empty();
        }
    }

    private static DialectFile file(JsonNode n) {
        PlainObject f = new PlainObject(n, "$schema", "format", "version", "name", "description", "lineEnding", "maxLineLength",
                "lineNumbers", "programNumber", "decimals", "trailingZeros", "comments", "axes", "rotation",
                "prologue", "epilogue", "templates");
        return new DialectFile(f.text("$schema"), f.text("format"), f.integer("version"), f.text("name"),
                f.text("description"), f.text("lineEnding"), f.integer("maxLineLength"),
                f.object("lineNumbers", DialectTree::lineNumbers), f.integer("programNumber"),
                f.object("decimals", DialectTree::decimals), f.bool("trailingZeros"),
                f.object("comments", DialectTree::comments), f.object("axes", DialectTree::axes),
                f.object("rotation", DialectTree::rotations), f.texts("prologue"), f.texts("epilogue"),
                f.object("templates", DialectTree::templates));
    }

    private static DialectFile.LineNumbers lineNumbers(JsonNode n) {
        PlainObject f = new PlainObject(n, "word", "start", "step");
        return new DialectFile.LineNumbers(f.text("word"), f.integer("start"), f.integer("step"));
    }

    private static DialectFile.Decimals decimals(JsonNode n) {
        PlainObject f = new PlainObject(n, "mm", "in", "mmPerRev", "inPerRev", "deg", "differential", "s", "rpm");
        return new DialectFile.Decimals(f.integer("mm"), f.integer("in"), f.integer("mmPerRev"), f.integer("inPerRev"),
                f.integer("deg"), f.integer("differential"), f.integer("s"), f.integer("rpm"));
    }

    private static DialectFile.Comments comments(JsonNode n) {
        PlainObject f = new PlainObject(n, "upperCase", "forbidden");
        return new DialectFile.Comments(f.bool("upperCase"), f.text("forbidden"));
    }

    private static DialectFile.Axes axes(JsonNode n) {
        PlainObject f = new PlainObject(n, "radial", "axial", "swivel", "shift");
        return new DialectFile.Axes(f.object("radial", DialectTree::axis), f.object("axial", DialectTree::axis),
                f.object("swivel", DialectTree::axis), f.object("shift", DialectTree::axis));
    }

    private static DialectFile.Axis axis(JsonNode n) {
        PlainObject f = new PlainObject(n, "letter", "sign", "diameter");
        return new DialectFile.Axis(f.text("letter"), f.integer("sign"), f.bool("diameter"));
    }

    private static DialectFile.Rotations rotations(JsonNode n) {
        PlainObject f = new PlainObject(n, "work", "hob");
        return new DialectFile.Rotations(f.object("work", DialectTree::words), f.object("hob", DialectTree::words));
    }

    private static DialectFile.RotationWords words(JsonNode n) {
        PlainObject f = new PlainObject(n, "clockwise", "counterClockwise");
        return new DialectFile.RotationWords(f.text("clockwise"), f.text("counterClockwise"));
    }

    private static Map<String, List<String>> templates(JsonNode n) {
        Map<String, List<String>> templates = new LinkedHashMap<>();
        for (Map.Entry<String, JsonNode> e : n.properties()) {
            templates.put(e.getKey(), texts(e.getValue()));
        }
        return templates;
    }

    /** An array of strings, or one string as a list of one (the mapper accepts a single value as an array). */
    private static List<String> texts(JsonNode n) {
        List<String> texts = new ArrayList<>();
        if (n.isString()) {
            texts.add(n.stringValue());
            return texts;
        }
        if (!n.isArray()) {
            throw new NotPlain();
        }
        for (JsonNode v : n.values()) {
            texts.add(text(v));
        }
        return texts;
    }

    private static String text(JsonNode n) {
        if (!n.isString()) {
            throw new NotPlain();
        }
        return n.stringValue();
    }

    /** The members of one object, each known key present or absent (absent binds to null). */
    private static final class PlainObject {
        private final JsonNode node;

        PlainObject(JsonNode node, String... known) {
            if (!node.isObject()) {
                throw new NotPlain();
            }
            List<String> keys = List.of(known);
            for (Map.Entry<String, JsonNode> e : node.properties()) {
                if (!keys.contains(e.getKey())) {
                    throw new NotPlain();
                }
            }
            this.node = node;
        }

        private JsonNode get(String key) {
            JsonNode v = node.get(key);
            if (v != null && v.isNull()) {
                throw new NotPlain();
            }
            return v;
        }

        String text(String key) {
            JsonNode v = get(key);
            return v == null ? null : DialectTree.text(v);
        }

        /** A whole number, also when written with a zero fraction ({@code 80.0}); others are not plain. */
        Integer integer(String key) {
            return scalar(key, n -> n.isInt() || n.isFloatingPointNumber() && n.canConvertToExactIntegral()
                    && n.canConvertToInt(), JsonNode::asInt);
        }

        Boolean bool(String key) {
            return scalar(key, JsonNode::isBoolean, JsonNode::booleanValue);
        }

        private <T> T scalar(String key, Predicate<JsonNode> plain, Function<JsonNode, T> value) {
            JsonNode v = get(key);
            if (v == null) {
                return null;
            }
            if (!plain.test(v)) {
                throw new NotPlain();
            }
            return value.apply(v);
        }

        List<String> texts(String key) {
            JsonNode v = get(key);
            return v == null ? null : DialectTree.texts(v);
        }

        <T> T object(String key, Function<JsonNode, T> bind) {
            JsonNode v = get(key);
            return v == null ? null : bind.apply(v);
        }
    }
}
