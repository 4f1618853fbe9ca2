package org.hobwright.api;

import java.nio.file.Path;
import java.time.DateTimeException;
import java.time.Instant;
import java.time.LocalDate;
import java.time.ZoneOffset;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.hobwright.api.check.Finding;
import org.hobwright.api.host.HostLibrary;
import org.hobwright.api.host.Outcome;
import org.hobwright.api.host.PlannedJob;
import org.hobwright.api.host.Written;
import org.hobwright.api.internal.Causes;
import org.hobwright.api.internal.Checks;
import org.hobwright.api.job.HobJob;
import org.hobwright.api.spi.CyclePlanner;
import org.hobwright.api.spi.CycleWriter;
import org.hobwright.api.spi.HostProvider;
import org.hobwright.api.spi.HostSession;
import org.hobwright.api.spi.ProviderMissingException;
import org.hobwright.api.spi.Providers;
import org.hobwright.api.spi.SpiCode;
import org.hobwright.api.spi.WriteResult;
import org.hobwright.api.wizard.Wizard;

/**
 * The one entry point a host needs: open it with the class loader that sees the plugin and with
 * the shop's library folder, read, plan and write jobs, and close it.
 *
 * <pre>{@code
 * try (URLClassLoader plugins = new URLClassLoader(new URL[] {pluginJar}, Hobwright.class.getClassLoader());
 *      Hobwright hw = Hobwright.open(plugins, libraryFolder)) {
 *     PlannedJob planned = hw.plan(hw.readJob(jobFile).orElseThrow());
 *     Written written = hw.write(planned, outputFolder);
 * }
 * }</pre>
 *
 * <p>Planning here uses the same library, cutting data and defaults as the terminal tool
 * ({@code hobwright plan --home FOLDER}), so the same job gives byte-identical files either way
 * when the date is the same. Writing is all or nothing. Nothing here throws for bad input (it
 * comes back as findings); a broken contract (a null argument, a closed handle) throws an
 * exception naming the argument.
 *
 * <p>Close the handle before closing or dropping the plugin's class loader: the session then
 * holds no thread, file or registration, so the loader can be collected and the jar replaced.
 */
@ApiStatus(since = "1.1")
public final class Hobwright implements AutoCloseable {

    /** Environment variable that fixes the date printed in outputs (seconds since 1970, UTC). */
    public static final String SOURCE_DATE_EPOCH = "SOURCE_DATE_EPOCH";

    private final HostSession session;
    private final List<Finding> problems;
    private volatile boolean closed;

    private Hobwright(HostSession session, List<Finding> problems) {
        this.session = session;
        this.problems = List.copyOf(problems);
    }

    /**
     * Opens Hobwright from a plugin class loader on a library folder.
     *
     * @param plugins the class loader that sees {@code hobwright-plugin.jar} (its parent must see
     *                this api, which the plugin does not carry)
     * @param home    the library folder of machines, templates, dialects and cutting data (need
     *                not exist)
     * @return the open handle; close it when done
     * @throws ProviderMissingException when the loader holds no usable provider, naming what was
     *                                  skipped and why (for instance a plugin built against a newer api),
     *                                  or when the provider cannot open a session (for instance a library
     *                                  missing beside it), naming the causes and keeping them as its cause
     */
    public static Hobwright open(ClassLoader plugins, Path home) {
        Checks.present("plugins", plugins);
        Checks.present("home", home);
        HostProvider provider = Providers.host(plugins);
        HostSession session;
        try {
            session = provider.open(home);
        } catch (RuntimeException | LinkageError e) {
            throw openFailed(provider, e);
        }
        return new Hobwright(session, session.problems());
    }

    /**
     * Opens Hobwright from the class loader of this api (one class path holding the api and the
     * plugin, as in a script).
     *
     * @param home the library folder
     * @return the open handle
     * @throws ProviderMissingException when no usable provider is on the class path
     */
    public static Hobwright open(Path home) {
        return open(Hobwright.class.getClassLoader(), home);
    }

    /**
     * Reads a job file. Machine and template names are looked up in the library.
     *
     * @param jobFile the job file
     * @return the job, or the findings that say why there is none
     */
    public Outcome<HobJob> readJob(Path jobFile) {
        Checks.present("jobFile", jobFile);
        return open().readJob(jobFile);
    }

    /**
     * Reads a job from the JSON text of a job file.
     *
     * @param json   the text
     * @param source a name for messages, e.g. {@code "script"}
     * @return the job, or the findings that say why there is none
     */
    public Outcome<HobJob> readJob(String json, String source) {
        Checks.present("json", json);
        Checks.text("source", source);
        return open().readJob(json, source);
    }

    /**
     * Checks and plans a job with the library's cutting data.
     *
     * @param job the job
     * @return the job with its cycle; a cycle with error findings has no steps and is not written
     */
    public PlannedJob plan(HobJob job) {
        Checks.present("job", job);
        return new PlannedJob(job, open().planner().plan(job));
    }

    /**
     * Writes every output of a planned job (NC program, cycle CSV, setup sheet, report and any
     * writer a host adds) into a folder, all or nothing. The date printed in the files is the
     * environment's {@value #SOURCE_DATE_EPOCH} when set, else today (UTC), as the terminal tool does.
     *
     * @param planned the planned job
     * @param folder  the output folder, created when missing; files of the same names are replaced
     * @return the files written, or the findings that say why nothing was written
     */
    public Written write(PlannedJob planned, Path folder) {
        Checks.present("planned", planned);
        Checks.present("folder", folder);
        Outcome<LocalDate> date = dateFrom(System.getenv());
        if (!date.ok()) {
            return new Written(folder, List.of(), date.findings());
        }
        return write(List.of(planned), folder, date.value().orElseThrow());
    }

    /**
     * Writes every output of a planned job into a folder, all or nothing, with the date given.
     *
     * @param planned the planned job
     * @param folder  the output folder
     * @param date    the date printed in the files
     * @return the files written, or the findings that say why nothing was written
     */
    public Written write(PlannedJob planned, Path folder, LocalDate date) {
        Checks.present("planned", planned);
        return write(List.of(planned), folder, date);
    }

    /**
     * Writes the outputs of several planned jobs into one folder, all or nothing: nothing is
     * written when any job has an error or a writer refuses.
     *
     * @param planned the planned jobs
     * @param folder  the output folder
     * @param date    the date printed in the files
     * @return the files written, or the findings that say why nothing was written
     */
    public Written write(List<PlannedJob> planned, Path folder, LocalDate date) {
        Checks.present("planned", planned);
        planned.forEach(p -> Checks.present("planned job", p));
        Checks.present("folder", folder);
        Checks.present("date", date);
        return open().write(planned, folder, date);
    }

    /**
     * The texts every writer gives for a planned job, without writing anything.
     *
     * @param planned the planned job
     * @param date    the date printed in the texts
     * @return the files, or the findings of a writer that refused
     */
    public WriteResult outputs(PlannedJob planned, LocalDate date) {
        Checks.present("planned", planned);
        Checks.present("date", date);
        return open().outputs(List.of(planned), date);
    }

    /** {@return the planner, with the library's cutting data and defaults} */
    public CyclePlanner planner() {
        return open().planner();
    }

    /** {@return the usable output writers} */
    public List<CycleWriter> writers() {
        return open().writers();
    }

    /** {@return A wizard session with no answers yet (no sample values), on this library} */
    public Wizard wizard() {
        return open().wizard(Optional.empty());
    }

    /**
     * A wizard session whose first answers are a job's values.
     *
     * @param start the job to start from
     * @return the session
     */
    public Wizard wizard(HobJob start) {
        Checks.present("start", start);
        return open().wizard(Optional.of(start));
    }

    /** {@return the machines, templates, dialects and cutting data} */
    public HostLibrary library() {
        return open().library();
    }

    /** {@return providers that were skipped while opening, one finding each (show them to the user)} */
    public List<Finding> problems() {
        return problems;
    }

    /** {@return true once {@link #close()} was called} */
    public boolean isClosed() {
        return closed;
    }

    /** Releases the session's threads, files and caches; later calls throw. Closing twice does nothing. */
    @Override
    public void close() {
        if (!closed) {
            closed = true;
            session.close();
        }
    }

    /** {@code Hobwright on FOLDER}, or {@code (closed)}. */
    @Override
    public String toString() {
        return closed ? "Hobwright (closed)" : "Hobwright on " + session.library().home();
    }

    /**
     * The date the terminal tool prints when no date is given: {@value #SOURCE_DATE_EPOCH} (whole
     * seconds since 1970, UTC), else today in UTC.
     *
     * @param environment the environment variables, e.g. {@link System#getenv()}
     * @return the date, or an error finding naming a malformed variable
     */
    public static Outcome<LocalDate> dateFrom(Map<String, String> environment) {
        Checks.present("environment", environment);
        String epoch = environment.get(SOURCE_DATE_EPOCH);
        if (epoch == null || epoch.isBlank()) {
            return Outcome.of(LocalDate.now(ZoneOffset.UTC), List.of());
        }
        try {
            return Outcome.of(LocalDate.ofInstant(Instant.ofEpochSecond(Long.parseLong(epoch.strip())),
                    ZoneOffset.UTC), List.of());
        } catch (NumberFormatException | DateTimeException e) {
            return Outcome.failed(List.of(FacadeCode.OUTPUT_BAD_DATE.at(SOURCE_DATE_EPOCH, SOURCE_DATE_EPOCH
                    + " must be whole seconds since 1970, was \"" + epoch + "\"", "set it to a number such as"
                    + " 1795996800, or unset it")));
        }
    }

    /** A provider found but unable to open, typically a dependency missing beside it: the causes named and kept. */
    private static ProviderMissingException openFailed(HostProvider provider, Throwable e) {
        String message = provider.getClass().getName() + " could not open a session: " + Causes.chain(e);
        ProviderMissingException missing = new ProviderMissingException("No usable HostProvider: " + message
                + "; put hobwright-plugin.jar, which holds every library the plugin needs, on the class loader",
                List.of(SpiCode.SPI_PROVIDER_BROKEN.at("spi.HostProvider", message,
                        "remove or rebuild the jar that declares it")));
        missing.initCause(e);
        return missing;
    }

    private HostSession open() {
        if (closed) {
            throw new IllegalStateException("this Hobwright handle is closed; open a new one");
        }
        return session;
    }
}
