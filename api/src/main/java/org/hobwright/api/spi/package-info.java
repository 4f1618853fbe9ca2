/** Provider interfaces found with {@link java.util.ServiceLoader}, and the defensive lookup. */
package org.hobwright.api.spi;
