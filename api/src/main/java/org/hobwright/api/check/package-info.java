/** Findings: every input or engineering problem, with a stable code, the field and a fix. */
package org.hobwright.api.check;
