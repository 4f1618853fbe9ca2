package org.hobwright.post.nc;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.hobwright.api.cycle.HobCycle;
import org.hobwright.api.cycle.SetupValues;
import org.hobwright.api.job.HobJob;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/**
 * The tests' own reader of posted NC programs, independent of the writer: it reads the program
 * exactly as written and checks the safety invariants on its words. It learns from the raw
 * dialect JSON only what a person reading the program would need (line endings, line numbers,
 * axis letters, signs and modes, and the templates, turned here into regular expressions so that
 * each block is known by the template that wrote it; the lines of a template of several lines,
 * written one after the other, are read as one block with all their values); it uses none of the
 * writer's code.
 *
 * <p>Use: {@code NcReader.assertSafe(programText, dialectJson, NcReader.Limits.of(job, cycle))},
 * or {@link #violations} for the list. What it checks, every block in order:
 * <ol>
 *   <li>every line ends with the dialect's line ending and is not longer than {@code maxLineLength};
 *       every block outside comments is made of ISO 6983 words (an address and a plain decimal
 *       number, no exponent, no comma), and is one the dialect's templates can write;</li>
 *   <li>the units block (mm or in) comes before the first move;</li>
 *   <li>the synchronisation is on before every feed move, with at least the machine's settle time
 *       of dwell before the first; it is off before the spindles stop and at the end;</li>
 *   <li>every speed and feed word is above zero; the hob speed word, and the work speed word times
 *       the ratio, lie within the hob spindle's range and the hob maker's limit; the work speed
 *       word, and the hob speed word over the ratio, within the work spindle's range; the ratio
 *       is not above the machine's largest; the feed word times the higher of those work speeds
 *       is not above the machine's feed rate;</li>
 *   <li>no feed or rapid goes inside the final root diameter;</li>
 *   <li>no rapid brings the hob into the blank: the hob's section in the axial plane through its
 *       centre (an ellipse, half axes r_a0 across and r_a0 / cos η along the work axis) stays out
 *       of the blank's section anywhere in the box between the rapid's end points; a rapid
 *       straight out from the work axis (the retract after a cut) is exempt, the first rapid is
 *       checked at its end.</li>
 * </ol>
 * Values are compared as read, allowing a relative 1e-9 for the binary arithmetic of the
 * conversion to millimetres.
 */
public final class NcReader {

    /**
     * What a program must keep to, from the job and its planned cycle.
     *
     * @param rootDiameterMm       final root diameter, mm
     * @param blankDiameterMm      blank diameter, mm
     * @param faceWidthMm          face width, mm (the blank lies from 0 to this along the axial axis)
     * @param hobOutsideDiameterMm hob outside diameter, mm
     * @param swivelDeg            swivel angle, degrees (its size is used)
     * @param hobMinRpm            lowest hob speed, rpm
     * @param hobMaxRpm            highest hob speed of the machine, rpm
     * @param hobMakerMaxRpm       the hob maker's limit, rpm (infinite when none)
     * @param workMinRpm           lowest work speed, rpm
     * @param workMaxRpm           highest work speed, rpm
     * @param maxSyncRatio         largest hob turns per work turn
     * @param maxFeedMmPerMin      highest feed rate, mm/min
     * @param syncSettleS          dwell the machine needs after synchronising, s
     */
    public record Limits(double rootDiameterMm, double blankDiameterMm, double faceWidthMm,
                         double hobOutsideDiameterMm, double swivelDeg, double hobMinRpm, double hobMaxRpm,
                         double hobMakerMaxRpm, double workMinRpm, double workMaxRpm, double maxSyncRatio,
                         double maxFeedMmPerMin, double syncSettleS) {

        /** The limits of a job and its planned cycle (which must have setup values). */
        public static Limits of(HobJob job, HobCycle cycle) {
            SetupValues s = cycle.setup().orElseThrow(() -> new AssertionError("the cycle has no setup values"));
            var m = job.machine();
            return new Limits(s.finalInfeedDiameterMm(), s.blankDiameterMm(), job.gear().faceWidthMm(),
                    job.hob().outsideDiameterMm(), Math.abs(s.swivelAngleDeg()), m.hobMinRpm(), m.hobMaxRpm(),
                    job.hob().maxRpm().orElse(Double.POSITIVE_INFINITY), m.workMinRpm(), m.workMaxRpm(),
                    m.maxSyncRatio(), m.maxFeedMmPerMin(), m.syncSettleS());
        }
    }

    /** One word: address letter(s) and number text. */
    public record Word(String address, String number) {
        public double value() {
            return Double.parseDouble(number);
        }
    }

    /**
     * One block as written.
     *
     * @param line     line number in the file, 1 = first
     * @param text     the line as written
     * @param words    its ISO 6983 words (comments left out)
     * @param template the template that writes it ({@code feed}, {@code syncOn}, ...), empty when none does
     * @param values   the text each placeholder of that template stands for in this block
     */
    public record Block(int line, String text, List<Word> words, Optional<String> template,
                       Map<String, String> values) {
        /** The first word with this address. */
        public Optional<Word> word(String address) {
            return words.stream().filter(w -> w.address().equals(address)).findFirst();
        }

        /** True when the block comes from this template. */
        public boolean is(String templateName) {
            return template.isPresent() && template.get().equals(templateName);
        }

        /** The number a numeric placeholder stands for ({@code "feed"}, {@code "hobRpm"}). */
        public double number(String placeholder) {
            String v = values.get(placeholder);
            if (v == null) {
                throw new AssertionError("line " + line + " \"" + text + "\" has no {" + placeholder + "}");
            }
            return Double.parseDouble(v);
        }
    }

    private static final String NUMBER = "[+-]?(?:\\d+\\.?\\d*|\\.\\d+)";
    private static final Pattern WORD = Pattern.compile("([A-Z]{1,3})(" + NUMBER + ")");
    private static final double REL = 1e-9;
    private static final List<String> AXES = List.of("radial", "axial", "swivel", "shift");
    private static final double MM_PER_INCH = 25.4;

    /** A template line as a pattern, with the placeholders of its groups in order. */
    private record Shape(String template, List<Pattern> patterns, List<List<String>> placeholders) {
    }

    private final JsonNode dialect;
    private final List<Shape> shapes = new ArrayList<>();

    /** A reader for programs in this dialect (its JSON text). */
    public NcReader(String dialectJson) {
        this.dialect = JsonMapper.builder().build().readTree(dialectJson);
        List<Shape> comments = new ArrayList<>();
        for (Map.Entry<String, JsonNode> t : dialect.get("templates").properties()) {
            List<String> lines = new ArrayList<>();
            if (t.getValue().isArray()) {
                t.getValue().forEach(l -> lines.add(l.asString()));
            } else {
                lines.add(t.getValue().asString());
            }
            if (lines.isEmpty()) {
                continue;
            }
            List<Pattern> patterns = new ArrayList<>();
            List<List<String>> names = new ArrayList<>();
            for (String l : lines) {
                List<String> n = new ArrayList<>();
                patterns.add(pattern(l, n));
                names.add(n);
            }
            (t.getKey().equals("comment") ? comments : shapes).add(new Shape(t.getKey(), patterns, names));
        }
        shapes.addAll(comments);
    }

    /** The dialect as JSON. */
    public JsonNode dialect() {
        return dialect;
    }

    /** Reads a program and fails, listing every broken invariant, unless all hold. */
    public static void assertSafe(String program, String dialectJson, Limits limits) {
        List<String> v = new NcReader(dialectJson).violations(program, limits);
        if (!v.isEmpty()) {
            throw new AssertionError("the posted program breaks " + v.size() + " safety invariant(s):\n  "
                    + String.join("\n  ", v));
        }
    }

    /** The program's blocks, prologue and epilogue lines left out. */
    public List<Block> blocks(String program) {
        List<String> problems = new ArrayList<>();
        List<Block> out = read(program, problems);
        if (!problems.isEmpty()) {
            throw new AssertionError(String.join("\n", problems));
        }
        return out;
    }

    /** Every broken invariant, in the order of the program; empty when the program keeps them all. */
    public List<String> violations(String program, Limits limits) {
        List<String> out = new ArrayList<>();
        List<Block> blocks = read(program, out);
        new Walk(limits, out).run(blocks);
        return out;
    }

    /** Address letter of an axis. */
    public String letter(String axis) {
        return dialect.get("axes").get(axis).get("letter").asString();
    }

    /** Sign of an axis (1 when not given). */
    public int sign(String axis) {
        JsonNode s = dialect.get("axes").get(axis).get("sign");
        return s == null ? 1 : s.asInt();
    }

    /** True when the radial axis is a diameter. */
    public boolean radialIsDiameter() {
        JsonNode d = dialect.get("axes").get("radial").get("diameter");
        return d != null && d.asBoolean();
    }

    /** Decimals of a kind. */
    public int decimals(String kind) {
        return dialect.get("decimals").get(kind).asInt();
    }

    // ---- reading ------------------------------------------------------------------------------

    private List<Block> read(String program, List<String> problems) {
        String ending = dialect.get("lineEnding").asString().equals("crlf") ? "\r\n" : "\n";
        if (!program.endsWith(ending)) {
            problems.add("the program does not end with the dialect's line ending");
            return List.of();
        }
        String[] lines = program.substring(0, program.length() - ending.length()).split(ending, -1);
        int first = count("prologue");
        int last = lines.length - count("epilogue");
        int max = dialect.get("maxLineLength").asInt();
        Pattern number = lineNumber();
        List<String> bodies = new ArrayList<>();
        for (int i = 0; i < lines.length; i++) {
            String l = lines[i];
            if (l.contains("\r") || l.contains("\n")) {
                problems.add("line " + (i + 1) + " mixes line endings");
            }
            if (i < first || i >= last) {
                bodies.add(null);
                continue;
            }
            if (l.length() > max) {
                problems.add("line " + (i + 1) + " is longer than " + max + " characters: " + l);
            }
            String body = number == null ? l : number.matcher(l).replaceFirst("");
            if (number != null && body.equals(l)) {
                problems.add("line " + (i + 1) + " has no line number: " + l);
            }
            bodies.add(body);
        }
        List<Block> out = new ArrayList<>();
        for (int i = first; i < last; ) {
            int taken = block(i, lines, bodies, problems, out);
            i += Math.max(1, taken);
        }
        return out;
    }

    /**
     * Reads the block at line {@code i}: the template whose lines match the most program lines from
     * there (a template of several lines is one block with all their values). Returns the lines taken.
     */
    private int block(int i, String[] lines, List<String> bodies, List<String> problems, List<Block> out) {
        Shape best = null;
        Map<String, String> values = Map.of();
        for (Shape s : shapes) {
            if (best != null && s.patterns().size() <= best.patterns().size()) {
                continue;
            }
            Map<String, String> found = new HashMap<>();
            if (matches(s, i, bodies, found)) {
                best = s;
                values = found;
            }
        }
        if (best == null) {
            problems.add("line " + (i + 1) + " is no block the dialect's templates write: " + lines[i]);
            out.add(new Block(i + 1, lines[i], words(i + 1, lines[i], bodies.get(i), problems), Optional.empty(),
                    Map.of()));
            return 1;
        }
        int n = best.patterns().size();
        List<Word> words = new ArrayList<>();
        StringBuilder text = new StringBuilder();
        for (int k = 0; k < n; k++) {
            words.addAll(words(i + k + 1, lines[i + k], bodies.get(i + k), problems));
            text.append(k == 0 ? "" : " / ").append(lines[i + k]);
        }
        out.add(new Block(i + 1, text.toString(), words, Optional.of(best.template()), values));
        return n;
    }

    private static boolean matches(Shape s, int i, List<String> bodies, Map<String, String> values) {
        for (int k = 0; k < s.patterns().size(); k++) {
            String body = i + k < bodies.size() ? bodies.get(i + k) : null;
            if (body == null) {
                return false;
            }
            Matcher m = s.patterns().get(k).matcher(body);
            if (!m.matches()) {
                return false;
            }
            List<String> names = s.placeholders().get(k);
            for (int g = 0; g < names.size(); g++) {
                values.put(names.get(g), m.group(g + 1));
            }
        }
        return true;
    }

    private static List<Word> words(int line, String text, String body, List<String> problems) {
        List<Word> words = new ArrayList<>();
        String code = body.replaceAll("\\([^)]*\\)", " ");
        int semi = code.indexOf(';');
        if (semi >= 0) {
            code = code.substring(0, semi);
        }
        for (String token : code.strip().split("\\s+")) {
            if (token.isEmpty()) {
                continue;
            }
            Matcher m = WORD.matcher(token);
            if (m.matches()) {
                words.add(new Word(m.group(1), m.group(2)));
            } else {
                problems.add("line " + line + ": \"" + token + "\" is not an ISO 6983 word in: " + text);
            }
        }
        return words;
    }

    private int count(String key) {
        JsonNode n = dialect.get(key);
        return n == null ? 0 : n.size();
    }

    private Pattern lineNumber() {
        JsonNode n = dialect.get("lineNumbers");
        return n == null ? null : Pattern.compile("^" + Pattern.quote(n.get("word").asString()) + "\\d+ ");
    }

    /** A template line as a regular expression: literal text quoted, each placeholder a group. */
    private Pattern pattern(String template, List<String> names) {
        StringBuilder re = new StringBuilder();
        Matcher m = Pattern.compile("\\{([^}]*)}").matcher(template);
        int at = 0;
        while (m.find()) {
            re.append(Pattern.quote(template.substring(at, m.start())));
            String p = m.group(1);
            names.add(p);
            if (AXES.contains(p)) {
                re.append(Pattern.quote(letter(p)));
            } else if (p.equals("safeRadial")) {
                re.append(Pattern.quote(letter("radial")));
            }
            re.append('(').append(placeholderPattern(p)).append(')');
            at = m.end();
        }
        re.append(Pattern.quote(template.substring(at)));
        return Pattern.compile(re.toString());
    }

    private String placeholderPattern(String p) {
        return switch (p) {
            case "text", "programName" -> ".*";
            case "workDir" -> words("work");
            case "hobDir" -> words("hob");
            case "radial", "axial", "swivel", "shift", "workRpm", "hobRpm", "hobTurns", "workTurns", "differential", "seconds", "milliseconds", "feed",
                 "programNumber", "safeRadial", "tool" -> NUMBER;
            default -> "\\S*";
        };
    }

    private String words(String spindle) {
        JsonNode r = dialect.get("rotation").get(spindle);
        return "(?:" + Pattern.quote(r.get("clockwise").asString()) + "|"
                + Pattern.quote(r.get("counterClockwise").asString()) + ")";
    }

    // ---- the invariants -----------------------------------------------------------------------

    /** One pass over the blocks with the machine's state. */
    private final class Walk {
        private final Limits lim;
        private final List<String> out;
        private Double mmPerUnit;
        private boolean synced;
        private boolean fed;
        private double settle;
        private double workWord = Double.NaN;
        private double workBound = Double.NaN;
        private double[] at;

        Walk(Limits limits, List<String> out) {
            this.lim = limits;
            this.out = out;
        }

        void run(List<Block> blocks) {
            for (Block b : blocks) {
                String t = b.template().orElse("");
                switch (t) {
                    case "syncOn", "syncOnHelix" -> sync(b);
                    case "unitsMm" -> mmPerUnit = 1.0;
                    case "unitsIn" -> mmPerUnit = MM_PER_INCH;
                    case "workSpindle" -> workWord = positive(b, "workRpm", "work speed");
                    case "syncOff" -> synced = false;
                    case "spindlesStop" -> {
                        if (synced) {
                            fail(b, "the spindles stop while synchronised");
                        }
                    }
                    case "programEnd" -> {
                        if (synced) {
                            fail(b, "the program ends synchronised");
                        }
                    }
                    case "dwell" -> {
                        if (synced && !fed) {
                            settle += b.values().containsKey("seconds") ? b.number("seconds")
                                    : b.number("milliseconds") / 1000;
                        }
                    }
                    case "rapid", "feed" -> move(b, t.equals("rapid"));
                    default -> {
                    }
                }
            }
            if (synced) {
                out.add("the program ends with the spindles synchronised");
            }
        }

        private void sync(Block b) {
            synced = true;
            settle = 0;
            double hob = positive(b, "hobRpm", "hob speed");
            double ratio = b.number("hobTurns") / b.number("workTurns");
            if (!(ratio > 0) || ratio > lim.maxSyncRatio() * (1 + REL)) {
                fail(b, "ratio " + ratio + " above the machine's " + lim.maxSyncRatio());
            }
            if (Double.isNaN(workWord)) {
                fail(b, "the synchronisation comes before the work spindle's speed word");
                return;
            }
            double hobMax = Math.min(lim.hobMaxRpm(), lim.hobMakerMaxRpm());
            for (double h : new double[] {hob, workWord * ratio}) {
                if (!within(h, lim.hobMinRpm(), hobMax)) {
                    fail(b, String.format(Locale.ROOT, "hob speed %s rpm (hob word %s, work word %s at %s:1) outside"
                            + " %s to %s rpm", h, hob, workWord, ratio, lim.hobMinRpm(), hobMax));
                }
            }
            for (double n : new double[] {workWord, hob / ratio}) {
                if (!within(n, lim.workMinRpm(), lim.workMaxRpm())) {
                    fail(b, String.format(Locale.ROOT, "work speed %s rpm (work word %s, hob word %s at %s:1) outside"
                            + " %s to %s rpm", n, workWord, hob, ratio, lim.workMinRpm(), lim.workMaxRpm()));
                }
            }
            workBound = Math.max(workWord, hob / ratio);
        }

        private void move(Block b, boolean rapid) {
            if (mmPerUnit == null) {
                fail(b, "a move before the units block");
                return;
            }
            double dia = b.number("radial") * sign("radial") * (radialIsDiameter() ? 1 : 2) * mmPerUnit;
            double z = b.number("axial") * sign("axial") * mmPerUnit;
            if (dia < lim.rootDiameterMm() * (1 - REL)) {
                fail(b, "diameter " + dia + " mm is inside the final root diameter " + lim.rootDiameterMm() + " mm");
            }
            if (!rapid) {
                if (!synced) {
                    fail(b, "a feed move before the synchronisation is on");
                } else if (!fed && settle < lim.syncSettleS() * (1 - REL)) {
                    fail(b, "the first feed after only " + settle + " s of dwell, the machine needs "
                            + lim.syncSettleS() + " s");
                }
                fed = true;
                double feed = positive(b, "feed", "feed");
                double rate = feed * mmPerUnit * workBound;
                if (rate > lim.maxFeedMmPerMin() * (1 + REL)) {
                    fail(b, "feeds " + rate + " mm/min at up to " + workBound + " rpm of the work, above the machine's "
                            + lim.maxFeedMmPerMin() + " mm/min");
                }
            } else if (at == null || z != at[1] || dia < at[0]) {
                rapidClearsTheBlank(b, dia, z);
            }
            at = new double[] {dia, z};
        }

        /**
         * The box between the rapid's end points (its end alone for the first rapid), at its point
         * nearest the blank: smallest diameter, axial position nearest the face interval [0, b].
         * The hob's axial-plane section reaches h(2 r_a0 − h) under the root of it, over cos η,
         * along the axis at a tip depth h below the blank's surface.
         */
        private void rapidClearsTheBlank(Block b, double dia, double z) {
            double low = at == null ? dia : Math.min(dia, at[0]);
            double z0 = at == null ? z : Math.min(z, at[1]);
            double z1 = at == null ? z : Math.max(z, at[1]);
            double depth = (lim.blankDiameterMm() - low) / 2;
            if (depth <= 0) {
                return;
            }
            double ra0 = lim.hobOutsideDiameterMm() / 2;
            double clear = z1 < 0 ? -z1 : z0 > lim.faceWidthMm() ? z0 - lim.faceWidthMm() : 0;
            double needed = depth >= ra0 ? Double.POSITIVE_INFINITY
                    : Math.sqrt(depth * (2 * ra0 - depth)) / Math.cos(Math.toRadians(lim.swivelDeg()));
            if (clear < needed * (1 - REL) - 1e-12) {
                fail(b, String.format(Locale.ROOT, "the rapid brings the hob into the blank: tip diameter %s mm is"
                        + " %s mm under the blank's surface and needs %s mm of axial clear, it has %s mm", low, depth,
                        needed, clear));
            }
        }

        private double positive(Block b, String placeholder, String what) {
            double v = b.number(placeholder);
            if (!(v > 0)) {
                fail(b, what + " word " + v + " is not above zero");
            }
            return v;
        }

        private boolean within(double v, double min, double max) {
            return v >= min * (1 - REL) && v <= max * (1 + REL);
        }

        private void fail(Block b, String what) {
            out.add("line " + b.line() + " \"" + b.text() + "\": " + what);
        }
    }
}
