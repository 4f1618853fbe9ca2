package org.hobwright.samples.host;

import java.io.IOException;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import java.util.Optional;
import java.util.Properties;
import java.util.TreeMap;

/**
 * The answers this host gives the wizard, read from a {@code .properties} file (UTF-8).
 * Keys are the wizard's field keys ({@code gear.teeth}, {@code hob.starts} ...); keys that start
 * with {@code host.} are this host's own settings and never reach the wizard.
 *
 * @param answers the wizard answers by field key
 * @param host    the host's own settings, without the {@code host.} prefix
 */
public record AnswerSheet(Map<String, String> answers, Map<String, String> host) {

    /** Prefix of the host's own keys. */
    public static final String HOST_PREFIX = "host.";

    public AnswerSheet {
        answers = Map.copyOf(answers);
        host = Map.copyOf(host);
    }

    /**
     * Reads a properties file.
     *
     * @throws IOException when the file cannot be read
     */
    public static AnswerSheet read(Path file) throws IOException {
        Properties p = new Properties();
        try (Reader r = Files.newBufferedReader(file, StandardCharsets.UTF_8)) {
            p.load(r);
        }
        Map<String, String> answers = new TreeMap<>();
        Map<String, String> host = new TreeMap<>();
        for (String key : p.stringPropertyNames()) {
            String value = p.getProperty(key).strip();
            if (key.startsWith(HOST_PREFIX)) {
                host.put(key.substring(HOST_PREFIX.length()), value);
            } else {
                answers.put(key, value);
            }
        }
        return new AnswerSheet(answers, host);
    }

    /** The answer for a wizard field, if the sheet has one. */
    public Optional<String> answer(String key) {
        return Optional.ofNullable(answers.get(key));
    }

    /** A host setting, if given. */
    public Optional<String> setting(String key) {
        return Optional.ofNullable(host.get(key));
    }

    /** True when the sheet says warnings may be accepted ({@code host.acceptWarnings=true}). */
    public boolean acceptWarnings() {
        return Boolean.parseBoolean(host.getOrDefault("acceptWarnings", "false"));
    }
}
