package org.hobwright.api.contract;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.hobwright.api.check.Finding;
import org.hobwright.api.check.Severity;
import org.hobwright.api.cycle.HobCycle;
import org.hobwright.api.spi.CycleWriter;
import org.hobwright.api.spi.Spi;
import org.hobwright.api.spi.WriteContext;
import org.hobwright.api.spi.WriteResult;
import org.junit.jupiter.api.Test;

/** What every {@link CycleWriter} must do. Extend it in a provider's tests. */
public abstract class CycleWriterContract {

    /** The writer under test. */
    protected abstract CycleWriter writer();

    /** A valid planned cycle and its context. */
    protected abstract HobCycle cleanCycle();

    /** The context for {@link #cleanCycle()}. */
    protected abstract WriteContext context();

    @Test
    void declaresStableIdAndVersion() {
        assertFalse(writer().id().isBlank());
        assertEquals(Spi.API_VERSION, writer().apiVersion(), "built against this api");
        assertFalse(writer().buildVersion().isBlank());
    }

    @Test
    void writesCleanCycle() {
        WriteResult r = writer().write(cleanCycle(), context());
        assertFalse(r.files().isEmpty(), "files for a clean cycle");
        assertFalse(Finding.anyError(r.findings()), () -> "no errors: " + r.findings());
    }

    @Test
    void refusesCycleWithErrorsWithoutThrowing() {
        HobCycle clean = cleanCycle();
        HobCycle bad = new HobCycle(clean.gear(), clean.inspection(), clean.tolerances(), clean.setup(), List.of(),
                clean.summary(), clean.simulation(),
                List.of(Finding.error("TEST_ERROR", "job", "a test error", null, "test")));
        WriteResult r = writer().write(bad, context());
        assertTrue(r.files().isEmpty(), "nothing is written for a cycle with errors");
        assertTrue(Finding.anyError(r.findings()), "the refusal says why");
    }

    /** A cycle that says it was planned for another job is refused: its numbers belong to another part. */
    @Test
    void refusesCycleOfAnotherJob() {
        HobCycle other = cleanCycle().forJob(context().job().withName(context().job().name() + "-other"));
        WriteResult r = writer().write(other, context());
        assertTrue(r.files().isEmpty(), "nothing is written for another job's cycle");
        assertTrue(r.findings().stream().anyMatch(f -> f.severity() == Severity.ERROR && f.field().equals("job")
                && f.message().contains(context().job().name() + "-other")), () -> "the refusal names the job: "
                + r.findings());
        WriteResult own = writer().write(cleanCycle().forJob(context().job()), context());
        assertFalse(own.files().isEmpty(), () -> "the cycle of the job itself is written: " + own.findings());
    }

    @Test
    void outputIsDeterministic() {
        assertEquals(writer().write(cleanCycle(), context()), writer().write(cleanCycle(), context()));
    }

    /** Preparing changes nothing a write produces, also when done twice and by the same instance. */
    @Test
    void preparingChangesNothingWritten() {
        WriteResult unprepared = writer().write(cleanCycle(), context());
        CycleWriter prepared = writer();
        prepared.prepare(context());
        prepared.prepare(context());
        assertEquals(unprepared, prepared.write(cleanCycle(), context()));
    }
}
