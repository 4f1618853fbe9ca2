/**
 * Cycle planning: synchronised speeds, feeds and passes, approach and overrun, predicted finish,
 * cycle time, the fastest cycle the machine allows and the ordered toolpath steps, with the
 * safety invariants checked before a cycle leaves the planner.
 *
 * <p>Coordinates of the steps (see {@link org.hobwright.api.cycle.CycleStep}): {@code axialMm} is the
 * hob centre's distance from the gear's front face (the face away from the chuck), positive toward
 * the back face; climb hobbing feeds one way and conventional hobbing the other, as the hob's
 * cutting sense requires ({@link org.hobwright.wizard.plan.SpindleSenses}); {@code diameterMm} is
 * the work diameter reached by the hob tip.
 * All lengths mm, times s, speeds rpm, angles degrees at the boundary.
 */
package org.hobwright.wizard.plan;
