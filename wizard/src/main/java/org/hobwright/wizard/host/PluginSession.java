package org.hobwright.wizard.host;

import java.io.IOException;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.hobwright.api.check.Finding;
import org.hobwright.api.host.HostLibrary;
import org.hobwright.api.host.Outcome;
import org.hobwright.api.host.PlannedJob;
import org.hobwright.api.host.Written;
import org.hobwright.api.job.HobJob;
import org.hobwright.api.spi.CyclePlanner;
import org.hobwright.api.spi.CycleWriter;
import org.hobwright.api.spi.HostSession;
import org.hobwright.api.spi.OutputFile;
import org.hobwright.api.spi.Providers;
import org.hobwright.api.spi.WriteResult;
import org.hobwright.api.wizard.Wizard;
import org.hobwright.wizard.run.Build;
import org.hobwright.wizard.run.Outputs;
import org.hobwright.wizard.run.RunCode;
import org.hobwright.wizard.steps.Answers;
import org.hobwright.wizard.steps.LibraryServices;
import org.hobwright.wizard.steps.StepSession;
import org.hobwright.wizard.store.AtomicFiles;
import org.hobwright.wizard.store.JobReader;
import org.hobwright.wizard.store.JobWriter;
import org.hobwright.wizard.store.Library;
import org.hobwright.wizard.store.Loaded;

/**
 * One host session on a library folder: the store's job reader, the library's planner
 * ({@link org.hobwright.wizard.run.LibraryPlanner}), the writers posting through {@link Outputs},
 * and all-or-nothing writing through {@link AtomicFiles}, the same pieces the terminal tool uses.
 * Everything runs on the caller's thread: the session starts no thread and keeps no file open.
 */
final class PluginSession implements HostSession {
    private final Library library;
    private final ClassLoader loader;
    private final JobReader reader;
    private final ShopLibrary shop;
    private CyclePlanner planner;
    private Providers.Loaded<CycleWriter> writers;

    PluginSession(Path home, ClassLoader loader) {
        this.library = Library.open(Optional.of(home));
        this.loader = loader;
        this.reader = new JobReader(library);
        this.shop = new ShopLibrary(library);
    }

    @Override
    public Outcome<HobJob> readJob(Path jobFile) {
        return outcome(reader.read(jobFile));
    }

    @Override
    public Outcome<HobJob> readJob(String json, String source) {
        return outcome(reader.read(json, source));
    }

    @Override
    public synchronized CyclePlanner planner() {
        if (planner == null) {
            planner = shop.planner(loader);
        }
        return planner;
    }

    @Override
    public List<CycleWriter> writers() {
        return loaded().providers();
    }

    @Override
    public List<Finding> problems() {
        return loaded().problems();
    }

    @Override
    public WriteResult outputs(List<PlannedJob> jobs, LocalDate date) {
        List<Finding> blocked = blocked(jobs);
        if (!blocked.isEmpty()) {
            return WriteResult.refused(blocked);
        }
        Outputs.Produced produced = produce(jobs, date);
        if (produced.refused()) {
            return WriteResult.refused(produced.findings());
        }
        List<OutputFile> files = new ArrayList<>();
        produced.files().forEach((name, text) -> files.add(new OutputFile(name, text)));
        return new WriteResult(files, produced.findings());
    }

    @Override
    public Written write(List<PlannedJob> jobs, Path folder, LocalDate date) {
        List<Finding> blocked = blocked(jobs);
        if (!blocked.isEmpty()) {
            return new Written(folder, List.of(), blocked);
        }
        Outputs.Produced produced = produce(jobs, date);
        if (produced.refused()) {
            return new Written(folder, List.of(), produced.findings());
        }
        Map<String, AtomicFiles.Content> contents = new LinkedHashMap<>();
        produced.files().forEach((name, text) -> contents.put(name, AtomicFiles.text(text)));
        try {
            AtomicFiles.writeAll(folder, contents, true);
        } catch (IOException | RuntimeException e) {
            List<Finding> findings = new ArrayList<>(produced.findings());
            findings.add(RunCode.OUTPUT_WRITE_FAILED.at("out", "cannot write to " + folder + ": " + e.getMessage()
                    + "; nothing was written", "choose a folder you can write to"));
            return new Written(folder, List.of(), findings);
        }
        List<Path> paths = produced.files().keySet().stream().map(folder::resolve).toList();
        return new Written(folder, paths, produced.findings());
    }

    @Override
    public Wizard wizard(Optional<HobJob> start) {
        LibraryServices services = new LibraryServices(library, loader);
        if (start.isEmpty()) {
            return new StepSession(services, new Answers());
        }
        HobJob job = start.get();
        boolean known = services.machines().contains(job.machine().name());
        return new StepSession(services, Answers.fromTree(JobWriter.jobTree(job, job.units(), known)));
    }

    @Override
    public HostLibrary library() {
        return shop;
    }

    @Override
    public synchronized void close() {
        planner = null;
        writers = null;
    }

    private synchronized Providers.Loaded<CycleWriter> loaded() {
        if (writers == null) {
            writers = Providers.writers(loader);
        }
        return writers;
    }

    private Outputs.Produced produce(List<PlannedJob> jobs, LocalDate date) {
        Outputs outputs = new Outputs(library, loaded(), date.toString(), Build.VERSION);
        return outputs.produce(jobs.stream().map(p -> new Outputs.Named(p.job().name(), p)).toList());
    }

    /** The errors of jobs that cannot be written, each finding prefixed with its job. */
    private static List<Finding> blocked(List<PlannedJob> jobs) {
        List<Finding> out = new ArrayList<>();
        if (jobs.isEmpty()) {
            out.add(RunCode.OUTPUT_NO_JOBS.at("job", "no planned job was given", "plan a job first"));
        }
        for (PlannedJob p : jobs) {
            if (p.hasErrors()) {
                out.add(RunCode.OUTPUT_JOB_HAS_ERRORS.at("job", "job " + p.job().name() + " has "
                        + p.findings().stream().filter(Finding::isError).count() + " error finding(s); nothing was"
                        + " written", "fix the errors listed for the job, then plan it again"));
                p.findings().stream().filter(Finding::isError).forEach(out::add);
            }
        }
        return out;
    }

    private static <T> Outcome<T> outcome(Loaded<T> loaded) {
        return loaded.value().isPresent() ? Outcome.of(loaded.value().get(), loaded.findings())
                : Outcome.failed(loaded.findings());
    }

    /** As {@link #outcome}, for the library. */
    static <T> Outcome<T> of(Loaded<T> loaded) {
        return outcome(loaded);
    }
}
