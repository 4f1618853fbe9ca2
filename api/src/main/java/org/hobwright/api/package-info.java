/**
 * Hobwright's neutral plugin SPI, the only thing a host must know.
 *
 * <p>Conventions that hold in every package below:
 * <ul>
 *   <li>Canonical units: lengths in millimetres, times in seconds, angles in degrees,
 *       rotational speeds in revolutions per minute. Component names carry the unit
 *       ({@code faceWidthMm}, {@code helixAngleDeg}, {@code hobRpm}). Inch input is converted
 *       once, at the boundary, with {@link org.hobwright.api.job.Units}.</li>
 *   <li>Hands: a right-hand helix or hob thread is positive, a left-hand one negative, whenever an
 *       angle is given signed (methods named {@code signed...}). Magnitudes are stored with a
 *       separate {@link org.hobwright.api.job.Hand}.</li>
 *   <li>No public method returns {@code null}; optional values are {@code Optional} or
 *       {@code OptionalDouble}.</li>
 *   <li>Records validate in their compact constructors and throw
 *       {@link java.lang.IllegalArgumentException} naming the field and the value.</li>
 * </ul>
 */
package org.hobwright.api;
