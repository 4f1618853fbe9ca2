/**
 * The engineering checks: each problem becomes a {@link org.hobwright.api.check.Finding} with a stable
 * code from {@link org.hobwright.wizard.check.EngineeringCode}, the input field, a message with the
 * numbers in the job's units, a fix and the rule it rests on. Checks never throw for a bad job.
 */
package org.hobwright.wizard.check;
