package org.hobwright.wizard.steps;

import java.math.BigDecimal;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Optional;
import org.hobwright.api.job.FieldDef;
import org.hobwright.api.job.FieldDefault;
import org.hobwright.api.job.Units;
import org.hobwright.api.wizard.FieldType;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.node.JsonNodeFactory;
import tools.jackson.databind.node.ObjectNode;

/**
 * The answers of a session as typed, keyed by job-file path, and their conversion to and from a
 * job file's JSON tree. An empty answer means the key is left out of the job.
 */
public final class Answers {
    private static final JsonNodeFactory NODES = JsonNodeFactory.instance;

    private final Map<String, String> values = new LinkedHashMap<>();
    private Optional<ObjectNode> inlineMachine = Optional.empty();

    /**
     * A blank start: only the fields with a default from a standard or the trade's convention are
     * filled ({@link FieldDefault}), in millimetres; everything the drawing must give is empty.
     */
    public static Answers blank() {
        Answers a = new Answers();
        a.fillDefaults(Units.MM);
        return a;
    }

    /**
     * Answers taken from a job file's tree (keys without a field are ignored); keys the job leaves
     * out take the table's default, as the job reader would.
     */
    public static Answers fromTree(JsonNode job) {
        Answers a = new Answers();
        for (FieldDef f : StepFields.all()) {
            JsonNode node = at(job, f.key());
            if (node == null || node.isNull() || node.isMissingNode()) {
                continue;
            }
            if (f.key().equals(StepFields.MACHINE) && node.isObject()) {
                a.inlineMachine = Optional.of((ObjectNode) node.deepCopy());
                a.values.put(f.key(), node.path("name").asString(""));
            } else if (!text(node).isEmpty()) {
                a.values.put(f.key(), text(node));
            }
        }
        a.fillDefaults("in".equals(a.get(StepFields.UNITS)) ? Units.IN : Units.MM);
        return a;
    }

    /** Fills every unanswered field that has a default value with it, in {@code units}. */
    private void fillDefaults(Units units) {
        for (FieldDef f : StepFields.all()) {
            if (!values.containsKey(f.key()) && f.dflt().hasValue()) {
                values.put(f.key(), f.dflt().value(units));
            }
        }
    }

    /** A file's value as an answer: yes or no, a plain number, a text; empty for objects and lists. */
    static String text(JsonNode node) {
        if (node.isBoolean()) {
            return node.booleanValue() ? "yes" : "no";
        }
        if (node.isNumber()) {
            return node.decimalValue().toPlainString();
        }
        return node.isString() ? node.stringValue() : "";
    }

    /** The answer of a key, or empty text. */
    public String get(String key) {
        return values.getOrDefault(key, "");
    }

    /** Sets an answer; empty text removes it. */
    public void put(String key, String text) {
        if (text.isEmpty()) {
            values.remove(key);
        } else {
            values.put(key, text);
        }
    }

    /**
     * The job file's JSON tree of these answers: {@code format}, {@code version} and every
     * answered key, typed as the file format wants it.
     */
    public ObjectNode toTree() {
        ObjectNode root = NODES.objectNode();
        root.put("format", "hobwright-job");
        root.put("version", 1);
        for (FieldDef f : StepFields.all()) {
            String text = get(f.key());
            if (text.isEmpty() || !StepFields.applies(f.key(), this)) {
                continue;
            }
            ObjectNode parent = parentOf(root, f.key());
            String leaf = f.key().substring(f.key().lastIndexOf('.') + 1);
            if (f.key().equals(StepFields.MACHINE) && inlineMachine.filter(m -> text.equals(m.path("name")
                    .asString(""))).isPresent()) {
                parent.set(leaf, inlineMachine.get().deepCopy());
            } else {
                parent.set(leaf, value(f.type(), text));
            }
        }
        return root;
    }

    /** The name of a machine given inline in the job, if any. */
    public Optional<String> inlineMachineName() {
        return inlineMachine.map(m -> m.path("name").asString(""));
    }

    private static JsonNode value(FieldType type, String text) {
        return switch (type) {
            case NUMBER -> NODES.numberNode(new BigDecimal(text));
            case INTEGER -> NODES.numberNode(new BigDecimal(text.strip()));
            case ANGLE -> FieldCheck.number(text).isPresent() ? NODES.numberNode(new BigDecimal(text))
                    : NODES.stringNode(text);
            case BOOLEAN -> NODES.booleanNode(FieldCheck.yesNo(text).orElse(false));
            case CHOICE, TEXT -> NODES.stringNode(text);
        };
    }

    private static ObjectNode parentOf(ObjectNode root, String key) {
        ObjectNode node = root;
        String[] parts = key.split("\\.");
        for (int i = 0; i < parts.length - 1; i++) {
            JsonNode child = node.get(parts[i]);
            if (!(child instanceof ObjectNode)) {
                child = node.putObject(parts[i]);
            }
            node = (ObjectNode) child;
        }
        return node;
    }

    private static JsonNode at(JsonNode root, String key) {
        JsonNode node = root;
        for (String part : key.split("\\.")) {
            node = node.get(part);
            if (node == null) {
                return null;
            }
        }
        return node;
    }
}
