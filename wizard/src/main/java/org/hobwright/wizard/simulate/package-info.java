/**
 * Generating simulation: the tooth space a hob really cuts, found from the discrete positions at
 * which its gashes pass, beside the profile continuous rolling would give.
 *
 * <p>Entry points: {@link org.hobwright.wizard.simulate.GeneratingSimulation#simulate} (the api's
 * {@code SimulationData}, used by the planner) and
 * {@link org.hobwright.wizard.simulate.GeneratingSimulation#run} (full detail, used by the
 * {@code simulate} verb and {@link org.hobwright.wizard.simulate.SimulationSvg}). Lengths in mm,
 * angles in radians inside. The method, the conventions and the settled helical factor of the
 * enveloping depth are described in DEVELOPERS.md, "Generating simulation".
 */
package org.hobwright.wizard.simulate;
