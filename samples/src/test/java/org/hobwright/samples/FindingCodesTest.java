package org.hobwright.samples;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import java.util.function.Function;
import java.util.stream.Stream;
import org.hobwright.api.check.FindingCode;
import org.hobwright.api.check.Severity;
import org.hobwright.wizard.check.EngineeringCode;
import org.hobwright.wizard.plan.PlanCode;
import org.hobwright.wizard.store.InputCode;
import org.junit.jupiter.api.Test;

/**
 * Every finding code has one shape and is documented: each module keeps its codes in enums
 * implementing {@link FindingCode}, and its {@code FINDINGS.md} holds a table generated from each
 * enum between the markers {@code <!-- codes: CLASS -->} and {@code <!-- end of codes -->}. The
 * test fails when an enum has no table, when a table is stale, or when main code builds a finding
 * from a bare string code. {@code HOBWRIGHT_WRITE_FINDINGS=1} in the environment rewrites the
 * stale tables instead of failing (review the diff).
 */
class FindingCodesTest {
    private static final Path ROOT = Path.of("..");
    private static final List<String> MODULES = List.of("api", "post/text", "wizard", "post", "samples");
    private static final String BEGIN = "<!-- codes: ";
    private static final String END = "<!-- end of codes -->";

    /** Columns some enums add between the severity and the meaning. */
    private static final Map<Class<?>, Column> EXTRA = Map.of(
            EngineeringCode.class, new Column("field", c -> "`" + ((EngineeringCode) c).field() + "`"),
            PlanCode.class, new Column("field", c -> "`" + ((PlanCode) c).field() + "`"),
            InputCode.class, new Column("exit", c -> exitCode((InputCode) c)));

    private record Column(String header, Function<FindingCode, String> value) {
    }

    @Test
    void everyCodeEnumHasAnUpToDateTable() throws IOException, ClassNotFoundException {
        Set<String> enums = codeEnums();
        assertTrue(enums.size() >= 8, "found the code enums: " + enums);
        Set<String> tabled = new TreeSet<>();
        List<String> stale = new ArrayList<>();
        for (String module : List.of("api", "wizard", "post", "samples")) {
            Path doc = ROOT.resolve(module).resolve("FINDINGS.md");
            String text = Files.readString(doc, StandardCharsets.UTF_8);
            StringBuilder fresh = new StringBuilder();
            int at = 0;
            while (true) {
                int begin = text.indexOf(BEGIN, at);
                if (begin < 0) {
                    break;
                }
                int nameEnd = text.indexOf(" -->", begin);
                int end = text.indexOf(END, nameEnd);
                assertTrue(end > 0, doc + ": a table without its end marker");
                String name = text.substring(begin + BEGIN.length(), nameEnd);
                assertTrue(tabled.add(name), name + " has two tables");
                fresh.append(text, at, nameEnd + 4).append('\n').append(table(Class.forName(name)));
                at = end;
            }
            fresh.append(text.substring(at));
            if (!fresh.toString().equals(text)) {
                if ("1".equals(System.getenv("HOBWRIGHT_WRITE_FINDINGS"))) {
                    Files.writeString(doc, fresh, StandardCharsets.UTF_8);
                } else {
                    stale.add(doc.normalize().toString());
                }
            }
        }
        assertEquals(enums, tabled, "every enum implementing FindingCode has exactly one table, and no other");
        assertEquals(List.of(), stale, "stale finding-code tables; rerun with HOBWRIGHT_WRITE_FINDINGS=1 to rewrite");
    }

    @Test
    void mainCodeBuildsFindingsOnlyThroughCodes() throws IOException {
        List<String> offences = new ArrayList<>();
        for (Path f : mainSources()) {
            if (f.endsWith(Path.of("org", "hobwright", "api", "check", "Finding.java"))
                    || f.endsWith(Path.of("org", "hobwright", "api", "check", "FindingCode.java"))) {
                continue;
            }
            String text = Files.readString(f, StandardCharsets.UTF_8);
            for (String bare : List.of("Finding.error(", "Finding.warning(", "Finding.info(", "new Finding(")) {
                if (text.contains(bare)) {
                    offences.add(ROOT.relativize(f) + ": " + bare);
                }
            }
        }
        assertEquals(List.of(), offences, "build findings with a FindingCode enum constant's at(...)");
    }

    @Test
    void codesAreUniqueAcrossModules() throws IOException, ClassNotFoundException {
        Set<String> seen = new HashSet<>();
        List<String> twice = new ArrayList<>();
        for (String name : codeEnums()) {
            for (Object c : Class.forName(name).getEnumConstants()) {
                String code = ((FindingCode) c).code();
                if (!seen.add(code)) {
                    twice.add(code);
                }
                assertTrue(((FindingCode) c).severities().contains(((FindingCode) c).severity()), code);
            }
        }
        assertEquals(List.of(), twice);
    }

    private static String table(Class<?> type) {
        Column extra = EXTRA.get(type);
        StringBuilder t = new StringBuilder("| code | severity | ");
        StringBuilder rule = new StringBuilder("|---|---|");
        if (extra != null) {
            t.append(extra.header()).append(" | ");
            rule.append("---|");
        }
        t.append("meaning | source |\n").append(rule).append("---|---|\n");
        for (Object o : type.getEnumConstants()) {
            FindingCode c = (FindingCode) o;
            t.append("| `").append(c.code()).append("` | ").append(severities(c)).append(" | ");
            if (extra != null) {
                t.append(cell(extra.value().apply(c))).append(" | ");
            }
            t.append(cell(c.meaning())).append(" | ").append(cell(c.source())).append(" |\n");
        }
        return t.toString();
    }

    /** The usual severity first, then the others the code may take. */
    private static String severities(FindingCode c) {
        StringBuilder s = new StringBuilder(c.severity().word());
        for (Severity v : Severity.values()) {
            if (v != c.severity() && c.severities().contains(v)) {
                s.append(" or ").append(v.word());
            }
        }
        return s.toString();
    }

    private static String cell(String text) {
        return text.replace("|", "\\|");
    }

    /** The terminal tool's exit code when a finding of this code is the reason it stops. */
    private static String exitCode(InputCode c) {
        return c.unreadable() ? "2" : c.severity() == Severity.ERROR ? "1" : "0";
    }

    private static Set<String> codeEnums() throws IOException {
        Set<String> names = new TreeSet<>();
        for (Path f : mainSources()) {
            String text = Files.readString(f, StandardCharsets.UTF_8);
            if (text.contains(" implements FindingCode")) {
                String pkg = text.substring(text.indexOf("package ") + 8, text.indexOf(';'));
                String file = f.getFileName().toString();
                names.add(pkg + "." + file.substring(0, file.length() - ".java".length()));
            }
        }
        return names;
    }

    private static List<Path> mainSources() throws IOException {
        List<Path> all = new ArrayList<>();
        for (String module : MODULES) {
            try (Stream<Path> s = Files.walk(ROOT.resolve(module).resolve("src/main/java"))) {
                s.filter(p -> p.toString().endsWith(".java")).forEach(all::add);
            }
        }
        Collections.sort(all);
        return all;
    }
}
