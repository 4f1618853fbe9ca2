package org.hobwright.wizard.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.net.URL;
import java.net.URLClassLoader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.hobwright.api.wizard.StepId;
import org.hobwright.api.job.FieldDef;
import org.hobwright.wizard.steps.StepFields;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The terminal wizard driven by piped answers (wrong answers, '?', 'back' included) writes the same
 * files as {@code plan} on the job file those answers describe.
 */
class WizardEndToEndTest {
    @TempDir
    Path dir;

    private ClassLoader loader;

    /** Providers of the class path plus {@link EchoWriter}, registered in a folder of its own. */
    @BeforeEach
    void addEchoWriter() throws IOException {
        Path services = Files.createDirectories(dir.resolve("extra/META-INF/services"));
        Files.writeString(services.resolve("org.hobwright.api.spi.CycleWriter"), EchoWriter.class.getName() + "\n");
        loader = new URLClassLoader(new URL[] {dir.resolve("extra").toUri().toURL()}, getClass().getClassLoader());
    }

    /** The built-in sample job as a file, to start the wizard from with {@code --job}. */
    private Path sample() throws IOException {
        return Files.writeString(dir.resolve("sample.json"), Store.builtinText("jobs/metering-pump-gear.json"));
    }

    /** The wizard started from the sample job, with piped answers and more arguments. */
    private Cli.Run wizardOnSample(List<String> in, String... more) throws IOException {
        List<String> args = new ArrayList<>(List.of("wizard", "--job", sample().toString()));
        args.addAll(List.of(more));
        return Cli.run(dir.resolve("home"), String.join("\n", in) + "\n", loader, args.toArray(String[]::new));
    }

    /**
     * Enter for every question of a step, except the answers given. The custom rack factors are not
     * asked (the sample's tooth system is not custom), and the drawing's values are declined with
     * Enter at their yes/no question.
     */
    private static List<String> step(StepId id, java.util.Map<String, List<String>> answers) {
        List<String> lines = new ArrayList<>();
        boolean drawingAsked = false;
        for (FieldDef f : StepFields.of(id)) {
            if (f.key().startsWith("gear.custom.") || StepFields.splineOnly(f.key())) {
                continue;
            }
            if (f.key().startsWith("gear.drawing.") || f.key().startsWith("gear.mate.")) {
                if (!drawingAsked) {
                    lines.add("");
                    drawingAsked = true;
                }
                continue;
            }
            lines.addAll(answers.getOrDefault(f.key(), List.of("")));
        }
        return lines;
    }

    @Test
    void pipedAnswersWriteWhatPlanWritesForTheSameJob() throws IOException {
        List<String> in = new ArrayList<>();
        in.addAll(step(StepId.GEAR, java.util.Map.of(
                "gear.partName", List.of("MP-204 drive gear, wizard"),
                "gear.teeth", List.of("twenty-four", "?", "24"),
                "gear.pressureAngle", List.of("20°0'0\""),
                "gear.faceWidth", List.of("0", "10"))));
        in.add("back");                                       // first question of CUTTER: back to GEAR
        in.addAll(step(StepId.GEAR, java.util.Map.of()));     // every GEAR answer was kept
        in.addAll(step(StepId.CUTTER, java.util.Map.of("hob.gashes", List.of("back", "", "12"))));
        in.addAll(step(StepId.MACHINE, java.util.Map.of()));
        in.addAll(step(StepId.CYCLE, java.util.Map.of("cycle.coolant", List.of("perhaps", "yes"))));
        in.add("yes");                                        // write the outputs
        in.add("");                                           // no template
        Path wizardOut = dir.resolve("wizard-out");
        Cli.Run wizard = wizardOnSample(in, "--out", wizardOut.toString(), "--date", "2026-12-01");
        assertEquals(ExitCodes.OK, wizard.code(), wizard::toString);
        assertTrue(wizard.out().contains("is not a whole number"), "a wrong answer is asked again with the reason");
        assertTrue(wizard.out().contains("Tooth count z from the drawing."), "'?' prints the help");
        assertTrue(wizard.out().contains("must be greater than 0"), wizard::toString);

        String job = Store.builtinText("jobs/metering-pump-gear.json")
                .replace("MP-204 metering pump drive gear", "MP-204 drive gear, wizard")
                .replace("\"faceWidth\": 8", "\"faceWidth\": 10");
        Path jobFile = Files.writeString(dir.resolve("metering-pump-gear.json"), job);
        Path planOut = dir.resolve("plan-out");
        Cli.Run plan = Cli.run(dir.resolve("home"), "", loader, "plan", jobFile.toString(), "--out",
                planOut.toString(), "--date", "2026-12-01");
        assertEquals(ExitCodes.OK, plan.code(), plan::toString);

        List<String> names = names(planOut);
        assertFalse(names.isEmpty());
        List<String> wizardNames = new ArrayList<>(names);
        wizardNames.add("metering-pump-gear.job.json");
        wizardNames.sort(null);
        assertEquals(wizardNames, names(wizardOut), "the outputs and the job file of the answers");
        for (String name : names) {
            assertArrayEquals(Files.readAllBytes(planOut.resolve(name)), Files.readAllBytes(wizardOut.resolve(name)),
                    name);
        }
    }

    @Test
    void customFactorsAndDrawingValuesAreAskedOnlyWhenTheyApply() throws IOException {
        List<String> in = new ArrayList<>();
        boolean drawingAsked = false;
        for (FieldDef f : StepFields.of(StepId.GEAR)) {
            if (StepFields.splineOnly(f.key())) {
                continue;                                              // not asked for a gear
            }
            switch (f.key()) {
                case "gear.toothSystem" -> in.add("custom");
                case "gear.custom.addendum" -> in.add("1");
                case "gear.custom.dedendum" -> in.add("1.25");
                case "gear.custom.rootRadius" -> in.add("0.3");
                case "gear.drawing.outsideDiameter" -> in.add("27");   // the tip is 26 mm (24 teeth, module 1)
                default -> {
                    if (f.key().startsWith("gear.drawing.") && !drawingAsked) {
                        in.add(in.size(), "yes");                      // compare with the drawing
                        drawingAsked = true;
                        in.add("");
                    } else {
                        in.add("");
                    }
                }
            }
        }
        Cli.Run r = wizardOnSample(in);
        assertTrue(r.out().contains("Custom addendum factor"), r::toString);
        assertTrue(r.out().contains("Compare with values printed on the drawing?"), r::toString);
        assertTrue(r.out().contains("DRAWING_OUTSIDE_DIAMETER"), r::toString);
    }

    @Test
    void theSampleIsNotAskedForCustomFactorsNorDrawingValues() throws IOException {
        Cli.Run r = wizardOnSample(step(StepId.GEAR, java.util.Map.of()));
        assertFalse(r.out().contains("Custom addendum factor"), r::toString);
        assertFalse(r.out().contains("Drawing: outside diameter"), r::toString);
        assertTrue(r.out().contains("Step 2 of 5"), r::toString);
    }

    /** A change of unit shows the remark and asks the later fields in the new unit, their values converted. */
    @Test
    void aChangeOfUnitIsShownOnTheFollowingQuestions() throws IOException {
        Cli.Run r = wizardOnSample(List.of("", "in", "", "", "", "", "", "", "", ""));
        assertTrue(r.out().contains("converted to inch units"), r::toString);
        // the sample's face width of 8 mm, over 25.4 mm to the inch, to 10 significant digits
        assertTrue(r.out().contains("Face width (in) [0.3149606299]"), r::toString);
    }

    @Test
    void theCycleAnswersAreSavedAsATemplateThatPlanCanApply() throws IOException {
        List<String> in = new ArrayList<>();
        in.addAll(step(StepId.GEAR, java.util.Map.of()));
        in.addAll(step(StepId.CUTTER, java.util.Map.of()));
        in.addAll(step(StepId.MACHINE, java.util.Map.of()));
        in.addAll(step(StepId.CYCLE, java.util.Map.of("cycle.finishFeed", List.of("0.4"))));
        in.add("no");                                         // no outputs this time
        in.add("../x");                                       // a name that would leave the folder
        in.add("fine-finish");
        Path home = dir.resolve("home");
        Cli.Run wizard = wizardOnSample(in, "--out", dir.resolve("out").toString());
        assertEquals(ExitCodes.OK, wizard.code(), wizard::toString);
        assertFalse(Files.exists(dir.resolve("out")));
        assertTrue(wizard.out().contains("Saved template fine-finish"), wizard::toString);
        Path saved = home.resolve("templates/varrow-1605/fine-finish.json");
        var cycle = tools.jackson.databind.json.JsonMapper.shared().readTree(Files.readString(saved)).path("cycle");
        // the values the plan used, not only the answers typed: speed and feeds the planner chose too
        for (String key : List.of("workMaterial", "cuttingSpeed", "finishFeed", "finishStock", "method", "coolant")) {
            assertTrue(cycle.has(key), key + " in " + cycle);
        }
        assertEquals(0.4, cycle.path("finishFeed").doubleValue(), 1e-12);

        Path job = Files.writeString(dir.resolve("job.json"), Store.builtinText("jobs/metering-pump-gear.json"));
        Cli.Run plan = Cli.run(home, "", loader, "plan", job.toString(), "--template", "fine-finish", "--json");
        assertEquals(ExitCodes.OK, plan.code(), plan::toString);
        var report = tools.jackson.databind.json.JsonMapper.shared().readTree(plan.out());
        assertEquals(0.4, report.at("/cycle/axialFeed").doubleValue(), 1e-12, plan::toString);
    }

    /**
     * A template chosen in the wizard replaces every cycle answer (the values of
     * samples/scenario/templates/varrow-1605/brass-fine.json), and the job saved at REVIEW plans to
     * the same files.
     */
    @Test
    void aChosenTemplateFillsEveryCycleAnswer() throws IOException {
        List<String> in = new ArrayList<>();
        in.addAll(step(StepId.GEAR, java.util.Map.of()));
        in.addAll(step(StepId.CUTTER, java.util.Map.of()));
        in.addAll(step(StepId.MACHINE, java.util.Map.of()));
        in.addAll(step(StepId.CYCLE, java.util.Map.of(StepFields.TEMPLATE, List.of("brass-fine"))));
        in.add("yes");
        in.add("");
        Path out = dir.resolve("wizard-out");
        Cli.Run wizard = wizardOnSample(in, "--out", out.toString(), "--date", "2026-12-01");
        assertEquals(ExitCodes.OK, wizard.code(), wizard::toString);
        assertTrue(wizard.out().contains("Work material [brass]"), wizard::toString);
        Path saved = out.resolve("metering-pump-gear.job.json");
        var cycle = tools.jackson.databind.json.JsonMapper.shared().readTree(Files.readString(saved)).path("cycle");
        assertEquals("brass", cycle.path("workMaterial").asString());
        assertEquals(80, cycle.path("cuttingSpeed").doubleValue(), 0);
        assertEquals(1.0, cycle.path("roughFeed").doubleValue(), 0);
        assertEquals(0.6, cycle.path("finishFeed").doubleValue(), 0);
        assertEquals(1.5, cycle.path("roughDepth").doubleValue(), 0);
        assertEquals(0.2, cycle.path("finishStock").doubleValue(), 0);

        Path planOut = dir.resolve("plan-out");
        Cli.Run plan = Cli.run(dir.resolve("home"), "", loader, "plan", saved.toString(), "--out", planOut.toString(),
                "--date", "2026-12-01");
        assertEquals(ExitCodes.OK, plan.code(), plan::toString);
        for (String name : names(planOut)) {
            assertArrayEquals(Files.readAllBytes(planOut.resolve(name)), Files.readAllBytes(out.resolve(name)), name);
        }
    }

    /** A job file without the optional keys that have a default is taken with Enter, without asking again. */
    @Test
    void aJobWithoutItsOptionalKeysIsTakenWithEnter() throws IOException {
        String text = Store.builtinText("jobs/metering-pump-gear.json").replace("    \"helixAngle\": 0,\n", "")
                .replace("    \"profileShift\": 0,\n", "");
        assertFalse(text.contains("helixAngle") || text.contains("profileShift"));
        Path job = Files.writeString(dir.resolve("short.json"), text);
        List<String> in = new ArrayList<>();
        for (StepId id : List.of(StepId.GEAR, StepId.CUTTER, StepId.MACHINE, StepId.CYCLE)) {
            in.addAll(step(id, java.util.Map.of()));
        }
        in.add("yes");
        in.add("");
        Path out = dir.resolve("out");
        Cli.Run r = Cli.run(dir.resolve("home"), String.join("\n", in) + "\n", loader, "wizard", "--job",
                job.toString(), "--out", out.toString());
        assertEquals(ExitCodes.OK, r.code(), r::toString);
        assertFalse(r.out().contains("  ! "), "no answer was refused: " + r);
        assertTrue(Files.exists(out.resolve("short.job.json")) || Files.exists(out.resolve("metering-pump-gear.job.json")),
                r::toString);
    }

    @Test
    void inputEndingEarlyIsAUsageErrorAndWritesNothing() {
        Path out = dir.resolve("out");
        Cli.Run r = Cli.run(dir.resolve("home"), "\n\n", loader, "wizard", "--out", out.toString());
        assertEquals(ExitCodes.USAGE, r.code(), r::toString);
        assertTrue(r.err().contains("input ended"), r::toString);
        assertFalse(Files.exists(out));
    }

    private static List<String> names(Path folder) throws IOException {
        try (Stream<Path> s = Files.list(folder)) {
            return s.map(p -> p.getFileName().toString()).sorted().toList();
        }
    }
}
