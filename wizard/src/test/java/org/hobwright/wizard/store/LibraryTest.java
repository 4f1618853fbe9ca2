package org.hobwright.wizard.store;

import static org.hobwright.wizard.store.StoreTesting.RESOURCES;
import static org.hobwright.wizard.store.StoreTesting.SCENARIO;
import static org.hobwright.wizard.store.StoreTesting.assertClose;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.hobwright.api.job.CycleSettings;
import org.hobwright.api.job.Units;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

class LibraryTest {
    @TempDir
    Path home;
    Library lib;

    @BeforeEach
    void setUp() {
        lib = Library.open(Optional.of(home));
    }

    @Test
    void theFolderIsTheOptionElseTheVariableElseTheUsersHome() {
        Path user = Path.of("/users/ann");
        assertEquals(Path.of("/opt/lib"), Library.open(Optional.of(Path.of("/opt/lib")),
                Map.of(Library.HOME_VARIABLE, "/env/lib"), user).home());
        assertEquals(Path.of("/env/lib"), Library.open(Optional.empty(), Map.of(Library.HOME_VARIABLE, "/env/lib"),
                user).home());
        assertEquals(user.resolve(".hobwright"), Library.open(Optional.empty(), Map.of(), user).home());
    }

    @Test
    void builtInsAreListedAndReadOnly() {
        List<String> names = lib.machines().stream().map(LibraryEntry::name).toList();
        assertTrue(names.containsAll(List.of("ottmere-4008", "varrow-1605")), names.toString());
        assertTrue(lib.machines().stream().allMatch(LibraryEntry::builtIn));
        assertTrue(lib.machine("varrow-1605").ok());
        Loaded<Path> removed = lib.removeMachine("varrow-1605");
        assertEquals("LIBRARY_READ_ONLY", removed.findings().get(0).code());
        assertTrue(lib.templates("varrow-1605").stream().anyMatch(e -> e.name().equals("brass-fine")));
    }

    @Test
    void machineRoundTripSaveListShowRemove() {
        MachineFile m = new MachineFile(new RandomJobs(3).machine(), Units.IN, "bench hobber in the back room");
        Loaded<Path> saved = lib.saveMachine(m, false);
        assertTrue(saved.ok(), saved::errorLine);
        assertEquals(home.resolve("machines").resolve(m.name() + ".json"), saved.get());
        assertClose(m, lib.machineFile(m.name()).get(), 1e-9, "machine");
        LibraryEntry entry = lib.machines().stream().filter(e -> e.name().equals(m.name())).findFirst().orElseThrow();
        assertFalse(entry.builtIn());
        assertEquals("bench hobber in the back room", entry.description());
        assertTrue(lib.machineText(m.name()).get().contains("\"units\": \"in\""));
        assertTrue(lib.removeMachine(m.name()).ok());
        assertTrue(lib.machine(m.name()).unreadable());
        assertEquals("LIBRARY_NOT_FOUND", lib.removeMachine(m.name()).findings().get(0).code());
    }

    @Test
    void anExistingFileIsReplacedOnlyWithForce() throws Exception {
        MachineFile first = new MachineFile(SaveLoop.SampleProfile.profile("shop-one"), Units.MM, "first");
        MachineFile second = new MachineFile(SaveLoop.SampleProfile.profile("shop-one"), Units.MM, "second");
        assertTrue(lib.saveMachine(first, false).ok());
        Loaded<Path> refused = lib.saveMachine(second, false);
        assertEquals("LIBRARY_EXISTS", refused.findings().get(0).code());
        assertTrue(refused.errorLine().contains("--force"));
        assertEquals("first", lib.machineFile("shop-one").get().description(), "unchanged");
        assertTrue(lib.saveMachine(second, true).ok());
        assertEquals("second", lib.machineFile("shop-one").get().description());
    }

    @Test
    void aSavedMachineWinsOverTheBuiltInOfTheSameName() throws Exception {
        Path file = home.resolve("my-varrow.json");
        Files.writeString(file, Files.readString(SCENARIO.resolve("machines/varrow-1605.json"))
                .replace("\"maxSyncRatio\": 120", "\"maxSyncRatio\": 90"));
        assertTrue(lib.saveMachine(file, false).ok());
        assertEquals(90, lib.machine("varrow-1605").get().maxSyncRatio());
        LibraryEntry e = lib.machines().stream().filter(x -> x.name().equals("varrow-1605")).findFirst().orElseThrow();
        assertTrue(e.hidesBuiltIn());
        assertFalse(Files.readString(home.resolve("machines/varrow-1605.json")).contains("$schema"));
        assertTrue(lib.removeMachine("varrow-1605").ok());
        assertEquals(120, lib.machine("varrow-1605").get().maxSyncRatio(), "the built-in one again");
    }

    static List<String> badNames() {
        return List.of("../x", "", ".hidden", "a/b", "a\\b", "name with space", "ü-umlaut", "x".repeat(200));
    }

    @ParameterizedTest
    @MethodSource("badNames")
    void badNamesNeverReachTheFileSystem(String name) {
        assertEquals("LIBRARY_BAD_NAME", lib.machine(name).findings().get(0).code());
        assertEquals("LIBRARY_BAD_NAME", lib.removeMachine(name).findings().get(0).code());
        assertEquals("LIBRARY_BAD_NAME", lib.template(name, "x").findings().get(0).code());
        assertEquals("LIBRARY_BAD_NAME", lib.template("varrow-1605", name).findings().get(0).code());
        assertEquals("LIBRARY_BAD_NAME", lib.dialectText(name).findings().get(0).code());
        assertTrue(lib.machine(name).unreadable());
        assertFalse(Files.exists(home.resolve("machines")), "nothing created");
    }

    @Test
    void aMachineFileNamedBadlyIsNotSaved() throws Exception {
        Path file = home.resolve("evil.json");
        Files.writeString(file, Files.readString(SCENARIO.resolve("machines/varrow-1605.json"))
                .replace("\"varrow-1605\"", "\"../../evil\""));
        Loaded<Path> saved = lib.saveMachine(file, true);
        assertFalse(saved.ok());
        assertTrue(saved.errorLine().contains("evil.json:6:"), saved.errorLine());
        assertFalse(Files.exists(home.getParent().resolve("evil.json")));
    }

    @Test
    void templateRoundTripAndMachineCheck() {
        CycleSettings settings = new RandomJobs(9).cycle();
        CycleTemplate t = CycleTemplate.of("night-shift", "varrow-1605", "long runs", settings, Units.IN);
        assertTrue(lib.saveTemplate(t, false).ok());
        CycleTemplate back = lib.template("varrow-1605", "night-shift").get();
        assertEquals(Units.IN, back.units());
        assertEquals(JobWriter.text(JobWriter.templateTree(t)), JobWriter.text(JobWriter.templateTree(back)));
        assertTrue(lib.templates("varrow-1605").stream().anyMatch(e -> e.name().equals("night-shift") && !e.builtIn()));
        assertTrue(lib.templates().stream().anyMatch(e -> e.machine().equals("ottmere-4008")));
        assertTrue(lib.templateText("varrow-1605", "night-shift").get().contains("\"name\": \"night-shift\""));
        assertTrue(lib.removeTemplate("varrow-1605", "night-shift").ok());
        assertTrue(lib.template("varrow-1605", "night-shift").unreadable());
        assertTrue(lib.template("ottmere-4008", "brass-fine").unreadable(), "templates belong to one machine");
    }

    @Test
    void anOlderMachineVersionIsMigratedOnReadAndSavedAsCurrent() throws Exception {
        Loaded<MachineFile> old = Library.readMachineFile(RESOURCES.resolve("old-machine-v0.json"));
        assertTrue(old.ok(), old::errorLine);
        assertEquals(8000, old.get().profile().workMaxRpm(), "workMaxRpm → workSpindle.maxRpm");
        assertEquals(100, old.get().profile().hobMinRpm(), "hobMinRpm → hobSpindle.minRpm");
        assertEquals("INPUT_MIGRATED", old.findings().get(0).code());
        assertTrue(lib.saveMachine(RESOURCES.resolve("old-machine-v0.json"), false).ok());
        String stored = Files.readString(home.resolve("machines/old-bench.json"));
        assertTrue(stored.contains("\"version\": 1") && stored.contains("\"workSpindle\""), stored);
        Loaded<MachineFile> again = lib.machineFile("old-bench");
        assertTrue(again.ok() && again.findings().isEmpty(), again.findings().toString());
        assertEquals(old.get(), again.get());
    }

    @Test
    void anOlderTemplateVersionIsMigrated() {
        Loaded<CycleTemplate> old = Library.readTemplateFile(RESOURCES.resolve("old-template-v0.json"));
        assertTrue(old.ok(), old::errorLine);
        assertEquals(250, old.get().cycle().get("cuttingSpeed").doubleValue());
        // 250 ft/min = 76.2 m/min and 0.04 in = 1.016 mm (1 ft = 0.3048 m, 1 in = 25.4 mm)
        assertEquals(76.2, old.get().cycleIn(Units.MM).get("cuttingSpeed").doubleValue(), 1e-9);
        assertEquals(1.016, old.get().cycleIn(Units.MM).get("roughFeed").doubleValue(), 1e-9);
    }

    @Test
    void unknownKeyInAMigratedFileNamesItsOriginalLine() {
        String v0 = "{\n  \"format\": \"hobwright-template\",\n  \"version\": 0,\n  \"units\": \"mm\",\n"
                + "  \"machine\": \"varrow-1605\",\n  \"name\": \"x\",\n  \"colour\": \"green\"\n}\n";
        Loaded<CycleTemplate> t = JsonDocument.parse(v0, "old.json").then(TemplateReader::read);
        assertTrue(t.value().isEmpty() && t.hasErrors());
        assertTrue(t.errorLine().startsWith("old.json:7: unknown key \"colour\" in cycle"), t.errorLine());
    }

    @Test
    void unknownKeyInASavedMachineNamesKeyFileAndLine() throws Exception {
        Path dir = Files.createDirectories(home.resolve("machines"));
        Files.writeString(dir.resolve("odd.json"), Files.readString(SCENARIO.resolve("machines/varrow-1605.json"))
                .replace("\"varrow-1605\"", "\"odd\"").replace("\"rapid\": 12000,", "\"rapid\": 12000,\n  \"turbo\": true,"));
        Loaded<MachineFile> m = lib.machineFile("odd");
        assertTrue(m.value().isEmpty() && m.hasErrors());
        assertTrue(m.errorLine().contains(dir.resolve("odd.json") + ":23: unknown key \"turbo\""), m.errorLine());
    }

    @Test
    void aFileWhoseNameDisagreesWithItsContentIsAnError() throws Exception {
        Path dir = Files.createDirectories(home.resolve("machines"));
        Files.copy(SCENARIO.resolve("machines/varrow-1605.json"), dir.resolve("other.json"));
        assertEquals("INPUT_CONFLICT", lib.machine("other").findings().get(0).code());
    }

    @Test
    void dialectsAreSavedAndReadAsText() throws Exception {
        Path file = home.resolve("d.json");
        Files.writeString(file, "{ \"format\": \"hobwright-dialect\", \"version\": 1, \"description\": \"test words\" }");
        assertTrue(lib.saveDialect(file, "test-ctl", false).ok());
        assertTrue(lib.dialectText("test-ctl").get().contains("test words"));
        assertTrue(lib.dialects().stream().anyMatch(e -> e.name().equals("test-ctl") && e.description().equals("test words")));
        Files.writeString(file, "{ \"format\": \"hobwright-job\", \"version\": 1 }");
        assertEquals("INPUT_FORMAT", lib.saveDialect(file, "wrong", false).findings().get(0).code());
        assertTrue(lib.removeDialect("test-ctl").ok());
    }

    /** A built-in file is shown without its repository-relative $schema line, otherwise as bundled. */
    @Test
    void builtInTextsAreShownWithoutTheirSchemaLine() throws Exception {
        int shown = 0;
        for (LibraryEntry e : lib.machines()) {
            same(lib.machineText(e.name()).get(), "machines/" + e.name() + ".json");
            shown++;
        }
        for (LibraryEntry e : lib.templates()) {
            same(lib.templateText(e.machine(), e.name()).get(), "templates/" + e.machine() + "/" + e.name() + ".json");
            shown++;
        }
        for (LibraryEntry e : lib.dialects()) {
            same(lib.dialectText(e.name()).get(), "dialects/" + e.name() + ".json");
            shown++;
        }
        assertTrue(shown >= 8, "every built-in file was shown: " + shown);
    }

    private static void same(String shown, String bundled) throws Exception {
        tools.jackson.databind.json.JsonMapper json = tools.jackson.databind.json.JsonMapper.shared();
        tools.jackson.databind.node.ObjectNode expected = (tools.jackson.databind.node.ObjectNode) json.readTree(
                SCENARIO.resolve(bundled).toFile());
        assertTrue(expected.has("$schema"), bundled + " carries a $schema");
        expected.remove("$schema");
        assertEquals(expected, json.readTree(shown), bundled);
    }

    /** A save removes what a killed save of the same file left behind, but not another save's fresh temporary file. */
    @Test
    void aSaveClearsTheLeftoversOfAKilledSave() throws Exception {
        MachineFile m = new MachineFile(new RandomJobs(5).machine(), Units.MM, "");
        Path folder = Files.createDirectories(home.resolve("machines"));
        String file = m.name() + ".json";
        Path killed = Files.writeString(folder.resolve("." + file + ".123" + AtomicFiles.TEMP_SUFFIX), "{ half");
        Path killedBackup = Files.writeString(folder.resolve("." + file + ".old" + AtomicFiles.TEMP_SUFFIX), "{}");
        Path running = Files.writeString(folder.resolve("." + file + ".456" + AtomicFiles.TEMP_SUFFIX), "{ now");
        Path other = Files.writeString(folder.resolve(".other.json.789" + AtomicFiles.TEMP_SUFFIX), "{}");
        java.nio.file.attribute.FileTime twoHoursAgo = java.nio.file.attribute.FileTime.fromMillis(
                System.currentTimeMillis() - 2 * 3600_000L);
        for (Path p : List.of(killed, killedBackup, other)) {
            Files.setLastModifiedTime(p, twoHoursAgo);
        }
        assertTrue(lib.saveMachine(m, false).ok());
        assertFalse(Files.exists(killed));
        assertFalse(Files.exists(killedBackup));
        assertTrue(Files.exists(running), "a younger temporary file may belong to a save running now");
        assertTrue(Files.exists(other), "only the saved file's leftovers go");
        assertTrue(lib.machineFile(m.name()).ok());
    }
}
