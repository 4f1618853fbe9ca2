package org.hobwright.samples.e2e;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringReader;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.Map;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.stream.Stream;
import org.hobwright.api.cycle.HobCycle;
import org.hobwright.api.job.HobJob;
import org.hobwright.api.spi.Providers;
import org.hobwright.post.nc.NcReader;
import org.hobwright.wizard.cli.CliEnvironment;
import org.hobwright.wizard.store.JobReader;
import org.hobwright.wizard.store.Library;
import org.hobwright.wizard.cli.HobwrightCommand;
import picocli.CommandLine;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/**
 * One run of {@code hobwright plan JOB --out DIR --json} in this JVM, exactly as a user runs it
 * from the terminal: job file → reader → checks → plan → writers → files.
 *
 * @param exitCode the tool's exit code
 * @param stdout   what it printed on standard output (the JSON report)
 * @param stderr   what it printed on standard error
 * @param out      the output folder
 * @param report   the parsed report, when one was printed
 */
record PlanRun(int exitCode, String stdout, String stderr, Path out, Optional<JsonNode> report) {

    /** The folder of the sample jobs, relative to the samples module (Surefire's working folder). */
    static final Path JOBS = Path.of("scenario", "jobs");

    private static final JsonMapper JSON = JsonMapper.builder().build();

    /**
     * Plans a sample job.
     *
     * @param jobFile the job's file name in {@link #JOBS}
     * @param work    a fresh folder for this run (output and an empty library folder)
     * @param options more options of {@code plan}, e.g. {@code --machine NAME}
     */
    static PlanRun of(String jobFile, Path work, String... options) {
        Path out = work.resolve("out");
        Path home = work.resolve("home");
        StringWriter so = new StringWriter();
        StringWriter se = new StringWriter();
        CliEnvironment env = new CliEnvironment(new BufferedReader(new StringReader("")),
                Clock.fixed(Instant.parse("2026-12-01T12:00:00Z"), ZoneOffset.UTC), Map.of(),
                PlanRun.class.getClassLoader(), true);
        CommandLine cl = HobwrightCommand.commandLine(env);
        cl.setOut(new PrintWriter(so, true));
        cl.setErr(new PrintWriter(se, true));
        List<String> args = new ArrayList<>(List.of("--home", home.toString(), "plan",
                JOBS.resolve(jobFile).toString(), "--out", out.toString(), "--json"));
        args.addAll(List.of(options));
        int code = cl.execute(args.toArray(String[]::new));
        String text = so.toString();
        Optional<JsonNode> report = text.isBlank() ? Optional.empty() : Optional.of(JSON.readTree(text));
        return new PlanRun(code, text, se.toString(), out, report);
    }

    /** The report, failing with the run's output when there is none. */
    JsonNode json() {
        return report.orElseThrow(() -> new AssertionError("no report; exit " + exitCode + ", stderr:\n" + stderr));
    }

    /** A number of the report at a JSON pointer, failing with the pointer when it is missing. */
    double number(String pointer) {
        JsonNode n = json().at(pointer);
        if (!n.isNumber()) {
            throw new AssertionError("report has no number at " + pointer + ":\n" + stdout);
        }
        return n.doubleValue();
    }

    /** The findings of the report as {@code severity code field: message} lines, for messages. */
    List<JsonNode> findings() {
        return json().at("/findings").valueStream().toList();
    }

    /** True when a finding has a code containing the given word. */
    Optional<JsonNode> finding(String codePart) {
        return findings().stream().filter(f -> f.at("/code").asString().contains(codePart)).findFirst();
    }

    /** The files written into the output folder. */
    List<Path> files() throws IOException {
        if (!Files.isDirectory(out)) {
            return List.of();
        }
        try (Stream<Path> s = Files.list(out)) {
            return s.sorted().toList();
        }
    }

    /** The one written file whose name ends this way. */
    Path file(String suffix) throws IOException {
        return files().stream().filter(p -> p.getFileName().toString().endsWith(suffix)).findFirst()
                .orElseThrow(() -> new AssertionError("no *" + suffix + " in " + out + ": " + filesText()));
    }

    private String filesText() {
        try {
            return files().toString();
        } catch (IOException e) {
            return e.toString();
        }
    }

    /**
     * Reads the written program back with the tests' own NC reader ({@code NcReader}, post
     * test-jar) and fails unless it keeps every safety invariant: the job is read and planned
     * again in this JVM (planning is deterministic) for the limits the words must keep to.
     *
     * @param jobFile the job's file name in {@link #JOBS}
     * @param work    the folder the run used
     */
    void assertProgramSafe(String jobFile, Path work) throws IOException {
        Library library = Library.open(Optional.of(work.resolve("home")), Map.of(), work);
        HobJob job = new JobReader(library).read(JOBS.resolve(jobFile)).value()
                .orElseThrow(() -> new AssertionError("the job does not read"));
        HobCycle cycle = Providers.planner(PlanRun.class.getClassLoader()).plan(job);
        String dialect = library.dialectText(job.machine().dialect()).value()
                .orElseThrow(() -> new AssertionError("no dialect " + job.machine().dialect()));
        NcReader.assertSafe(Files.readString(file(".nc")), dialect, NcReader.Limits.of(job, cycle));
    }

    /** A text to put in assertion messages. */
    String describe() {
        return "exit " + exitCode + "\nstderr:\n" + stderr + "\nstdout:\n" + stdout;
    }
}
