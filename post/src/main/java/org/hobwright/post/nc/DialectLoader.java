package org.hobwright.post.nc;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.hobwright.api.check.Finding;
import org.hobwright.api.cycle.Rotation;
import org.hobwright.api.spi.WriteContext;
import org.hobwright.post.PostCode;
import org.hobwright.text.JsonTrees;
import tools.jackson.core.JacksonException;
import tools.jackson.core.JsonParser;
import tools.jackson.core.JsonToken;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.node.ObjectNode;

/**
 * The one reader of dialect files. It reads the JSON tree with its lines, checks every key against
 * {@link DialectKeys} (unknown keys, missing keys, kinds, ranges, choices) and every template against
 * {@link TemplateKey} (unknown templates and placeholders, a placeholder where it has no value,
 * missing required templates, templates that need an axis), and collects every
 * problem as an error finding that names the dialect, the line and the key:
 * {@code varrow-ctl line 42, templates.feed: unknown placeholder {fed}}. Never throws for bad input.
 */
public final class DialectLoader {

    /** The {@code format} every dialect file states. */
    public static final String FORMAT = DialectKeys.FORMAT;

    /** The dialect version this loader reads. */
    public static final int VERSION = DialectKeys.VERSION;

    private static final String FIX_SEE_README = "post/README.md describes every key";

    private DialectLoader() {
    }

    /**
     * The result of loading: a dialect when there is no error finding.
     *
     * @param dialect  the dialect, empty when any finding is an error
     * @param findings the problems found
     */
    public record Loaded(Optional<Dialect> dialect, List<Finding> findings) {
        public Loaded {
            findings = List.copyOf(findings);
        }
    }

    /**
     * Loads a dialect.
     *
     * @param fileName the dialect's name or file name, for messages
     * @param json     the dialect text (a leading byte-order mark is skipped)
     * @return the dialect or the findings that say why not
     */
    public static Loaded load(String fileName, String json) {
        Map<String, Integer> lines = new HashMap<>();
        ObjectNode root;
        try (JsonParser p = JsonTrees.parser(json)) {
            JsonToken t = p.nextToken();
            if (t != JsonToken.START_OBJECT) {
                return unreadable(fileName, 1, "dialect", t == null ? "the file is empty"
                        : "the file holds no JSON object", "write a dialect object { ... }");
            }
            root = JsonTrees.readObject(p, "", lines::put);
            if (p.nextToken() != null) {
                return unreadable(fileName, p.currentTokenLocation().getLineNr(), "dialect",
                        "text after the end of the dialect object", "remove it");
            }
        } catch (JsonTrees.DuplicateKey e) {
            return unreadable(fileName, e.line(), "dialect." + e.path(), "key " + e.path() + " is written twice",
                    "keep one of the two");
        } catch (JacksonException e) {
            return unreadable(fileName, Math.max(1, JsonTrees.line(e)), "dialect", JsonTrees.message(e),
                    "correct the JSON at that line (" + FIX_SEE_README + ")");
        }
        return new Reading(fileName, lines, root).dialect();
    }

    /**
     * The dialect a write context holds ({@link WriteContext#DIALECT}, named by
     * {@link WriteContext#DIALECT_NAME} or the machine's dialect); empty when it holds none or one that
     * does not load (the program writer reports why).
     */
    public static Optional<Dialect> of(WriteContext context) {
        Optional<String> text = context.resource(WriteContext.DIALECT);
        if (text.isEmpty()) {
            return Optional.empty();
        }
        return load(context.resource(WriteContext.DIALECT_NAME).orElse(context.job().machine().dialect()), text.get())
                .dialect();
    }

    private static Loaded unreadable(String fileName, int line, String field, String message, String fix) {
        return new Loaded(Optional.empty(), List.of(PostCode.NC_DIALECT_UNREADABLE.at(field,
                fileName + " line " + line + ": " + message, fix)));
    }

    /** One file being read: its tree, the lines of its keys and the findings so far. */
    private static final class Reading {
        private final String fileName;
        private final Map<String, Integer> lines;
        private final ObjectNode root;
        private final List<Finding> findings = new ArrayList<>();

        Reading(String fileName, Map<String, Integer> lines, ObjectNode root) {
            this.fileName = fileName;
            this.lines = lines;
            this.root = root;
        }

        Loaded dialect() {
            if (!version()) {
                return new Loaded(Optional.empty(), findings);
            }
            check("", root);
            JsonNode raw = root.get("templates");
            Map<TemplateKey, List<LineTemplate>> templates = raw != null && raw.isObject()
                    ? templates(raw, node("axes.swivel") != null, node("axes.shift") != null)
                    : Map.of();
            if (!findings.isEmpty()) {
                return new Loaded(Optional.empty(), findings);
            }
            Dialect.NumberRange programs = range("programNumber");
            Dialect.NumberRange tools = range("toolStation");
            Dialect.Axis radial = axis("axes.radial");
            Dialect.Axis axial = axis("axes.axial");
            Optional<Dialect.Axis> swivel = optionalAxis("axes.swivel");
            Optional<Dialect.Axis> shift = optionalAxis("axes.shift");
            if (!findings.isEmpty()) {
                return new Loaded(Optional.empty(), findings);
            }
            Map<TemplateKey, Integer> each = new EnumMap<>(TemplateKey.class);
            templates.keySet().forEach(k -> each.put(k, line("templates." + k.key())));
            Optional<Dialect.Numbering> numbering = node("lineNumbers") == null ? Optional.empty()
                    : Optional.of(new Dialect.Numbering(text("lineNumbers.word"), integer("lineNumbers.start"),
                    integer("lineNumbers.step")));
            Dialect.Decimals decimals = new Dialect.Decimals(integer("decimals.mm"), integer("decimals.in"),
                    integer("decimals.mmPerRev"), integer("decimals.inPerRev"), integer("decimals.deg"),
                    integer("decimals.differential"), integer("decimals.s"), integer("decimals.rpm"));
            Dialect.CommentRules comments = new Dialect.CommentRules(bool("comments.upperCase"),
                    node("comments.forbidden") == null ? "" : text("comments.forbidden"));
            return new Loaded(Optional.of(new Dialect(text("name"), "crlf".equals(text("lineEnding")) ? "\r\n" : "\n",
                    integer("maxLineLength"), numbering, programs, tools, decimals, bool("trailingZeros"), comments,
                    radial, axial, swivel, shift, words("rotation.work"),
                    words("rotation.hob"), lines("prologue"), lines("epilogue"), templates,
                    new Dialect.Lines(line("templates"), each))), findings);
        }

        /** The format and version, before anything else: another version is read no further. */
        private boolean version() {
            JsonNode f = root.get("format");
            if (f == null || !f.isString() || !FORMAT.equals(f.stringValue())) {
                error(PostCode.NC_DIALECT_FORMAT, "format", "\"format\" must be \"" + FORMAT + "\", was "
                        + (f == null ? "nothing" : f.toString()), "put \"format\": \"" + FORMAT + "\" in the file");
            }
            JsonNode v = root.get("version");
            if (v == null || !v.isInt() || v.intValue() != VERSION) {
                String was = v == null ? "nothing" : v.toString();
                String fix = v != null && v.isInt() && v.intValue() == 1
                        ? "version 1 has no safe start and end and takes the program number and tool from the"
                        + " dialect alone: add the templates safeStart and safeEnd, {tool} in toolCall, the objects"
                        + " programNumber and toolStation { default, min, max }, and set \"version\": " + VERSION
                        : "this build reads dialect version " + VERSION + "; update Hobwright or the file";
                error(PostCode.NC_DIALECT_VERSION, "version", "\"version\" must be " + VERSION + ", was " + was, fix);
                return false;
            }
            return true;
        }

        /** Checks the members of an object against the keys defined for it, then its required keys. */
        private void check(String path, JsonNode object) {
            for (Map.Entry<String, JsonNode> e : object.properties()) {
                String child = join(path, e.getKey());
                Optional<DialectKeys.Key> key = DialectKeys.at(child);
                if (child.equals("format") || child.equals("version")) {
                    continue;
                }
                if (key.isEmpty()) {
                    error(PostCode.NC_DIALECT_UNKNOWN_KEY, child, "the dialect format has no key \"" + e.getKey()
                            + "\"" + (path.isEmpty() ? "" : " in \"" + path + "\""), "remove it or correct its name ("
                            + FIX_SEE_README + ")");
                } else {
                    value(key.get(), e.getValue());
                }
            }
            for (DialectKeys.Key k : DialectKeys.children(path)) {
                if (k.required() && !object.has(k.name())) {
                    error(PostCode.NC_DIALECT_MISSING_KEY, k.path(), "\"" + k.name() + "\" is missing",
                            "add it: " + k.meaning());
                }
            }
        }

        private void value(DialectKeys.Key k, JsonNode v) {
            switch (k.kind()) {
                case OBJECT -> {
                    if (v.isObject()) {
                        check(k.path(), v);
                    } else {
                        wrongKind(k, "an object { ... }");
                    }
                }
                case TEXT, ANY_TEXT -> {
                    if (!v.isString()) {
                        wrongKind(k, "a text in double quotes");
                    } else if (k.kind() == DialectKeys.Kind.TEXT && v.stringValue().isBlank()) {
                        error(PostCode.NC_DIALECT_BAD_VALUE, k.path(), "\"" + k.name() + "\" must not be blank",
                                "write " + k.meaning());
                    } else if (!k.choices().isEmpty() && !k.choices().contains(v.stringValue())) {
                        error(PostCode.NC_DIALECT_BAD_VALUE, k.path(), "\"" + k.name() + "\" must be " + choices(k)
                                + ", was \"" + v.stringValue() + "\"", "write one of them");
                    }
                }
                case LETTERS -> {
                    if (!v.isString() || !isAddressLetters(v.stringValue())) {
                        error(PostCode.NC_DIALECT_BAD_VALUE, k.path(), "\"" + k.name() + "\" must be 1 to 3 letters,"
                                + " was " + v, "write the address letter(s) the control uses");
                    }
                }
                case INTEGER -> integer(k, v);
                case BOOLEAN -> {
                    if (!v.isBoolean()) {
                        wrongKind(k, "true or false");
                    }
                }
                case LINES -> lineList(k.path(), v);
                case TEMPLATES -> {
                    if (!v.isObject()) {
                        wrongKind(k, "an object of templates { \"rapid\": \"...\", ... }");
                    }
                }
            }
        }

        private void integer(DialectKeys.Key k, JsonNode v) {
            // a zero fraction reads as the whole number (JSON does not tell 80 and 80.0 apart)
            if (!v.isNumber() || v.doubleValue() != Math.rint(v.doubleValue()) || Math.abs(v.doubleValue()) > 1e15) {
                wrongKind(k, "a whole number");
                return;
            }
            long n = (long) v.doubleValue();
            if (!k.choices().isEmpty() ? !k.choices().contains(Long.toString(n)) : n < k.min() || n > k.max()) {
                error(PostCode.NC_DIALECT_BAD_NUMBER, k.path(), "\"" + k.name() + "\" must be " + (k.choices().isEmpty()
                        ? "a whole number from " + k.min() + " to " + k.max() : choices(k)) + ", was " + n,
                        "write " + k.meaning());
            }
        }

        /** A list of texts, or one text. */
        private List<String> lineList(String path, JsonNode v) {
            List<String> out = new ArrayList<>();
            if (v.isString()) {
                out.add(v.stringValue());
            } else if (v.isArray()) {
                for (JsonNode e : v.values()) {
                    if (!e.isString()) {
                        error(PostCode.NC_DIALECT_BAD_VALUE, path + "[" + out.size() + "]", "every line must be a text"
                                + " in double quotes, was " + e, "write the line as a text");
                        return List.of();
                    }
                    out.add(e.stringValue());
                }
            } else {
                error(PostCode.NC_DIALECT_BAD_VALUE, path, "must be a text or a list of texts, was " + v,
                        "write a text, a list of texts, or [] for no line");
                return List.of();
            }
            return out;
        }

        private Map<TemplateKey, List<LineTemplate>> templates(JsonNode raw, boolean swivel, boolean shift) {
            Map<TemplateKey, List<LineTemplate>> out = new EnumMap<>(TemplateKey.class);
            for (Map.Entry<String, JsonNode> e : raw.properties()) {
                String path = "templates." + e.getKey();
                Optional<TemplateKey> key = TemplateKey.byKey(e.getKey());
                if (key.isEmpty()) {
                    error(PostCode.NC_DIALECT_UNKNOWN_TEMPLATE, path, "unknown template \"" + e.getKey() + "\"",
                            "use one of the template names listed in post/README.md");
                    continue;
                }
                out.put(key.get(), templateLines(key.get(), lineList(path, e.getValue()), path));
            }
            for (TemplateKey k : TemplateKey.values()) {
                if (k.required() && !raw.has(k.key())) {
                    error(PostCode.NC_DIALECT_MISSING_TEMPLATE, "templates", "required template \"" + k.key()
                            + "\" is missing", "add \"" + k.key() + "\" to \"templates\"");
                }
            }
            needsAxis(out, TemplateKey.SWIVEL_TO, swivel, "swivel");
            needsAxis(out, TemplateKey.HOB_SHIFT, shift, "shift");
            return out;
        }

        private void needsAxis(Map<TemplateKey, List<LineTemplate>> templates, TemplateKey key, boolean axis,
                               String axisName) {
            if (templates.containsKey(key) && !axis) {
                error(PostCode.NC_DIALECT_BAD_VALUE, "templates." + key.key(), "template \"" + key.key()
                        + "\" needs \"axes\"." + axisName, "add \"" + axisName + "\": { \"letter\": ... } to \"axes\"");
            }
        }

        private List<LineTemplate> templateLines(TemplateKey key, List<String> texts, String path) {
            List<LineTemplate> out = new ArrayList<>();
            for (int i = 0; i < texts.size(); i++) {
                String p = path + "[" + i + "]";
                String t = texts.get(i);
                if (t.isBlank()) {
                    error(PostCode.NC_DIALECT_BAD_VALUE, p, "template \"" + key.key() + "\" has a blank line",
                            "remove the blank line (an empty list [] writes no block)");
                    continue;
                }
                List<String> problem = new ArrayList<>();
                Optional<LineTemplate> lt = LineTemplate.parse(t, key.allowed(), problem);
                if (lt.isPresent()) {
                    out.add(lt.get());
                } else {
                    PostCode code = problem.get(0).startsWith("unknown placeholder")
                            ? PostCode.NC_DIALECT_UNKNOWN_PLACEHOLDER : PostCode.NC_DIALECT_BAD_TEMPLATE;
                    error(code, p, "template \"" + key.key() + "\" (\"" + t + "\"): " + problem.get(0),
                            "use only " + allowedText(key) + " in \"" + key.key() + "\"");
                }
            }
            return out;
        }

        private Dialect.NumberRange range(String path) {
            long dflt = integer(path + ".default");
            long min = integer(path + ".min");
            long max = integer(path + ".max");
            if (min > max || dflt < min || dflt > max) {
                error(PostCode.NC_DIALECT_BAD_NUMBER, path, "\"" + path + "\" must have min ≤ default ≤ max, has"
                        + " default " + dflt + ", min " + min + ", max " + max, "correct the three numbers");
            }
            return new Dialect.NumberRange(dflt, min, max);
        }

        private Optional<Dialect.Axis> optionalAxis(String path) {
            return node(path) == null ? Optional.empty() : Optional.of(axis(path));
        }

        private Dialect.Axis axis(String path) {
            JsonNode sign = node(path + ".sign");
            JsonNode diameter = node(path + ".diameter");
            boolean dia = diameter != null && diameter.booleanValue();
            if (dia && !path.equals("axes.radial")) {
                error(PostCode.NC_DIALECT_BAD_VALUE, path + ".diameter", "only the radial axis can be programmed as"
                        + " a diameter", "remove \"diameter\" from this axis");
            }
            return new Dialect.Axis(text(path + ".letter"), sign == null ? 1 : sign.intValue(), dia);
        }

        private Map<Rotation, String> words(String path) {
            Map<Rotation, String> m = new EnumMap<>(Rotation.class);
            m.put(Rotation.CLOCKWISE, text(path + ".clockwise"));
            m.put(Rotation.COUNTER_CLOCKWISE, text(path + ".counterClockwise"));
            return m;
        }

        private List<String> lines(String path) {
            JsonNode v = node(path);
            return v == null ? List.of() : lineList(path, v);
        }

        /** The value at a dotted path, or null when absent. */
        private JsonNode node(String path) {
            JsonNode n = root;
            int from = 0;
            while (n != null && from <= path.length()) {
                int dot = path.indexOf('.', from);
                int to = dot < 0 ? path.length() : dot;
                n = n.get(path.substring(from, to));
                from = to + 1;
            }
            return n;
        }

        private String text(String path) {
            return node(path).stringValue();
        }

        private int integer(String path) {
            return (int) node(path).doubleValue();
        }

        private boolean bool(String path) {
            return node(path).booleanValue();
        }

        private void wrongKind(DialectKeys.Key k, String expected) {
            error(PostCode.NC_DIALECT_BAD_VALUE, k.path(), "\"" + k.name() + "\" must be " + expected + ", was "
                    + node(k.path()), "write " + k.meaning());
        }

        /** An error naming the dialect, the line and the key; the field is the key's path under {@code dialect}. */
        private void error(PostCode code, String path, String message, String fix) {
            findings.add(code.at("dialect." + path.replace("[", ".").replace("]", ""),
                    fileName + " line " + line(path) + ", " + path + ": " + message, fix));
        }

        /** The line of a key, or of its nearest parent that has one; 1 when unknown. */
        private int line(String path) {
            String p = path;
            while (!p.isEmpty()) {
                Integer l = lines.get(p);
                if (l != null) {
                    return l;
                }
                int cut = Math.max(p.lastIndexOf('.'), p.lastIndexOf('['));
                p = cut < 0 ? "" : p.substring(0, cut);
            }
            return 1;
        }

        private static String join(String path, String key) {
            return path.isEmpty() ? key : path + "." + key;
        }

        private static String choices(DialectKeys.Key k) {
            return String.join(" or ", k.choices().stream().map(c -> k.kind() == DialectKeys.Kind.INTEGER ? c
                    : "\"" + c + "\"").toList());
        }

        private static String allowedText(TemplateKey key) {
            if (key.allowed().isEmpty()) {
                return "literal words (this template takes no placeholder)";
            }
            return key.allowed().stream().sorted().map(p -> "{" + p.key() + "}")
                    .reduce((a, b) -> a + ", " + b).orElse("");
        }

        /** 1 to 3 ASCII letters. */
        private static boolean isAddressLetters(String value) {
            if (value.isEmpty() || value.length() > 3) {
                return false;
            }
            for (int i = 0; i < value.length(); i++) {
                char c = value.charAt(i);
                if (!(c >= 'A' && c <= 'Z' || c >= 'a' && c <= 'z')) {
                    return false;
                }
            }
            return true;
        }
    }
}
