package org.hobwright.wizard.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.InputStream;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;
import javax.xml.parsers.DocumentBuilderFactory;
import org.hobwright.wizard.store.Library;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;

class SimulateCommandTest {
    @TempDir
    Path tmp;

    private record Run(int code, String out, String err) {
    }

    private Run run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        CommandLine cl = new CommandLine(new SimulateCommand(h -> Library.open(Optional.of(tmp.resolve("library")))));
        cl.setOut(new PrintWriter(out, true));
        cl.setErr(new PrintWriter(err, true));
        cl.setExitCodeExceptionMapper(t -> ExitCodes.USAGE);
        return new Run(cl.execute(args), out.toString(), err.toString());
    }

    private static String sampleJob() throws Exception {
        try (InputStream in = SimulateCommand.class.getClassLoader().getResourceAsStream(SimulateCommand.SAMPLE)) {
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        }
    }

    @Test
    void builtInSampleWritesAWellFormedPicture() throws Exception {
        Path out = tmp.resolve("out");
        Run r = run("--out", out.toString());
        assertEquals(ExitCodes.OK, r.code(), r.err());
        Path svg = out.resolve("metering-pump-gear-simulation.svg");
        assertTrue(Files.exists(svg), r.out());
        String text = Files.readString(svg);
        // parses as XML and states the exaggeration
        DocumentBuilderFactory.newInstance().newDocumentBuilder()
                .parse(new ByteArrayInputStream(text.getBytes(StandardCharsets.UTF_8)));
        assertTrue(text.contains("deviation ×"), "states the scale factor");
        assertTrue(r.out().contains("enveloping depth"), r.out());
        assertTrue(r.out().contains("undercut                no"), r.out());
        try (var files = Files.list(out)) {
            assertFalse(files.anyMatch(p -> p.toString().endsWith(".tmp")), "no temporary file left");
        }
    }

    @Test
    void smallPinionShowsUndercut() throws Exception {
        // 12 teeth, no shift: below the 17-tooth limit of FORMULAS.md §2.3
        Path job = tmp.resolve("pinion.json");
        Files.writeString(job, sampleJob().replace("\"teeth\": 24", "\"teeth\": 12")
                .replace("\"blankDiameter\": 26.0", "\"blankDiameter\": 14.0")
                .replace("\"name\": \"metering-pump-gear\"", "\"name\": \"small-pinion\""));
        Run r = run(job.toString(), "--out", tmp.resolve("out").toString());
        assertEquals(ExitCodes.OK, r.code(), r.err());
        assertTrue(r.out().contains("undercut                yes"), r.out());
        assertTrue(Files.readString(tmp.resolve("out/small-pinion-simulation.svg")).contains("UNDERCUT"));
    }

    @Test
    void missingFileIsAnInputProblem() {
        Run r = run(tmp.resolve("no-such-job.json").toString(), "--out", tmp.resolve("out").toString());
        assertEquals(ExitCodes.USAGE, r.code());
        assertTrue(r.err().startsWith("hobwright: "), r.err());
        assertFalse(Files.exists(tmp.resolve("out")));
    }

    @Test
    void hobOfAnotherPitchIsAJobError() throws Exception {
        Path job = tmp.resolve("mismatch.json");
        String text = sampleJob();
        int hob = text.indexOf("\"hob\"");
        text = text.substring(0, hob) + text.substring(hob).replaceFirst("\"module\": 1.0", "\"module\": 1.25");
        Files.writeString(job, text);
        Run r = run(job.toString(), "--out", tmp.resolve("out").toString());
        assertEquals(ExitCodes.JOB_ERRORS, r.code(), r.out() + r.err());
        assertTrue(r.err().contains("hob.module"), r.err());
        assertFalse(Files.exists(tmp.resolve("out")));
    }

    /** A drawing plan refuses (the sample whose printed values disagree) is refused here too: exit 1, no picture. */
    @Test
    void aJobPlanRefusesIsNotSimulated() {
        Path job = Path.of("../samples/scenario/jobs/counter-wheel-drawing-error.json");
        Path home = tmp.resolve("library");
        Cli.Run plan = Cli.run(home, "plan", job.toString(), "--out", tmp.resolve("plan-out").toString());
        assertEquals(ExitCodes.JOB_ERRORS, plan.code(), plan::toString);
        Run r = run(job.toString(), "--out", tmp.resolve("out").toString());
        assertEquals(plan.code(), r.code(), r.out() + r.err());
        assertTrue(r.err().contains("DRAWING_"), r.err());
        assertFalse(Files.exists(tmp.resolve("out")));
    }

    /**
     * Quality values in µm, as the targets and the plan's summary: the sample's enveloping depth in
     * closed form is 0.244 µm (FORMULAS.md §6.2, δ_y = π² z₀² m_n sin α_n / (4 z₂ i²): m 1 mm, z₂ 24,
     * z₀ 1, i 12 gashes, α 20° give π² · sin 20° / 13824 mm = 0.2442 µm), printed to 0.001 µm.
     */
    @Test
    void qualityValuesArePrintedInMicrometres() {
        Run r = run("--out", tmp.resolve("out").toString());
        assertEquals(ExitCodes.OK, r.code(), r.err());
        String line = r.out().lines().filter(l -> l.startsWith("enveloping depth")).findFirst().orElseThrow();
        assertTrue(line.endsWith("(closed form 0.244 µm)"), line);
        assertFalse(line.contains("mm"), line);
        assertTrue(r.out().lines().filter(l -> l.startsWith("profile deviation max")).allMatch(l -> l.endsWith(" µm")),
                r.out());
    }
}
