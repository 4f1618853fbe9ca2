package org.hobwright.api.cycle;

import org.hobwright.api.ApiStatus;

/**
 * Sense of rotation of a spindle. The work spindle is seen from the front face of the gear (the
 * face away from the chuck), looking along the work axis toward the chuck; the hob spindle from
 * its drive end, looking toward the hob. The dialect maps each sense onto the control's words.
 */
@ApiStatus(since = "1.0")
public enum Rotation {
    /** Clockwise, seen as defined above. */
    CLOCKWISE,
    /** Counter-clockwise, seen as defined above. */
    COUNTER_CLOCKWISE;

    /** {@return {@code clockwise} or {@code counter-clockwise}, the word the cycle CSV and the texts use} */
    @ApiStatus(since = "1.1")
    public String word() {
        return this == CLOCKWISE ? "clockwise" : "counter-clockwise";
    }

    /** {@return the other sense} */
    public Rotation reversed() {
        return this == CLOCKWISE ? COUNTER_CLOCKWISE : CLOCKWISE;
    }
}
