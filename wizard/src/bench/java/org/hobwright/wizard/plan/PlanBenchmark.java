package org.hobwright.wizard.plan;

import java.util.List;
import java.util.concurrent.TimeUnit;
import org.hobwright.api.cycle.HobCycle;
import org.hobwright.api.job.CycleSettings;
import org.hobwright.api.job.HobJob;
import org.hobwright.api.testkit.SampleJobs;
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
 * Plan + optimise throughput on one core: each operation analyses, plans and runs the fastest-cycle
 * search for one of the sample jobs (spur, helical, and the invented metering-pump gear), in turn.
 * Target: at least 20,000 jobs per second per core. Run with {@code mvn -B -pl wizard -am -Pbench
 * -DskipTests verify}.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.Throughput)
@OutputTimeUnit(TimeUnit.SECONDS)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(1)
@Threads(1)
public class PlanBenchmark {
    private final DefaultCyclePlanner planner = new DefaultCyclePlanner();
    private final List<HobJob> jobs = List.of(fastest(SampleJobs.spurMetric()), fastest(SampleJobs.helicalMetric()),
            TestJobs.meteringPumpOnVarrow());
    private int next;

    private static HobJob fastest(HobJob j) {
        CycleSettings c = j.cycle();
        return TestJobs.with(j, new CycleSettings(c.workMaterial(), c.cuttingSpeedMPerMin(), c.roughFeedMmPerRev(),
                c.finishFeedMmPerRev(), c.roughDepthMm(), c.finishStockMm(), c.method(), c.axialClearanceMm(),
                c.radialClearanceMm(), c.coolant(), c.targets(), c.hobShiftPerPartMm(), c.hobShiftEveryParts(), true));
    }

    /** Plans and optimises one job. */
    @Benchmark
    public HobCycle planAndOptimise() {
        HobJob job = jobs.get(next);
        next = (next + 1) % jobs.size();
        return planner.plan(job);
    }
}
