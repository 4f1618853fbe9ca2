package org.hobwright.samples;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/**
 * The shipped dialects write only words that RS274/NGC (NISTIR 6556, 2000, and its reference
 * interpreter's lathe modes) and ISO 6983-1:2009 define, in the meaning Hobwright uses them, and
 * otherwise invented M words from M100 to M199, the range that interpreter leaves to the user. No
 * feed-per-revolution G99, no dwell under U or F, no inch/metric G70/G71, no tool-and-offset
 * pairs (D beside T, four-digit T), no three-digit per-spindle M words outside the user range.
 */
class ShippedDialectWordsTest {
    private static final Path DIALECTS = Path.of("scenario", "dialects");
    private static final Pattern WORD = Pattern.compile("(?<![A-Za-z{])([A-Z])(\\d+(?:\\.\\d+)?)");

    /** The G words allowed, with what they mean in RS274/NGC and where Hobwright uses them. */
    private static final Map<String, String> G = Map.ofEntries(
            Map.entry("0", "rapid"), Map.entry("1", "feed move"), Map.entry("4", "dwell, P in seconds"),
            Map.entry("7", "lathe diameter mode (reference interpreter)"),
            Map.entry("8", "lathe radius mode (reference interpreter)"), Map.entry("18", "XZ plane"),
            Map.entry("20", "inch"), Map.entry("21", "millimetre"), Map.entry("28", "return home"),
            Map.entry("40", "cutter compensation off"), Map.entry("43", "tool length offset"),
            Map.entry("54", "first work offset"), Map.entry("90", "absolute distances"),
            Map.entry("95", "feed per revolution (ISO 6983 and RS274/NGC)"));
    /** The standard M words allowed: program end, spindle senses and stop, tool change, coolant. */
    private static final List<Integer> M = List.of(3, 4, 5, 6, 8, 9, 30);
    /** Addresses the dialects may use: words, the axes and the parameters of the user M words. */
    private static final String ADDRESSES = "GMSTFPQXZAN";

    static Stream<Path> dialects() throws IOException {
        try (Stream<Path> s = Files.list(DIALECTS)) {
            return s.filter(p -> p.toString().endsWith(".json")).sorted().toList().stream();
        }
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("dialects")
    void onlyStandardWordsInTheirMeaningOrInventedUserMWords(Path file) throws IOException {
        JsonNode d = JsonMapper.builder().build().readTree(Files.readString(file));
        List<String> texts = new ArrayList<>();
        d.get("templates").properties().forEach(e -> lines(e.getValue(), texts));
        d.get("rotation").values().forEach(spindle -> spindle.values().forEach(w -> texts.add(w.asString())));
        for (String key : List.of("radial", "axial", "swivel", "shift")) {
            JsonNode axis = d.at("/axes/" + key + "/letter");
            if (!axis.isMissingNode()) {
                texts.add(axis.asString() + "0");
            }
        }
        for (String t : texts) {
            if (t.startsWith("(") || t.startsWith(";")) {
                continue; // a comment
            }
            Matcher m = WORD.matcher(t);
            while (m.find()) {
                String address = m.group(1);
                String number = m.group(2);
                assertTrue(ADDRESSES.contains(address), file + ": address " + address + " in \"" + t + "\"");
                if (address.equals("G")) {
                    assertTrue(G.containsKey(number), file + ": G" + number + " in \"" + t + "\"");
                } else if (address.equals("M")) {
                    int n = Integer.parseInt(number);
                    assertTrue(M.contains(n) || n >= 100 && n <= 199, file + ": M" + number + " in \"" + t + "\"");
                }
            }
            assertFalse(t.matches(".*\\bT\\d{3,}.*"), file + ": a tool-and-offset T word in \"" + t + "\"");
        }
        assertTrue(d.at("/toolStation/max").asLong() < 100, file + ": tool stations of at most two digits");
    }

    private static void lines(JsonNode v, List<String> out) {
        if (v.isArray()) {
            v.values().forEach(l -> out.add(l.asString()));
        } else {
            out.add(v.asString());
        }
    }
}
