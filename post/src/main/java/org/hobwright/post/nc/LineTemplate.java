package org.hobwright.post.nc;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;

/**
 * One line of a dialect template: literal text with {@code {placeholder}} fields.
 *
 * @param source   the template text as written
 * @param segments literal texts and placeholders in order
 */
public record LineTemplate(String source, List<Object> segments) {

    public LineTemplate {
        segments = List.copyOf(segments);
    }

    /**
     * Parses a template line.
     *
     * @param text    the template text
     * @param allowed the placeholders this template may use
     * @param problem receives the problem text when the line is not valid
     * @return the template, or empty when it is not valid
     */
    public static Optional<LineTemplate> parse(String text, Set<Placeholder> allowed, List<String> problem) {
        List<Object> segments = new ArrayList<>();
        int i = 0;
        while (i < text.length()) {
            int open = text.indexOf('{', i);
            int close = text.indexOf('}', i);
            if (close >= 0 && (open < 0 || close < open)) {
                problem.add("a '}' without a '{' at position " + (close + 1));
                return Optional.empty();
            }
            if (open < 0) {
                segments.add(text.substring(i));
                break;
            }
            if (open > i) {
                segments.add(text.substring(i, open));
            }
            if (close < 0) {
                problem.add("the placeholder opened at position " + (open + 1) + " is not closed with '}'");
                return Optional.empty();
            }
            String name = text.substring(open + 1, close);
            Optional<Placeholder> p = Placeholder.byKey(name);
            if (p.isEmpty()) {
                problem.add("unknown placeholder {" + name + "}");
                return Optional.empty();
            }
            if (!allowed.contains(p.get())) {
                problem.add("placeholder {" + name + "} has no value in this template");
                return Optional.empty();
            }
            segments.add(p.get());
            i = close + 1;
        }
        return Optional.of(new LineTemplate(text, segments));
    }

    /**
     * Fills the placeholders.
     *
     * @param values a value for every placeholder the line uses
     * @return the line
     * @throws IllegalArgumentException naming the placeholder when a value is missing
     */
    public String render(Map<Placeholder, String> values) {
        StringBuilder sb = new StringBuilder();
        for (Object s : segments) {
            if (s instanceof Placeholder p) {
                String v = values.get(p);
                if (v == null) {
                    throw new IllegalArgumentException("no value for placeholder {" + p.key() + "} in \"" + source + "\"");
                }
                sb.append(v);
            } else {
                sb.append((String) s);
            }
        }
        return sb.toString();
    }

    /**
     * The address letters written right before a placeholder ({@code S} in {@code G97 S{workRpm} M3}),
     * for messages that name a word; empty when the line does not use the placeholder.
     */
    public Optional<String> address(Placeholder p) {
        for (int i = 0; i < segments.size(); i++) {
            if (segments.get(i) == p) {
                String before = i > 0 && segments.get(i - 1) instanceof String t ? t : "";
                int start = before.length();
                while (start > 0 && Character.isLetter(before.charAt(start - 1))) {
                    start--;
                }
                return Optional.of(before.substring(start));
            }
        }
        return Optional.empty();
    }
}
