package org.hobwright.api.spi;

import java.nio.file.Path;
import java.time.LocalDate;
import java.util.List;
import org.hobwright.api.ApiStatus;
import org.hobwright.api.check.Finding;
import org.hobwright.api.host.HostLibrary;
import org.hobwright.api.host.Outcome;
import org.hobwright.api.host.PlannedJob;
import org.hobwright.api.host.Written;
import org.hobwright.api.job.HobJob;
import org.hobwright.api.wizard.Wizard;

/**
 * One open library with its planner and writers, as a {@link HostProvider} gives it. The façade
 * {@link org.hobwright.api.Hobwright} checks every argument before it calls a session, so an
 * implementation may take them as valid. Nothing here throws for bad input: problems are findings.
 */
@ApiStatus(since = "1.1")
public interface HostSession extends AutoCloseable {

    /**
     * Reads a job file, resolving machine and template names through the library.
     *
     * @param jobFile the job file
     * @return the job, or the findings that say why there is none
     */
    Outcome<HobJob> readJob(Path jobFile);

    /**
     * Reads a job from the text of a job file.
     *
     * @param json   the JSON text
     * @param source a name for messages, e.g. a file name
     * @return the job, or the findings that say why there is none
     */
    Outcome<HobJob> readJob(String json, String source);

    /** {@return the planner, with the library's cutting data and defaults} */
    CyclePlanner planner();

    /** {@return the usable writers, in class-path order} */
    List<CycleWriter> writers();

    /** {@return providers that were skipped while the session was opened, one finding each} */
    List<Finding> problems();

    /**
     * The texts every writer gives for planned jobs, without writing anything.
     *
     * @param jobs the planned jobs
     * @param date the date printed in the outputs
     * @return the files, or the findings of a writer that refused
     */
    WriteResult outputs(List<PlannedJob> jobs, LocalDate date);

    /**
     * Writes every writer's files for planned jobs into a folder, all or nothing.
     *
     * @param jobs   the planned jobs, none with errors
     * @param folder the output folder (created when missing)
     * @param date   the date printed in the outputs
     * @return the files written, or the findings that say why nothing was written
     */
    Written write(List<PlannedJob> jobs, Path folder, LocalDate date);

    /**
     * Starts a wizard session.
     *
     * @param start the job whose values are the first answers; empty for a blank start
     * @return the session
     */
    Wizard wizard(java.util.Optional<HobJob> start);

    /** {@return the machine, template, dialect and cutting-data library} */
    HostLibrary library();

    /** Releases what the session holds: threads, open files, caches. */
    @Override
    void close();
}
