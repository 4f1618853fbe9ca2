package org.hobwright.api.spi;

import org.hobwright.api.ApiStatus;
import org.hobwright.api.cycle.HobCycle;

/**
 * Writes one kind of output (NC program, cycle CSV, setup sheet, report) from a planned cycle.
 * Found with {@link java.util.ServiceLoader}; the post module provides four, a host may add more.
 *
 * <p>A writer formats what the cycle says; it computes no geometry. It produces texts, not files:
 * the caller writes every file of a run atomically, or none when any writer refuses.
 */
@ApiStatus(since = "1.0")
public interface CycleWriter extends Provider {

    /** Stable identifier: {@code nc}, {@code csv}, {@code sheet}, {@code report}, or a host's own. */
    @Override
    String id();

    /**
     * The SPI generation of the first api: return {@link Spi#VERSION}. Which api the provider was
     * built against is {@link #apiVersion()}, which the lookup reads.
     *
     * @return {@link Spi#VERSION}
     */
    int spiVersion();

    /** {@return one line saying what this writer produces} */
    default String description() {
        return id();
    }

    /**
     * Called once the job is known, before its cycle is planned, possibly on another thread and
     * while other jobs are written: a writer may load and check what it will need (a dialect) so
     * that {@link #write} takes less time. It writes nothing and reports nothing ({@code write}
     * reports every problem), and what it keeps must not change what {@code write} produces. The
     * default does nothing.
     *
     * @param context the job and the resources the writer will be given
     */
    default void prepare(WriteContext context) {
    }

    /**
     * Formats the cycle. Must not throw for a cycle with errors: it returns a refusal instead, and
     * so for a cycle planned for another job than {@code context.job()}
     * ({@link HobCycle#plannedFor()}).
     *
     * @param cycle   the planned cycle
     * @param context the job and the resources the writer may need
     * @return files or findings, never null
     */
    WriteResult write(HobCycle cycle, WriteContext context);
}
