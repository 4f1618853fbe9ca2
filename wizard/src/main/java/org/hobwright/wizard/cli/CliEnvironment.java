package org.hobwright.wizard.cli;

import java.io.BufferedReader;
import java.io.InputStreamReader;
import java.nio.charset.Charset;
import java.time.Clock;
import java.util.Map;

/**
 * What the tool takes from the world besides its arguments, injected so tests can script it:
 * the answers typed (or piped), the clock for the date in headers, the environment variables
 * and the class loader the writers and planner are found with.
 *
 * @param in     where wizard answers are read from
 * @param clock  the clock for the date printed in outputs
 * @param env    environment variables ({@code HOBWRIGHT_HOME}, {@code SOURCE_DATE_EPOCH})
 * @param loader class loader for {@link java.util.ServiceLoader} look-ups
 * @param piped  true when the answers do not come from a terminal (they are then echoed)
 */
public record CliEnvironment(BufferedReader in, Clock clock, Map<String, String> env, ClassLoader loader,
                             boolean piped) {
    public CliEnvironment {
        env = Map.copyOf(env);
    }

    /** The real terminal: standard input, the system clock, the process environment. */
    public static CliEnvironment system() {
        return new CliEnvironment(new BufferedReader(new InputStreamReader(System.in, Charset.defaultCharset())),
                Clock.systemUTC(), System.getenv(), CliEnvironment.class.getClassLoader(), System.console() == null);
    }
}
