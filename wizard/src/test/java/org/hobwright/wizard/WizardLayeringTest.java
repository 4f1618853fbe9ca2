package org.hobwright.wizard;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/**
 * The wizard finds the writers through the SPI and never calls the post module: its main sources
 * name no {@code org.hobwright.post} class (the post module is on its class path at run time only),
 * and what both share lives in {@code org.hobwright.text} (module {@code post/text}).
 */
class WizardLayeringTest {

    @Test
    void mainSourcesNeverNameThePostModule() throws IOException {
        Path main = Path.of("src/main/java");
        assertTrue(Files.isDirectory(main), "run from the wizard module folder");
        List<String> offences = new ArrayList<>();
        int files = 0;
        try (Stream<Path> all = Files.walk(main)) {
            for (Path f : (Iterable<Path>) all.filter(p -> p.toString().endsWith(".java"))::iterator) {
                files++;
                if (Files.readString(f).contains("org.hobwright.post")) {
                    offences.add(main.relativize(f).toString());
                }
            }
        }
        assertTrue(files > 50, "found the wizard's sources (" + files + " files)");
        assertEquals(List.of(), offences);
    }

    @Test
    void thePostModuleIsNotOnTheCompileClassPath() throws IOException {
        String pom = Files.readString(Path.of("pom.xml"));
        int post = pom.indexOf("<artifactId>hobwright-post</artifactId>");
        assertTrue(post > 0, "the terminal jar bundles the writers");
        int end = pom.indexOf("</dependency>", post);
        assertTrue(pom.substring(post, end).contains("<scope>runtime</scope>"),
                "hobwright-post is a runtime dependency of the wizard, never a compile one");
    }
}
