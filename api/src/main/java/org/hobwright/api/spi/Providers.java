package org.hobwright.api.spi;

import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.Optional;
import java.util.ServiceConfigurationError;
import java.util.ServiceLoader;
import java.util.function.ToIntFunction;
import org.hobwright.api.ApiStatus;
import org.hobwright.api.check.Finding;
import org.hobwright.api.internal.Causes;
import org.hobwright.api.internal.Checks;
import org.hobwright.api.wizard.WizardFactory;

/**
 * Finds providers with {@link ServiceLoader}, defensively: a provider that fails to load, or was
 * built against an api this host cannot run ({@link ApiVersion#runs}), is skipped and reported as
 * a finding instead of breaking the lookup or failing later with a linkage error. A host that
 * needs nothing but the api uses this class, or the façade {@link org.hobwright.api.Hobwright}, to
 * reach Hobwright.
 *
 * <p>System property {@code hobwright.planner} may name the id of the planner to use when several
 * are present.
 */
@ApiStatus(since = "1.0")
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
    @ApiStatus(since = "1.0")
    public record Loaded<T>(List<T> providers, List<Finding> problems) {
        /**
         * Checks the components: a value out of range throws {@link IllegalArgumentException} naming the field and
         * the value.
         *
         * @param providers the usable providers, in class-path order
         * @param problems one warning for each provider that was skipped
         */
        public Loaded {
            providers = List.copyOf(providers);
            problems = List.copyOf(problems);
        }
    }

    /**
     * Loads every provider of a service type that this api can run: one built against the same
     * major api version and no newer minor version than {@link ApiVersion#CURRENT}.
     *
     * @param type   the service interface
     * @param loader the class loader to search (a host passes its plugin loader)
     * @param <T>    the service type
     * @return the usable providers and the problems, never null
     */
    public static <T extends Provider> Loaded<T> load(Class<T> type, ClassLoader loader) {
        Checks.present("type", type);
        Checks.present("loader", loader);
        List<T> found = new ArrayList<>();
        List<Finding> problems = new ArrayList<>();
        String kind = type.getSimpleName();
        for (T provider : instances(type, loader, problems)) {
            String name = provider.getClass().getName();
            ApiVersion built;
            try {
                built = ApiVersion.parse(provider.apiVersion());
            } catch (RuntimeException | LinkageError e) {
                problems.add(broken(kind, name + " failed when asked for its api version: " + causes(e)));
                continue;
            }
            if (!ApiVersion.CURRENT.runs(built)) {
                problems.add(mismatch(kind, name + " " + buildOf(provider), built));
                continue;
            }
            found.add(provider);
        }
        return new Loaded<>(found, problems);
    }

    /**
     * Loads every provider of a service type, reading the SPI generation of the first api.
     *
     * @param type    the service interface
     * @param loader  the class loader to search
     * @param version how to read a provider's declared SPI generation
     * @param <T>     the service type
     * @return the usable providers and the problems, never null
     * @deprecated use {@link #load(Class, ClassLoader)}, which reads the providers' api versions
     */
    @Deprecated(since = "1.1")
    public static <T> Loaded<T> load(Class<T> type, ClassLoader loader, ToIntFunction<T> version) {
        Checks.present("type", type);
        Checks.present("loader", loader);
        Checks.present("version", version);
        List<T> found = new ArrayList<>();
        List<Finding> problems = new ArrayList<>();
        String kind = type.getSimpleName();
        for (T provider : instances(type, loader, problems)) {
            try {
                int declared = version.applyAsInt(provider);
                if (declared != Spi.VERSION) {
                    problems.add(SpiCode.SPI_VERSION_MISMATCH.at("spi." + kind, provider.getClass().getName()
                            + " was built for SPI version " + declared + ", this api is version " + Spi.VERSION
                            + "; it was skipped", "use a build of that provider for SPI version " + Spi.VERSION));
                    continue;
                }
            } catch (RuntimeException | LinkageError e) {
                problems.add(broken(kind, provider.getClass().getName() + " failed when asked for its SPI version: "
                        + causes(e)));
                continue;
            }
            found.add(provider);
        }
        return new Loaded<>(found, problems);
    }

    /**
     * Every usable {@link CycleWriter}.
     *
     * @param loader the class loader to search
     * @return the writers and the problems
     */
    public static Loaded<CycleWriter> writers(ClassLoader loader) {
        return load(CycleWriter.class, loader);
    }

    /**
     * Every usable {@link WizardFactory}.
     *
     * @param loader the class loader to search
     * @return the factories and the problems
     */
    @ApiStatus(since = "1.1")
    public static Loaded<WizardFactory> wizards(ClassLoader loader) {
        return load(WizardFactory.class, loader);
    }

    /**
     * The wizard factory to use: the first usable one.
     *
     * @param loader the class loader to search
     * @return the factory
     * @throws ProviderMissingException naming what was skipped and why when none is usable
     */
    @ApiStatus(since = "1.1")
    public static WizardFactory wizard(ClassLoader loader) {
        Loaded<WizardFactory> loaded = wizards(loader);
        return loaded.providers().stream().findFirst().orElseThrow(() -> missing("WizardFactory", "",
                "put hobwright-plugin.jar (or hobwright-wizard and its dependencies) on the class path", loaded));
    }

    /**
     * The host provider behind {@link org.hobwright.api.Hobwright}: the first usable one.
     *
     * @param loader the class loader to search
     * @return the provider
     * @throws ProviderMissingException naming what was skipped and why when none is usable
     */
    @ApiStatus(since = "1.1")
    public static HostProvider host(ClassLoader loader) {
        Loaded<HostProvider> loaded = load(HostProvider.class, loader);
        return loaded.providers().stream().findFirst().orElseThrow(() -> missing("HostProvider", "",
                "put hobwright-plugin.jar (or hobwright-wizard and its dependencies) on the class path", loaded));
    }

    /**
     * The planner to use: the one named by the system property {@code hobwright.planner}, else
     * the first found.
     *
     * @param loader the class loader to search
     * @return the planner
     * @throws ProviderMissingException naming the missing kind, and what was skipped and why, when none is usable
     */
    public static CyclePlanner planner(ClassLoader loader) {
        Loaded<CyclePlanner> loaded = load(CyclePlanner.class, loader);
        String wanted = System.getProperty("hobwright.planner");
        Optional<CyclePlanner> pick = loaded.providers().stream()
                .filter(p -> wanted == null || wanted.equals(p.id()))
                .findFirst();
        return pick.orElseThrow(() -> missing("CyclePlanner", wanted == null ? "" : " with id \"" + wanted + "\"",
                "put hobwright-plugin.jar (or hobwright-wizard and its dependencies) on the class path", loaded));
    }

    /**
     * The writer with the given id.
     *
     * @param loader the class loader to search
     * @param id     the writer's id
     * @return the writer
     * @throws ProviderMissingException naming the id, and what was skipped and why, when no usable writer has it
     */
    public static CycleWriter writer(ClassLoader loader, String id) {
        Loaded<CycleWriter> loaded = writers(loader);
        return loaded.providers().stream().filter(w -> w.id().equals(id)).findFirst()
                .orElseThrow(() -> missing("CycleWriter", " with id \"" + id + "\"",
                        "put hobwright-plugin.jar (or hobwright-post) on the class path", loaded));
    }

    /** Every provider of a type that can be instantiated; each one that cannot is a finding in {@code problems}. */
    private static <T> List<T> instances(Class<T> type, ClassLoader loader, List<Finding> problems) {
        List<T> out = new ArrayList<>();
        String kind = type.getSimpleName();
        Iterator<T> it = ServiceLoader.load(type, loader).iterator();
        while (true) {
            try {
                if (!it.hasNext()) {
                    return out;
                }
                out.add(it.next());
            } catch (ServiceConfigurationError | LinkageError e) {
                problems.add(broken(kind, "A " + kind + " provider could not be loaded: " + causes(e)));
            }
        }
    }

    private static ProviderMissingException missing(String kind, String which, String fix, Loaded<?> loaded) {
        StringBuilder sb = new StringBuilder("No usable " + kind + " provider" + which + " was found; " + fix);
        if (!loaded.problems().isEmpty()) {
            sb.append(" (skipped:");
            loaded.problems().forEach(p -> sb.append(' ').append(p.message()).append(';'));
            sb.append(')');
        }
        return new ProviderMissingException(sb.toString(), loaded.problems());
    }

    private static String buildOf(Provider p) {
        try {
            return "(build " + p.buildVersion() + ")";
        } catch (RuntimeException | LinkageError e) {
            return "(build unknown)";
        }
    }

    private static Finding broken(String kind, String message) {
        return SpiCode.SPI_PROVIDER_BROKEN.at("spi." + kind, message, "remove or rebuild the jar that declares it");
    }

    private static Finding mismatch(String kind, String provider, ApiVersion built) {
        ApiVersion host = ApiVersion.CURRENT;
        if (built.major() == host.major()) {
            return SpiCode.SPI_API_TOO_OLD.at("spi." + kind, provider + " was built against api "
                    + built + ", newer than this host's api " + host + "; it was skipped, because it may call"
                    + " what this api lacks", "give the host hobwright-api " + built + " or newer (same major"
                    + " version), or use a build of the provider for api " + host);
        }
        return SpiCode.SPI_API_MAJOR_MISMATCH.at("spi." + kind, provider + " was built against api "
                + built + ", this host's api is " + host + "; a different major version is not compatible, so it"
                + " was skipped", "use a build of the provider for api " + host.major() + ".x");
    }

    /** The message of a failure with every cause behind it, e.g. the class a missing dependency should have held. */
    static String causes(Throwable e) {
        return Causes.chain(e);
    }
}
