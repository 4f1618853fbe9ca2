package org.hobwright.api.spi;

import org.hobwright.api.ApiStatus;
import org.hobwright.api.cycle.HobCycle;
import org.hobwright.api.job.HobJob;

/**
 * Turns a job into a checked, planned cycle. Found with {@link java.util.ServiceLoader}; the
 * wizard module provides one.
 */
@ApiStatus(since = "1.0")
public interface CyclePlanner extends Provider {

    /** Stable identifier, e.g. {@code hobwright}. */
    @Override
    String id();

    /**
     * The SPI generation of the first api: return {@link Spi#VERSION}. Which api the provider was
     * built against is {@link #apiVersion()}, which the lookup reads.
     *
     * @return {@link Spi#VERSION}
     */
    int spiVersion();

    /**
     * Checks and plans a job. Never throws for an engineering problem: every problem is a
     * finding in the returned cycle, and a cycle with error findings has no steps.
     *
     * @param job the job
     * @return the cycle, never null
     * @throws NullPointerException naming the job when it is null (a broken contract, not a finding)
     */
    HobCycle plan(HobJob job);
}
