package org.hobwright.api.cycle;

import org.hobwright.api.ApiStatus;

/**
 * Sense of rotation of a spindle. The work spindle is seen from the entry face of the gear,
 * looking along the work axis toward the chuck; the hob spindle from its drive end, looking
 * toward the hob. The dialect maps each sense onto the control's words.
 */
@ApiStatus(since = "1.0")
public enum Rotation {
    /** Clockwise, seen as defined above. */
    CLOCKWISE,
    /** Counter-clockwise, seen as defined above. */
    COUNTER_CLOCKWISE;

    /** The other sense. */
    public Rotation reversed() {
        return this == CLOCKWISE ? COUNTER_CLOCKWISE : CLOCKWISE;
    }
}
