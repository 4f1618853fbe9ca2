package org.hobwright.post.csv;

import java.util.Optional;
import org.hobwright.api.cycle.HobCycle;
import org.hobwright.api.spi.CycleWriter;
import org.hobwright.api.spi.OutputFile;
import org.hobwright.api.spi.Spi;
import org.hobwright.api.spi.WriteContext;
import org.hobwright.api.spi.WriteResult;
import org.hobwright.post.PostFindings;
import org.hobwright.post.nc.Dialect;
import org.hobwright.post.nc.DialectLoader;

/** Writes the cycle CSV ({@code JOB.csv}) that host adapters import; see {@link CycleCsv}. */
public final class CsvWriter implements CycleWriter {

    @Override
    public String id() {
        return "csv";
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
        return "cycle CSV for host adapters: one row per step, mm and s";
    }

    @Override
    public WriteResult write(HobCycle cycle, WriteContext context) {
        Optional<WriteResult> refusal = PostFindings.refusal(cycle, context, id());
        return refusal.orElseGet(() -> WriteResult.of(
                new OutputFile(context.job().name() + ".csv", CycleCsv.write(cycle.steps(), DialectLoader.of(context)))));
    }
}
