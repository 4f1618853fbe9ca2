/**
 * Hob lead angle, swivel angle and angle notation.
 *
 * <p>Sign rule, stated once: helix angles β and hob lead angles γ are signed, right hand positive. The
 * swivel angle is η = β − γ, measured from the plane square to the work axis; so the same hand subtracts
 * the magnitudes (|η| = |β| − γ), opposite hands add them (|η| = |β| + γ), and a spur gear swivels by
 * η = −γ. How a machine counts its swivel is data in its profile
 * ({@code SwivelHolder.positiveIsRight}, {@code positiveSense}), never a constant here.
 */
package org.hobwright.wizard.setup;
