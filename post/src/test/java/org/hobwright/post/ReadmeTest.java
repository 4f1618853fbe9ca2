package org.hobwright.post;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.hobwright.post.csv.CsvColumn;
import org.hobwright.post.nc.DialectKeys;
import org.hobwright.post.nc.Placeholder;
import org.hobwright.post.nc.TemplateKey;
import org.junit.jupiter.api.Test;

/** post/README.md documents every placeholder, template, CSV column and finding code the code knows. */
class ReadmeTest {

    private static String readme() throws IOException {
        return Files.readString(Path.of("README.md"));
    }

    @Test
    void documentsEveryPlaceholderAndTemplate() throws IOException {
        String r = readme();
        for (Placeholder p : Placeholder.values()) {
            assertTrue(r.contains("`{" + p.key() + "}`"), p.key());
        }
        for (TemplateKey t : TemplateKey.values()) {
            assertTrue(r.contains("| `" + t.key() + "` | " + (t.required() ? "yes" : "when")), t.key());
        }
    }

    /** The dialect's key table, as the definition gives it. */
    static String dialectKeyTable() {
        StringBuilder t = new StringBuilder("| key | value | required | meaning |\n|---|---|---|---|\n");
        for (DialectKeys.Key k : DialectKeys.ALL) {
            String value = switch (k.kind()) {
                case TEXT -> k.choices().isEmpty() ? "text" : k.choices().stream().map(c -> "`\"" + c + "\"`")
                        .collect(java.util.stream.Collectors.joining(" or "));
                case ANY_TEXT -> "text, may be empty";
                case LETTERS -> "1 to 3 letters";
                case INTEGER -> k.min() == k.max() ? "`" + k.min() + "`" : !k.choices().isEmpty()
                        ? String.join(" or ", k.choices()) : "whole number " + k.min() + "–" + k.max();
                case BOOLEAN -> "`true` or `false`";
                case OBJECT -> "object";
                case LINES -> "text or list of texts";
                case TEMPLATES -> "object of templates";
            };
            t.append("| `").append(k.path()).append("` | ").append(value).append(" | ")
                    .append(k.required() ? "yes" : "no").append(" | ").append(k.meaning()).append(" |\n");
        }
        return t.toString();
    }

    @Test
    void theDialectKeyTableIsTheDefinition() throws IOException {
        String marker = "<!-- dialect keys: generated from DialectKeys, checked by ReadmeTest -->\n";
        String r = readme();
        int at = r.indexOf(marker);
        assertTrue(at >= 0, "README has the dialect key table's marker");
        int from = at + marker.length();
        int to = r.indexOf("\n\n", from);
        String table = dialectKeyTable();
        if (System.getenv("HOBWRIGHT_WRITE_README") != null) {
            Files.writeString(Path.of("README.md"), r.substring(0, from) + table.strip() + r.substring(to));
            r = readme();
            to = r.indexOf("\n\n", from);
        }
        assertEquals(table.strip(), r.substring(from, to),
                "post/README.md's dialect key table differs from DialectKeys; rewrite it with HOBWRIGHT_WRITE_README=1");
    }

    @Test
    void documentsEveryCsvColumn() throws IOException {
        String r = readme();
        for (CsvColumn c : CsvColumn.values()) {
            assertTrue(r.contains("`" + c.header() + "`"), c.header());
        }
    }

    @Test
    void documentsEveryFindingCode() throws IOException {
        String r = readme();
        Pattern code = Pattern.compile("\"((?:NC|CSV|POST)_[A-Z_]+)\"");
        try (Stream<Path> files = Files.walk(Path.of("src", "main", "java"))) {
            for (Path f : files.filter(p -> p.toString().endsWith(".java")).toList()) {
                Matcher m = code.matcher(Files.readString(f));
                while (m.find()) {
                    assertTrue(r.contains("`" + m.group(1) + "`"), m.group(1) + " from " + f);
                }
            }
        }
    }
}
