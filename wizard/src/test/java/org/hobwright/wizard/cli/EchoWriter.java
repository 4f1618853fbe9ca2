package org.hobwright.wizard.cli;

import java.util.Locale;
import org.hobwright.api.cycle.HobCycle;
import org.hobwright.api.spi.CycleWriter;
import org.hobwright.api.spi.OutputFile;
import org.hobwright.api.spi.Spi;
import org.hobwright.api.spi.WriteContext;
import org.hobwright.api.spi.WriteResult;
import org.hobwright.wizard.store.JobWriter;

/**
 * A test writer added through its own class loader: writes the job as read and the key setup
 * numbers, so two runs that planned the same job write the same bytes.
 */
public final class EchoWriter implements CycleWriter {
    @Override
    public String id() {
        return "echo";
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
    public WriteResult write(HobCycle cycle, WriteContext context) {
        String setup = cycle.setup().map(s -> String.format(Locale.ROOT, "hob %.6f rpm, work %.6f rpm, swivel %s%n",
                s.hobRpm(), s.workRpm(), s.swivelAngleDms())).orElse("no setup\n");
        return WriteResult.of(new OutputFile(context.job().name() + ".echo.txt", context.generatedOn() + "\n"
                + JobWriter.jobText(context.job(), context.job().units(), true) + setup));
    }
}
