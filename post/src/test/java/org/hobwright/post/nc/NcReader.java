package org.hobwright.post.nc;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/**
 * A small reader of NC programs, independent of the writer: it splits the text into blocks and
 * each block into ISO 6983 words (an address letter and a number; the standard's word address
 * format), after removing comments in parentheses or after a semicolon. It learns from the raw
 * dialect JSON only the axis letters and conventions and the literal words of each template, to
 * say which block is which.
 */
public final class NcReader {

    /** One word: address letter(s) and number text. */
    public record Word(String address, String number) {
        /** The number. */
        public double value() {
            return Double.parseDouble(number);
        }
    }

    /** One block: the line as written and its words. */
    public record Block(int line, String text, List<Word> words) {
        /** The first word with this address. */
        public Optional<Word> word(String address) {
            return words.stream().filter(w -> w.address().equals(address)).findFirst();
        }

        /** True when the block holds every one of these literal words. */
        public boolean has(List<String> literalWords) {
            List<String> mine = words.stream().map(w -> w.address() + w.number()).toList();
            return !literalWords.isEmpty() && mine.containsAll(literalWords);
        }
    }

    private static final Pattern WORD = Pattern.compile("([A-Z]{1,3})([+-]?(?:\\d+\\.?\\d*|\\.\\d+))");

    private final JsonNode dialect;

    /** A reader for programs of this dialect. */
    public NcReader(String dialectJson) {
        this.dialect = JsonMapper.builder().build().readTree(dialectJson);
    }

    /** The raw dialect. */
    public JsonNode dialect() {
        return dialect;
    }

    /** The program's blocks, prologue and epilogue lines ({@code %}) left out. */
    public List<Block> blocks(String program) {
        String ending = dialect.get("lineEnding").asString().equals("crlf") ? "\r\n" : "\n";
        if (!program.endsWith(ending)) {
            throw new AssertionError("the program must end with the dialect's line ending");
        }
        String[] lines = program.substring(0, program.length() - ending.length()).split(ending, -1);
        List<Block> out = new ArrayList<>();
        for (int i = 0; i < lines.length; i++) {
            String l = lines[i];
            if (l.contains("\r") || l.contains("\n")) {
                throw new AssertionError("line " + (i + 1) + " mixes line endings");
            }
            if (l.equals("%")) {
                continue;
            }
            String code = l.replaceAll("\\([^)]*\\)", " ");
            int semi = code.indexOf(';');
            if (semi >= 0) {
                code = code.substring(0, semi);
            }
            List<Word> words = new ArrayList<>();
            for (String token : code.strip().split("\\s+")) {
                if (token.isEmpty()) {
                    continue;
                }
                Matcher m = WORD.matcher(token);
                if (!m.matches()) {
                    throw new AssertionError("line " + (i + 1) + ": \"" + token + "\" is not an ISO 6983 word in: " + l);
                }
                words.add(new Word(m.group(1), m.group(2)));
            }
            out.add(new Block(i + 1, l, words));
        }
        return out;
    }

    /** The literal words (no placeholder) of a template's line. */
    public List<String> literalWords(String template, int line) {
        JsonNode t = dialect.get("templates").get(template);
        String text = t.isArray() ? t.get(line).asString() : t.asString();
        return Arrays.stream(text.split("\\s+")).filter(w -> !w.contains("{") && !w.contains("(")
                && !w.contains(";") && WORD.matcher(w).matches()).toList();
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
}
