package org.hobwright.post.nc;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.concurrent.atomic.AtomicLong;
import org.hobwright.api.check.Finding;
import org.hobwright.api.cycle.HobCycle;
import org.hobwright.api.spi.CycleWriter;
import org.hobwright.api.spi.OutputFile;
import org.hobwright.api.spi.Spi;
import org.hobwright.api.spi.WriteContext;
import org.hobwright.api.spi.WriteResult;

/**
 * A writer for tests only, listed in the test resources of the modules that post through the SPI
 * (wizard, samples): whenever a test posts a cycle, it posts the same cycle with {@link NcWriter}
 * (the program is deterministic, so it is the program the run writes) and reads it back with
 * {@link NcReader} against the job's limits. It writes no file of its own. A broken invariant
 * becomes an error finding, so the run writes nothing and a test expecting success fails with
 * the violations printed, and is kept in {@link #violations()} for tests that allow exit 1.
 */
public final class ReadBackWriter implements CycleWriter {
    private static final List<String> FOUND = Collections.synchronizedList(new ArrayList<>());
    private static final AtomicLong CHECKED = new AtomicLong();

    @Override
    public String id() {
        return "nc-read-back";
    }

    @Override
    public int spiVersion() {
        return Spi.VERSION;
    }

    @Override
    public WriteResult write(HobCycle cycle, WriteContext context) {
        WriteResult posted = new NcWriter().write(cycle, context);
        String dialect = context.resource(WriteContext.DIALECT).orElse("");
        for (OutputFile f : posted.files()) {
            List<String> v = new NcReader(dialect).violations(f.text(), NcReader.Limits.of(context.job(), cycle));
            CHECKED.incrementAndGet();
            if (!v.isEmpty()) {
                String text = context.job().name() + ": " + String.join("; ", v);
                FOUND.add(text);
                return WriteResult.refused(List.of(Finding.error("TEST_NC_READ_BACK", "job",
                        "the posted program breaks a safety invariant when read back: " + text,
                        "fix the post", "tests' NC reader")));
            }
        }
        return new WriteResult(List.of(), List.of());
    }

    /** Every violation found since the JVM started, one line per program. */
    public static List<String> violations() {
        synchronized (FOUND) {
            return List.copyOf(FOUND);
        }
    }

    /** How many programs were read back since the JVM started. */
    public static long checked() {
        return CHECKED.get();
    }
}
