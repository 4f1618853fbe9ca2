/**
 * Involute geometry of external spur and helical gears cut by a hob: tooth systems (basic racks),
 * the ISO 21771 relations ({@link org.hobwright.wizard.geometry.InvoluteGear}), the involute function and
 * its inverse, and the undercut limits. Lengths in mm, angles in radians inside and degrees at the api
 * boundary. The helix angle is used as a magnitude here; its hand only matters for the hob setup.
 */
package org.hobwright.wizard.geometry;
