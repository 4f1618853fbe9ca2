package org.hobwright.post.sheet;

import org.hobwright.api.contract.CycleWriterContract;
import org.hobwright.api.cycle.HobCycle;
import org.hobwright.api.spi.CycleWriter;
import org.hobwright.api.spi.WriteContext;
import org.hobwright.post.Fixtures;

/** {@link SetupSheetWriter} keeps the contract every writer keeps. */
class SetupSheetWriterContractTest extends CycleWriterContract {

    @Override
    protected CycleWriter writer() {
        return new SetupSheetWriter();
    }

    @Override
    protected HobCycle cleanCycle() {
        return Fixtures.helicalMetric().cycle();
    }

    @Override
    protected WriteContext context() {
        return Fixtures.helicalMetric().plainContext();
    }
}
