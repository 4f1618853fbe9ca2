/**
 * The entry point of the engineering core: {@link org.hobwright.wizard.analysis.JobAnalyser#analyse}
 * turns a job into gear data, inspection values, tolerances, hob setup and findings.
 */
package org.hobwright.wizard.analysis;
