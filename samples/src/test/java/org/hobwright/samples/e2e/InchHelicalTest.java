package org.hobwright.samples.e2e;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.hobwright.api.cycle.CycleStep;
import org.hobwright.api.cycle.HobCycle;
import org.hobwright.api.job.HobJob;
import org.hobwright.api.job.Units;
import org.hobwright.api.spi.Providers;
import org.hobwright.api.spi.WriteContext;
import org.hobwright.api.spi.WriteResult;
import org.hobwright.post.nc.NcReader;
import org.hobwright.wizard.store.JobReader;
import org.hobwright.wizard.store.Library;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The helical sample gear programmed in inches: the helical addition word and the header comment
 * that explains it give the same number in the same unit, degrees of work rotation per inch of axial
 * travel, which is the planned value per millimetre times 25.4 (the inch is 25.4 mm exactly by
 * definition, NIST SP 811:2008, appendix B).
 */
class InchHelicalTest {

    @Test
    void theHelicalAdditionWordAndItsCommentAreInDegreesPerInch(@TempDir Path work) throws IOException {
        ClassLoader loader = getClass().getClassLoader();
        Library library = Library.open(Optional.of(work.resolve("home")), Map.of(), work);
        HobJob job = new JobReader(library).read(PlanRun.JOBS.resolve("pump-helical-gear-4008.json")).value()
                .orElseThrow().withUnits(Units.IN);
        HobCycle cycle = Providers.planner(loader).plan(job);
        assertFalse(cycle.hasErrors(), cycle.findings().toString());
        double perMm = cycle.steps().stream().filter(CycleStep.SyncOn.class::isInstance).map(CycleStep.SyncOn.class::cast)
                .findFirst().orElseThrow().differentialDegPerMm();
        assertTrue(perMm != 0, "a helical cycle adds a rotation");
        double perInch = perMm * 25.4;

        String dialect = library.dialectText(job.machine().dialect()).value().orElseThrow();
        WriteResult r = Providers.writer(loader, "nc").write(cycle, WriteContext.of(job, LocalDate.of(2026, 1, 5),
                "test", Map.of(WriteContext.DIALECT, dialect, WriteContext.DIALECT_NAME, job.machine().dialect())));
        assertFalse(r.files().isEmpty(), r.findings().toString());
        String program = r.files().get(0).text();
        NcReader reader = new NcReader(dialect);
        List<NcReader.Block> blocks = reader.blocks(program);
        double word = blocks.stream().filter(b -> b.is("syncOnHelix")).findFirst().orElseThrow().number("differential");
        assertEquals(perInch, word, 0.5 * Math.pow(10, -reader.decimals("differential")) + 1e-12,
                "the word in degrees per inch");

        String comment = program.lines().filter(l -> l.contains("differential: ")).findFirst().orElseThrow();
        assertTrue(comment.contains(" deg of work rotation per in of axial travel"), comment);
        String number = comment.substring(comment.indexOf("differential: ") + "differential: ".length());
        number = number.substring(0, number.indexOf(' '));
        assertEquals(perInch, Double.parseDouble(number), 1e-6, "the comment gives the word's value: " + comment);
    }
}
