package org.hobwright.wizard.steps;

import java.math.BigDecimal;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Optional;
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

    /** Answers taken from a job file's tree (keys without a field are ignored). */
    public static Answers fromTree(JsonNode job) {
        Answers a = new Answers();
        for (Field f : StepFields.all()) {
            JsonNode node = at(job, f.key());
            if (node == null || node.isNull() || node.isMissingNode()) {
                continue;
            }
            if (f.key().equals(StepFields.MACHINE) && node.isObject()) {
                a.inlineMachine = Optional.of((ObjectNode) node.deepCopy());
                a.values.put(f.key(), node.path("name").asString(""));
            } else if (node.isBoolean()) {
                a.values.put(f.key(), node.booleanValue() ? "yes" : "no");
            } else if (node.isNumber()) {
                a.values.put(f.key(), node.decimalValue().toPlainString());
            } else if (node.isString()) {
                a.values.put(f.key(), node.stringValue());
            }
        }
        return a;
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
        for (Field f : StepFields.all()) {
            String text = get(f.key());
            if (text.isEmpty()) {
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
            case INTEGER -> NODES.numberNode(Integer.parseInt(text));
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
