package org.hobwright.samples.host;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.hobwright.api.check.Finding;
import org.hobwright.api.cycle.HobCycle;
import org.hobwright.api.job.HobJob;
import org.hobwright.api.spi.OutputFile;
import org.hobwright.api.spi.WriteContext;
import org.hobwright.api.wizard.Wizard;

/**
 * One run of the example host: wizard → cycle → writers → files → operations imported from the
 * cycle CSV. Every step uses the api only.
 *
 * @param plugin Hobwright as found on the plugin class path
 * @param out    where the host shows what happens
 */
public record HostSession(HobwrightPlugin plugin, PrintWriter out) {

    /** What a run produced. */
    public enum Status {
        /** Files written and operations imported. */
        DONE,
        /** The job has errors or a writer refused: nothing written. */
        JOB_ERRORS
    }

    /**
     * The result of a run.
     *
     * @param status     how it ended
     * @param cycle      the planned cycle, when one was planned
     * @param written    the files written
     * @param operations the host's operations imported from the cycle CSV
     * @param findings   the findings that ended the run, or the open warnings
     */
    public record Result(Status status, Optional<HobCycle> cycle, List<Path> written, List<Operation> operations,
                         List<Finding> findings) {
        public Result {
            written = List.copyOf(written);
            operations = List.copyOf(operations);
            findings = List.copyOf(findings);
        }
    }

    /**
     * Runs the wizard with the sheet's answers and, when the job is clean, posts it into a folder.
     *
     * @param sheet  the answers and host settings
     * @param folder the output folder
     * @throws IOException when the output folder cannot be written
     */
    public Result run(AnswerSheet sheet, Path folder) throws IOException {
        Map<String, String> options = new HashMap<>();
        sheet.setting("home").ifPresent(home -> options.put("home", home));
        Wizard wizard = plugin.wizards().start(options);
        WizardOutcome outcome = new StepRenderer(out).walk(wizard, sheet);
        if (!outcome.postable()) {
            out.println("Nothing written: the job has errors.");
            return new Result(Status.JOB_ERRORS, outcome.cycle(), List.of(), List.of(), outcome.findings());
        }
        HobJob job = outcome.job().orElseThrow();
        HobCycle cycle = outcome.cycle().orElseThrow();
        DialectSource dialects = new DialectSource(sheet.setting("dialects").map(Path::of),
                plugin.wizards().getClass().getClassLoader());
        WriteContext context = new WriteContext(job, sheet.setting("date").orElse(LocalDate.now().toString()),
                "example host 1", dialects.resourcesFor(job.machine()));
        PostRun post = PostRun.of(plugin.writers(), cycle, context);
        post.findings().forEach(f -> out.println("   ! " + f.line()));
        if (post.files().isEmpty()) {
            out.println("Nothing written: a writer refused.");
            return new Result(Status.JOB_ERRORS, Optional.of(cycle), List.of(), List.of(), post.findings());
        }
        List<Path> written = OutputFolder.write(folder, post.files());
        written.forEach(p -> out.println("wrote " + p));
        List<Operation> ops = post.fileEndingWith(".csv").map(OutputFile::text).map(CycleImport::operations)
                .orElse(List.of());
        out.println();
        out.println("Imported " + ops.size() + " operations from the cycle CSV:");
        ops.forEach(op -> out.println(op.describe()));
        return new Result(Status.DONE, Optional.of(cycle), written, ops, cycle.findings());
    }
}
