package org.hobwright.samples;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/**
 * The project's markdown: the contributor guide stays a day-one guide (at most 15,000 characters), and
 * every relative link in every markdown file of the project resolves to a file or folder, and to a
 * heading when it names one.
 */
class DocumentationTest {

    private static final Path ROOT = Path.of("..").toAbsolutePath().normalize();
    private static final Set<String> SKIPPED_FOLDERS = Set.of("target", "hobwright-out", "out", "node_modules");
    /** An inline link or image: [text](destination), the destination without spaces, an optional title after. */
    private static final Pattern LINK = Pattern.compile("!?\\[[^\\]]*\\]\\(([^)\\s]+)(?:\\s+\"[^\"]*\")?\\)");

    @Test
    void contributorGuideStaysShort() throws IOException {
        String guide = Files.readString(ROOT.resolve("DEVELOPERS.md"), StandardCharsets.UTF_8);
        assertTrue(guide.length() <= 15_000, "DEVELOPERS.md has " + guide.length()
                + " characters; keep it to what a contributor needs on day one (at most 15,000) and move reference"
                + " material beside the code it describes");
    }

    @Test
    void everyRelativeLinkResolves() throws IOException {
        List<Path> docs = markdownFiles();
        assertTrue(docs.contains(ROOT.resolve("DEVELOPERS.md")), "found the project's markdown under " + ROOT);
        List<String> broken = new ArrayList<>();
        for (Path doc : docs) {
            for (String destination : links(Files.readString(doc, StandardCharsets.UTF_8))) {
                String problem = problem(doc, destination);
                if (problem != null) {
                    broken.add(ROOT.relativize(doc) + ": (" + destination + ") " + problem);
                }
            }
        }
        assertEquals(List.of(), broken, "broken relative links");
    }

    @Test
    void theCheckerFindsBrokenLinks() {
        Path guide = ROOT.resolve("DEVELOPERS.md");
        assertEquals(null, problem(guide, "wizard/FORMULAS.md"));
        assertEquals(null, problem(guide, "#where-the-reference-lives"));
        assertTrue(problem(guide, "wizard/NO-SUCH-FILE.md") != null);
        assertTrue(problem(guide, "wizard/FORMULAS.md#no-such-heading") != null);
        assertTrue(problem(guide, "../outside.md") != null);
        assertEquals(List.of("a.md", "b/c.md#x"), links("see [a](a.md) and ![b](b/c.md#x \"t\"), not `[c](c.md)`\n"
                + "```\n[d](d.md)\n```\n"));
        assertEquals("where-the-reference-lives", slug("Where the reference lives"));
        assertEquals("the-terminal-tool-wizardcli", slug("The terminal tool (`wizard.cli`)"));
        assertEquals("start-up", slug("Start-up"));
    }

    private static List<Path> markdownFiles() throws IOException {
        try (Stream<Path> files = Files.walk(ROOT)) {
            return files.filter(p -> p.toString().endsWith(".md") && Files.isRegularFile(p))
                    .filter(p -> {
                        for (Path part : ROOT.relativize(p)) {
                            String name = part.toString();
                            if (SKIPPED_FOLDERS.contains(name) || name.startsWith(".")) {
                                return false;
                            }
                        }
                        return true;
                    })
                    .sorted().toList();
        }
    }

    /** The link destinations of a markdown text, outside code blocks and code spans. */
    private static List<String> links(String text) {
        List<String> found = new ArrayList<>();
        boolean fenced = false;
        for (String line : text.split("\n", -1)) {
            if (line.strip().startsWith("```")) {
                fenced = !fenced;
                continue;
            }
            if (fenced) {
                continue;
            }
            Matcher m = LINK.matcher(line.replaceAll("`[^`]*`", "``"));
            while (m.find()) {
                found.add(m.group(1));
            }
        }
        return found;
    }

    /** Null when the destination resolves, else what is wrong. Web, mail and other absolute links are not checked. */
    private static String problem(Path doc, String destination) {
        if (destination.matches("[a-zA-Z][a-zA-Z0-9+.-]*:.*")) {
            return null;
        }
        int hash = destination.indexOf('#');
        String file = hash < 0 ? destination : destination.substring(0, hash);
        String anchor = hash < 0 ? null : destination.substring(hash + 1);
        if (file.startsWith("/")) {
            return "absolute path";
        }
        Path target = file.isEmpty() ? doc : doc.getParent().resolve(file).normalize();
        if (!target.startsWith(ROOT)) {
            return "points outside the project";
        }
        if (!Files.exists(target)) {
            return "no such file";
        }
        if (anchor != null && target.toString().endsWith(".md") && !headings(target).contains(anchor)) {
            return "no heading #" + anchor + " in " + ROOT.relativize(target);
        }
        return null;
    }

    private static Set<String> headings(Path doc) {
        Set<String> slugs = new HashSet<>();
        boolean fenced = false;
        try {
            for (String line : Files.readAllLines(doc, StandardCharsets.UTF_8)) {
                if (line.strip().startsWith("```")) {
                    fenced = !fenced;
                } else if (!fenced && line.startsWith("#")) {
                    slugs.add(slug(line.replaceFirst("^#+\\s*", "")));
                }
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return slugs;
    }

    /** The anchor a markdown renderer gives a heading: lower case, punctuation dropped, spaces to hyphens. */
    private static String slug(String heading) {
        StringBuilder s = new StringBuilder();
        for (char c : heading.strip().toLowerCase(Locale.ROOT).toCharArray()) {
            if (Character.isLetterOrDigit(c) || c == '-' || c == '_') {
                s.append(c);
            } else if (c == ' ') {
                s.append('-');
            }
        }
        return s.toString();
    }
}
