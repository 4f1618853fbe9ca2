package org.hobwright.post.nc;

import org.hobwright.api.contract.CycleWriterContract;
import org.hobwright.api.cycle.HobCycle;
import org.hobwright.api.spi.CycleWriter;
import org.hobwright.api.spi.WriteContext;
import org.hobwright.post.Fixtures;

/** {@link NcWriter} keeps the contract every writer keeps. */
class NcWriterContractTest extends CycleWriterContract {

    @Override
    protected CycleWriter writer() {
        return new NcWriter();
    }

    @Override
    protected HobCycle cleanCycle() {
        return Fixtures.helicalMetric().cycle();
    }

    @Override
    protected WriteContext context() {
        return Fixtures.helicalMetric().context("ottmere-ctl");
    }
}
