package org.hobwright.wizard.store;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.OutputStream;
import java.net.URL;
import java.net.URLClassLoader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.jar.JarEntry;
import java.util.jar.JarOutputStream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The built-in scenario is found in a folder on the class path and inside a jar, as the runnable jar holds it. */
class BuiltinsTest {
    @TempDir
    Path dir;

    @Test
    void listsAndReadsFromAFolder() {
        Builtins b = new Builtins(BuiltinsTest.class.getClassLoader());
        assertTrue(b.names("machines").containsAll(List.of("ottmere-4008", "varrow-1605")));
        assertTrue(b.folders("templates").contains("varrow-1605"));
        assertTrue(b.text("machines/varrow-1605.json").orElseThrow().contains("hobwright-machine"));
        assertEquals(List.of(), b.names("no-such-folder"));
    }

    @Test
    void listsAndReadsFromAJar() throws IOException {
        Path jar = dir.resolve("scenario.jar");
        try (OutputStream file = Files.newOutputStream(jar); JarOutputStream out = new JarOutputStream(file)) {
            for (String d : List.of("org/", "org/hobwright/", "org/hobwright/builtin/", "org/hobwright/builtin/machines/",
                    "org/hobwright/builtin/templates/", "org/hobwright/builtin/templates/lathe-1/")) {
                out.putNextEntry(new JarEntry(d));
                out.closeEntry();
            }
            for (String f : List.of("machines/lathe-1.json", "machines/lathe-2.json", "templates/lathe-1/fine.json")) {
                out.putNextEntry(new JarEntry(Builtins.ROOT + f));
                out.write("{}".getBytes(StandardCharsets.UTF_8));
                out.closeEntry();
            }
        }
        try (URLClassLoader loader = new URLClassLoader(new URL[] {jar.toUri().toURL()}, null)) {
            Builtins b = new Builtins(loader);
            assertEquals(List.of("lathe-1", "lathe-2"), b.names("machines"));
            assertEquals(List.of("lathe-1"), b.folders("templates"));
            assertEquals(List.of("fine"), b.names("templates/lathe-1"));
            assertEquals("{}", b.text("templates/lathe-1/fine.json").orElseThrow());
        }
    }
}
