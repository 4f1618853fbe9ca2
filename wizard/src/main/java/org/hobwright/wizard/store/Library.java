package org.hobwright.wizard.store;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;
import java.util.function.Function;
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

    private final Shelf shelf;

    private Library(Path home, Builtins builtins) {
        this.shelf = new Shelf(home.toAbsolutePath().normalize(), builtins);
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
        String env = environment.get(HOME_VARIABLE);
        Path chosen = home.isPresent() ? home.get()
                : env != null && !env.isBlank() ? Path.of(env) : userHome.resolve(DEFAULT_FOLDER);
        return new Library(chosen, new Builtins(Library.class.getClassLoader()));
    }

    /** The library folder. */
    public Path home() {
        return shelf.home();
    }

    // ---------------------------------------------------------------- machines

    /** Every machine profile, saved and built-in, sorted by name. */
    public List<LibraryEntry> machines() {
        return shelf.list(MACHINES, "", d -> MachineReader.read(d).value().map(MachineFile::description).orElse(""));
    }

    /** The machine profile of that name. */
    public Loaded<MachineProfile> machine(String name) {
        return machineFile(name).map(MachineFile::profile);
    }

    /** The machine profile of that name with its file's units and description. */
    public Loaded<MachineFile> machineFile(String name) {
        return shelf.document(MACHINES, "machine", name).then(d -> checkStem(MachineReader.read(d), name,
                MachineFile::name, "machine"));
    }

    /** The file text of the machine profile of that name (for {@code machines show}). */
    public Loaded<String> machineText(String name) {
        return shelf.text(MACHINES, "machine", name);
    }

    /** Reads a machine profile file anywhere (e.g. {@code plan --machine FILE}, {@code machines save FILE}). */
    public static Loaded<MachineFile> readMachineFile(Path file) {
        return JsonDocument.read(file).then(MachineReader::read);
    }

    /**
     * Saves a machine profile file under the name it states; replaces an existing one only with
     * {@code force}. The dialect it names must be in the library (saved or built-in).
     */
    public Loaded<Path> saveMachine(Path file, boolean force) {
        return JsonDocument.read(file).then(d -> FileFormat.MACHINE.open(d).then(md -> MachineReader.read(md)
                .then(m -> dialectKnown(m, md)).then(m -> shelf.save(MACHINES, m.name(), "machine", storedText(md),
                        force))));
    }

    /** The machine, when the dialect it names is in the library; else why not, and the fix. */
    private Loaded<MachineFile> dialectKnown(MachineFile m, JsonDocument d) {
        String dialect = m.profile().dialect();
        if (Names.valid(dialect) && dialectText(dialect).ok()) {
            return Loaded.of(m);
        }
        return Loaded.unreadable(List.of(InputCode.LIBRARY_NOT_FOUND.at("dialect", d.at("dialect") + ": machine \""
                + m.name() + "\" names dialect \"" + dialect + "\", which is not in the library (it has "
                + names(dialects()) + ")", "save the dialect first (hobwright dialects save FILE) or correct the"
                + " machine's \"dialect\" key")));
    }

    private static String names(List<LibraryEntry> entries) {
        return entries.isEmpty() ? "none" : String.join(", ", entries.stream().map(LibraryEntry::name).toList());
    }

    /** Saves a machine profile, written in its file units; replaces an existing one only with {@code force}. */
    public Loaded<Path> saveMachine(MachineFile machine, boolean force) {
        return shelf.save(MACHINES, machine.name(), "machine", JobWriter.text(JobWriter.machineTree(machine)), force);
    }

    /** Removes a saved machine profile (built-in ones are read-only). Its templates stay. */
    public Loaded<Path> removeMachine(String name) {
        return shelf.remove(MACHINES, "machine", name);
    }

    // ---------------------------------------------------------------- templates

    /** Every template of every machine, sorted by machine and name. */
    public List<LibraryEntry> templates() {
        TreeMap<String, Boolean> machines = new TreeMap<>();
        shelf.builtins().folders(TEMPLATES).forEach(m -> machines.put(m, true));
        Shelf.savedFolders(shelf.home().resolve(TEMPLATES)).forEach(m -> machines.put(m, true));
        List<LibraryEntry> out = new ArrayList<>();
        machines.keySet().forEach(m -> out.addAll(templates(m)));
        return out;
    }

    /** The templates of one machine, sorted by name; empty for an unknown or badly named machine. */
    public List<LibraryEntry> templates(String machine) {
        if (!Names.valid(machine)) {
            return List.of();
        }
        return shelf.list(TEMPLATES + "/" + machine, machine,
                d -> TemplateReader.read(d).value().map(CycleTemplate::description).orElse(""));
    }

    /** The template of that name for that machine. */
    public Loaded<CycleTemplate> template(String machine, String name) {
        return Shelf.named("machine", machine, () -> shelf.document(TEMPLATES + "/" + machine, "template", name)
                .then(d -> checkStem(TemplateReader.read(d), name, CycleTemplate::name, "template")
                        .then(t -> belongsTo(t, machine, d))));
    }

    private static Loaded<CycleTemplate> belongsTo(CycleTemplate t, String machine, JsonDocument d) {
        if (t.machine().equals(machine)) {
            return Loaded.of(t);
        }
        return Loaded.unreadable(List.of(InputCode.LIBRARY_WRONG_MACHINE.at("machine", d.at("machine")
                + ": template \"" + t.name() + "\" is stored for machine \"" + machine + "\" but names machine \""
                + t.machine() + "\"", "correct its \"machine\" key or save it again")));
    }

    /** The file text of a template (for {@code templates show}). */
    public Loaded<String> templateText(String machine, String name) {
        return Shelf.named("machine", machine, () -> shelf.text(TEMPLATES + "/" + machine, "template", name));
    }

    /** Reads a template file anywhere. */
    public static Loaded<CycleTemplate> readTemplateFile(Path file) {
        return JsonDocument.read(file).then(TemplateReader::read);
    }

    /**
     * Saves a template file under the machine and name it states; replaces only with {@code force}.
     * The machine must be in the library (saved or built-in).
     */
    public Loaded<Path> saveTemplate(Path file, boolean force) {
        return JsonDocument.read(file).then(d -> FileFormat.TEMPLATE.open(d).then(td -> TemplateReader.read(td)
                .then(t -> machineKnown(t, td))
                .then(t -> shelf.save(TEMPLATES + "/" + t.machine(), t.name(), "template", storedText(td), force))));
    }

    /** The template, when the machine it names is in the library; else why not, and the fix. */
    private Loaded<CycleTemplate> machineKnown(CycleTemplate t, JsonDocument d) {
        if (machineText(t.machine()).ok()) {
            return Loaded.of(t);
        }
        return Loaded.unreadable(List.of(InputCode.LIBRARY_NOT_FOUND.at("machine", d.at("machine") + ": template \""
                + t.name() + "\" names machine \"" + t.machine() + "\", which is not in the library (it has "
                + names(machines()) + ")", "save the machine first (hobwright machines save FILE) or correct the"
                + " template's \"machine\" key")));
    }

    /** Saves a template (e.g. the wizard's answers); replaces an existing one only with {@code force}. */
    public Loaded<Path> saveTemplate(CycleTemplate template, boolean force) {
        return shelf.save(TEMPLATES + "/" + template.machine(), template.name(), "template",
                JobWriter.text(JobWriter.templateTree(template)), force);
    }

    /** Removes a saved template (built-in ones are read-only). */
    public Loaded<Path> removeTemplate(String machine, String name) {
        return Shelf.named("machine", machine, () -> shelf.remove(TEMPLATES + "/" + machine, "template", name));
    }

    // ---------------------------------------------------------------- dialects

    /** Every NC dialect, saved and built-in, sorted by name. */
    public List<LibraryEntry> dialects() {
        return shelf.list(DIALECTS, "", d -> d.root().path("description").asString(""));
    }

    /**
     * The text of the dialect of that name, for the NC writer (which checks its contents). The
     * library checks only that it is a JSON object of format {@code hobwright-dialect}.
     */
    public Loaded<String> dialectText(String name) {
        return shelf.text(DIALECTS, "dialect", name).then(t -> dialectDocument(t, name).map(d -> t));
    }

    /** Saves a dialect file under {@code name}; replaces an existing one only with {@code force}. */
    public Loaded<Path> saveDialect(Path file, String name, boolean force) {
        return Shelf.named("dialect", name, () -> JsonDocument.read(file).then(d -> dialectFormat(d).then(x ->
                        shelf.save(DIALECTS, name, "dialect", JobWriter.text(d.root()), force))));
    }

    /** Removes a saved dialect (built-in ones are read-only). */
    public Loaded<Path> removeDialect(String name) {
        return shelf.remove(DIALECTS, "dialect", name);
    }

    private static Loaded<JsonDocument> dialectDocument(String text, String name) {
        return JsonDocument.parse(text, "dialect " + name).then(Library::dialectFormat);
    }

    private static Loaded<JsonDocument> dialectFormat(JsonDocument d) {
        JsonNode f = d.root().get("format");
        if (f == null || !f.isString() || !f.stringValue().equals(DIALECT_FORMAT)) {
            return Loaded.unreadable(InputCode.INPUT_FORMAT.at("format", d.at("format")
                    + ": not a dialect file (\"format\" must be \"" + DIALECT_FORMAT + "\")", null));
        }
        return Loaded.of(d);
    }


    private static <T> Loaded<T> checkStem(Loaded<T> loaded, String name, Function<T, String> nameOf, String what) {
        return loaded.then(v -> nameOf.apply(v).equals(name) ? Loaded.of(v)
                : Loaded.failed(List.of(InputCode.INPUT_CONFLICT.at("name", "the " + what + " file \"" + name
                        + ".json\" names itself \"" + nameOf.apply(v) + "\"", "rename the file or correct its name"))));
    }


    /** The text stored for a file being saved: its (migrated) tree without the editor's {@code $schema}. */
    private static String storedText(JsonDocument d) {
        ObjectNode copy = d.root().deepCopy();
        copy.remove("$schema");
        copy.put("version", FileFormat.VERSION);
        return JobWriter.text(copy);
    }
}
