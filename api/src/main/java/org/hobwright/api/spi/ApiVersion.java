package org.hobwright.api.spi;

import org.hobwright.api.ApiStatus;
import org.hobwright.api.internal.Checks;

/**
 * A version of this api, {@code major.minor}. Within one major version every change is an
 * addition, and each addition raises the minor version; anything else raises the major version.
 * A build's binary-compatibility check against the previous release enforces the rule.
 *
 * <p>A provider built against version {@code P} runs on a host api {@code H} when both have the
 * same major version and {@code P.minor <= H.minor}: it calls nothing the host lacks.
 *
 * @param major the major version, raised for a change that is not an addition
 * @param minor the minor version, raised for each addition
 */
@ApiStatus(since = "1.1")
public record ApiVersion(int major, int minor) implements Comparable<ApiVersion> {

    /** The version of this api jar. */
    public static final ApiVersion CURRENT = parse(Spi.API_VERSION);

    /** The version a provider that does not state one was built against (the first api). */
    public static final ApiVersion FIRST = new ApiVersion(1, 0);

    /**
     * Checks the components: a value out of range throws {@link IllegalArgumentException} naming the field and the
     * value.
     *
     * @param major the major version, raised for a change that is not an addition
     * @param minor the minor version, raised for each addition
     */
    public ApiVersion {
        Checks.atLeast("major", major, 1);
        Checks.atLeast("minor", minor, 0);
    }

    /**
     * Reads {@code major.minor}, e.g. {@code 1.1}.
     *
     * @param text the version text
     * @return the version
     * @throws IllegalArgumentException naming the text when it is not {@code major.minor}
     */
    public static ApiVersion parse(String text) {
        Checks.present("version", text);
        String[] parts = text.strip().split("\\.", -1);
        if (parts.length == 2) {
            try {
                return new ApiVersion(Integer.parseInt(parts[0]), Integer.parseInt(parts[1]));
            } catch (IllegalArgumentException e) {
                // reported below
            }
        }
        throw new IllegalArgumentException("an api version must be major.minor, e.g. 1.1, was \"" + text + "\"");
    }

    /**
     * True when a provider built against {@code built} runs on this api: same major version and no
     * newer minor version.
     *
     * @param built the api version the provider was built against
     * @return true when every api the provider may call is here
     */
    public boolean runs(ApiVersion built) {
        return built.major == major && built.minor <= minor;
    }

    @Override
    public int compareTo(ApiVersion o) {
        return major != o.major ? Integer.compare(major, o.major) : Integer.compare(minor, o.minor);
    }

    /** {@code major.minor}. */
    @Override
    public String toString() {
        return major + "." + minor;
    }
}
