/** The wizard's step model, which a host renders in its own way. */
package org.hobwright.api.wizard;
