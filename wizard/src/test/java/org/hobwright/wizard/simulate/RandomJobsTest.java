package org.hobwright.wizard.simulate;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.OptionalInt;
import java.util.SplittableRandom;
import org.hobwright.api.cycle.GearData;
import org.hobwright.api.cycle.Point;
import org.hobwright.api.cycle.SimulationData;
import org.hobwright.api.job.DrawingValues;
import org.hobwright.api.job.GearSpec;
import org.hobwright.api.job.Hand;
import org.hobwright.api.job.Pitch;
import org.hobwright.api.job.ToothProportions;
import org.hobwright.wizard.geometry.GearGeometry;
import org.hobwright.wizard.geometry.ToothSystem;
import org.junit.jupiter.api.Test;

/**
 * Property: any job the api accepts either simulates to finite numbers or is refused with a
 * {@link SimulationInputException} naming a field; never another exception (fixed seed).
 */
class RandomJobsTest {
    @Test
    void randomJobsSimulateOrNameTheField() {
        SplittableRandom random = new SplittableRandom(42L);
        List<String> systems = ToothSystem.ids();
        int simulated = 0;
        for (int n = 0; n < 400; n++) {
            String system = systems.get(random.nextInt(systems.size()));
            Optional<ToothProportions> custom = system.equals(ToothSystem.CUSTOM)
                    ? Optional.of(new ToothProportions(0.8 + 0.2 * random.nextDouble(), 1.05 + 0.45 * random.nextDouble(),
                    0.6 * random.nextDouble())) : Optional.empty();
            GearSpec g = new GearSpec("r", 5 + random.nextInt(300), new Pitch.Module(0.2 + 6 * random.nextDouble()),
                    system.equals("full-depth-14.5") ? 14.5 : 20, random.nextBoolean() ? 0 : 45 * random.nextDouble(),
                    Hand.RIGHT, 10, -1 + 2.5 * random.nextDouble(), -0.05 * random.nextDouble(), system, custom,
                    OptionalDouble.empty(), OptionalDouble.empty(), OptionalInt.empty(), DrawingValues.NONE);
            GearData gear = GearGeometry.of(g, ToothSystem.of(g).orElseThrow());
            try {
                SimulationData d = GeneratingSimulation.simulate(Jobs.job(g, 1 + random.nextInt(4),
                        3 + random.nextInt(20)), gear);
                for (Point p : d.simulatedProfile()) {
                    assertTrue(Double.isFinite(p.x()) && Double.isFinite(p.y()));
                }
                simulated++;
            } catch (SimulationInputException e) {
                assertTrue(e.field().startsWith("gear.") || e.field().startsWith("hob."), e.field());
            }
        }
        assertTrue(simulated > 300, "most random jobs simulate: " + simulated);
    }
}
