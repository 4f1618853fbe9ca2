package org.hobwright.api.spi;

import java.util.Map;
import java.util.Optional;
import org.hobwright.api.Validate;
import org.hobwright.api.job.HobJob;

/**
 * What a writer gets besides the cycle.
 *
 * @param job         the job the cycle was planned from
 * @param generatedOn the date (ISO 8601, e.g. {@code 2026-12-01}) to print in headers; injected so
 *                    output is reproducible
 * @param toolVersion version of the program that wrote the files
 * @param resources   named texts a writer may need, e.g. {@link #DIALECT} → the dialect file's JSON
 */
public record WriteContext(HobJob job, String generatedOn, String toolVersion, Map<String, String> resources) {

    /** Resource key of the NC dialect text (JSON). */
    public static final String DIALECT = "dialect";

    /** Resource key of the dialect's name or file, for messages. */
    public static final String DIALECT_NAME = "dialect.name";

    public WriteContext {
        Validate.present("job", job);
        Validate.text("generatedOn", generatedOn);
        Validate.text("toolVersion", toolVersion);
        resources = Map.copyOf(Validate.present("resources", resources));
    }

    /** A named resource, if present. */
    public Optional<String> resource(String key) {
        return Optional.ofNullable(resources.get(key));
    }
}
