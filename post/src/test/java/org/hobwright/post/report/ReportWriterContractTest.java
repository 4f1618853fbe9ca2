package org.hobwright.post.report;

import org.hobwright.api.contract.CycleWriterContract;
import org.hobwright.api.cycle.HobCycle;
import org.hobwright.api.spi.CycleWriter;
import org.hobwright.api.spi.WriteContext;
import org.hobwright.post.Fixtures;

/** {@link ReportWriter} keeps the contract every writer keeps. */
class ReportWriterContractTest extends CycleWriterContract {

    @Override
    protected CycleWriter writer() {
        return new ReportWriter();
    }

    @Override
    protected HobCycle cleanCycle() {
        return Fixtures.spurMetric().cycle();
    }

    @Override
    protected WriteContext context() {
        return Fixtures.spurMetric().plainContext();
    }
}
