/**
 * External involute splines: the geometry and limits of ISO 4156-1, ANSI B92.1 and DIN 5480
 * ({@link org.hobwright.wizard.spline.SplineLimits}), the measurement over pins
 * ({@link org.hobwright.wizard.spline.SplinePins}), the spline hob's fit to the spline
 * ({@link org.hobwright.wizard.spline.SplineHobCheck}) and the form check by the generating
 * simulation ({@link org.hobwright.wizard.spline.FormCheck}). Formulas and sources: the spline
 * section of wizard/FORMULAS.md.
 */
package org.hobwright.wizard.spline;
