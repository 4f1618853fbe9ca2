package org.hobwright.post.nc;

import org.hobwright.post.PostCode;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.hobwright.api.check.Finding;
import org.hobwright.api.cycle.Rotation;
import org.hobwright.post.nc.DialectFile.RotationWords;
import org.hobwright.text.JsonTrees;
import tools.jackson.core.JacksonException;
import tools.jackson.core.StreamReadFeature;
import tools.jackson.databind.DeserializationFeature;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.MapperFeature;
import tools.jackson.databind.json.JsonMapper;

/**
 * Reads a dialect file (JSON) and checks it completely: unknown keys, unknown placeholders, a
 * placeholder used where it has no value, missing required templates and values out of range all
 * become error findings that name the dialect and the line. Never throws for bad input.
 */
public final class DialectLoader {

    /** The {@code format} every dialect file states. */
    public static final String FORMAT = "hobwright-dialect";

    /** The newest dialect version this loader reads. */
    public static final int VERSION = 1;

    /** Largest count of decimals a dialect may ask for. */
    static final int MAX_DECIMALS = 6;


    /**
     * The object mapper for dialect files, built on first use: a dialect in the plain form is bound
     * by {@link DialectTree} without one (building a mapper is a large share of a short run's
     * start-up), any other form by this mapper, whose binding is the reference for {@code DialectTree}.
     */
    static final class Binding {
        static final JsonMapper MAPPER = JsonMapper.builder()
                .enable(StreamReadFeature.STRICT_DUPLICATE_DETECTION)
                .enable(DeserializationFeature.FAIL_ON_UNKNOWN_PROPERTIES)
                .enable(DeserializationFeature.FAIL_ON_TRAILING_TOKENS)
                .enable(DeserializationFeature.ACCEPT_SINGLE_VALUE_AS_ARRAY)
                .disable(DeserializationFeature.ACCEPT_FLOAT_AS_INT)
                .disable(MapperFeature.ALLOW_COERCION_OF_SCALARS)
                .build();

        private Binding() {
        }
    }

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
     * @param text     the dialect text (a leading byte-order mark is skipped)
     * @return the dialect or the findings that say why not
     */
    public static Loaded load(String fileName, String text) {
        String json = JsonTrees.withoutByteOrderMark(text);
        JsonLines lines = JsonLines.of(json);
        Optional<DialectFile> plain = plain(json);
        DialectFile file;
        try {
            file = plain.isPresent() ? plain.get() : Binding.MAPPER.readValue(json, DialectFile.class);
        } catch (JacksonException e) {
            String pointer = e.getPath().stream().map(r -> "/" + (r.getPropertyName() != null ? r.getPropertyName()
                    : String.valueOf(r.getIndex()))).reduce("", String::concat);
            int line = e.getLocation() != null && e.getLocation().getLineNr() > 0 ? e.getLocation().getLineNr()
                    : lines.line(pointer);
            String path = "dialect" + pointer.replace('/', '.');
            return new Loaded(Optional.empty(), List.of(PostCode.NC_DIALECT_UNREADABLE.at(path,
                    fileName + " line " + line + ": " + JsonTrees.message(e),
                    "correct the dialect file at that line (post/README.md describes every key)")));
        }
        if (file == null) {
            return new Loaded(Optional.empty(), List.of(PostCode.NC_DIALECT_UNREADABLE.at("dialect",
                    fileName + " line 1: the file is empty", "write a dialect object")));
        }
        return new Check(fileName, lines).dialect(file);
    }

    /**
     * The file bound by {@link DialectTree} when it is in the plain form, without duplicate keys;
     * empty otherwise, and the caller binds with Jackson, which reports any problem (a repeated key
     * too: its parser detects them).
     */
    private static Optional<DialectFile> plain(String json) {
        try {
            JsonNode root = JsonTrees.parse(json);
            return root.isMissingNode() ? Optional.empty() : DialectTree.bind(root);
        } catch (JacksonException | JsonTrees.DuplicateKey e) {
            return Optional.empty();
        }
    }

    /** Checks one bound file and collects findings. */
    private static final class Check {
        private final String fileName;
        private final JsonLines lines;
        private final List<Finding> findings = new ArrayList<>();

        Check(String fileName, JsonLines lines) {
            this.fileName = fileName;
            this.lines = lines;
        }

        Loaded dialect(DialectFile f) {
            if (!FORMAT.equals(f.format())) {
                error(PostCode.NC_DIALECT_FORMAT, "/format", "\"format\" must be \"" + FORMAT + "\", was "
                        + quoted(f.format()), "put \"format\": \"" + FORMAT + "\" in the file");
            }
            if (f.version() == null || f.version() != VERSION) {
                error(PostCode.NC_DIALECT_VERSION, "/version", "\"version\" must be " + VERSION + ", was " + f.version(),
                        "this build reads dialect version " + VERSION + "; update Hobwright or the file");
            }
            String name = text(f.name(), "/name");
            String ending = lineEnding(f.lineEnding());
            int maxLen = integer(f.maxLineLength(), "/maxLineLength", 20, 1000);
            Optional<Dialect.Numbering> numbering = numbering(f.lineNumbers());
            int programNumber = integer(f.programNumber(), "/programNumber", 0, 99_999_999);
            Dialect.Decimals decimals = decimals(f.decimals());
            boolean trailingZeros = flag(f.trailingZeros(), "/trailingZeros");
            Dialect.CommentRules comments = comments(f.comments());
            DialectFile.Axes axes = present(f.axes(), "/axes");
            Dialect.Axis radial = axis(axes == null ? null : axes.radial(), "/axes/radial", true);
            Dialect.Axis axial = axis(axes == null ? null : axes.axial(), "/axes/axial", true);
            Optional<Dialect.Axis> swivel = Optional.ofNullable(axes == null ? null : axes.swivel())
                    .map(a -> axis(a, "/axes/swivel", false));
            Optional<Dialect.Axis> shift = Optional.ofNullable(axes == null ? null : axes.shift())
                    .map(a -> axis(a, "/axes/shift", false));
            DialectFile.Rotations rot = present(f.rotation(), "/rotation");
            Map<Rotation, String> work = words(rot == null ? null : rot.work(), "/rotation/work");
            Map<Rotation, String> hob = words(rot == null ? null : rot.hob(), "/rotation/hob");
            Map<TemplateKey, List<LineTemplate>> templates = templates(f.templates(), swivel.isPresent(),
                    shift.isPresent());
            Map<TemplateKey, Integer> each = new EnumMap<>(TemplateKey.class);
            templates.keySet().forEach(k -> each.put(k, lines.line("/templates/" + k.key())));
            if (Finding.anyError(findings)) {
                return new Loaded(Optional.empty(), findings);
            }
            return new Loaded(Optional.of(new Dialect(name, ending, maxLen, numbering, programNumber, decimals,
                    trailingZeros, comments, radial, axial, swivel, shift, work, hob,
                    plain(f.prologue()), plain(f.epilogue()), templates,
                    new Dialect.Lines(lines.line("/templates"), each))), findings);
        }

        private String lineEnding(String value) {
            if ("lf".equals(value)) {
                return "\n";
            }
            if ("crlf".equals(value)) {
                return "\r\n";
            }
            error(PostCode.NC_DIALECT_BAD_VALUE, "/lineEnding", "\"lineEnding\" must be \"lf\" or \"crlf\", was "
                    + quoted(value), "write \"lf\" or \"crlf\" as the control expects");
            return "\n";
        }

        private Optional<Dialect.Numbering> numbering(DialectFile.LineNumbers n) {
            if (n == null) {
                return Optional.empty();
            }
            String word = letters(n.word(), "/lineNumbers/word");
            int start = integer(n.start(), "/lineNumbers/start", 0, 99_999_999);
            int step = integer(n.step(), "/lineNumbers/step", 1, 10_000);
            return Optional.of(new Dialect.Numbering(word, start, step));
        }

        private Dialect.Decimals decimals(DialectFile.Decimals d) {
            if (present(d, "/decimals") == null) {
                return new Dialect.Decimals(0, 0, 0, 0, 0, 0, 0, 0);
            }
            return new Dialect.Decimals(
                    integer(d.mm(), "/decimals/mm", 0, MAX_DECIMALS),
                    integer(d.inch(), "/decimals/in", 0, MAX_DECIMALS),
                    integer(d.mmPerRev(), "/decimals/mmPerRev", 0, MAX_DECIMALS),
                    integer(d.inPerRev(), "/decimals/inPerRev", 0, MAX_DECIMALS),
                    integer(d.deg(), "/decimals/deg", 0, MAX_DECIMALS),
                    integer(d.differential(), "/decimals/differential", 0, MAX_DECIMALS + 2),
                    integer(d.s(), "/decimals/s", 0, MAX_DECIMALS),
                    integer(d.rpm(), "/decimals/rpm", 0, MAX_DECIMALS));
        }

        private Dialect.CommentRules comments(DialectFile.Comments c) {
            if (present(c, "/comments") == null) {
                return new Dialect.CommentRules(false, "");
            }
            return new Dialect.CommentRules(flag(c.upperCase(), "/comments/upperCase"),
                    c.forbidden() == null ? "" : c.forbidden());
        }

        private Dialect.Axis axis(DialectFile.Axis a, String pointer, boolean needsSign) {
            if (present(a, pointer) == null) {
                return new Dialect.Axis("?", 1, false);
            }
            String letter = letters(a.letter(), pointer + "/letter");
            int sign = 1;
            if (a.sign() != null || needsSign) {
                Integer s = a.sign();
                if (s == null || (s != 1 && s != -1)) {
                    error(PostCode.NC_DIALECT_BAD_VALUE, pointer + "/sign", "\"sign\" must be 1 or -1, was " + s,
                            "write 1 when the axis counts like Hobwright's value, -1 when it counts the other way");
                } else {
                    sign = s;
                }
            }
            boolean diameter = a.diameter() != null && a.diameter();
            if (diameter && !pointer.endsWith("radial")) {
                error(PostCode.NC_DIALECT_BAD_VALUE, pointer + "/diameter", "only the radial axis can be programmed as a "
                        + "diameter", "remove \"diameter\" from this axis");
            }
            return new Dialect.Axis(letter, sign, diameter);
        }

        private Map<Rotation, String> words(RotationWords w, String pointer) {
            Map<Rotation, String> m = new EnumMap<>(Rotation.class);
            if (present(w, pointer) == null) {
                return m;
            }
            m.put(Rotation.CLOCKWISE, text(w.clockwise(), pointer + "/clockwise"));
            m.put(Rotation.COUNTER_CLOCKWISE, text(w.counterClockwise(), pointer + "/counterClockwise"));
            return m;
        }

        private Map<TemplateKey, List<LineTemplate>> templates(Map<String, List<String>> raw, boolean swivel,
                                                              boolean shift) {
            Map<TemplateKey, List<LineTemplate>> out = new EnumMap<>(TemplateKey.class);
            if (present(raw, "/templates") == null) {
                return out;
            }
            for (Map.Entry<String, List<String>> e : new LinkedHashMap<>(raw).entrySet()) {
                String pointer = "/templates/" + e.getKey();
                Optional<TemplateKey> key = TemplateKey.byKey(e.getKey());
                if (key.isEmpty()) {
                    error(PostCode.NC_DIALECT_UNKNOWN_TEMPLATE, pointer, "unknown template \"" + e.getKey() + "\"",
                            "use one of the template names listed in post/README.md");
                    continue;
                }
                out.put(key.get(), templateLines(key.get(), e.getValue(), pointer));
            }
            for (TemplateKey k : TemplateKey.values()) {
                if (k.required() && !raw.containsKey(k.key())) {
                    error(PostCode.NC_DIALECT_MISSING_TEMPLATE, "/templates", "required template \"" + k.key()
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
                error(PostCode.NC_DIALECT_BAD_VALUE, "/templates/" + key.key(), "template \"" + key.key()
                        + "\" needs \"axes\"." + axisName, "add \"" + axisName + "\": { \"letter\": ... } to \"axes\"");
            }
        }

        private List<LineTemplate> templateLines(TemplateKey key, List<String> texts, String pointer) {
            List<LineTemplate> out = new ArrayList<>();
            if (texts == null) {
                error(PostCode.NC_DIALECT_BAD_VALUE, pointer, "template \"" + key.key() + "\" is null",
                        "write a text, a list of texts, or [] for no block");
                return out;
            }
            for (int i = 0; i < texts.size(); i++) {
                String p = pointer + "/" + i;
                String t = texts.get(i);
                if (t == null || t.isBlank()) {
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

        private static String allowedText(TemplateKey key) {
            if (key.allowed().isEmpty()) {
                return "literal words (this template takes no placeholder)";
            }
            return key.allowed().stream().sorted().map(p -> "{" + p.key() + "}")
                    .reduce((a, b) -> a + ", " + b).orElse("");
        }

        private List<String> plain(List<String> texts) {
            return texts == null ? List.of() : texts.stream().filter(java.util.Objects::nonNull).toList();
        }

        private <T> T present(T value, String pointer) {
            if (value == null) {
                error(PostCode.NC_DIALECT_MISSING_KEY, pointer, "\"" + pointer.substring(pointer.lastIndexOf('/') + 1)
                        + "\" is missing", "add it (post/README.md describes every key)");
            }
            return value;
        }

        private String text(String value, String pointer) {
            if (present(value, pointer) != null && value.isBlank()) {
                error(PostCode.NC_DIALECT_BAD_VALUE, pointer, "\"" + leaf(pointer) + "\" must not be blank",
                        "write the word the control expects");
            }
            return value == null ? "?" : value;
        }

        private String letters(String value, String pointer) {
            String v = text(value, pointer);
            if (value != null && !isAddressLetters(value)) {
                error(PostCode.NC_DIALECT_BAD_VALUE, pointer, "\"" + leaf(pointer) + "\" must be 1 to 3 letters, was "
                        + quoted(value), "write the address letter(s) the control uses");
            }
            return v;
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

        private int integer(Integer value, String pointer, int min, int max) {
            if (present(value, pointer) == null) {
                return min;
            }
            if (value < min || value > max) {
                error(PostCode.NC_DIALECT_BAD_NUMBER, pointer, "\"" + leaf(pointer) + "\" must be a whole number from "
                        + min + " to " + max + ", was " + value, "write a value in that range");
            }
            return value;
        }

        private boolean flag(Boolean value, String pointer) {
            return present(value, pointer) != null && value;
        }

        private void error(PostCode code, String pointer, String message, String fix) {
            findings.add(code.at("dialect" + pointer.replace('/', '.'),
                    fileName + " line " + lines.line(pointer) + ": " + message, fix));
        }

        private static String leaf(String pointer) {
            return pointer.substring(pointer.lastIndexOf('/') + 1);
        }

        private static String quoted(String s) {
            return s == null ? "nothing" : "\"" + s + "\"";
        }
    }
}
