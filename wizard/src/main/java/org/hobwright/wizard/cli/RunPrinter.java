package org.hobwright.wizard.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.Collection;
import java.util.List;
import org.hobwright.api.check.Finding;
import org.hobwright.api.check.Severity;
import org.hobwright.api.job.Units;
import org.hobwright.wizard.steps.ReviewLines;

/** The short human summary of a run: per job its key numbers and findings, then what was written. */
final class RunPrinter {
    private final PrintWriter out;

    RunPrinter(PrintWriter out) {
        this.out = out;
    }

    /** A job's headline, key setup numbers with units, and its findings (info ones counted only). */
    void job(JobInput in) {
        List<Finding> findings = in.allFindings();
        long errors = findings.stream().filter(Finding::isError).count();
        out.println(in.name() + " (" + in.source() + "): " + (errors == 0 ? "planned"
                : errors + " error" + (errors == 1 ? "" : "s")));
        if (errors == 0) {
            Units units = in.job().map(j -> j.units()).orElse(Units.MM);
            in.cycle().ifPresent(c -> ReviewLines.of(c, units).forEach(l -> out.println("  " + l)));
        }
        findings(findings);
    }

    /** Errors and warnings one per line; info findings as a count. */
    void findings(Collection<Finding> findings) {
        findings.stream().filter(f -> f.severity() != Severity.INFO).forEach(f -> out.println("  " + f.line()));
        long infos = findings.stream().filter(f -> f.severity() == Severity.INFO).count();
        if (infos > 0) {
            out.println("  (" + infos + " remark" + (infos == 1 ? "" : "s") + " in the report)");
        }
    }

    /** What was written where, and which older files of the same names it replaced. */
    void written(Path folder, Collection<String> names, Collection<String> replaced) {
        out.println("Wrote " + names.size() + " file" + (names.size() == 1 ? "" : "s") + " to " + folder + ": "
                + String.join(", ", names));
        if (!replaced.isEmpty()) {
            out.println("Replaced " + replaced.size() + " older file" + (replaced.size() == 1 ? "" : "s")
                    + " of the same name" + (replaced.size() == 1 ? "" : "s") + ": " + String.join(", ", replaced));
        }
        out.println("Caution: prove out the program at reduced override with the guards closed, following the"
                + " machine builder's manual.");
    }

    /** Nothing written, and why. */
    void nothingWritten(String why) {
        out.println("Nothing written: " + why + ".");
    }
}
