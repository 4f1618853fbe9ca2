/**
 * An example host adapter: a tiny host that reaches Hobwright through the api alone.
 *
 * <p>It puts {@code hobwright-plugin.jar} on a class loader of its own, opens the façade
 * {@link org.hobwright.api.Hobwright} on a library folder, renders the wizard's step model in its
 * own plain way (answers come from a {@code .properties} file), has the façade write every output
 * all or nothing, imports the cycle CSV back into its own list of operations, and closes the
 * façade and the loader. Nothing here depends on the wizard or post modules at compile time.
 */
package org.hobwright.samples.host;
