/**
 * What the façade {@link org.hobwright.api.Hobwright} returns: values with their findings
 * ({@link org.hobwright.api.host.Outcome}), a job with its planned cycle
 * ({@link org.hobwright.api.host.PlannedJob}), what a write did
 * ({@link org.hobwright.api.host.Written}) and the library
 * ({@link org.hobwright.api.host.HostLibrary}).
 */
package org.hobwright.api.host;
