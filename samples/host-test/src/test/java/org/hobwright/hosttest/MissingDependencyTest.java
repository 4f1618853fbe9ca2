package org.hobwright.hosttest;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.net.URLClassLoader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Collections;
import java.util.jar.JarEntry;
import java.util.jar.JarFile;
import java.util.jar.JarOutputStream;
import org.hobwright.api.Hobwright;
import org.hobwright.api.spi.ProviderMissingException;
import org.hobwright.api.spi.Providers;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;
import org.junit.jupiter.api.io.TempDir;

/**
 * A plugin whose bundled library is missing (a jar assembled by hand without it): the host gets a
 * {@link ProviderMissingException} that names the missing class and keeps the cause, never a bare
 * {@link NoClassDefFoundError}.
 */
class MissingDependencyTest {
    private static final String LIBRARY = "org/hobwright/internal/jackson/";

    @TempDir
    Path work;

    @ParameterizedTest
    @EnumSource(Host.Arrangement.class)
    void aMissingLibraryIsNamedWithItsCause(Host.Arrangement arrangement) throws IOException {
        Path jar = withoutLibrary(work.resolve("hobwright-plugin-without-jackson.jar"));
        try (URLClassLoader plugins = arrangement.loader(jar)) {
            ProviderMissingException planner = assertThrows(ProviderMissingException.class,
                    () -> Providers.planner(plugins));
            assertTrue(planner.getMessage().contains("NoClassDefFoundError: " + LIBRARY), planner.getMessage());
            assertEquals("SPI_PROVIDER_BROKEN", planner.problems().get(0).code());

            ProviderMissingException open = assertThrows(ProviderMissingException.class,
                    () -> Hobwright.open(plugins, work.resolve("home")));
            assertTrue(open.getMessage().contains(LIBRARY), open.getMessage());
            assertTrue(open.getMessage().contains("hobwright-plugin.jar"), "says what to put there: " + open.getMessage());
            assertTrue(open.problems().stream().anyMatch(f -> f.message().contains(LIBRARY)), open.problems()::toString);
            assertInstanceOf(LinkageError.class, open.getCause(), "the cause is kept");
        }
    }

    /** The plugin jar less its bundled library. */
    private static Path withoutLibrary(Path target) throws IOException {
        try (JarFile in = new JarFile(Host.pluginJar().toFile());
             OutputStream file = Files.newOutputStream(target);
             JarOutputStream out = new JarOutputStream(file)) {
            for (JarEntry e : Collections.list(in.entries())) {
                if (e.getName().startsWith(LIBRARY)) {
                    continue;
                }
                out.putNextEntry(new JarEntry(e.getName()));
                try (InputStream s = in.getInputStream(e)) {
                    s.transferTo(out);
                }
                out.closeEntry();
            }
        }
        return target;
    }
}
