package org.hobwright.post;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.hobwright.post.csv.CsvColumn;
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
