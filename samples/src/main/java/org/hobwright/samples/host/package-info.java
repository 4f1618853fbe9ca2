/**
 * An example host adapter: a tiny host that reaches Hobwright through the api alone.
 *
 * <p>It finds the wizard and the writers with {@link java.util.ServiceLoader}, renders the
 * wizard's step model in its own plain way (answers come from a {@code .properties} file), takes
 * the planned cycle, has every writer format it, writes the files all or nothing, and imports the
 * cycle CSV back into its own list of operations. Nothing here depends on the wizard or post
 * modules at compile time; they are found at run time, as in a real host.
 */
package org.hobwright.samples.host;
