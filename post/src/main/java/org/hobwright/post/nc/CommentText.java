package org.hobwright.post.nc;

import java.text.Normalizer;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * Makes any text safe for an NC comment: plain printable ASCII (degree, minute and second signs
 * become words, accents are dropped, anything else becomes {@code ?}), the dialect's forbidden
 * characters become spaces, and capitals when the dialect asks for them.
 */
final class CommentText {

    private static final Map<Character, String> WORDS = Map.ofEntries(
            Map.entry('°', " deg"), Map.entry('′', " min"), Map.entry('″', " sec"), Map.entry('µ', "U"),
            Map.entry('−', "-"), Map.entry('–', "-"), Map.entry('—', "-"), Map.entry('×', "X"),
            Map.entry('η', "ETA"), Map.entry('β', "BETA"), Map.entry('γ', "GAMMA"), Map.entry('α', "ALPHA"),
            Map.entry('’', "'"), Map.entry('‘', "'"), Map.entry('“', "\""), Map.entry('”', "\""), Map.entry('≤', "<="),
            Map.entry('≥', ">="));

    private CommentText() {
    }

    /** Cleans a text for a comment. */
    static String clean(String text, Dialect.CommentRules rules) {
        StringBuilder sb = new StringBuilder();
        for (char c : text.toCharArray()) {
            String w = WORDS.get(c);
            sb.append(w != null ? w : String.valueOf(c));
        }
        // accents dropped: decomposed, then the combining marks removed (plain ASCII has none)
        String plain = isAscii(sb) ? sb.toString()
                : Normalizer.normalize(sb, Normalizer.Form.NFD).replaceAll("\\p{M}", "");
        StringBuilder out = new StringBuilder();
        for (char c : plain.toCharArray()) {
            if (rules.forbidden().indexOf(c) >= 0 || Character.isWhitespace(c)) {
                out.append(' ');
            } else if (c < 0x20 || c > 0x7e) {
                out.append('?');
            } else {
                out.append(c);
            }
        }
        String collapsed = tidySpaces(out.toString().strip());
        return rules.upperCase() ? collapsed.toUpperCase(Locale.ROOT) : collapsed;
    }

    private static boolean isAscii(CharSequence text) {
        for (int i = 0; i < text.length(); i++) {
            if (text.charAt(i) > 0x7f) {
                return false;
            }
        }
        return true;
    }

    /** One space where there were several, and none before {@code , ; : .}. */
    static String tidySpaces(String text) {
        StringBuilder out = new StringBuilder(text.length());
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            if (c == ' ') {
                int next = i + 1;
                while (next < text.length() && text.charAt(next) == ' ') {
                    next++;
                }
                i = next - 1;
                if (next < text.length() && ",;:.".indexOf(text.charAt(next)) >= 0) {
                    continue;
                }
            }
            out.append(c);
        }
        return out.toString();
    }

    /** Splits a cleaned text into pieces of at most {@code width} characters, at spaces where possible. */
    static List<String> wrap(String text, int width) {
        List<String> out = new ArrayList<>();
        String rest = text;
        int w = Math.max(width, 8);
        while (rest.length() > w) {
            int cut = rest.lastIndexOf(' ', w);
            if (cut <= 0) {
                cut = w;
            }
            out.add(rest.substring(0, cut).strip());
            rest = rest.substring(cut).strip();
        }
        if (!rest.isEmpty() || out.isEmpty()) {
            out.add(rest);
        }
        return out;
    }
}
