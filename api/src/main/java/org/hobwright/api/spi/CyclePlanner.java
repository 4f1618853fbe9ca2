package org.hobwright.api.spi;

import org.hobwright.api.cycle.HobCycle;
import org.hobwright.api.job.HobJob;

/**
 * Turns a job into a checked, planned cycle. Found with {@link java.util.ServiceLoader}; the
 * wizard module provides one.
 */
public interface CyclePlanner {

    /** Stable identifier, e.g. {@code hobwright}. */
    String id();

    /** The SPI version this planner was built for ({@link Spi#VERSION}). */
    int spiVersion();

    /**
     * Checks and plans a job. Never throws for an engineering problem: every problem is a
     * finding in the returned cycle, and a cycle with error findings has no steps.
     *
     * @param job the job
     * @return the cycle, never null
     */
    HobCycle plan(HobJob job);
}
