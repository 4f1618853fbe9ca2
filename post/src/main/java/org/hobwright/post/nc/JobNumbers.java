package org.hobwright.post.nc;

import java.util.Optional;
import org.hobwright.api.job.HobJob;
import org.hobwright.api.spi.WriteContext;

/**
 * The program number and the hob's tool station a job runs under: the job's (or its template's)
 * {@code cycle.programNumber} and {@code cycle.toolStation}, else the dialect's defaults. The
 * program, the setup sheet and the report print the same two numbers.
 *
 * @param programNumber the program number
 * @param toolStation   the hob's tool station
 */
public record JobNumbers(long programNumber, long toolStation) {

    /** The numbers of a job on a dialect. */
    public static JobNumbers of(HobJob job, Dialect d) {
        long program = job.cycle().run().programNumber().isPresent()
                ? job.cycle().run().programNumber().getAsInt() : d.programNumbers().dflt();
        long tool = job.cycle().run().toolStation().isPresent()
                ? job.cycle().run().toolStation().getAsInt() : d.toolStations().dflt();
        return new JobNumbers(program, tool);
    }

    /** The numbers of the context's job on the context's dialect; empty without a readable dialect. */
    public static Optional<JobNumbers> of(WriteContext context) {
        Optional<Dialect> d = DialectLoader.of(context);
        return d.isPresent() ? Optional.of(of(context.job(), d.get())) : Optional.empty();
    }
}
