package org.hobwright.wizard.plan;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.TimeUnit;
import org.hobwright.api.cycle.HobCycle;
import org.hobwright.api.job.HobJob;
import org.hobwright.api.spi.CycleWriter;
import org.hobwright.api.spi.Providers;
import org.hobwright.api.spi.WriteContext;
import org.hobwright.api.spi.WriteResult;
import org.hobwright.wizard.store.Library;
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
import org.openjdk.jmh.infra.Blackhole;

/**
 * Plan + post throughput on one core: each operation plans the invented metering-pump gear on the
 * Varrow 1605 and formats all four outputs (NC program, cycle CSV, setup sheet, report) with the
 * writers found through the SPI, as {@code hobwright plan} does, without the file writes. Run with
 * {@code mvn -B -pl wizard -am -Pbench -DskipTests verify -Dbench.args=PlanAndPostBenchmark}.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.Throughput)
@OutputTimeUnit(TimeUnit.SECONDS)
@Warmup(iterations = 5, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(1)
@Threads(1)
public class PlanAndPostBenchmark {
    private final DefaultCyclePlanner planner = new DefaultCyclePlanner();
    private final HobJob job = TestJobs.meteringPumpOnVarrow();
    private final List<CycleWriter> writers =
            Providers.writers(PlanAndPostBenchmark.class.getClassLoader()).providers();
    private final WriteContext context = context();

    private static WriteContext context() {
        try {
            Path empty = Files.createTempDirectory("hobwright-bench");
            String dialect = Library.open(Optional.of(empty)).dialectText("varrow-ctl").value().orElseThrow();
            return new WriteContext(TestJobs.meteringPumpOnVarrow(), "2026-12-01", "bench",
                    Map.of(WriteContext.DIALECT, dialect, WriteContext.DIALECT_NAME, "varrow-ctl"));
        } catch (java.io.IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
    }

    /** Plans the job and formats every output. */
    @Benchmark
    public void planAndPost(Blackhole out) {
        HobCycle cycle = planner.plan(job);
        for (CycleWriter w : writers) {
            WriteResult r = w.write(cycle, context);
            if (r.files().isEmpty()) {
                throw new IllegalStateException(w.id() + " refused: " + r.findings());
            }
            out.consume(r);
        }
    }
}
