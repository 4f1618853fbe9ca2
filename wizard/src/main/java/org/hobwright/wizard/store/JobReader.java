package org.hobwright.wizard.store;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import org.hobwright.api.check.Finding;
import org.hobwright.api.job.CycleSettings;
import org.hobwright.api.job.GearSpec;
import org.hobwright.api.job.HobJob;
import org.hobwright.api.job.HobSpec;
import org.hobwright.api.job.JobFields;
import org.hobwright.api.job.Units;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.node.ObjectNode;

/**
 * Reads a job (file, text, or a tree built in memory, e.g. from the wizard's answers) into a
 * {@link HobJob} in canonical units. Resolves a machine given by name and the cycle template
 * through the {@link Library}; a template's values fill the cycle keys the job leaves out.
 * Lengths are converted from the job's units once, here; angles may be decimal degrees or
 * degrees-minutes-seconds. Every bad value is a finding; nothing throws for bad input.
 */
public final class JobReader {
    private final Library library;

    /** A reader that finds machines and templates in {@code library}. */
    public JobReader(Library library) {
        this.library = Objects.requireNonNull(library, "library");
    }

    /**
     * What the command line may put in place of the job's own choices.
     *
     * @param machine  a machine name, or the path of a machine profile file (a value ending in
     *                 {@code .json} or naming an existing file), replacing the job's machine
     * @param template a template name of that machine, replacing {@code cycle.template}
     */
    public record Overrides(Optional<String> machine, Optional<String> template) {
        /** No overrides. */
        public static final Overrides NONE = new Overrides(Optional.empty(), Optional.empty());

        public Overrides {
            Objects.requireNonNull(machine, "machine");
            Objects.requireNonNull(template, "template");
        }
    }

    /** Reads a job file. */
    public Loaded<HobJob> read(Path file) {
        return read(file, Overrides.NONE);
    }

    /** Reads a job file with overrides. */
    public Loaded<HobJob> read(Path file, Overrides overrides) {
        return JsonDocument.read(file).then(d -> read(d, overrides));
    }

    /** Reads a job from JSON text; {@code sourceName} names it in messages. */
    public Loaded<HobJob> read(String json, String sourceName) {
        return read(json, sourceName, Overrides.NONE);
    }

    /** Reads a job from JSON text with overrides. */
    public Loaded<HobJob> read(String json, String sourceName, Overrides overrides) {
        return JsonDocument.parse(json, sourceName).then(d -> read(d, overrides));
    }

    /**
     * Reads a job from a tree built in memory. {@code format} and {@code version} may be left
     * out (the current ones are assumed); everything else is checked as in a file.
     */
    public Loaded<HobJob> read(JsonNode tree, String sourceName) {
        return read(tree, sourceName, Overrides.NONE);
    }

    /** Reads a job from a tree built in memory, with overrides. */
    public Loaded<HobJob> read(JsonNode tree, String sourceName, Overrides overrides) {
        if (tree == null || !tree.isObject()) {
            return Loaded.unreadable(InputCode.INPUT_MALFORMED.at("job", sourceName
                    + ": a job must be a JSON object", null));
        }
        ObjectNode copy = ((ObjectNode) tree).deepCopy();
        if (!copy.has("format")) {
            copy.put("format", FileFormat.JOB.word());
        }
        if (!copy.has("version")) {
            copy.put("version", FileFormat.VERSION);
        }
        return read(JsonDocument.ofTree(copy, sourceName), overrides);
    }

    private Loaded<HobJob> read(JsonDocument raw, Overrides overrides) {
        return FileFormat.JOB.open(raw).then(doc -> {
            List<Finding> out = new ArrayList<>(FileFormat.JOB.structure(doc));
            Optional<Units> units = FieldReader.root(doc, out, Units.MM).units("units");
            if (units.isEmpty()) {
                return Loaded.unreadable(out);
            }
            FieldReader root = FieldReader.root(doc, out, units.get());
            MachineChoice choice = machine(root, overrides, out);
            if (choice.unreadable()) {
                return Loaded.unreadable(out);
            }
            Optional<MachineFile> machine = choice.machine();
            FieldReader cycleFields = cycleWithTemplate(doc, root, machine, overrides, out);
            if (cycleFields == null) {
                return Loaded.unreadable(out);
            }
            String name = root.text(JobFields.NAME).orElse("job");
            boolean spline = root.word(JobFields.PART).orElse("gear").equals("spline");
            String partKey = spline ? "spline" : "gear";
            if (!root.has(partKey)) {
                root.missing(partKey, spline ? "describe the spline: standard, teeth, module or diametralPitch,"
                        + " pressureAngle, root, toleranceClass, ..." : "describe the gear: teeth, module or"
                        + " diametralPitch, pressureAngle, ...");
            }
            String other = spline ? "gear" : "spline";
            if (root.has(other)) {
                root.problem(InputCode.INPUT_CONFLICT, other, "a " + partKey + " job has no " + other + " object",
                        spline ? "describe the part in \"spline\" only" : "set \"part\": \"spline\" for a spline job");
            }
            if (!root.has("hob")) {
                root.missing("hob", "describe the hob: module or diametralPitch, starts, hand, outsideDiameter, ...");
            }
            Optional<SplineParts.Read> splineRead = spline && root.has("spline")
                    ? SplineParts.spline(root.child("spline"), name, out) : Optional.empty();
            Optional<GearSpec> gear = spline ? splineRead.map(SplineParts.Read::frame)
                    : root.has("gear") ? JobParts.gear(root.child("gear"), name, out) : Optional.empty();
            Optional<HobSpec> hob = root.has("hob") ? JobParts.hob(root.child("hob"), out) : Optional.empty();
            CycleReader.Values cycle = CycleReader.read(cycleFields, true);
            if (Finding.anyError(out) || gear.isEmpty() || hob.isEmpty() || machine.isEmpty()) {
                return Loaded.failed(out);
            }
            try {
                CycleSettings settings = cycle.settings();
                return Loaded.of(new HobJob(name, units.get(), gear.get(), hob.get(), machine.get().profile(),
                        settings, splineRead.map(SplineParts.Read::spline)), out);
            } catch (IllegalArgumentException | NullPointerException | java.util.NoSuchElementException e) {
                out.add(InputCode.INPUT_VALUE.at("job", doc.source() + ": " + e.getMessage(), null));
                return Loaded.failed(out);
            }
        });
    }

    /** The machine, or empty with an error finding; {@code unreadable} when reading must stop. */
    private record MachineChoice(Optional<MachineFile> machine, boolean unreadable) {
    }

    /** The machine: the override, the named profile, or the inline object. Findings go to {@code out}. */
    private MachineChoice machine(FieldReader root, Overrides overrides, List<Finding> out) {
        JsonNode m = root.raw("machine");
        if (overrides.machine().isPresent() || m != null && m.isString()) {
            Loaded<MachineFile> named = lookUpMachine(overrides.machine().orElseGet(m::stringValue),
                    overrides.machine().isPresent());
            out.addAll(named.findings());
            return new MachineChoice(named.value(), named.unreadable());
        }
        if (m == null) {
            root.missing("machine", "name a machine profile, e.g. \"machine\": \"varrow-1605\", or describe it inline");
            return new MachineChoice(Optional.empty(), false);
        }
        Optional<FieldReader> inline = inlineMachineFields(root);
        return inline.isEmpty() ? new MachineChoice(Optional.empty(), true)
                : new MachineChoice(MachineReader.body(inline.get(), out), false);
    }

    /** A machine by name, or from a file when an override names one. */
    private Loaded<MachineFile> lookUpMachine(String nameOrFile, boolean mayBeFile) {
        if (mayBeFile && (nameOrFile.endsWith(".json") || nameOrFile.contains("/") || nameOrFile.contains("\\")
                || isFile(nameOrFile))) {
            try {
                return Library.readMachineFile(Path.of(nameOrFile));
            } catch (java.nio.file.InvalidPathException e) {
                return library.machineFile(nameOrFile);
            }
        }
        return library.machineFile(nameOrFile);
    }

    private static boolean isFile(String text) {
        try {
            return Files.isRegularFile(Path.of(text));
        } catch (java.nio.file.InvalidPathException e) {
            return false;
        }
    }

    /** The fields of an inline machine, in its own units when it states them; empty when they are wrong. */
    private static Optional<FieldReader> inlineMachineFields(FieldReader root) {
        FieldReader inline = root.child("machine");
        if (!inline.has("units")) {
            return Optional.of(inline);
        }
        return inline.units("units").map(inline::withUnits);
    }

    /**
     * The cycle keys to read: the job's own, filled with the template's (converted to the job's
     * units). Returns null (with a finding) when the template cannot be read.
     */
    private FieldReader cycleWithTemplate(JsonDocument doc, FieldReader root, Optional<MachineFile> machine,
                                     Overrides overrides, List<Finding> out) {
        FieldReader cycle = root.child("cycle");
        Optional<String> templateName = overrides.template().or(() -> cycle.text(JobFields.CYCLE_TEMPLATE));
        if (templateName.isEmpty()) {
            return cycle;
        }
        if (machine.isEmpty()) {
            return cycle;
        }
        Loaded<CycleTemplate> t = library.template(machine.get().name(), templateName.get());
        out.addAll(t.findings());
        if (t.unreadable()) {
            return null;
        }
        if (t.value().isEmpty()) {
            return cycle;
        }
        ObjectNode merged = cycle.objectOrEmpty().deepCopy();
        merged.remove("template");
        CycleReader.fill(merged, t.get().cycleIn(root.units()));
        return new FieldReader(doc, merged, "cycle", out, root.units());
    }
}
