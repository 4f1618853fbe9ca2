/**
 * Writers found through the SPI: the NC program (driven by editable dialect files), the cycle
 * CSV, the setup sheet and the JSON report. They format what the cycle says; they compute no
 * geometry.
 */
package org.hobwright.post;
