package org.hobwright.post.sheet;

import java.util.Optional;
import org.hobwright.api.cycle.HobCycle;
import org.hobwright.api.spi.CycleWriter;
import org.hobwright.api.spi.OutputFile;
import org.hobwright.api.spi.Spi;
import org.hobwright.api.spi.WriteContext;
import org.hobwright.api.spi.WriteResult;
import org.hobwright.post.PostFindings;

/** Writes the setup sheet ({@code JOB.setup.html}): one printable page for the setter and the inspector. */
public final class SetupSheetWriter implements CycleWriter {

    @Override
    public String id() {
        return "sheet";
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
        return "setup sheet (HTML with drawings) for the setter and the inspector";
    }

    @Override
    public WriteResult write(HobCycle cycle, WriteContext context) {
        Optional<WriteResult> refusal = PostFindings.refusal(cycle, context, id());
        return refusal.orElseGet(() -> WriteResult.of(
                new OutputFile(context.job().name() + ".setup.html", SetupSheet.html(cycle, context))));
    }
}
