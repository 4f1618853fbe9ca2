package org.hobwright.post.csv;

import org.hobwright.api.contract.CycleWriterContract;
import org.hobwright.api.cycle.HobCycle;
import org.hobwright.api.spi.CycleWriter;
import org.hobwright.api.spi.WriteContext;
import org.hobwright.post.Fixtures;

/** {@link CsvWriter} keeps the contract every writer keeps. */
class CsvWriterContractTest extends CycleWriterContract {

    @Override
    protected CycleWriter writer() {
        return new CsvWriter();
    }

    @Override
    protected HobCycle cleanCycle() {
        return Fixtures.spurInch().cycle();
    }

    @Override
    protected WriteContext context() {
        return Fixtures.spurInch().plainContext();
    }
}
