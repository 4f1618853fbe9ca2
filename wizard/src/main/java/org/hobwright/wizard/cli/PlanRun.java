package org.hobwright.wizard.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.CompletionException;
import java.util.stream.Stream;
import org.hobwright.api.host.PlannedJob;
import org.hobwright.api.spi.CyclePlanner;
import org.hobwright.wizard.run.LibraryPlanner;
import org.hobwright.wizard.run.Outputs;
import org.hobwright.wizard.store.JobReader;
import org.hobwright.wizard.store.Loaded;

/**
 * The batch form of the wizard, shared by {@code plan} and {@code demo}: read every job, plan it,
 * print the findings and a short summary, and write all outputs atomically, or none when any job
 * has errors. Knows nothing of picocli, so the launcher's fast path can call it directly.
 */
final class PlanRun {
    /** Name of the built-in sample job used by {@code demo} and as the wizard's defaults. */
    static final String SAMPLE_JOB = "metering-pump-gear";

    private final CliEnvironment env;
    private final PrintWriter out;
    private final PrintWriter err;

    PlanRun(CliEnvironment env, PrintWriter out, PrintWriter err) {
        this.env = env;
        this.out = out;
        this.err = err;
    }

    /**
     * Runs the request.
     *
     * @return 0 written, 1 a job has errors (nothing written)
     * @throws CliFailure (exit 2) for a usage problem or an unreadable input
     */
    int run(PlanRequest request) {
        String generatedOn = GeneratedOn.resolve(request.date().orElse(null), env);
        // the planner and the writers are looked up beside the reading of the jobs
        Store store = Store.open(request.home(), env);
        ExecutorService background = Executors.newSingleThreadExecutor(r -> {
            Thread t = new Thread(r, "hobwright-lookup");
            t.setDaemon(true);
            return t;
        });
        try {
            CompletableFuture<CyclePlanner> planner = CompletableFuture.supplyAsync(() -> planner(store), background);
            Outputs outputs = new Outputs(store.library(), env.loader(), generatedOn, ToolVersion.VERSION, background);
            request.out().ifPresent(OutputFolder::check);
            Timing.mark("library opened");
            JobReader.Overrides overrides = new JobReader.Overrides(request.machine(), request.template());
            List<JobInput> read = new ArrayList<>();
            if (request.inputs().isEmpty()) {
                read.add(store.readBuiltinJob(SAMPLE_JOB, overrides, request.fastest()));
            }
            for (Path p : request.inputs()) {
                for (Path file : files(p)) {
                    read.add(store.readJobFile(file, overrides, request.fastest()));
                }
            }
            Timing.mark("jobs read");
            outputs.prepare(read.stream().flatMap(in -> in.job().stream()).toList());
            List<JobInput> jobs = read.stream()
                    .map(in -> in.job().map(j -> in.planned(join(planner).plan(j))).orElse(in)).toList();
            Timing.mark("jobs planned");
            return finish(jobs, request, store, outputs);
        } finally {
            background.shutdown();      // what was asked of it finishes; the thread then ends
        }
    }

    /**
     * The library's planner ({@link LibraryPlanner}).
     *
     * @throws CliFailure (exit 2) when the shop's table cannot be used: every problem, each with its
     *                    line, key and fix
     */
    private CyclePlanner planner(Store store) {
        Loaded<CyclePlanner> planner = LibraryPlanner.of(store.library(), env.loader());
        if (!planner.ok()) {
            throw CliFailure.usage(LibraryPlanner.failure(planner.findings()));
        }
        return planner.get();
    }

    /** The looked-up planner; a missing one is reported as the exception the look-up threw. */
    private static CyclePlanner join(CompletableFuture<CyclePlanner> planner) {
        try {
            return planner.join();
        } catch (CompletionException e) {
            throw e.getCause() instanceof RuntimeException r ? r : e;
        }
    }

    private int finish(List<JobInput> jobs, PlanRequest request, Store store, Outputs outputs) {
        RunPrinter printer = new RunPrinter(request.json() ? err : out);
        jobs.forEach(printer::job);
        if (request.json()) {
            out.println(new JsonReports(outputs).of(jobs));
            out.flush();
        }
        if (jobs.stream().anyMatch(JobInput::hasErrors)) {
            printer.nothingWritten(jobs.size() == 1 ? "the job has errors" : "a job has errors");
            return ExitCodes.JOB_ERRORS;
        }
        return request.out().map(folder -> write(outputs, jobs, store, folder, printer)).orElse(ExitCodes.OK);
    }

    /** Writes every job's outputs, or none when a writer refuses. */
    static int write(Outputs outputs, List<JobInput> jobs, Store store, Path folder, RunPrinter printer) {
        Outputs.Produced produced = outputs.produce(jobs.stream().map(in -> new Outputs.Named(in.source(),
                new PlannedJob(in.job().orElseThrow(), in.cycle().orElseThrow()))).toList());
        Timing.mark("outputs formatted");
        return write(produced, store, folder, printer);
    }

    /** Writes produced files, or none when a writer refused; names the older files replaced. */
    static int write(Outputs.Produced produced, Store store, Path folder, RunPrinter printer) {
        printer.findings(produced.findings());
        if (produced.refused()) {
            printer.nothingWritten("a writer refused");
            return ExitCodes.JOB_ERRORS;
        }
        List<String> replaced = OutputFolder.existing(folder, produced.files().keySet());
        store.writeAll(folder, produced.files());
        Timing.mark("outputs written");
        printer.written(folder, produced.files().keySet(), replaced);
        return ExitCodes.OK;
    }

    /** A job file, or the {@code .json} files of a folder in name order. */
    private static List<Path> files(Path p) {
        if (!Files.isDirectory(p)) {
            return List.of(p);
        }
        try (Stream<Path> list = Files.list(p)) {
            List<Path> files = list.filter(f -> f.getFileName().toString().endsWith(".json"))
                    .filter(Files::isRegularFile).sorted().toList();
            if (files.isEmpty()) {
                throw CliFailure.usage("cannot read " + p + ": the folder holds no .json job files");
            }
            return files;
        } catch (IOException e) {
            throw CliFailure.usage("cannot read " + p + ": " + e.getMessage());
        }
    }
}
