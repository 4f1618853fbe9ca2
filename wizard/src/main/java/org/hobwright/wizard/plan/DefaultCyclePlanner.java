package org.hobwright.wizard.plan;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Optional;
import org.hobwright.api.check.Finding;
import org.hobwright.api.cycle.HobCycle;
import org.hobwright.api.job.HobJob;
import org.hobwright.api.spi.CyclePlanner;
import org.hobwright.api.spi.Spi;
import org.hobwright.wizard.analysis.JobAnalyser;
import org.hobwright.wizard.analysis.JobAnalysis;
import org.hobwright.wizard.run.Build;
import org.hobwright.wizard.store.CuttingDataTable;

/**
 * Hobwright's planner: analyses the job (geometry, inspection, tolerances, hob setup, checks), then
 * plans the synchronised cycle ({@link JobPlanning}). A job whose analysis has errors gets those
 * findings and no steps. Findings come errors first, then warnings, then remarks.
 */
public final class DefaultCyclePlanner implements CyclePlanner {
    /** The planner's identifier. */
    public static final String ID = "hobwright";

    private static final Comparator<Finding> ERRORS_FIRST = Comparator.comparing(Finding::severity);

    private final CuttingDataTable table;

    /** A planner with the built-in cutting-data table (used by {@link java.util.ServiceLoader}). */
    public DefaultCyclePlanner() {
        this(CuttingDataTable.builtIn());
    }

    /**
     * A planner with a cutting-data table, e.g. the one of a library folder
     * ({@link org.hobwright.wizard.store.CuttingDataReader#forLibrary}).
     *
     * @param table the table
     */
    public DefaultCyclePlanner(CuttingDataTable table) {
        this.table = java.util.Objects.requireNonNull(table, "table");
    }

    @Override
    public String id() {
        return ID;
    }

    @Override
    public int spiVersion() {
        return Spi.VERSION;
    }

    @Override
    public String apiVersion() {
        return Spi.API_VERSION;
    }

    @Override
    public String buildVersion() {
        return Build.VERSION;
    }

    @Override
    public HobCycle plan(HobJob job) {
        java.util.Objects.requireNonNull(job, "job is required, was null");
        return planned(job).forJob(job);
    }

    private HobCycle planned(HobJob job) {
        JobAnalysis analysis = JobAnalyser.analyse(job);
        List<Finding> findings = new ArrayList<>(analysis.findings());
        if (!analysis.hasErrors() && (analysis.gear().isEmpty() || analysis.hobSetup().isEmpty())) {
            findings.add(PlanCode.PLAN_INVARIANT_BROKEN.at("job", "the analysis gave no gear geometry or hob"
                    + " setup and no error", "do not post; report this job to the Hobwright developers"));
        }
        if (Finding.anyError(findings)) {
            return unplanned(analysis, findings);
        }
        return new JobPlanning(job, analysis, table, findings).run();
    }

    /** The cycle of a job that cannot be planned: analysis results and findings, no steps. */
    static HobCycle unplanned(JobAnalysis analysis, List<Finding> findings) {
        return new HobCycle(analysis.gear(), analysis.inspection(), analysis.tolerances(), Optional.empty(),
                List.of(), Optional.empty(), Optional.empty(), sorted(findings), Optional.empty(), analysis.pair(),
                analysis.spline());
    }

    /** The findings, errors first (stable). */
    static List<Finding> sorted(List<Finding> findings) {
        List<Finding> out = new ArrayList<>(findings);
        out.sort(ERRORS_FIRST);
        return out;
    }
}
