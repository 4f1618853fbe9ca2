package org.hobwright.api.spi;

import java.time.DateTimeException;
import java.time.LocalDate;
import java.util.Map;
import java.util.Optional;
import org.hobwright.api.ApiStatus;
import org.hobwright.api.internal.Checks;
import org.hobwright.api.job.HobJob;

/**
 * What a writer gets besides the cycle.
 *
 * @param job         the job the cycle was planned from
 * @param generatedOn the date (ISO 8601 calendar date, e.g. {@code 2026-12-01}) to print in headers;
 *                    injected so output is reproducible
 * @param toolVersion version of the program that wrote the files
 * @param resources   named texts a writer may need, e.g. {@link #DIALECT} → the dialect file's JSON
 */
@ApiStatus(since = "1.0")
public record WriteContext(HobJob job, String generatedOn, String toolVersion, Map<String, String> resources) {

    /** Resource key of the NC dialect text (JSON). */
    public static final String DIALECT = "dialect";

    /** Resource key of the dialect's name or file, for messages. */
    public static final String DIALECT_NAME = "dialect.name";

    /**
     * Resource key read by the report writer: {@code true} asks for the report also of a cycle with
     * errors, with its findings and without the parts that could not be computed.
     */
    @ApiStatus(since = "1.1")
    public static final String REPORT_WITH_ERRORS = "report.withErrors";

    public WriteContext {
        Checks.present("job", job);
        Checks.text("generatedOn", generatedOn);
        try {
            if (!LocalDate.parse(generatedOn).toString().equals(generatedOn)) {
                throw new DateTimeException(generatedOn);
            }
        } catch (DateTimeException e) {
            throw new IllegalArgumentException("generatedOn must be an ISO 8601 date like 2026-12-01, was \""
                    + generatedOn + "\"", e);
        }
        Checks.text("toolVersion", toolVersion);
        resources = Map.copyOf(Checks.present("resources", resources));
    }

    /**
     * A context whose date is given as a date.
     *
     * @param job         the job the cycle was planned from
     * @param generatedOn the date to print in headers
     * @param toolVersion version of the program that writes the files
     * @param resources   named texts a writer may need
     * @return the context
     */
    @ApiStatus(since = "1.1")
    public static WriteContext of(HobJob job, LocalDate generatedOn, String toolVersion, Map<String, String> resources) {
        return new WriteContext(job, Checks.present("generatedOn", generatedOn).toString(), toolVersion, resources);
    }

    /** A named resource, if present. */
    public Optional<String> resource(String key) {
        return Optional.ofNullable(resources.get(key));
    }
}
