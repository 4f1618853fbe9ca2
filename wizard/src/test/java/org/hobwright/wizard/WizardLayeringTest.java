package org.hobwright.wizard;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/**
 * The wizard finds the writers through the SPI and never calls the post module's internals: the
 * only package of {@code org.hobwright.post} its main sources may name is {@code post.text}
 * (DEVELOPERS.md, "Layout").
 */
class WizardLayeringTest {
    private static final Pattern POST_REFERENCE = Pattern.compile("org\\.hobwright\\.post\\.([a-z]+)");

    @Test
    void mainSourcesNameOnlyThePostJsonPackage() throws IOException {
        Path main = Path.of("src/main/java");
        assertTrue(Files.isDirectory(main), "run from the wizard module folder");
        List<String> offences = new ArrayList<>();
        int files = 0;
        try (Stream<Path> all = Files.walk(main)) {
            for (Path f : (Iterable<Path>) all.filter(p -> p.toString().endsWith(".java"))::iterator) {
                files++;
                Matcher m = POST_REFERENCE.matcher(Files.readString(f));
                while (m.find()) {
                    if (!m.group(1).equals("text")) {
                        offences.add(main.relativize(f) + ": " + m.group());
                    }
                }
            }
        }
        assertTrue(files > 50, "found the wizard's sources (" + files + " files)");
        assertEquals(List.of(), offences);
    }
}
