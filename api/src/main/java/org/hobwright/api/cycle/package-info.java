/** Cycle output: computed gear data, inspection values, setup values, steps and summary. */
package org.hobwright.api.cycle;
