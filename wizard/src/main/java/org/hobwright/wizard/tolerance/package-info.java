/** Flank tolerances of ISO 1328-1:2013 for a flank tolerance class, with the standard's rounding and scope. */
package org.hobwright.wizard.tolerance;
