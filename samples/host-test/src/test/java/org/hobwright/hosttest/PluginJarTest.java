package org.hobwright.hosttest;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.util.Collections;
import java.util.List;
import java.util.jar.JarFile;
import java.util.zip.ZipEntry;
import org.junit.jupiter.api.Test;

/** The plugin jar holds only Hobwright's own classes and resources, and no api. */
class PluginJarTest {

    private static List<String> entries() throws IOException {
        try (JarFile jar = new JarFile(Host.pluginJar().toFile())) {
            return Collections.list(jar.entries()).stream().map(ZipEntry::getName).toList();
        }
    }

    @Test
    void everyEntryIsHobwrightsOwnOrMetaInf() throws IOException {
        List<String> outside = entries().stream()
                .filter(e -> !e.startsWith("org/hobwright/") && !e.startsWith("META-INF/") && !e.equals("org/"))
                .toList();
        assertEquals(List.of(), outside, "entries outside org/hobwright/ and META-INF/");
    }

    @Test
    void theApiComesFromTheHost() throws IOException {
        assertEquals(List.of(), entries().stream().filter(e -> e.startsWith("org/hobwright/api/")).toList());
    }

    @Test
    void noCommandLineLibraryNoTerminalToolNoReleaseSpecificCopies() throws IOException {
        List<String> all = entries();
        assertFalse(all.stream().anyMatch(e -> e.contains("picocli")), "picocli is the terminal's");
        assertFalse(all.stream().anyMatch(e -> e.startsWith("org/hobwright/wizard/cli/")), "the terminal tool");
        assertFalse(all.stream().anyMatch(e -> e.startsWith("META-INF/versions/")),
                "release-specific class copies would keep the libraries' own package folders");
    }

    @Test
    void bundledLibrariesAreRelocatedUnderHobwright() throws IOException {
        List<String> all = entries();
        assertTrue(all.contains("org/hobwright/internal/jackson/databind/ObjectMapper.class"), "Jackson 3, relocated");
        assertTrue(all.contains("org/hobwright/internal/jackson/annotation/JsonProperty.class"),
                "the 2.x annotations Jackson 3 reads, relocated");
        assertTrue(all.contains("META-INF/services/org.hobwright.api.spi.HostProvider"), "the façade's provider");
    }
}
