package org.hobwright.samples.host;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import java.util.Optional;
import org.hobwright.api.job.MachineProfile;
import org.hobwright.api.spi.WriteContext;

/**
 * Finds the NC dialect a machine profile names: first in the host's own dialect folder (if it has
 * one), then among the dialects shipped inside the Hobwright jar (resources under
 * {@code org/hobwright/builtin/dialects/}). The NC writer gets the dialect's text through
 * {@link WriteContext#resources()}; it never reads files itself.
 *
 * @param folder the host's own dialect folder, if any
 * @param plugin the class loader that sees the Hobwright jar
 */
public record DialectSource(Optional<Path> folder, ClassLoader plugin) {

    /** Where the shipped dialects sit inside the Hobwright jar. */
    public static final String BUILT_IN = "org/hobwright/builtin/dialects/";

    /**
     * The writer resources for a machine: the dialect text and its name, or nothing when the
     * dialect is found nowhere (the NC writer then says so in a finding).
     */
    public Map<String, String> resourcesFor(MachineProfile machine) {
        String file = machine.dialect() + ".json";
        return read(file).map(text -> Map.of(WriteContext.DIALECT, text, WriteContext.DIALECT_NAME, machine.dialect()))
                .orElse(Map.of());
    }

    private Optional<String> read(String file) {
        try {
            if (folder.isPresent() && Files.isRegularFile(folder.get().resolve(file))) {
                return Optional.of(Files.readString(folder.get().resolve(file), StandardCharsets.UTF_8));
            }
            try (InputStream in = plugin.getResourceAsStream(BUILT_IN + file)) {
                return in == null ? Optional.empty() : Optional.of(new String(in.readAllBytes(), StandardCharsets.UTF_8));
            }
        } catch (IOException e) {
            throw new UncheckedIOException("dialect " + file + " could not be read", e);
        }
    }
}
