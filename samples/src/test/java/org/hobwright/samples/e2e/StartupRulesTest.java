package org.hobwright.samples.e2e;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The start-up rules of a plan run (wizard/src/bench/README.md, "Start-up"), enforced: every
 * sample job is planned and posted by the terminal jar ({@code wizard/target/hobwright.jar}, built
 * before this module's tests) in a fresh JVM with class loading logged, and no class of a banned
 * kind may load. Each costs milliseconds at its first use in a short run:
 * <ul>
 *   <li>{@code java.util.Formatter} (the JDK's locale data): numbers go through {@code org.hobwright.text.Decimal};</li>
 *   <li>{@code java.util.regex}: texts are read character by character;</li>
 *   <li>{@code java.lang.runtime.ObjectMethods}: no record {@code equals}, {@code hashCode} or
 *       {@code toString} is bootstrapped;</li>
 *   <li>the object mapper of jackson-databind: JSON trees go through {@code JsonTrees};</li>
 *   <li>picocli: {@code Main} reads plain {@code plan} command lines itself;</li>
 *   <li>{@code java.time.format}: dates are read and written without the formatter machinery;</li>
 *   <li>{@code java.security.SecureRandom}: temporary names need no secure random numbers.</li>
 * </ul>
 * {@code java.math.BigDecimal} is not banned: Jackson's parser loads it in every run.
 */
class StartupRulesTest {

    private static final List<String> BANNED = List.of("java.util.Formatter ", "java.util.regex.",
            "java.lang.runtime.ObjectMethods ", "tools.jackson.databind.ObjectMapper ",
            "tools.jackson.databind.json.JsonMapper ", "picocli.", "java.time.format.", "java.security.SecureRandom ");

    private static final Path JAR = Path.of("../wizard/target/hobwright.jar");

    @Test
    void planningASampleJobLoadsNoBannedClass(@TempDir Path tmp) throws Exception {
        assertTrue(Files.isRegularFile(JAR), "build the terminal jar first (mvn -B verify builds it before this test)");
        List<Path> jobs;
        try (Stream<Path> s = Files.list(Path.of("../samples/scenario/jobs"))) {
            jobs = s.filter(p -> p.toString().endsWith(".json")).sorted().toList();
        }
        assertTrue(jobs.size() >= 8, "found the sample jobs: " + jobs);
        ExecutorService pool = Executors.newFixedThreadPool(2);
        try {
            List<Future<String>> runs = new ArrayList<>();
            for (Path job : jobs) {
                runs.add(pool.submit(() -> offences(job, tmp)));
            }
            List<String> offences = new ArrayList<>();
            for (Future<String> run : runs) {
                String o = run.get(120, TimeUnit.SECONDS);
                if (!o.isEmpty()) {
                    offences.add(o);
                }
            }
            assertEquals(List.of(), offences, "classes loaded against the start-up rules");
        } finally {
            pool.shutdownNow();
        }
    }

    /** Plans one job in a fresh JVM; the banned classes it loaded, or empty text. */
    private static String offences(Path job, Path tmp) throws IOException, InterruptedException {
        String name = job.getFileName().toString().replace(".json", "");
        Path log = tmp.resolve(name + ".classes.log");
        Path out = tmp.resolve(name);
        Path java = Path.of(System.getProperty("java.home"), "bin", "java");
        List<String> command = List.of(java.toString(), "-XX:TieredStopAtLevel=1", "-XX:CICompilerCount=1",
                "-Xlog:class+load=info:file=" + log, "-cp", JAR.toString(),
                "org.hobwright.wizard.cli.Main", "--home", tmp.resolve("home").toString(), "plan", job.toString(),
                "--out", out.toString());
        Process p = new ProcessBuilder(command).redirectErrorStream(true)
                .redirectOutput(tmp.resolve(name + ".out").toFile()).start();
        if (!p.waitFor(100, TimeUnit.SECONDS)) {
            p.destroyForcibly();
            return name + ": did not finish";
        }
        String printed = Files.readString(tmp.resolve(name + ".out"), StandardCharsets.UTF_8);
        if (p.exitValue() > 1) {
            return name + ": exit " + p.exitValue() + "\n" + printed;
        }
        List<String> banned = new ArrayList<>();
        List<String> loaded = Files.readAllLines(log, StandardCharsets.UTF_8);
        assertTrue(loaded.size() > 500, name + ": the class-load log holds the run");
        for (String line : loaded) {
            for (String b : BANNED) {
                int at = line.indexOf("] " + b);
                if (at >= 0 && banned.size() < 3) {
                    banned.add(line.substring(at + 2, line.indexOf(' ', at + 2)));
                }
            }
        }
        return banned.isEmpty() ? "" : name + ": " + banned + " (the first; the log: " + log + ")";
    }
}
