package org.hobwright.wizard.simulate;

import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Threads;
import org.openjdk.jmh.annotations.Warmup;

/**
 * One tooth space of a 100-tooth gear at 1 µm resolution with a 12-gash single-start hob, both
 * flanks, cusps and the undercut check: the whole {@link GeneratingSimulation#run}. Spur m 1 on the
 * ISO 53 A rack, the same with the cuts off the space centre (no mirror reuse of the right flank),
 * and the same gear helical (β 20°). Target: under 20 ms per tooth space on one core.
 * Run with {@code mvn -B -pl wizard -am -Pbench -DskipTests verify -Dbench.args=SimulationBenchmark}.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(1)
@Threads(1)
public class SimulationBenchmark {
    private final GeneratingSetup spur = setup(0);
    private final GeneratingSetup helical = setup(Math.toRadians(20));
    private final GeneratingSetup offPhase = setup(0).withHob(1, 12, 0.3);

    private static GeneratingSetup setup(double beta) {
        double m = 1;
        int z = 100;
        double d = z * m / Math.cos(beta);
        return new GeneratingSetup(z, m, Math.toRadians(20), beta, 0, 1.25 * m, 0.38 * m, d + 2 * m, 1, 12, 0,
                GeneratingSimulation.RESOLUTION_MM);
    }

    /** Spur, 100 teeth, m 1, 12 gashes, 1 µm. */
    @Benchmark
    public ToothSpaceSimulation spur100Teeth() {
        return GeneratingSimulation.run(spur);
    }

    /** As {@link #spur100Teeth} with the cuts off the space centre: the two flanks differ and are both computed. */
    @Benchmark
    public ToothSpaceSimulation spur100TeethOffPhase() {
        return GeneratingSimulation.run(offPhase);
    }

    /** Helical β 20°, 100 teeth, m_n 1, 12 gashes, 1 µm. */
    @Benchmark
    public ToothSpaceSimulation helical100Teeth() {
        return GeneratingSimulation.run(helical);
    }
}
