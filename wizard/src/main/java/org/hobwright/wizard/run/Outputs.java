package org.hobwright.wizard.run;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.Executor;
import org.hobwright.api.check.Finding;
import org.hobwright.api.cycle.HobCycle;
import org.hobwright.api.host.PlannedJob;
import org.hobwright.api.job.HobJob;
import org.hobwright.api.spi.CycleWriter;
import org.hobwright.api.spi.OutputFile;
import org.hobwright.api.spi.Providers;
import org.hobwright.api.spi.WriteContext;
import org.hobwright.api.spi.WriteResult;
import org.hobwright.wizard.store.Library;

/**
 * Runs the writers found through the SPI (NC program, cycle CSV, setup sheet, report, and any a
 * host adds) over planned jobs and collects their files; nothing touches the disk here. The
 * terminal tool and a host session both post through this class, so the same job, library and
 * date give the same files.
 */
public final class Outputs {
    /** Id of the report writer, whose text {@code plan --json} prints. */
    public static final String REPORT = "report";

    private final Library library;
    private final String generatedOn;
    private final String toolVersion;
    private final Executor background;
    private final CompletableFuture<Providers.Loaded<CycleWriter>> lookup;
    private final boolean sideBySide;

    /**
     * One planned job and where it came from (a file name, for messages).
     *
     * @param source  the job file or "built-in job ..."
     * @param planned the job and its cycle
     */
    public record Named(String source, PlannedJob planned) {
    }

    /**
     * The files and the findings of the writers for some jobs.
     *
     * @param files    file name → text, in the order written
     * @param findings the writers' findings (an error means nothing may be written)
     */
    public record Produced(Map<String, String> files, List<Finding> findings) {
        /** True when a writer refused: nothing may be written. */
        public boolean refused() {
            return Finding.anyError(findings);
        }
    }

    /**
     * Looks the writers up on {@code background}, beside whatever the caller does next.
     *
     * @param library     the library the dialects come from
     * @param loader      the class loader the writers are found with
     * @param generatedOn the date printed in the files, ISO 8601
     * @param toolVersion the version printed in the files
     * @param background  where the look-up and the writers' preparation run
     */
    public Outputs(Library library, ClassLoader loader, String generatedOn, String toolVersion, Executor background) {
        this.library = library;
        this.generatedOn = generatedOn;
        this.toolVersion = toolVersion;
        this.background = background;
        this.lookup = CompletableFuture.supplyAsync(() -> Providers.writers(loader), background);
        this.sideBySide = true;
    }

    /**
     * Posts with writers already looked up, everything on the caller's thread (a host session:
     * no plugin code runs on a thread the plugin does not own).
     *
     * @param library     the library the dialects come from
     * @param writers     the writers
     * @param generatedOn the date printed in the files, ISO 8601
     * @param toolVersion the version printed in the files
     */
    public Outputs(Library library, Providers.Loaded<CycleWriter> writers, String generatedOn, String toolVersion) {
        this.library = library;
        this.generatedOn = generatedOn;
        this.toolVersion = toolVersion;
        this.background = Runnable::run;
        this.lookup = CompletableFuture.completedFuture(writers);
        this.sideBySide = false;
    }

    /**
     * Lets every writer prepare for these jobs on the background thread (a dialect is read and
     * checked while the jobs are planned). A writer that fails here reports it when it writes.
     *
     * @param jobs the jobs about to be planned
     */
    public void prepare(List<HobJob> jobs) {
        lookup.thenAcceptAsync(found -> {
            for (HobJob job : jobs) {
                WriteContext context = context(job);
                for (CycleWriter w : found.providers()) {
                    try {
                        w.prepare(context);
                    } catch (RuntimeException e) {
                        // the same problem comes back as a finding when this writer writes
                    }
                }
            }
        }, background);
    }

    /**
     * Every writer's files for every job; a file name written twice is an error.
     *
     * @param jobs the planned jobs, none with errors
     * @return the files and the writers' findings
     */
    public Produced produce(List<Named> jobs) {
        Map<String, String> files = new LinkedHashMap<>();
        List<Finding> findings = new ArrayList<>(lookup.join().problems());
        if (writers().isEmpty()) {
            findings.add(RunCode.OUTPUT_NO_WRITERS.at("job", "no output writer was found",
                    "put hobwright-plugin.jar (or hobwright-post) on the class path"));
        }
        Map<String, String> owner = new HashMap<>();
        for (Named in : jobs) {
            HobJob job = in.planned().job();
            HobCycle cycle = in.planned().cycle();
            WriteContext context = context(job);
            // the writers are independent: run them side by side, keep their order
            List<CycleWriter> all = writers();
            for (WriteResult r : (sideBySide ? all.parallelStream() : all.stream()).map(w -> w.write(cycle, context))
                    .toList()) {
                findings.addAll(r.findings());
                for (OutputFile f : r.files()) {
                    String before = owner.putIfAbsent(f.fileName(), in.source());
                    if (before != null) {
                        findings.add(RunCode.OUTPUT_NAME_TWICE.at("name", "jobs " + before + " and "
                                + in.source() + " both write " + f.fileName(), "give the jobs different names"));
                    }
                    files.put(f.fileName(), f.text());
                }
            }
        }
        return new Produced(files, findings);
    }

    /**
     * The report writer's text for one job, also for a cycle with errors, if a report writer is
     * present and does not refuse.
     *
     * @param job   the job
     * @param cycle its cycle
     * @return the report's text
     */
    public Optional<String> report(HobJob job, HobCycle cycle) {
        WriteContext base = context(job);
        Map<String, String> resources = new HashMap<>(base.resources());
        resources.put(WriteContext.REPORT_WITH_ERRORS, "true");
        WriteContext context = new WriteContext(job, base.generatedOn(), base.toolVersion(), resources);
        return writers().stream().filter(w -> w.id().equals(REPORT)).findFirst()
                .map(w -> w.write(cycle, context))
                .filter(r -> !r.files().isEmpty())
                .map(r -> r.files().get(0).text());
    }

    /** The usable writers (waits for the look-up). */
    public List<CycleWriter> writers() {
        return lookup.join().providers();
    }

    /** The writers that were skipped, one finding each (waits for the look-up). */
    public List<Finding> problems() {
        return lookup.join().problems();
    }

    private WriteContext context(HobJob job) {
        String dialect = job.machine().dialect();
        Map<String, String> resources = new HashMap<>();
        resources.put(WriteContext.DIALECT_NAME, dialect);
        library.dialectText(dialect).value().ifPresent(t -> resources.put(WriteContext.DIALECT, t));
        return new WriteContext(job, generatedOn, toolVersion, resources);
    }
}
