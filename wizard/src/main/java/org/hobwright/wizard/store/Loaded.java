package org.hobwright.wizard.store;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import java.util.function.Function;
import org.hobwright.api.check.Finding;

/**
 * The result of reading a file or a tree: the value when it could be built, every finding met
 * on the way, and whether the input itself could not be read.
 *
 * <p>{@code unreadable} means an input <em>file</em> problem (missing, a folder, too large,
 * malformed JSON, an unknown key, a wrong type, a wrong format or version): the terminal tool
 * exits 2 with {@link #errorLine()}. A readable input with bad values has error findings and no
 * value: the tool exits 1 and prints the findings. Nothing here ever throws for bad input.
 *
 * @param value      the value, present only when no finding is an error
 * @param findings   every finding, in the order met
 * @param unreadable true when the input could not be read as a file of its format
 * @param <T>        the type of the value
 */
public record Loaded<T>(Optional<T> value, List<Finding> findings, boolean unreadable) {

    public Loaded {
        Objects.requireNonNull(value, "value");
        findings = List.copyOf(Objects.requireNonNull(findings, "findings"));
        if (value.isPresent() && (unreadable || Finding.anyError(findings))) {
            throw new IllegalArgumentException("a loaded value must have no error findings and be readable");
        }
        if (value.isEmpty() && !Finding.anyError(findings)) {
            throw new IllegalArgumentException("a load without a value needs an error finding saying why");
        }
    }

    /** A value with the (non-error) findings met while reading it. */
    public static <T> Loaded<T> of(T value, List<Finding> findings) {
        return new Loaded<>(Optional.of(value), findings, false);
    }

    /** A value with no findings. */
    public static <T> Loaded<T> of(T value) {
        return of(value, List.of());
    }

    /** A readable input whose values are wrong; {@code findings} holds at least one error. */
    public static <T> Loaded<T> failed(List<Finding> findings) {
        return new Loaded<>(Optional.empty(), findings, false);
    }

    /** An input that could not be read; {@code problem} is an error finding. */
    public static <T> Loaded<T> unreadable(Finding problem) {
        return new Loaded<>(Optional.empty(), List.of(problem), true);
    }

    /** An input that could not be read, with every finding that says why. */
    public static <T> Loaded<T> unreadable(List<Finding> problems) {
        return new Loaded<>(Optional.empty(), problems, true);
    }

    /** True when a value is present. */
    public boolean ok() {
        return value.isPresent();
    }

    /** The value; throws {@link IllegalStateException} naming the first error when there is none. */
    public T get() {
        return value.orElseThrow(() -> new IllegalStateException("no value: " + errorLine()));
    }

    /** True when any finding is an error. */
    public boolean hasErrors() {
        return Finding.anyError(findings);
    }

    /**
     * One line for a terminal: the message of the first error (which names the file, the line
     * where known, and the field), or empty text when there is no error.
     */
    public String errorLine() {
        return findings.stream().filter(Finding::isError).findFirst()
                .map(f -> Finding.printable(f.message() + f.fix().map(x -> " (" + x + ")").orElse("")))
                .orElse("");
    }

    /** Applies {@code f} to the value, keeping the findings. */
    public <R> Loaded<R> map(Function<? super T, ? extends R> f) {
        return new Loaded<>(value.map(f), findings, unreadable);
    }

    /**
     * Continues with a second load that needs this value; the findings of both are kept, and
     * the result is unreadable when either is.
     */
    public <R> Loaded<R> then(Function<? super T, Loaded<R>> next) {
        if (value.isEmpty()) {
            return new Loaded<>(Optional.empty(), findings, unreadable);
        }
        Loaded<R> r = next.apply(value.get());
        List<Finding> all = new ArrayList<>(findings);
        all.addAll(r.findings());
        return new Loaded<>(r.value(), all, r.unreadable());
    }
}
