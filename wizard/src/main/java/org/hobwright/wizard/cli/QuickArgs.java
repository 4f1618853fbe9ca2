package org.hobwright.wizard.cli;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * Reads the common, well-formed forms of {@code plan} and {@code demo} without picocli:
 * {@code [--home DIR] plan JOB... [--machine M] [--template T] [--out DIR] [--date D] [--home DIR]
 * [--json] [--fastest]} and {@code [--home DIR] demo [--out DIR] [--date D] [--home DIR]}, options
 * also as {@code --name=value}. Anything else (help, version, an unknown or repeated option, a
 * missing value, {@code --}) returns empty and is left to the picocli command line, which then
 * gives the usual messages. A test checks that both read every accepted form the same way.
 */
final class QuickArgs {
    private static final List<String> PLAN_VALUES = List.of("--machine", "--template", "--out", "--date", "--home");
    private static final List<String> DEMO_VALUES = List.of("--out", "--date", "--home");
    private static final List<String> PLAN_FLAGS = List.of("--json", "--fastest");

    private QuickArgs() {
    }

    /** The run these arguments ask for, when they are a plain plan or demo. */
    static Optional<PlanRequest> parse(String[] args) {
        Map<String, String> values = new java.util.HashMap<>();
        int i = 0;
        if (args.length >= 2 && args[0].equals("--home")) {
            values.put("--home", args[1]);
            i = 2;
        } else if (args.length >= 1 && args[0].startsWith("--home=")) {
            values.put("--home", args[0].substring("--home=".length()));
            i = 1;
        }
        if (i >= args.length || !(args[i].equals("plan") || args[i].equals("demo"))) {
            return Optional.empty();
        }
        boolean plan = args[i].equals("plan");
        List<String> valued = plan ? PLAN_VALUES : DEMO_VALUES;
        List<String> flags = plan ? PLAN_FLAGS : List.of();
        List<Path> jobs = new ArrayList<>();
        for (i++; i < args.length; i++) {
            String a = args[i];
            int eq = a.indexOf('=');
            String name = a.startsWith("--") && eq > 0 ? a.substring(0, eq) : a;
            if (!a.startsWith("-")) {
                if (!plan) {
                    return Optional.empty();
                }
                jobs.add(Path.of(a));
            } else if (flags.contains(a)) {
                if (values.put(a, "true") != null) {
                    return Optional.empty();
                }
            } else if (valued.contains(name)) {
                String value = eq > 0 && name.length() < a.length() ? a.substring(eq + 1)
                        : i + 1 < args.length ? args[++i] : null;
                if (value == null || value.isEmpty() || value.startsWith("-")
                        || values.put(name, value) != null) {
                    return Optional.empty();
                }
            } else {
                return Optional.empty();
            }
        }
        Path home = values.containsKey("--home") ? Path.of(values.get("--home")) : null;
        Path out = values.containsKey("--out") ? Path.of(values.get("--out")) : null;
        if (!plan) {
            return Optional.of(PlanRequest.demo(out, values.get("--date"), home));
        }
        if (jobs.isEmpty()) {
            return Optional.empty();
        }
        return Optional.of(PlanRequest.plan(jobs, values.get("--machine"), values.get("--template"), out,
                values.containsKey("--json"), values.containsKey("--fastest"), values.get("--date"), home));
    }
}
