package org.hobwright.api.job;

import org.hobwright.api.ApiStatus;

/**
 * The sense of rotation in which a hob cuts, seen from the hob's own drive end (the end with the
 * drive slot or the marking) looking toward the hob. A hob cuts in this sense only: its teeth are
 * relieved behind the cutting faces, so turned the other way it rubs with the backs of its teeth.
 */
@ApiStatus(since = "1.1")
public enum CuttingSense {
    /** Cuts turning clockwise, seen from its drive end. */
    CLOCKWISE,
    /** Cuts turning counter-clockwise, seen from its drive end. */
    COUNTER_CLOCKWISE;

    /** {@return the word used in job files: {@code clockwise} or {@code counter-clockwise}} */
    public String word() {
        return this == CLOCKWISE ? "clockwise" : "counter-clockwise";
    }
}
