package org.hobwright.wizard.store;

import java.io.IOException;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;
import java.util.function.Function;
import java.util.stream.Stream;
import org.hobwright.api.job.MachineProfile;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.node.ObjectNode;

/**
 * The per-user library of machine profiles ({@code machines/NAME.json}), cycle templates
 * ({@code templates/MACHINE/NAME.json}) and NC dialects ({@code dialects/NAME.json}) in one
 * folder, over the read-only built-in sample scenario. A saved file wins over a built-in one of
 * the same name. Saves are atomic; an existing file is replaced only when asked; names are
 * checked so that no name reaches outside the folder. No method throws for bad input or a
 * failing disk: every problem is a finding.
 */
public final class Library {
    /** The environment variable naming the library folder. */
    public static final String HOME_VARIABLE = "HOBWRIGHT_HOME";
    /** The library folder's name in the user's home when neither option nor variable is given. */
    public static final String DEFAULT_FOLDER = ".hobwright";

    static final String MACHINES = "machines";
    static final String TEMPLATES = "templates";
    static final String DIALECTS = "dialects";
    private static final String DIALECT_FORMAT = "hobwright-dialect";

    private final Path home;
    private final Builtins builtins;

    private Library(Path home, Builtins builtins) {
        this.home = home.toAbsolutePath().normalize();
        this.builtins = builtins;
    }

    /**
     * Opens the library: {@code home} when given, else {@code $HOBWRIGHT_HOME}, else
     * {@code ~/.hobwright}. The folder need not exist; it is created by the first save.
     */
    public static Library open(Optional<Path> home) {
        return open(home, System.getenv(), Path.of(System.getProperty("user.home")));
    }

    /** As {@link #open(Optional)} with the environment and the user's home given (for tests and hosts). */
    public static Library open(Optional<Path> home, Map<String, String> environment, Path userHome) {
        Path chosen = home.orElseGet(() -> {
            String env = environment.get(HOME_VARIABLE);
            return env != null && !env.isBlank() ? Path.of(env) : userHome.resolve(DEFAULT_FOLDER);
        });
        return new Library(chosen, new Builtins(Library.class.getClassLoader()));
    }

    /** The library folder. */
    public Path home() {
        return home;
    }

    // ---------------------------------------------------------------- machines

    /** Every machine profile, saved and built-in, sorted by name. */
    public List<LibraryEntry> machines() {
        return list(MACHINES, "", d -> MachineReader.read(d).value().map(MachineFile::description).orElse(""));
    }

    /** The machine profile of that name. */
    public Loaded<MachineProfile> machine(String name) {
        return machineFile(name).map(MachineFile::profile);
    }

    /** The machine profile of that name with its file's units and description. */
    public Loaded<MachineFile> machineFile(String name) {
        return document(MACHINES, "machine", name).then(d -> checkStem(MachineReader.read(d), name,
                MachineFile::name, "machine"));
    }

    /** The file text of the machine profile of that name (for {@code machines show}). */
    public Loaded<String> machineText(String name) {
        return text(MACHINES, "machine", name);
    }

    /** Reads a machine profile file anywhere (e.g. {@code plan --machine FILE}, {@code machines save FILE}). */
    public static Loaded<MachineFile> readMachineFile(Path file) {
        return JsonDocument.read(file).then(MachineReader::read);
    }

    /** Saves a machine profile file under the name it states; replaces an existing one only with {@code force}. */
    public Loaded<Path> saveMachine(Path file, boolean force) {
        return JsonDocument.read(file).then(d -> FileFormat.MACHINE.open(d).then(md -> MachineReader.read(md)
                .then(m -> save(MACHINES, m.name(), "machine", storedText(md), force))));
    }

    /** Saves a machine profile, written in its file units; replaces an existing one only with {@code force}. */
    public Loaded<Path> saveMachine(MachineFile machine, boolean force) {
        return save(MACHINES, machine.name(), "machine", JobWriter.text(JobWriter.machineTree(machine)), force);
    }

    /** Removes a saved machine profile (built-in ones are read-only). Its templates stay. */
    public Loaded<Path> removeMachine(String name) {
        return remove(MACHINES, "machine", name);
    }

    // ---------------------------------------------------------------- templates

    /** Every template of every machine, sorted by machine and name. */
    public List<LibraryEntry> templates() {
        TreeMap<String, Boolean> machines = new TreeMap<>();
        builtins.folders(TEMPLATES).forEach(m -> machines.put(m, true));
        savedFolders(home.resolve(TEMPLATES)).forEach(m -> machines.put(m, true));
        List<LibraryEntry> out = new ArrayList<>();
        machines.keySet().forEach(m -> out.addAll(templates(m)));
        return out;
    }

    /** The templates of one machine, sorted by name; empty for an unknown or badly named machine. */
    public List<LibraryEntry> templates(String machine) {
        if (!Names.valid(machine)) {
            return List.of();
        }
        return list(TEMPLATES + "/" + machine, machine,
                d -> TemplateReader.read(d).value().map(CycleTemplate::description).orElse(""));
    }

    /** The template of that name for that machine. */
    public Loaded<CycleTemplate> template(String machine, String name) {
        Optional<org.hobwright.api.check.Finding> bad = Names.check("machine", machine);
        if (bad.isPresent()) {
            return Loaded.unreadable(bad.get());
        }
        return document(TEMPLATES + "/" + machine, "template", name).then(d -> checkStem(
                TemplateReader.read(d), name, CycleTemplate::name, "template").then(t -> t.machine().equals(machine)
                ? Loaded.of(t)
                : Loaded.unreadable(List.of(InputCode.LIBRARY_WRONG_MACHINE.finding("machine", d.at("machine")
                        + ": template \"" + name + "\" is stored for machine \"" + machine + "\" but names machine \""
                        + t.machine() + "\"", "correct its \"machine\" key or save it again")))));
    }

    /** The file text of a template (for {@code templates show}). */
    public Loaded<String> templateText(String machine, String name) {
        Optional<org.hobwright.api.check.Finding> bad = Names.check("machine", machine);
        return bad.isPresent() ? Loaded.unreadable(bad.get()) : text(TEMPLATES + "/" + machine, "template", name);
    }

    /** Reads a template file anywhere. */
    public static Loaded<CycleTemplate> readTemplateFile(Path file) {
        return JsonDocument.read(file).then(TemplateReader::read);
    }

    /** Saves a template file under the machine and name it states; replaces only with {@code force}. */
    public Loaded<Path> saveTemplate(Path file, boolean force) {
        return JsonDocument.read(file).then(d -> FileFormat.TEMPLATE.open(d).then(td -> TemplateReader.read(td)
                .then(t -> save(TEMPLATES + "/" + t.machine(), t.name(), "template", storedText(td), force))));
    }

    /** Saves a template (e.g. the wizard's answers); replaces an existing one only with {@code force}. */
    public Loaded<Path> saveTemplate(CycleTemplate template, boolean force) {
        return save(TEMPLATES + "/" + template.machine(), template.name(), "template",
                JobWriter.text(JobWriter.templateTree(template)), force);
    }

    /** Removes a saved template (built-in ones are read-only). */
    public Loaded<Path> removeTemplate(String machine, String name) {
        Optional<org.hobwright.api.check.Finding> bad = Names.check("machine", machine);
        return bad.isPresent() ? Loaded.unreadable(bad.get()) : remove(TEMPLATES + "/" + machine, "template", name);
    }

    // ---------------------------------------------------------------- dialects

    /** Every NC dialect, saved and built-in, sorted by name. */
    public List<LibraryEntry> dialects() {
        return list(DIALECTS, "", d -> d.root().path("description").asString(""));
    }

    /**
     * The text of the dialect of that name, for the NC writer (which checks its contents). The
     * library checks only that it is a JSON object of format {@code hobwright-dialect}.
     */
    public Loaded<String> dialectText(String name) {
        return text(DIALECTS, "dialect", name).then(t -> dialectDocument(t, name).map(d -> t));
    }

    /** Saves a dialect file under {@code name}; replaces an existing one only with {@code force}. */
    public Loaded<Path> saveDialect(Path file, String name, boolean force) {
        Optional<org.hobwright.api.check.Finding> bad = Names.check("dialect", name);
        if (bad.isPresent()) {
            return Loaded.unreadable(bad.get());
        }
        return JsonDocument.read(file).then(d -> dialectFormat(d).then(x ->
                save(DIALECTS, name, "dialect", JobWriter.text(d.root()), force)));
    }

    /** Removes a saved dialect (built-in ones are read-only). */
    public Loaded<Path> removeDialect(String name) {
        return remove(DIALECTS, "dialect", name);
    }

    private static Loaded<JsonDocument> dialectDocument(String text, String name) {
        return JsonDocument.parse(text, "dialect " + name).then(Library::dialectFormat);
    }

    private static Loaded<JsonDocument> dialectFormat(JsonDocument d) {
        JsonNode f = d.root().get("format");
        if (f == null || !f.isString() || !f.stringValue().equals(DIALECT_FORMAT)) {
            return Loaded.unreadable(InputCode.INPUT_FORMAT.finding("format", d.at("format")
                    + ": not a dialect file (\"format\" must be \"" + DIALECT_FORMAT + "\")", null));
        }
        return Loaded.of(d);
    }

    // ---------------------------------------------------------------- shared

    private Path folder(String relative) {
        return home.resolve(relative);
    }

    private Path file(String folder, String name) {
        return folder(folder).resolve(name + ".json");
    }

    private Loaded<JsonDocument> document(String folder, String what, String name) {
        Optional<org.hobwright.api.check.Finding> bad = Names.check(what, name);
        if (bad.isPresent()) {
            return Loaded.unreadable(bad.get());
        }
        Path saved = file(folder, name);
        if (Files.exists(saved)) {
            return JsonDocument.read(saved);
        }
        Optional<String> text = builtins.text(folder + "/" + name + ".json");
        if (text.isPresent()) {
            return JsonDocument.parse(text.get(), "built-in " + folder + "/" + name + ".json");
        }
        return Loaded.unreadable(notFound(folder, what, name));
    }

    private Loaded<String> text(String folder, String what, String name) {
        Optional<org.hobwright.api.check.Finding> bad = Names.check(what, name);
        if (bad.isPresent()) {
            return Loaded.unreadable(bad.get());
        }
        Path saved = file(folder, name);
        if (Files.isRegularFile(saved)) {
            return JsonDocument.read(saved).then(d -> {
                try {
                    return Loaded.of(Files.readString(saved));
                } catch (IOException e) {
                    return Loaded.unreadable(InputCode.INPUT_IO.finding("file", saved + ": cannot be read", null));
                }
            });
        }
        return builtins.text(folder + "/" + name + ".json").map(Loaded::of)
                .orElseGet(() -> Loaded.unreadable(notFound(folder, what, name)));
    }

    private org.hobwright.api.check.Finding notFound(String folder, String what, String name) {
        return InputCode.LIBRARY_NOT_FOUND.finding(what, "no " + what + " \"" + name + "\" in " + folder(folder)
                + " or among the built-in ones", "list them with the " + (what.equals("template") ? "templates"
                : what + "s") + " list command, or save one first");
    }

    private static <T> Loaded<T> checkStem(Loaded<T> loaded, String name, Function<T, String> nameOf, String what) {
        return loaded.then(v -> nameOf.apply(v).equals(name) ? Loaded.of(v)
                : Loaded.failed(List.of(InputCode.INPUT_CONFLICT.finding("name", "the " + what + " file \"" + name
                        + ".json\" names itself \"" + nameOf.apply(v) + "\"", "rename the file or correct its name"))));
    }

    private List<LibraryEntry> list(String folder, String machine, Function<JsonDocument, String> describe) {
        TreeMap<String, LibraryEntry> out = new TreeMap<>();
        for (String n : builtins.names(folder)) {
            String desc = builtins.text(folder + "/" + n + ".json")
                    .flatMap(t -> JsonDocument.parse(t, n).value()).map(describe).orElse("");
            out.put(n, new LibraryEntry(n, machine, true, false, desc, "built-in"));
        }
        for (String n : savedNames(folder(folder))) {
            Path p = file(folder, n);
            String desc = JsonDocument.read(p).value().map(describe).orElse("");
            out.put(n, new LibraryEntry(n, machine, false, out.containsKey(n), desc, p.toString()));
        }
        return List.copyOf(out.values());
    }

    private static List<String> savedNames(Path dir) {
        if (!Files.isDirectory(dir)) {
            return List.of();
        }
        try (Stream<Path> s = Files.list(dir)) {
            return s.filter(Files::isRegularFile).map(p -> p.getFileName().toString())
                    .filter(n -> n.endsWith(".json")).map(n -> n.substring(0, n.length() - 5))
                    .filter(Names::valid).sorted().toList();
        } catch (IOException e) {
            return List.of();
        }
    }

    private static List<String> savedFolders(Path dir) {
        if (!Files.isDirectory(dir)) {
            return List.of();
        }
        try (Stream<Path> s = Files.list(dir)) {
            return s.filter(Files::isDirectory).map(p -> p.getFileName().toString()).filter(Names::valid)
                    .sorted().toList();
        } catch (IOException e) {
            return List.of();
        }
    }

    /** The text stored for a file being saved: its (migrated) tree without the editor's {@code $schema}. */
    private static String storedText(JsonDocument d) {
        ObjectNode copy = d.root().deepCopy();
        copy.remove("$schema");
        copy.put("version", FileFormat.VERSION);
        return JobWriter.text(copy);
    }

    private Loaded<Path> save(String folder, String name, String what, String text, boolean force) {
        Optional<org.hobwright.api.check.Finding> bad = Names.check(what, name);
        if (bad.isPresent()) {
            return Loaded.unreadable(bad.get());
        }
        Path target = file(folder, name);
        try {
            AtomicFiles.writeText(target, text, force);
            return Loaded.of(target);
        } catch (FileAlreadyExistsException e) {
            return Loaded.unreadable(List.of(InputCode.LIBRARY_EXISTS.finding(what, target + ": a saved " + what + " \""
                    + name + "\" exists already", "add --force to replace it")));
        } catch (IOException | RuntimeException e) {
            return Loaded.unreadable(List.of(InputCode.LIBRARY_WRITE_FAILED.finding(what, target + ": cannot be written ("
                    + e.getClass().getSimpleName() + ": " + e.getMessage() + "); nothing was changed", null)));
        }
    }

    private Loaded<Path> remove(String folder, String what, String name) {
        Optional<org.hobwright.api.check.Finding> bad = Names.check(what, name);
        if (bad.isPresent()) {
            return Loaded.unreadable(bad.get());
        }
        Path target = file(folder, name);
        try {
            if (Files.deleteIfExists(target)) {
                return Loaded.of(target);
            }
        } catch (IOException e) {
            return Loaded.unreadable(List.of(InputCode.LIBRARY_WRITE_FAILED.finding(what, target + ": cannot be removed ("
                    + e.getMessage() + ")", null)));
        }
        if (builtins.text(folder + "/" + name + ".json").isPresent()) {
            return Loaded.unreadable(List.of(InputCode.LIBRARY_READ_ONLY.finding(what, "the " + what + " \"" + name
                    + "\" is built in and cannot be removed", "save one of the same name to use instead of it")));
        }
        return Loaded.unreadable(notFound(folder, what, name));
    }
}
