package org.hobwright.api.wizard;

/** The wizard's steps, in order. */
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
