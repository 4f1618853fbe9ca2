package org.hobwright.wizard.plan;

import java.util.List;
import java.util.concurrent.TimeUnit;
import org.hobwright.api.cycle.HobCycle;
import org.hobwright.api.job.CycleSettings;
import org.hobwright.api.job.HobJob;
import org.hobwright.api.testkit.SampleJobs;
import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import org.openjdk.jmh.annotations.AuxCounters;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.TearDown;
import org.openjdk.jmh.annotations.Threads;
import org.openjdk.jmh.annotations.Warmup;

/**
 * Plan + optimise throughput on one core: each operation analyses, plans and runs the fastest-cycle
 * search for one of the sample jobs (spur, helical, and the invented metering-pump gear), in turn.
 * Target: at least 20,000 jobs per second per core. Run with {@code mvn -B -pl wizard -am -Pbench
 * -DskipTests verify}.
 *
 * <p>Besides the wall-clock score, the {@code jobs} and {@code cpuMicros} counters give the work done
 * and the benchmark thread's CPU time, so jobs per CPU second (jobs / cpuMicros × 10⁶) can be read
 * even on a machine shared with other work.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.Throughput)
@OutputTimeUnit(TimeUnit.SECONDS)
@Warmup(iterations = 10, time = 2)
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
        return TestJobs.with(j, TestJobs.shiftAndFastest(c, c.hobShiftPerPartMm(), c.hobShiftEveryParts(), true));
    }

    /** Plans and optimises one job. */
    @Benchmark
    public HobCycle planAndOptimise(CpuClock clock) {
        HobJob job = jobs.get(next);
        next = (next + 1) % jobs.size();
        clock.jobs++;
        return planner.plan(job);
    }

    private final HobJob mostPasses = mostPasses();

    /** The metering-pump gear split into the most passes a cycle may have ({@link PassDepths#MAX_PASSES}). */
    private static HobJob mostPasses() {
        HobJob j = TestJobs.meteringPumpOnVarrow();
        CycleSettings c = j.cycle();
        double depth = (26.0 - new DefaultCyclePlanner().plan(j).setup().orElseThrow().finalInfeedDiameterMm()) / 2;
        return TestJobs.with(j, new CycleSettings(c.workMaterial(), c.cuttingSpeedMPerMin(), c.roughFeedMmPerRev(),
                c.finishFeedMmPerRev(), java.util.OptionalDouble.of(depth / PassDepths.MAX_PASSES), c.finishStockMm(),
                c.method(), c.axialClearanceMm(), c.radialClearanceMm(), c.coolant(), c.targets(),
                c.hobShiftPerPartMm(), c.hobShiftEveryParts(), false));
    }

    /**
     * Plans the job with the most passes: planning is linear in the steps (each step's time is
     * added once), so this takes about {@value PassDepths#MAX_PASSES} times one pass's share.
     */
    @Benchmark
    public HobCycle planMostPasses(CpuClock clock) {
        clock.jobs++;
        return planner.plan(mostPasses);
    }

    /** Jobs done and CPU time of the benchmark thread, per iteration. */
    @State(Scope.Thread)
    @AuxCounters(AuxCounters.Type.EVENTS)
    public static class CpuClock {
        private static final ThreadMXBean THREADS = ManagementFactory.getThreadMXBean();
        /** Jobs planned in the iteration. */
        public long jobs;
        /** CPU time of the benchmark thread in the iteration, µs. */
        public long cpuMicros;
        private long startNanos;

        /** Starts the CPU clock. */
        @Setup(Level.Iteration)
        public void start() {
            jobs = 0;
            cpuMicros = 0;
            startNanos = THREADS.getCurrentThreadCpuTime();
        }

        /** Stops the CPU clock. */
        @TearDown(Level.Iteration)
        public void stop() {
            cpuMicros = (THREADS.getCurrentThreadCpuTime() - startNanos) / 1000;
        }
    }
}
