package org.hobwright.wizard.store;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.net.JarURLConnection;
import java.net.URISyntaxException;
import java.net.URL;
import java.nio.charset.StandardCharsets;
import java.nio.file.FileSystem;
import java.nio.file.FileSystems;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.stream.Stream;

/**
 * The read-only sample scenario bundled on the class path under {@value #ROOT}
 * ({@code machines/}, {@code templates/MACHINE/}, {@code dialects/}, {@code jobs/}, {@code schema/}).
 * A listing opens the jar for itself and closes it before it returns.
 */
final class Builtins {
    /** Class-path folder of the bundled scenario. */
    static final String ROOT = "org/hobwright/builtin/";

    private final ClassLoader loader;

    Builtins(ClassLoader loader) {
        this.loader = loader;
    }

    /** The text of a bundled file, e.g. {@code machines/varrow-1605.json}. */
    Optional<String> text(String relative) {
        try (InputStream in = loader.getResourceAsStream(ROOT + relative)) {
            return in == null ? Optional.empty() : Optional.of(new String(in.readAllBytes(), StandardCharsets.UTF_8));
        } catch (IOException e) {
            return Optional.empty();
        }
    }

    /** Names (without {@code .json}) of the bundled files in a folder, sorted. */
    List<String> names(String folder) {
        return entries(folder, false);
    }

    /** Names of the sub-folders of a bundled folder (the machines that have templates), sorted. */
    List<String> folders(String folder) {
        return entries(folder, true);
    }

    private List<String> entries(String folder, boolean dirs) {
        URL url = loader.getResource(ROOT + folder);
        if (url == null) {
            return List.of();
        }
        try {
            if ("jar".equals(url.getProtocol())) {
                // a file system of our own on the jar, closed at once: nothing stays open or
                // registered JVM-wide, so a host can close its loader and replace the jar
                JarURLConnection connection = (JarURLConnection) url.openConnection();
                Path jar = Path.of(connection.getJarFileURL().toURI());
                try (FileSystem fs = FileSystems.newFileSystem(jar, (ClassLoader) null)) {
                    return list(fs.getPath(connection.getEntryName()), dirs);
                }
            }
            return list(Path.of(url.toURI()), dirs);
        } catch (URISyntaxException | IOException | UncheckedIOException | IllegalArgumentException
                 | java.nio.file.FileSystemNotFoundException | java.nio.file.ProviderNotFoundException e) {
            return List.of();
        }
    }

    private static List<String> list(Path dir, boolean dirs) throws IOException {
        List<String> out = new ArrayList<>();
        try (Stream<Path> s = Files.list(dir)) {
            s.forEach(p -> {
                String n = p.getFileName().toString().replace("/", "");
                if (dirs && Files.isDirectory(p) && Names.valid(n)) {
                    out.add(n);
                } else if (!dirs && n.endsWith(".json") && Names.valid(n.substring(0, n.length() - 5))) {
                    out.add(n.substring(0, n.length() - 5));
                }
            });
        }
        out.sort(null);
        return out;
    }
}
