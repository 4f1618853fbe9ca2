/** The example host adapter: reaches Hobwright through the api alone. */
package org.hobwright.samples;
