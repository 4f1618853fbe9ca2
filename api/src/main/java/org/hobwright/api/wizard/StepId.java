package org.hobwright.api.wizard;

import org.hobwright.api.ApiStatus;

/** The wizard's steps, in order. */
@ApiStatus(since = "1.0")
public enum StepId {
    /** The gear from the drawing. */
    GEAR,
    /** The hob. */
    CUTTER,
    /** The machine profile. */
    MACHINE,
    /** How to cut: speeds, feeds, passes, targets. */
    CYCLE,
    /** Everything computed, with every open finding. */
    REVIEW
}
