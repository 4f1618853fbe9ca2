/**
 * Helpers of the api's own records. <strong>Not part of the api</strong>: left out of the
 * published javadoc and of the compatibility check, and free to change in any release.
 */
package org.hobwright.api.internal;
