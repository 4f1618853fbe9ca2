package org.hobwright.post.report;

import java.util.List;
import java.util.Optional;
import org.hobwright.api.cycle.HobCycle;
import org.hobwright.api.spi.CycleWriter;
import org.hobwright.api.spi.OutputFile;
import org.hobwright.api.spi.Spi;
import org.hobwright.api.spi.WriteContext;
import org.hobwright.api.spi.WriteResult;
import org.hobwright.post.PostFindings;
import org.hobwright.text.JsonTrees;

/**
 * Writes the JSON report ({@code JOB.report.json}) with the pointers listed in post/README.md. Like every
 * writer it writes nothing for a cycle with errors, unless the context's resource
 * {@value #WITH_ERRORS} is {@code true}: then it writes the report with the error findings and
 * without the parts that could not be computed (what {@code plan --json} prints).
 */
public final class ReportWriter implements CycleWriter {

    /** Resource key: {@code true} writes the report also for a cycle with errors. */
    public static final String WITH_ERRORS = WriteContext.REPORT_WITH_ERRORS;

    private static final JsonTrees.Layout LAYOUT = new JsonTrees.Layout(true, true);

    @Override
    public String id() {
        return "report";
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
        return PostFindings.BUILD_VERSION;
    }

    @Override
    public String description() {
        return "JSON report: gear data, inspection, setup, cycle, findings";
    }

    @Override
    public WriteResult write(HobCycle cycle, WriteContext context) {
        boolean always = context.resource(WITH_ERRORS).map("true"::equals).orElse(false);
        Optional<WriteResult> refusal = always && cycle.hasErrors() ? PostFindings.otherJob(cycle, context, id())
                : PostFindings.refusal(cycle, context, id());
        if (refusal.isPresent()) {
            return refusal.get();
        }
        String text = JsonTrees.write(new ReportBuilder(context.job()).build(cycle, context), LAYOUT) + "\n";
        return new WriteResult(List.of(new OutputFile(context.job().name() + ".report.json", text)), List.of());
    }
}
