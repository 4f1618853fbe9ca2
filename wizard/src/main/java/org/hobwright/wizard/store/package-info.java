/**
 * Files: the job reader and writer, machine profiles, cycle templates and the per-user library
 * folder with the built-in sample scenario under it; atomic writes. File formats, version 1, are
 * defined in wizard/README.md; the JSON Schemas in {@code samples/scenario/schema/} describe the same.
 */
package org.hobwright.wizard.store;
