package org.hobwright.wizard.plan;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.Optional;
import org.hobwright.api.check.Finding;
import org.hobwright.api.cycle.HobCycle;
import org.hobwright.api.job.HobJob;
import org.hobwright.wizard.store.JobReader;
import org.hobwright.wizard.store.Library;
import org.hobwright.wizard.store.Loaded;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** The invented sample scenario's job plans cleanly on both invented machines with their templates. */
class ScenarioPlanningTest {
    private static final Path DEMO_JOB = Path.of("..", "samples", "scenario", "jobs", "metering-pump-gear.json");

    @ParameterizedTest(name = "{0} {1}")
    @CsvSource({"varrow-1605, ''", "varrow-1605, brass-fine", "ottmere-4008, ''", "ottmere-4008, steel-production"})
    void demoJobPlans(String machine, String template, @TempDir Path home) {
        Loaded<HobJob> job = new JobReader(Library.open(Optional.of(home))).read(DEMO_JOB, new JobReader.Overrides(
                Optional.of(machine), template.isEmpty() ? Optional.empty() : Optional.of(template)));
        assertTrue(job.value().isPresent(), job.findings().toString());
        HobCycle c = new DefaultCyclePlanner().plan(job.value().get());
        assertFalse(c.hasErrors(), c.findings().stream().filter(Finding::isError).map(Finding::line).toList()
                .toString());
        assertFalse(c.steps().isEmpty());
    }
}
