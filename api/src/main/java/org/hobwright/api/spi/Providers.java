package org.hobwright.api.spi;

import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.Optional;
import java.util.ServiceConfigurationError;
import java.util.ServiceLoader;
import java.util.function.ToIntFunction;
import org.hobwright.api.Validate;
import org.hobwright.api.check.Finding;

/**
 * Finds providers with {@link ServiceLoader}, defensively: a provider that fails to load, or was
 * built for another SPI version, is skipped and reported as a finding instead of breaking the
 * lookup. A host that needs nothing but the api uses this class to reach Hobwright.
 *
 * <p>System property {@code hobwright.planner} may name the id of the planner to use when several
 * are present.
 */
public final class Providers {

    private Providers() {
    }

    /**
     * Providers of one kind and the problems met while loading them.
     *
     * @param providers the usable providers, in class-path order
     * @param problems  one warning for each provider that was skipped
     * @param <T>       the service type
     */
    public record Loaded<T>(List<T> providers, List<Finding> problems) {
        public Loaded {
            providers = List.copyOf(providers);
            problems = List.copyOf(problems);
        }
    }

    /**
     * Loads every provider of a service type.
     *
     * @param type    the service interface
     * @param loader  the class loader to search (a host passes its plugin loader)
     * @param version how to read a provider's declared SPI version
     * @param <T>     the service type
     * @return the usable providers and the problems, never null
     */
    public static <T> Loaded<T> load(Class<T> type, ClassLoader loader, ToIntFunction<T> version) {
        Validate.present("type", type);
        Validate.present("loader", loader);
        List<T> found = new ArrayList<>();
        List<Finding> problems = new ArrayList<>();
        Iterator<T> it = ServiceLoader.load(type, loader).iterator();
        while (true) {
            T provider;
            try {
                if (!it.hasNext()) {
                    break;
                }
                provider = it.next();
            } catch (ServiceConfigurationError e) {
                problems.add(SpiCode.SPI_PROVIDER_BROKEN.at("spi." + type.getSimpleName(),
                        "A " + type.getSimpleName() + " provider could not be loaded: " + e.getMessage(),
                        "remove or rebuild the jar that declares it"));
                continue;
            }
            int declared;
            try {
                declared = version.applyAsInt(provider);
            } catch (RuntimeException e) {
                problems.add(SpiCode.SPI_PROVIDER_BROKEN.at("spi." + type.getSimpleName(),
                        provider.getClass().getName() + " failed when asked for its SPI version: " + e,
                        "remove or rebuild the jar that declares it"));
                continue;
            }
            if (declared != Spi.VERSION) {
                problems.add(SpiCode.SPI_VERSION_MISMATCH.at("spi." + type.getSimpleName(),
                        provider.getClass().getName() + " was built for SPI version " + declared
                                + ", this api is version " + Spi.VERSION + "; it was skipped",
                        "use a build of that provider for SPI version " + Spi.VERSION));
                continue;
            }
            found.add(provider);
        }
        return new Loaded<>(found, problems);
    }

    /** Every usable {@link CycleWriter}. */
    public static Loaded<CycleWriter> writers(ClassLoader loader) {
        return load(CycleWriter.class, loader, CycleWriter::spiVersion);
    }

    /**
     * The planner to use: the one named by the system property {@code hobwright.planner}, else
     * the first found.
     *
     * @throws ProviderMissingException naming the missing kind when none is usable
     */
    public static CyclePlanner planner(ClassLoader loader) {
        Loaded<CyclePlanner> loaded = load(CyclePlanner.class, loader, CyclePlanner::spiVersion);
        String wanted = System.getProperty("hobwright.planner");
        Optional<CyclePlanner> pick = loaded.providers().stream()
                .filter(p -> wanted == null || wanted.equals(p.id()))
                .findFirst();
        return pick.orElseThrow(() -> new ProviderMissingException(
                "No usable CyclePlanner provider"
                        + (wanted == null ? "" : " with id \"" + wanted + "\"")
                        + " was found; put hobwright-wizard (and its dependencies) on the class path"
                        + problemsText(loaded)));
    }

    /**
     * The writer with the given id.
     *
     * @throws ProviderMissingException naming the id when no usable writer has it
     */
    public static CycleWriter writer(ClassLoader loader, String id) {
        Loaded<CycleWriter> loaded = writers(loader);
        return loaded.providers().stream().filter(w -> w.id().equals(id)).findFirst()
                .orElseThrow(() -> new ProviderMissingException("No usable CycleWriter with id \"" + id
                        + "\" was found; put hobwright-post on the class path" + problemsText(loaded)));
    }

    private static String problemsText(Loaded<?> loaded) {
        if (loaded.problems().isEmpty()) {
            return "";
        }
        StringBuilder sb = new StringBuilder(" (skipped:");
        loaded.problems().forEach(p -> sb.append(' ').append(p.message()).append(';'));
        return sb.append(')').toString();
    }
}
