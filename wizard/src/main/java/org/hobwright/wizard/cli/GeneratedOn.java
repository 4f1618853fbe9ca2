package org.hobwright.wizard.cli;

import java.time.DateTimeException;
import java.time.Instant;
import java.time.LocalDate;
import java.time.ZoneOffset;
import java.util.Map;

/**
 * The date printed in every output's header: {@code --date}, else the environment variable
 * {@code SOURCE_DATE_EPOCH} (seconds since 1970, UTC, as reproducible-build tools set it), else
 * today by the injected clock (UTC). The same inputs and date give byte-identical outputs.
 */
final class GeneratedOn {
    private GeneratedOn() {
    }

    /**
     * Resolves the date as ISO 8601 ({@code 2026-12-01}).
     *
     * @throws CliFailure (exit 2) when {@code --date} or {@code SOURCE_DATE_EPOCH} is malformed
     */
    static String resolve(String option, CliEnvironment environment) {
        if (option != null) {
            try {
                return LocalDate.parse(option).toString();
            } catch (DateTimeException e) {
                throw CliFailure.usage("--date must be a date like 2026-12-01, was \"" + option + "\"");
            }
        }
        Map<String, String> env = environment.env();
        String epoch = env.get("SOURCE_DATE_EPOCH");
        if (epoch != null && !epoch.isBlank()) {
            try {
                return LocalDate.ofInstant(Instant.ofEpochSecond(Long.parseLong(epoch.strip())), ZoneOffset.UTC)
                        .toString();
            } catch (NumberFormatException | DateTimeException e) {
                throw CliFailure.usage("SOURCE_DATE_EPOCH must be whole seconds since 1970, was \"" + epoch + "\"");
            }
        }
        return LocalDate.ofInstant(environment.clock().instant(), ZoneOffset.UTC).toString();
    }
}
