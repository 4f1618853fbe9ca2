package org.hobwright.wizard.store;

import java.util.HashMap;
import java.util.List;
import java.util.Map;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.node.ObjectNode;

/**
 * Migrates older file versions to the current one, in memory, keeping the line of every key.
 *
 * <p>Version 0 (the first draft of the formats, still read):
 * <ul>
 *   <li>job: {@code gear.normalModule} and {@code hob.normalModule} instead of {@code module},
 *       {@code hob.threads} instead of {@code starts};</li>
 *   <li>machine: flat {@code workMinRpm}, {@code workMaxRpm}, {@code hobMinRpm}, {@code hobMaxRpm}
 *       instead of the {@code workSpindle} and {@code hobSpindle} objects;</li>
 *   <li>template: the cycle keys at the top level instead of inside {@code cycle}.</li>
 * </ul>
 */
final class Migrations {
    private static final List<String> TEMPLATE_HEADER =
            List.of("$schema", "format", "version", "units", "machine", "name", "description");

    private Migrations() {
    }

    /** Migrates {@code doc}, of the given format and older {@code version}, to the current version. */
    static JsonDocument migrate(FileFormat format, int version, JsonDocument doc) {
        ObjectNode root = doc.root().deepCopy();
        Map<String, Integer> lines = new HashMap<>(doc.lines());
        if (version == 0) {
            switch (format) {
                case JOB -> jobFrom0(root, lines);
                case MACHINE -> machineFrom0(root, lines);
                case TEMPLATE -> templateFrom0(root, lines);
            }
        }
        root.put("version", FileFormat.VERSION);
        return new JsonDocument(doc.source(), root, lines);
    }

    private static void jobFrom0(ObjectNode root, Map<String, Integer> lines) {
        if (root.get("gear") instanceof ObjectNode gear) {
            rename(gear, "gear", "normalModule", "module", lines);
        }
        if (root.get("hob") instanceof ObjectNode hob) {
            rename(hob, "hob", "normalModule", "module", lines);
            rename(hob, "hob", "threads", "starts", lines);
        }
    }

    private static void machineFrom0(ObjectNode root, Map<String, Integer> lines) {
        for (String spindle : List.of("work", "hob")) {
            ObjectNode target = null;
            for (String end : List.of("Min", "Max")) {
                String old = spindle + end + "Rpm";
                if (root.has(old)) {
                    if (target == null) {
                        target = root.putObject(spindle + "Spindle");
                        lines.put(spindle + "Spindle", lines.get(old));
                    }
                    move(root, "", old, target, spindle + "Spindle", end.toLowerCase(java.util.Locale.ROOT) + "Rpm",
                            lines);
                }
            }
        }
    }

    private static void templateFrom0(ObjectNode root, Map<String, Integer> lines) {
        if (root.has("cycle")) {
            return;
        }
        ObjectNode cycle = root.objectNode();
        for (String key : List.copyOf(root.propertyNames())) {
            if (!TEMPLATE_HEADER.contains(key)) {
                lines.putIfAbsent("cycle", lines.get(key));
                move(root, "", key, cycle, "cycle", key, lines);
            }
        }
        root.set("cycle", cycle);
    }

    private static void rename(ObjectNode node, String path, String from, String to, Map<String, Integer> lines) {
        if (node.has(from) && !node.has(to)) {
            move(node, path, from, node, path, to, lines);
        }
    }

    private static void move(ObjectNode from, String fromPath, String fromKey, ObjectNode to, String toPath,
                             String toKey, Map<String, Integer> lines) {
        JsonNode value = from.remove(fromKey);
        to.set(toKey, value);
        String oldPath = join(fromPath, fromKey);
        String newPath = join(toPath, toKey);
        Map<String, Integer> moved = new HashMap<>();
        lines.forEach((k, v) -> {
            if (k.equals(oldPath) || k.startsWith(oldPath + ".") || k.startsWith(oldPath + "[")) {
                moved.put(newPath + k.substring(oldPath.length()), v);
            }
        });
        lines.putAll(moved);
    }

    private static String join(String path, String key) {
        return path.isEmpty() ? key : path + "." + key;
    }
}
