package org.hobwright.samples.host;

import java.util.ArrayList;
import java.util.List;
import org.hobwright.api.check.Finding;
import org.hobwright.api.cycle.HobCycle;
import org.hobwright.api.spi.CycleWriter;
import org.hobwright.api.spi.OutputFile;
import org.hobwright.api.spi.WriteContext;
import org.hobwright.api.spi.WriteResult;

/**
 * Has every writer format the cycle. All or nothing: when one writer refuses, no file is kept.
 *
 * @param files    the files to write (empty when any writer refused)
 * @param findings what the writers said
 */
public record PostRun(List<OutputFile> files, List<Finding> findings) {

    public PostRun {
        files = List.copyOf(files);
        findings = List.copyOf(findings);
    }

    /**
     * Runs the writers. A writer that throws is reported as an error finding, never passed on.
     *
     * @param writers the writers
     * @param cycle   the planned cycle
     * @param context the job and the dialect
     */
    public static PostRun of(List<CycleWriter> writers, HobCycle cycle, WriteContext context) {
        List<OutputFile> files = new ArrayList<>();
        List<Finding> findings = new ArrayList<>();
        for (CycleWriter writer : writers) {
            try {
                WriteResult r = writer.write(cycle, context);
                files.addAll(r.files());
                findings.addAll(r.findings());
            } catch (RuntimeException e) {
                findings.add(HostCode.HOST_WRITER_FAILED.at("writer." + writer.id(),
                        "writer \"" + writer.id() + "\" failed: " + e, "report it with the job file"));
            }
        }
        return new PostRun(Finding.anyError(findings) ? List.of() : files, findings);
    }

    /** The file a writer named this way produced ({@code .csv}, {@code .nc} ...), if any. */
    public java.util.Optional<OutputFile> fileEndingWith(String suffix) {
        return files.stream().filter(f -> f.fileName().endsWith(suffix)).findFirst();
    }
}
