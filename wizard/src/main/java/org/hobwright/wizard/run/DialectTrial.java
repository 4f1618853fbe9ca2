package org.hobwright.wizard.run;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.hobwright.api.check.Finding;
import org.hobwright.api.check.Severity;
import org.hobwright.api.cycle.HobCycle;
import org.hobwright.api.job.HobJob;
import org.hobwright.api.spi.CycleWriter;
import org.hobwright.api.spi.Providers;
import org.hobwright.api.spi.WriteContext;
import org.hobwright.wizard.plan.DefaultCyclePlanner;

/**
 * The check of a dialect before the library saves it: a known job is planned and posted with the
 * dialect through every writer found, which read and check it as they would for a real job. The
 * wizard learns what is wrong from the writers' findings and never reads a dialect itself.
 */
public final class DialectTrial {
    private DialectTrial() {
    }

    /**
     * Posts {@code sample} with the dialect.
     *
     * @param name    the dialect's name
     * @param text    the dialect file's text
     * @param sample  a job that can be planned and posted (the built-in sample)
     * @param loader  the class loader the writers are found with
     * @param date    the date printed in the trial outputs (they are not kept)
     * @return the writers' findings: an error means the dialect cannot post a program
     */
    public static List<Finding> findings(String name, String text, HobJob sample, ClassLoader loader, String date) {
        HobJob job = sample.withMachine(sample.machine().withDialect(name));
        HobCycle cycle = new DefaultCyclePlanner().plan(job);
        List<Finding> out = new ArrayList<>();
        if (cycle.hasErrors()) {
            return out;
        }
        WriteContext context = new WriteContext(job, date, "dialect check",
                Map.of(WriteContext.DIALECT_NAME, name, WriteContext.DIALECT, text));
        for (CycleWriter w : Providers.writers(loader).providers()) {
            for (Finding f : w.write(cycle, context).findings()) {
                if (f.severity() != Severity.INFO) {
                    out.add(f);
                }
            }
        }
        return out;
    }
}
