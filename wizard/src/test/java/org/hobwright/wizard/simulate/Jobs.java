package org.hobwright.wizard.simulate;

import java.util.Optional;
import java.util.OptionalDouble;
import java.util.OptionalInt;
import org.hobwright.api.job.DrawingValues;
import org.hobwright.api.job.GearSpec;
import org.hobwright.api.job.Hand;
import org.hobwright.api.job.HobJob;
import org.hobwright.api.job.HobSpec;
import org.hobwright.api.job.Pitch;
import org.hobwright.api.job.Units;
import org.hobwright.api.testkit.SampleJobs;
import org.hobwright.wizard.geometry.GearGeometry;
import org.hobwright.wizard.geometry.ToothSystem;

/** Jobs and setups for the simulation tests, built through the public entry points. */
final class Jobs {
    private Jobs() {
    }

    static GearSpec gear(int teeth, double module, double helixDeg, double shift, String system) {
        return new GearSpec("sim-test", teeth, new Pitch.Module(module), 20, helixDeg, Hand.RIGHT, 20, shift, 0,
                system, Optional.empty(), OptionalDouble.empty(), OptionalDouble.empty(), OptionalInt.empty(),
                DrawingValues.NONE);
    }

    static HobJob job(GearSpec gear, int starts, int gashes) {
        HobSpec hob = new HobSpec(gear.pitch(), gear.pressureAngleDeg(), starts, Hand.RIGHT, 70, OptionalDouble.empty(),
                OptionalDouble.empty(), gashes, 80, OptionalDouble.empty(), "hss");
        return new HobJob("sim-test", Units.MM, gear, hob, SampleJobs.machine(true), SampleJobs.cycle());
    }

    /** Setup of a gear on its tooth system's rack, through {@link GeneratingSimulation#setupOf}. */
    static GeneratingSetup setup(int teeth, double module, double helixDeg, double shift, String system, int starts,
                                 int gashes) {
        GearSpec g = gear(teeth, module, helixDeg, shift, system);
        return GeneratingSimulation.setupOf(job(g, starts, gashes), GearGeometry.of(g, ToothSystem.of(g).orElseThrow()));
    }
}
