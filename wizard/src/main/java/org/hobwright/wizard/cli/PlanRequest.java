package org.hobwright.wizard.cli;

import java.nio.file.Path;
import java.util.List;
import java.util.Optional;

/**
 * One {@code plan} or {@code demo} run as the command line asked for it.
 *
 * @param inputs   job files or folders of job files; empty for the built-in sample job
 * @param machine  a machine name or machine file replacing the jobs' own
 * @param template a cycle template of that machine filling the cycle values the jobs leave out
 * @param out      the output folder; empty writes nothing (only with {@code json})
 * @param json     print the report on standard output
 * @param fastest  ask the optimiser for the fastest cycle too
 * @param date     the date to print in the outputs' headers, ISO 8601
 * @param home     the library folder
 */
record PlanRequest(List<Path> inputs, Optional<String> machine, Optional<String> template, Optional<Path> out,
                   boolean json, boolean fastest, Optional<String> date, Optional<Path> home) {
    PlanRequest {
        inputs = List.copyOf(inputs);
    }

    /** The output folder when none is given. */
    static final String DEFAULT_OUT = "hobwright-out";

    /** A {@code plan} run: without {@code --out}, writes to the default folder unless {@code --json} is asked. */
    static PlanRequest plan(List<Path> inputs, String machine, String template, Path out, boolean json,
                            boolean fastest, String date, Path home) {
        Optional<Path> folder = out != null ? Optional.of(named(out, "--out"))
                : json ? Optional.empty() : Optional.of(Path.of(DEFAULT_OUT));
        return new PlanRequest(inputs, Optional.ofNullable(machine), Optional.ofNullable(template), folder, json,
                fastest, Optional.ofNullable(date), Optional.ofNullable(home).map(h -> named(h, "--home")));
    }

    /** A {@code demo} run of the built-in sample job. */
    static PlanRequest demo(Path out, String date, Path home) {
        return new PlanRequest(List.of(), Optional.empty(), Optional.empty(),
                Optional.of(out == null ? Path.of(DEFAULT_OUT) : named(out, "--out")), false, false,
                Optional.ofNullable(date), Optional.ofNullable(home).map(h -> named(h, "--home")));
    }

    /**
     * A folder given on the command line; an empty one is a usage error, not the current folder
     * (whose files would be replaced).
     *
     * @throws CliFailure (exit 2) when the name is empty or blank
     */
    static Path named(Path folder, String option) {
        if (folder.toString().isBlank()) {
            throw CliFailure.usage(option + " needs a folder name; an empty one would mean the current folder"
                    + " (give \".\" to mean it)");
        }
        return folder;
    }
}
