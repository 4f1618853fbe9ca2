package org.hobwright.wizard.cli;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.Executor;
import java.util.concurrent.ForkJoinPool;
import org.hobwright.api.check.Finding;
import org.hobwright.api.cycle.HobCycle;
import org.hobwright.api.job.HobJob;
import org.hobwright.api.spi.CycleWriter;
import org.hobwright.api.spi.OutputFile;
import org.hobwright.api.spi.Providers;
import org.hobwright.api.spi.WriteContext;
import org.hobwright.api.spi.WriteResult;

/**
 * Runs the writers found through the SPI (NC program, cycle CSV, setup sheet, report, and any a
 * host adds) over planned jobs and collects their files; nothing touches the disk here.
 */
final class Outputs {
    /** Id of the report writer, whose text {@code plan --json} prints. */
    static final String REPORT = "report";

    /**
     * Resource the report writer reads: {@code true} asks for the report also of a cycle with
     * errors, with its findings and without the parts that could not be computed.
     */
    static final String REPORT_WITH_ERRORS = "report.withErrors";

    private final Store store;
    private final String generatedOn;
    private final Executor background;
    private final CompletableFuture<Providers.Loaded<CycleWriter>> lookup;

    /**
     * The files and the findings of the writers for some jobs.
     *
     * @param files    file name → text, in the order written
     * @param findings the writers' findings (an error means nothing may be written)
     */
    record Produced(Map<String, String> files, List<Finding> findings) {
        boolean refused() {
            return Finding.anyError(findings);
        }
    }

    /** Starts looking the writers up at once, beside whatever the caller does next. */
    Outputs(Store store, ClassLoader loader, String generatedOn) {
        this(store, loader, generatedOn, ForkJoinPool.commonPool());
    }

    /** Looks the writers up on {@code background}, beside whatever the caller does next. */
    Outputs(Store store, ClassLoader loader, String generatedOn, Executor background) {
        this.store = store;
        this.generatedOn = generatedOn;
        this.background = background;
        this.lookup = CompletableFuture.supplyAsync(() -> Providers.writers(loader), background);
    }

    /**
     * Lets every writer prepare for these jobs on the background thread (a dialect is read and
     * checked while the jobs are planned). A writer that fails here reports it when it writes.
     */
    void prepare(List<JobInput> jobs) {
        lookup.thenAcceptAsync(found -> {
            for (JobInput in : jobs) {
                if (in.job().isPresent()) {
                    WriteContext context = context(in.job().get());
                    for (CycleWriter w : found.providers()) {
                        try {
                            w.prepare(context);
                        } catch (RuntimeException e) {
                            // the same problem comes back as a finding when this writer writes
                        }
                    }
                }
            }
        }, background);
    }

    /** Every writer's files for every job; a file name written twice is an error. */
    Produced produce(List<JobInput> jobs) {
        return produce(jobs, Map.of());
    }

    /** Every writer's files for every job, then {@code extra} files (name → text) of the caller's. */
    Produced produce(List<JobInput> jobs, Map<String, String> extra) {
        Map<String, String> files = new LinkedHashMap<>();
        List<Finding> findings = new ArrayList<>(lookupProblems());
        if (writers().isEmpty()) {
            findings.add(CliCode.OUTPUT_NO_WRITERS.at("job", "no output writer was found",
                    "put hobwright-post on the class path"));
        }
        Map<String, String> owner = new HashMap<>();
        for (JobInput in : jobs) {
            HobJob job = in.job().orElseThrow();
            HobCycle cycle = in.cycle().orElseThrow();
            WriteContext context = context(job);
            // the writers are independent: run them side by side, keep their order
            for (WriteResult r : writers().parallelStream().map(w -> w.write(cycle, context)).toList()) {
                findings.addAll(r.findings());
                for (OutputFile f : r.files()) {
                    String before = owner.putIfAbsent(f.fileName(), in.source());
                    if (before != null) {
                        findings.add(CliCode.OUTPUT_NAME_TWICE.at("name", "jobs " + before + " and "
                                + in.source() + " both write " + f.fileName(), "give the jobs different names"));
                    }
                    files.put(f.fileName(), f.text());
                }
            }
        }
        files.putAll(extra);
        return new Produced(files, findings);
    }

    /** The report writer's text for one job, if a report writer is present and does not refuse. */
    Optional<String> report(HobJob job, HobCycle cycle) {
        WriteContext base = context(job);
        Map<String, String> resources = new HashMap<>(base.resources());
        resources.put(REPORT_WITH_ERRORS, "true");
        WriteContext context = new WriteContext(job, base.generatedOn(), base.toolVersion(), resources);
        return writers().stream().filter(w -> w.id().equals(REPORT)).findFirst()
                .map(w -> w.write(cycle, context))
                .filter(r -> !r.files().isEmpty())
                .map(r -> r.files().get(0).text());
    }

    private WriteContext context(HobJob job) {
        String dialect = job.machine().dialect();
        Map<String, String> resources = new HashMap<>();
        resources.put(WriteContext.DIALECT_NAME, dialect);
        store.dialectText(dialect).ifPresent(t -> resources.put(WriteContext.DIALECT, t));
        return new WriteContext(job, generatedOn, ToolVersion.VERSION, resources);
    }

    private List<Finding> lookupProblems() {
        return lookup.join().problems();
    }

    private List<CycleWriter> writers() {
        return lookup.join().providers();
    }
}
