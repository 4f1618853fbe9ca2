package org.hobwright.wizard.store;

import static org.hobwright.wizard.store.StoreTesting.assertClose;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.Optional;
import java.util.stream.LongStream;
import org.hobwright.api.job.HobJob;
import org.hobwright.api.job.Units;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

class JobWriterTest {
    @TempDir
    static Path home;

    static LongStream seeds() {
        return LongStream.range(0, 20).map(i -> 0x5EEDL * 31 + i);
    }

    @ParameterizedTest(name = "seed {0}")
    @MethodSource("seeds")
    void jobToJsonToJobToJsonGivesTheSameJson(long seed) {
        // property: JSON → HobJob → JSON is stable, and the job survives the trip (to 1e-9 relative),
        // in either unit; 50 random valid jobs per seed
        JobReader reader = new JobReader(Library.open(Optional.of(home)));
        RandomJobs random = new RandomJobs(seed);
        for (int i = 0; i < 50; i++) {
            HobJob job = random.job();
            String first = JobWriter.jobText(job, job.units(), false);
            Loaded<HobJob> back = reader.read(first, "random-" + seed + "-" + i);
            assertTrue(back.ok(), () -> back.errorLine() + "\n" + first);
            assertClose(job, back.get(), 1e-9, "job " + seed + "/" + i);
            assertEquals(first, JobWriter.jobText(back.get(), job.units(), false), "seed " + seed + " case " + i);
        }
    }

    @Test
    void aJobWrittenInInchesReadsAsTheSameJob() {
        JobReader reader = new JobReader(Library.open(Optional.of(home)));
        RandomJobs random = new RandomJobs(77);
        for (int i = 0; i < 100; i++) {
            HobJob job = random.job();
            Units other = job.units() == Units.MM ? Units.IN : Units.MM;
            HobJob back = reader.read(JobWriter.jobText(job, other, false), "case " + i).get();
            assertEquals(other, back.units());
            assertClose(job, back, 1e-9, "case " + i, "units");
        }
    }

    @Test
    void aSampleJobIsWrittenByMachineName() {
        JobReader reader = new JobReader(Library.open(Optional.of(home)));
        HobJob job = reader.read(StoreTesting.SCENARIO.resolve("jobs/metering-pump-gear.json")).get();
        String text = JobWriter.jobText(job, Units.MM, true);
        assertTrue(text.contains("\"machine\": \"varrow-1605\""), text);
        assertTrue(text.contains("\"faceWidth\": 8,"), "whole numbers without a fraction: " + text);
        assertEquals(job, reader.read(text, "again").get(), "mm to mm is exact");
    }

    @Test
    void machineFilesSurviveTheRoundTrip() {
        RandomJobs random = new RandomJobs(5);
        for (int i = 0; i < 200; i++) {
            MachineFile m = new MachineFile(random.machine(), i % 2 == 0 ? Units.MM : Units.IN, i % 3 == 0 ? "" : "bench " + i);
            Loaded<MachineFile> back = MachineReader.read(JsonDocument.ofTree(JobWriter.machineTree(m), "m" + i));
            assertTrue(back.ok(), back::errorLine);
            assertClose(m, back.get(), 1e-9, "machine " + i);
        }
    }
}
