package org.hobwright.hosttest;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.net.MalformedURLException;
import java.net.URL;
import java.net.URLClassLoader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.time.ZoneOffset;
import java.util.List;
import java.util.stream.Stream;

/** What the tests share: where the jars and samples are, the two loader arrangements, a shop library. */
final class Host {
    /** The date every test writes with: 2026-12-01, as SOURCE_DATE_EPOCH seconds too. */
    static final LocalDate DATE = LocalDate.of(2026, 12, 1);
    static final long EPOCH = DATE.atStartOfDay().toEpochSecond(ZoneOffset.UTC);

    private Host() {
    }

    /** How a host gives the plugin its class loader. */
    enum Arrangement {
        /** A plain URLClassLoader: the host's class path first (the JDK's default). */
        PARENT_FIRST,
        /** The plugin's jar first, the api shared from the host. */
        CHILD_FIRST;

        URLClassLoader loader(Path jar) {
            URL[] urls = {url(jar)};
            ClassLoader parent = Host.class.getClassLoader();
            return this == PARENT_FIRST ? new URLClassLoader("hobwright-plugin", urls, parent)
                    : new ChildFirstLoader(urls, parent);
        }
    }

    static Path pluginJar() {
        return Path.of(System.getProperty("hobwright.pluginJar"));
    }

    static Path terminalJar() {
        return Path.of(System.getProperty("hobwright.terminalJar"));
    }

    /** {@return the version of this build, as in the jars' names} */
    static String version() {
        return System.getProperty("hobwright.version");
    }

    static Path samples() {
        return Path.of(System.getProperty("hobwright.samples"));
    }

    /** Every sample job file, in name order. */
    static List<Path> sampleJobs() {
        try (Stream<Path> s = Files.list(samples().resolve("jobs"))) {
            return s.filter(p -> p.toString().endsWith(".json")).sorted().toList();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /**
     * A shop's library folder, written with the host's own Jackson 2: the sliding-headstock
     * lathe's dialect saved with {@code "maxLineLength": 80.0} (a decimal where the file format
     * counts characters), and a cutting-data table whose free-machining steel row differs from the
     * built-in one, so that a planner that ignored the shop's table would give other speeds.
     */
    static Path shopLibrary(Path home) throws IOException {
        ObjectMapper jackson2 = new ObjectMapper();
        ObjectNode dialect = (ObjectNode) jackson2.readTree(samples().resolve("dialects/varrow-ctl.json").toFile());
        dialect.remove("$schema");
        dialect.put("maxLineLength", 80.0);
        Files.createDirectories(home.resolve("dialects"));
        jackson2.writerWithDefaultPrettyPrinter().writeValue(home.resolve("dialects/varrow-ctl.json").toFile(), dialect);
        Files.writeString(home.resolve("cutting-data.json"), """
                {
                  "format": "hobwright-cutting-data",
                  "version": 1,
                  "units": "mm",
                  "rows": [
                    { "workMaterial": "steel-free-machining", "hobMaterial": "hss-coated", "cuttingSpeed": [70, 80],
                      "roughFeed": [1.5, 3.0], "finishFeed": [0.5, 1.5], "maxChipThickness": 0.20,
                      "status": "the shop's own, invented for this test" }
                  ]
                }
                """);
        return home;
    }

    static URL url(Path p) {
        try {
            return p.toUri().toURL();
        } catch (MalformedURLException e) {
            throw new IllegalArgumentException(e);
        }
    }
}
