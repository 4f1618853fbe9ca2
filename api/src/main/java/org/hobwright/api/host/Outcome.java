package org.hobwright.api.host;

import java.util.List;
import java.util.Optional;
import org.hobwright.api.ApiStatus;
import org.hobwright.api.check.Finding;
import org.hobwright.api.internal.Checks;

/**
 * A value a host asked for (a job read from a file, a machine from the library), or the findings
 * that say why there is none. Warnings and remarks may come with a value.
 *
 * @param value    the value, present only when no finding is an error
 * @param findings every finding met, errors first
 * @param <T>      the type of the value
 */
@ApiStatus(since = "1.1")
public record Outcome<T>(Optional<T> value, List<Finding> findings) {

    /**
     * Checks the components: a value out of range throws {@link IllegalArgumentException} naming the field and the
     * value.
     *
     * @param value the value
     * @param findings the findings
     */
    public Outcome {
        Checks.present("value", value);
        findings = Finding.errorsFirst(Checks.present("findings", findings));
        if (value.isPresent() == Finding.anyError(findings)) {
            throw new IllegalArgumentException(value.isPresent()
                    ? "an outcome with an error finding must have no value"
                    : "an outcome without a value needs an error finding saying why");
        }
    }

    /**
     * A value with the findings met on the way (none of them an error).
     *
     * @param value    the value
     * @param findings warnings and remarks
     * @param <T>      the type of the value
     * @return the outcome
     */
    public static <T> Outcome<T> of(T value, List<Finding> findings) {
        return new Outcome<>(Optional.of(Checks.present("value", value)), findings);
    }

    /**
     * No value, with the findings that say why (at least one an error).
     *
     * @param findings the findings
     * @param <T>      the type of the missing value
     * @return the outcome
     */
    public static <T> Outcome<T> failed(List<Finding> findings) {
        return new Outcome<>(Optional.empty(), findings);
    }

    /** {@return true when there is a value} */
    public boolean ok() {
        return value.isPresent();
    }

    /**
     * The value, for scripts that stop at the first problem.
     *
     * @return the value
     * @throws IllegalStateException whose message lists the findings, one line each, when there is none
     */
    public T orElseThrow() {
        return value.orElseThrow(() -> new IllegalStateException("no value:" + System.lineSeparator()
                + Finding.lines(findings)));
    }

    /** The value, or {@code "no value"}, then each finding on a line of its own. */
    @Override
    public String toString() {
        String head = value.map(String::valueOf).orElse("no value");
        return findings.isEmpty() ? head : head + System.lineSeparator() + Finding.lines(findings);
    }
}
