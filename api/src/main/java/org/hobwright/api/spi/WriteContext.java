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

    /**
     * Checks the components: a value out of range throws {@link IllegalArgumentException} naming the field and the
     * value.
     *
     * @param job the job the cycle was planned from
     * @param generatedOn the date to print in headers
     * @param toolVersion version of the program that writes the files
     * @param resources named texts a writer may need
     */
    public WriteContext {
        Checks.present("job", job);
        Checks.text("generatedOn", generatedOn);
        if (!isoDate(generatedOn)) {
            throw new IllegalArgumentException("generatedOn must be an ISO 8601 date like 2026-12-01, was \""
                    + generatedOn + "\"");
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
    public static WriteContext of(HobJob job, LocalDate generatedOn, String toolVersion,
                                  Map<String, String> resources) {
        return new WriteContext(job, Checks.present("generatedOn", generatedOn).toString(), toolVersion, resources);
    }

    /**
     * A named resource, if present.
     *
     * @param key key
     * @return A named resource, if present
     */
    public Optional<String> resource(String key) {
        return Optional.ofNullable(resources.get(key));
    }

    /**
     * True for a calendar date written {@code YYYY-MM-DD}. Read digit by digit: the JDK's date
     * parser would load its formatter machinery and regular expressions into every run that writes.
     */
    private static boolean isoDate(String text) {
        if (text.length() != 10 || text.charAt(4) != '-' || text.charAt(7) != '-') {
            return false;
        }
        for (int i = 0; i < 10; i++) {
            if (i != 4 && i != 7 && (text.charAt(i) < '0' || text.charAt(i) > '9')) {
                return false;
            }
        }
        try {
            return LocalDate.of(Integer.parseInt(text, 0, 4, 10), Integer.parseInt(text, 5, 7, 10),
                    Integer.parseInt(text, 8, 10, 10)).toString().equals(text);
        } catch (DateTimeException e) {
            return false;
        }
    }
}
