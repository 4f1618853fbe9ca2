package org.hobwright.wizard.plan;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;

import org.hobwright.api.contract.CyclePlannerContract;
import org.hobwright.api.spi.CyclePlanner;
import org.hobwright.api.spi.Providers;
import org.junit.jupiter.api.Test;

/** The SPI contract for Hobwright's own planner, and its registration. */
class DefaultCyclePlannerContractTest extends CyclePlannerContract {

    @Override
    protected CyclePlanner planner() {
        return new DefaultCyclePlanner();
    }

    @Test
    void isFoundThroughTheServiceLoader() {
        CyclePlanner found = Providers.planner(getClass().getClassLoader());
        assertInstanceOf(DefaultCyclePlanner.class, found);
        assertEquals("hobwright", found.id());
    }
}
