package org.hobwright.samples.host;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.List;
import java.util.Optional;
import org.hobwright.api.Hobwright;
import org.hobwright.api.check.Finding;
import org.hobwright.api.cycle.HobCycle;
import org.hobwright.api.host.PlannedJob;
import org.hobwright.api.host.Written;
import org.hobwright.api.wizard.Wizard;

/**
 * One run of the example host: wizard → planned job → all outputs written by the façade →
 * operations imported from the cycle CSV. Every step uses the api only.
 *
 * @param hobwright the open façade
 * @param out       where the host shows what happens
 */
public record HostSession(Hobwright hobwright, PrintWriter out) {

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
     * Walks a blank wizard with the sheet's answers and, when the job is clean, writes its outputs.
     *
     * @param sheet  the answers and host settings
     * @param folder the output folder
     * @return what the run did
     * @throws IOException when the written cycle CSV cannot be read back
     */
    public Result run(AnswerSheet sheet, Path folder) throws IOException {
        Wizard wizard = hobwright.wizard();
        WizardOutcome outcome = new StepRenderer(out).walk(wizard, sheet);
        if (!outcome.postable()) {
            out.println("Nothing written: the job has errors.");
            return new Result(Status.JOB_ERRORS, outcome.cycle(), List.of(), List.of(), outcome.findings());
        }
        PlannedJob planned = new PlannedJob(outcome.job().orElseThrow(), outcome.cycle().orElseThrow());
        LocalDate date = sheet.setting("date").map(LocalDate::parse).orElse(LocalDate.now());
        Written written = hobwright.write(planned, folder, date);
        written.findings().forEach(f -> out.println("   ! " + f.line()));
        if (!written.ok()) {
            out.println("Nothing written: a writer refused.");
            return new Result(Status.JOB_ERRORS, Optional.of(planned.cycle()), List.of(), List.of(),
                    written.findings());
        }
        written.files().forEach(p -> out.println("wrote " + p));
        Optional<Path> csv = written.files().stream().filter(p -> p.toString().endsWith(".csv")).findFirst();
        List<Operation> ops = csv.isEmpty() ? List.of()
                : CycleImport.operations(Files.readString(csv.get(), StandardCharsets.UTF_8));
        out.println();
        out.println("Imported " + ops.size() + " operations from the cycle CSV:");
        ops.forEach(op -> out.println(op.describe()));
        return new Result(Status.DONE, Optional.of(planned.cycle()), written.files(), ops, planned.findings());
    }
}
