/**
 * Generating simulation: the tooth space a hob really cuts, found from the discrete positions at
 * which its gashes pass, beside the profile continuous rolling would give.
 *
 * <p>Entry points: {@link org.hobwright.wizard.simulate.GeneratingSimulation#simulate} (the api's
 * {@code SimulationData}, used by the planner) and
 * {@link org.hobwright.wizard.simulate.GeneratingSimulation#run} (full detail, used by the
 * {@code simulate} verb and {@link org.hobwright.wizard.simulate.SimulationSvg}). Lengths in mm,
 * angles in radians inside. The model, the method and the conventions are described in NOTES.md
 * beside this package; the settled helical factor of the enveloping depth in FORMULAS.md §6.2.
 */
package org.hobwright.wizard.simulate;
