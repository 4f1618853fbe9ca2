package org.hobwright.samples.host;

import java.util.ArrayList;
import java.util.List;
import java.util.ServiceConfigurationError;
import java.util.ServiceLoader;
import org.hobwright.api.check.Finding;
import org.hobwright.api.spi.CycleWriter;
import org.hobwright.api.spi.Providers;
import org.hobwright.api.spi.Spi;
import org.hobwright.api.wizard.WizardFactory;

/**
 * Hobwright as this host sees it: a wizard factory and the output writers, found with
 * {@link ServiceLoader} in a class loader the host chooses (its plugin loader).
 *
 * @param wizards  the wizard factory
 * @param writers  every usable writer, in class-path order
 * @param problems providers that were skipped, with the reason
 */
public record HobwrightPlugin(WizardFactory wizards, List<CycleWriter> writers, List<Finding> problems) {

    public HobwrightPlugin {
        writers = List.copyOf(writers);
        problems = List.copyOf(problems);
    }

    /**
     * Looks Hobwright up in a class loader.
     *
     * @param loader the loader that sees the Hobwright jars (for a plain class path: the
     *               application class loader)
     * @return the plugin
     * @throws IllegalStateException naming what is missing when no wizard or no writer is found
     */
    public static HobwrightPlugin load(ClassLoader loader) {
        List<Finding> problems = new ArrayList<>();
        WizardFactory factory = null;
        var it = ServiceLoader.load(WizardFactory.class, loader).iterator();
        while (factory == null) {
            try {
                if (!it.hasNext()) {
                    break;
                }
                WizardFactory candidate = it.next();
                if (candidate.spiVersion() == Spi.VERSION) {
                    factory = candidate;
                } else {
                    problems.add(HostCode.HOST_WIZARD_VERSION.at("plugin",
                            candidate.getClass().getName() + " speaks SPI version " + candidate.spiVersion()
                                    + ", this host speaks " + Spi.VERSION,
                            "use matching Hobwright jars"));
                }
            } catch (ServiceConfigurationError e) {
                problems.add(HostCode.HOST_WIZARD_BROKEN.at("plugin",
                        "a wizard provider could not be loaded: " + e.getMessage(),
                        "rebuild or remove the jar that declares it"));
            }
        }
        if (factory == null) {
            throw new IllegalStateException("No Hobwright wizard was found on the plugin class path;"
                    + " add hobwright.jar (or the wizard and post jars with their dependencies)");
        }
        Providers.Loaded<CycleWriter> writers = Providers.writers(loader);
        problems.addAll(writers.problems());
        if (writers.providers().isEmpty()) {
            throw new IllegalStateException("No Hobwright output writers were found on the plugin class path;"
                    + " add the post jar");
        }
        return new HobwrightPlugin(factory, writers.providers(), problems);
    }
}
