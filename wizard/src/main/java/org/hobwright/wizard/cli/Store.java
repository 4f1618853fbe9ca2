package org.hobwright.wizard.cli;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Optional;
import org.hobwright.api.job.CycleSettings;
import org.hobwright.api.job.HobJob;
import org.hobwright.wizard.store.AtomicFiles;
import org.hobwright.wizard.store.JobReader;
import org.hobwright.wizard.store.Library;
import org.hobwright.wizard.store.Loaded;
import org.hobwright.wizard.store.OutputSet;

/**
 * The template library and job reader as the terminal tool uses them: unreadable input becomes a
 * one-line {@link CliFailure} (exit 2), readable input a {@link JobInput} with its findings.
 */
final class Store {
    /** Resource folder of the bundled sample scenario. */
    static final String BUILTIN = "org/hobwright/builtin/";

    private final Library library;
    private final JobReader reader;

    private Store(Library library) {
        this.library = library;
        this.reader = new JobReader(library);
    }

    /** Opens the library: {@code --home}, else {@code $HOBWRIGHT_HOME}, else {@code ~/.hobwright}. */
    static Store open(Optional<Path> home, CliEnvironment env) {
        return new Store(Library.open(home, env.env(), Path.of(System.getProperty("user.home"))));
    }

    Library library() {
        return library;
    }

    JobReader reader() {
        return reader;
    }

    /** Reads a job file with the command line's overrides. */
    JobInput readJobFile(Path file, JobReader.Overrides overrides, boolean fastest) {
        return input(file.toString(), reader.read(file, overrides), fastest);
    }

    /** Reads a built-in sample job. */
    JobInput readBuiltinJob(String name, JobReader.Overrides overrides, boolean fastest) {
        String source = "built-in job " + name;
        return input(source, reader.read(builtinText("jobs/" + name + ".json"), source, overrides), fastest);
    }

    /** The text of a bundled sample file, e.g. {@code jobs/metering-pump-gear.json}. */
    static String builtinText(String path) {
        try (InputStream in = Store.class.getClassLoader().getResourceAsStream(BUILTIN + path)) {
            if (in == null) {
                throw new IllegalStateException("the built-in file " + path + " is missing from the jar");
            }
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** The dialect's text, when the library has it (the NC writer reports a missing one). */
    Optional<String> dialectText(String name) {
        return library.dialectText(name).value();
    }

    /**
     * Writes every file into the folder atomically, all or nothing, replacing older outputs
     * ({@link OutputSet}: never into the library folder).
     *
     * @throws CliFailure (exit 2) when the folder cannot be written
     */
    void writeAll(Path folder, Map<String, String> files) {
        Map<String, AtomicFiles.Content> contents = new LinkedHashMap<>();
        files.forEach((name, text) -> contents.put(name, AtomicFiles.text(text)));
        try {
            OutputSet.write(folder, contents, true, Optional.of(library.home()));
        } catch (IOException e) {
            throw CliFailure.usage("cannot write to " + folder + ": " + e.getMessage() + "; nothing was written");
        }
    }

    /** Turns an unreadable input into a one-line failure. */
    static <T> Loaded<T> readable(Loaded<T> loaded) {
        if (loaded.unreadable()) {
            throw CliFailure.usage(loaded.errorLine());
        }
        return loaded;
    }

    private static JobInput input(String source, Loaded<HobJob> loaded, boolean fastest) {
        readable(loaded);
        Optional<HobJob> job = loaded.value().map(j -> fastest ? fastest(j) : j);
        return new JobInput(source, job, loaded.findings(), Optional.empty());
    }

    private static HobJob fastest(HobJob j) {
        CycleSettings c = j.cycle();
        CycleSettings f = new CycleSettings(c.workMaterial(), c.cuttingSpeedMPerMin(), c.roughFeedMmPerRev(),
                c.finishFeedMmPerRev(), c.roughDepthMm(), c.finishStockMm(), c.method(), c.axialClearanceMm(),
                c.radialClearanceMm(), c.coolant(), c.targets(), c.hobShiftPerPartMm(), c.hobShiftEveryParts(), true);
        return new HobJob(j.name(), j.units(), j.gear(), j.hob(), j.machine(), f);
    }
}
