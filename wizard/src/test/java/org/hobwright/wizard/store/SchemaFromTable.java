package org.hobwright.wizard.store;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.hobwright.api.job.FieldDef;
import org.hobwright.api.job.FieldDefault;
import org.hobwright.api.job.FieldRange;
import org.hobwright.api.job.JobFields;
import org.hobwright.api.job.MachineFields;
import org.hobwright.api.job.TemplateFields;
import org.hobwright.api.job.Units;
import org.hobwright.api.wizard.FieldType;
import org.hobwright.text.Decimal;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.node.ArrayNode;
import tools.jackson.databind.node.JsonNodeFactory;
import tools.jackson.databind.node.ObjectNode;

/**
 * Writes the JSON Schemas (draft 2020-12) of the job, machine and template formats from the field
 * table ({@link JobFields}, {@link MachineFields}, {@link TemplateFields}): every key, type, range,
 * choice, default and help text comes from there. What a table of single fields cannot say is
 * written here once: exactly one of module and diametral pitch, the hand of a helical gear, the
 * custom factors only with the custom tooth system, a thickness series only without allowances, the
 * mating gear's teeth whenever it is given, a machine by name or inline, a gear or a spline by the
 * part kind, a spline pitch written as the standard does ("16/32"), a spline hob's keys together. A range in a unit
 * that follows the file's ({@code mm} or {@code in}) can only be stated as its sign; its limits are
 * in the description.
 */
final class SchemaFromTable {
    static final String DRAFT = "https://json-schema.org/draft/2020-12/schema";
    private static final JsonNodeFactory NODES = JsonNodeFactory.instance;
    /** A name of a library entry (the rule of {@link Names}). */
    private static final String NAME_PATTERN = "^[A-Za-z0-9_-][A-Za-z0-9._-]{0,63}$";
    /** The degrees-minutes-seconds forms {@code wizard.setup.Angles} reads. */
    private static final String ANGLE_PATTERN = "^\\s*[+-]?\\s*[0-9]+(\\.[0-9]+)?\\s*(°|d)?\\s*$"
            + "|^\\s*[+-]?\\s*[0-9]+\\s*(°|d|\\s)\\s*[0-5]?[0-9](\\.[0-9]+)?\\s*('|′|m)?\\s*$"
            + "|^\\s*[+-]?\\s*[0-9]+\\s*(°|d|\\s)\\s*[0-5]?[0-9](\\.[0-9]+)?(\\s*('|′|m)\\s*|\\s+)[0-5]?[0-9]"
            + "(\\.[0-9]+)?\\s*(\\\"|″|''|s)?\\s*$";

    private SchemaFromTable() {
    }

    /** The schema files by name, e.g. {@code job.schema.json}, as their text. */
    static Map<String, String> all() {
        Map<String, String> out = new LinkedHashMap<>();
        out.put("job.schema.json", JobWriter.text(job()));
        out.put("machine.schema.json", JobWriter.text(machine()));
        out.put("template.schema.json", JobWriter.text(template()));
        return out;
    }

    static ObjectNode machine() {
        ObjectNode s = head("Hobwright machine profile, version 1", "What a machine can do and how it counts."
                + " Lengths in the file's units; rapid and maxFeed in file units per minute; angles in degrees"
                + " (number or degrees-minutes-seconds text); speeds in rpm; times in seconds. Stored as"
                + " machines/NAME.json.");
        s.put("type", "object");
        s.put("$ref", "#/$defs/body");
        ObjectNode props = s.putObject("properties");
        header(props, "hobwright-machine");
        s.set("required", words("format", "version", "units"));
        s.put("unevaluatedProperties", false);
        ObjectNode defs = s.putObject("$defs");
        defs.set("name", NODES.objectNode().put("type", "string").put("pattern", NAME_PATTERN)
                .put("description", "Letters, digits, '.', '_', '-'; 1 to 64 characters, not starting with a dot."));
        ObjectNode angle = defs.putObject("angle");
        angle.put("description", "Degrees: a number, or a degrees-minutes-seconds text such as \"13°14'12\\\"\" or"
                + " \"13 14 12\".");
        ArrayNode any = angle.putArray("anyOf");
        any.addObject().put("type", "number");
        any.addObject().put("type", "string").put("pattern", ANGLE_PATTERN);
        ObjectNode body = object(MachineFields.all(), "", "#/$defs/");
        body.remove("additionalProperties");
        ArrayNode bodyRequired = required(body);
        for (int i = bodyRequired.size() - 1; i >= 0; i--) {
            if (bodyRequired.get(i).asString().equals("units")) {
                bodyRequired.remove(i);                 // an inline machine takes the job's units
            }
        }
        defs.set("body", body);
        return s;
    }

    static ObjectNode job() {
        ObjectNode s = head("Hobwright job, version 1", "One gear hobbing job: gear, hob, machine and cycle. Lengths"
                + " in the file's units; module in mm and diametralPitch in 1/in whatever the units; angles in"
                + " degrees (number or degrees-minutes-seconds text); cutting speed m/min in mm files and ft/min in"
                + " inch files; feeds in file units per work revolution; quality targets in µm (chip thickness in"
                + " file units).");
        s.put("type", "object");
        List<FieldDef> own = new ArrayList<>();
        for (FieldDef f : JobFields.all()) {
            if (!f.key().startsWith("cycle.") || f == JobFields.CYCLE_TEMPLATE) {
                own.add(f);
            }
        }
        ObjectNode root = object(own, "", "machine.schema.json#/$defs/");
        ObjectNode props = NODES.objectNode();
        header(props, "hobwright-job");
        props.setAll((ObjectNode) root.get("properties"));
        ObjectNode machine = props.putObject("machine");
        machine.put("description", JobFields.MACHINE.help());
        ArrayNode any = machine.putArray("anyOf");
        any.addObject().put("$ref", "machine.schema.json#/$defs/name");
        any.addObject().put("$ref", "machine.schema.json#/$defs/body").put("unevaluatedProperties", false);
        ObjectNode cycle = (ObjectNode) props.get("cycle");
        ObjectNode template = (ObjectNode) cycle.get("properties").get("template");
        props.set("cycle", NODES.objectNode().put("$ref", "#/$defs/cycleKeys")
                .set("properties", NODES.objectNode().set("template", template)));
        ((ObjectNode) props.get("cycle")).put("unevaluatedProperties", false);
        pitch((ObjectNode) props.get("gear"), true);
        pitch((ObjectNode) props.get("hob"), false);
        ObjectNode spline = (ObjectNode) props.get("spline");
        pitch(spline, false);
        ObjectNode dp = (ObjectNode) spline.get("properties").get(JobFields.SPLINE_DIAMETRAL_PITCH.leaf());
        dp.remove(List.of("type", "minLength"));
        ArrayNode dpForms = dp.putArray("anyOf");
        dpForms.addObject().put("type", "number").put("exclusiveMinimum", 0);
        dpForms.addObject().put("type", "string").put("pattern", "^\\s*[0-9.]+\\s*(/\\s*[0-9.]+\\s*)?$");
        splineHob((ObjectNode) props.get("hob"));
        s.set("properties", props);
        ArrayNode required = words("format", "version");
        for (JsonNode k : required(root)) {
            if (!k.asString().equals("gear") && !k.asString().equals("spline")) {
                required.add(k);
            }
        }
        s.set("required", required);
        s.set("allOf", NODES.arrayNode().add(partRule()));
        s.put("additionalProperties", false);
        ObjectNode defs = s.putObject("$defs");
        ObjectNode keys = object(JobFields.cycle(), "cycle.", "machine.schema.json#/$defs/");
        keys.remove("additionalProperties");            // the job adds "template"; both close it with unevaluatedProperties
        keys.put("description", "how to cut; every key optional (the planner or the template fills what is left out)");
        defs.set("cycleKeys", keys);
        return s;
    }

    static ObjectNode template() {
        ObjectNode s = head("Hobwright cycle template, version 1", "Cycle values saved for one machine; they fill"
                + " the cycle keys a job leaves out. Stored as templates/MACHINE/NAME.json.");
        s.put("type", "object");
        List<FieldDef> own = List.of(TemplateFields.UNITS, TemplateFields.MACHINE, TemplateFields.NAME,
                TemplateFields.DESCRIPTION);
        ObjectNode root = object(own, "", "machine.schema.json#/$defs/");
        ObjectNode props = NODES.objectNode();
        header(props, "hobwright-template");
        props.setAll((ObjectNode) root.get("properties"));
        props.set("cycle", NODES.objectNode().put("$ref", "job.schema.json#/$defs/cycleKeys")
                .put("unevaluatedProperties", false));
        s.set("properties", props);
        ArrayNode required = words("format", "version");
        required.addAll(required(root));
        s.set("required", required);
        s.put("additionalProperties", false);
        return s;
    }

    /** The gear's or hob's pitch rule, and for the gear the helical hand and the custom factors. */
    private static void pitch(ObjectNode object, boolean gear) {
        ArrayNode all = NODES.arrayNode();
        ArrayNode one = all.addObject().putArray("oneOf");
        one.addObject().set("required", words("module"));
        ((ObjectNode) one.get(0)).set("not", NODES.objectNode().set("required", words("diametralPitch")));
        one.addObject().set("required", words("diametralPitch"));
        ((ObjectNode) one.get(1)).set("not", NODES.objectNode().set("required", words("module")));
        if (gear) {
            ObjectNode helical = all.addObject();
            helical.set("if", NODES.objectNode().<ObjectNode>set("properties", NODES.objectNode()
                    .set("helixAngle", NODES.objectNode().set("not", NODES.objectNode().put("const", 0))))
                    .set("required", words("helixAngle")));
            helical.set("then", NODES.objectNode().set("required", words("hand")));
            ObjectNode custom = all.addObject();
            custom.set("if", NODES.objectNode().<ObjectNode>set("properties", NODES.objectNode()
                    .set("toothSystem", NODES.objectNode().put("const", "custom")))
                    .set("required", words("toothSystem")));
            custom.set("then", NODES.objectNode().set("required", words("custom")));
            custom.set("else", NODES.objectNode().set("not", NODES.objectNode().set("required", words("custom"))));
            ObjectNode series = all.addObject();
            series.set("if", NODES.objectNode().set("required", words("thicknessSeries")));
            ArrayNode allowances = NODES.arrayNode();
            allowances.addObject().set("required", words("thicknessAllowance"));
            allowances.addObject().set("required", words("thicknessAllowanceLower"));
            series.set("then", NODES.objectNode().set("not", NODES.objectNode().set("anyOf", allowances)));
            ObjectNode mate = (ObjectNode) object.get("properties").get("mate");
            mate.set("required", words("teeth"));
            mate.put("description", "the external gear this one runs with (same module, pressure angle, helix angle"
                    + " of the other hand and tooth system)");
        }
        object.set("allOf", all);
    }

    /** A spline job has a spline and no gear; any other job a gear and no spline. */
    private static ObjectNode partRule() {
        ObjectNode rule = NODES.objectNode();
        rule.set("if", NODES.objectNode().<ObjectNode>set("properties", NODES.objectNode()
                .set(JobFields.PART.key(), NODES.objectNode().put("const", JobFields.PARTS.get(1))))
                .set("required", words(JobFields.PART.key())));
        rule.set("then", NODES.objectNode().<ObjectNode>set("required", words("spline"))
                .set("not", NODES.objectNode().set("required", words("gear"))));
        rule.set("else", NODES.objectNode().<ObjectNode>set("required", words("gear"))
                .set("not", NODES.objectNode().set("required", words("spline"))));
        return rule;
    }

    /** A spline hob gives its root form and tip radius together; its addendum only with them. */
    private static void splineHob(ObjectNode hob) {
        String root = JobFields.HOB_ROOT.leaf();
        String tip = JobFields.HOB_TIP_RADIUS.leaf();
        hob.putObject("dependentRequired").<ObjectNode>set(root, words(tip)).<ObjectNode>set(tip, words(root))
                .set(JobFields.HOB_ADDENDUM.leaf(), words(root, tip));
    }

    /** An object schema of the fields, nested by their dotted keys below {@code prefix}. */
    private static ObjectNode object(List<FieldDef> fields, String prefix, String defs) {
        Map<String, List<FieldDef>> children = new LinkedHashMap<>();
        Map<String, FieldDef> leaves = new LinkedHashMap<>();
        for (FieldDef f : fields) {
            String rest = f.key().substring(prefix.length());
            int dot = rest.indexOf('.');
            if (dot < 0) {
                leaves.put(rest, f);
                children.put(rest, null);
            } else {
                children.computeIfAbsent(rest.substring(0, dot), k -> new ArrayList<>()).add(f);
            }
        }
        ObjectNode o = NODES.objectNode();
        o.put("type", "object");
        ObjectNode props = o.putObject("properties");
        ArrayNode required = NODES.arrayNode();
        children.forEach((name, sub) -> {
            if (sub == null) {
                FieldDef f = leaves.get(name);
                props.set(name, value(f, defs));
                if (f.required()) {
                    required.add(name);
                }
            } else {
                props.set(name, object(sub, prefix + name + ".", defs));
                if (prefix.isEmpty() && sub.stream().anyMatch(FieldDef::required)) {
                    required.add(name);
                }
            }
        });
        if (!required.isEmpty()) {
            o.set("required", required);
        }
        o.put("additionalProperties", false);
        return o;
    }

    /** The schema of one value. */
    private static ObjectNode value(FieldDef f, String defs) {
        ObjectNode v = NODES.objectNode();
        boolean inUnits = f.unit().followsUnits();
        switch (f.type()) {
            case NUMBER -> v.put("type", "number");
            case INTEGER -> v.put("type", "integer");
            case ANGLE -> v.put("$ref", defs + "angle");
            case BOOLEAN -> v.put("type", "boolean");
            case CHOICE, TEXT -> {
                if (!f.choices().isEmpty()) {
                    v.set("enum", words(f.choices().toArray(String[]::new)));
                } else if (f.libraryName()) {
                    v.put("$ref", defs + "name");
                } else {
                    v.put("type", "string").put("minLength", 1);
                }
            }
        }
        FieldRange r = f.range();
        if (f.numeric()) {
            if (r.hasMin() && (!inUnits || r.min() == 0)) {
                number(v, r.minOpen() ? "exclusiveMinimum" : "minimum", r.min());
            }
            if (r.hasMax() && !inUnits) {
                number(v, "maximum", r.max());
            }
        }
        FieldDefault d = f.dflt();
        if (!f.required() && d.hasValue() && d.value(Units.MM).equals(d.value(Units.IN))) {
            v.set("default", defaultValue(f, d.value(Units.MM)));
        }
        v.put("description", description(f));
        return v;
    }

    private static String description(FieldDef f) {
        StringBuilder sb = new StringBuilder(f.help());
        String mm = f.unit().symbol(Units.MM);
        String in = f.unit().symbol(Units.IN);
        FieldRange r = f.range();
        if (f.numeric() && f.unit().followsUnits()) {
            sb.append(" Unit: ").append(mm).append(" in millimetre files, ").append(in).append(" in inch files.");
            if (r.hasMax() || r.hasMin() && r.min() != 0) {
                sb.append(" Allowed: ").append(RangeWords.of(f, Units.MM)).append(" (").append(RangeWords.of(f, Units.IN))
                        .append(").");
            }
        } else if (!mm.isEmpty()) {
            sb.append(" Unit: ").append(mm).append('.');
        }
        sb.append(" Default: ").append(f.dflt().describe());
        if (f.dflt().hasValue() && !f.dflt().value(Units.MM).equals(f.dflt().value(Units.IN))) {
            sb.append(" (").append(f.dflt().value(Units.MM)).append(' ').append(mm).append(", ")
                    .append(f.dflt().value(Units.IN)).append(' ').append(in).append(')');
        }
        return sb.append('.').toString();
    }

    private static JsonNode defaultValue(FieldDef f, String text) {
        return switch (f.type()) {
            case BOOLEAN -> NODES.booleanNode(text.equals("yes"));
            case NUMBER, INTEGER, ANGLE -> {
                ObjectNode n = NODES.objectNode();
                number(n, "v", Double.parseDouble(text));
                yield n.get("v");
            }
            default -> NODES.stringNode(text);
        };
    }

    private static void number(ObjectNode n, String key, double v) {
        if (v == Math.rint(v) && Math.abs(v) < 1e15) {
            n.put(key, (long) v);
        } else {
            n.put(key, Double.parseDouble(Decimal.exact(v)));
        }
    }

    private static ObjectNode head(String title, String description) {
        ObjectNode s = NODES.objectNode();
        s.put("$schema", DRAFT);
        s.put("title", title);
        s.put("description", description + " Generated from the field table (org.hobwright.api.job); do not"
                + " edit by hand.");
        return s;
    }

    private static void header(ObjectNode props, String format) {
        props.putObject("$schema").put("type", "string");
        props.putObject("format").put("const", format);
        props.putObject("version").put("const", FileFormat.VERSION);
    }

    private static ArrayNode required(ObjectNode object) {
        JsonNode r = object.get("required");
        if (r instanceof ArrayNode a) {
            return a;
        }
        ArrayNode a = NODES.arrayNode();
        object.set("required", a);
        return a;
    }

    private static ArrayNode words(String... words) {
        ArrayNode a = NODES.arrayNode();
        for (String w : words) {
            a.add(w);
        }
        return a;
    }
}
