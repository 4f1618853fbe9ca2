package org.hobwright.wizard.cli;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.hobwright.api.check.Finding;
import org.hobwright.api.job.HobJob;
import org.hobwright.text.JsonTrees;
import org.hobwright.wizard.run.DialectTrial;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code hobwright dialects list|show|save|remove}: the NC dialects of the library. */
@Command(name = "dialects", mixinStandardHelpOptions = true,
        description = "Lists, shows, saves and removes NC dialects (the words of a control). The built-in"
                + " dialects are examples for invented machines, read-only; a saved dialect of the same name wins.",
        subcommands = {CommandLine.HelpCommand.class})
final class DialectsCommand extends Verb {
    @Command(name = "list", mixinStandardHelpOptions = true, description = "Lists every dialect.")
    int list() {
        return LibraryCommands.list(store().library().dialects(), out(), "No dialects.");
    }

    @Command(name = "show", mixinStandardHelpOptions = true, description = "Prints a dialect file.")
    int show(@Parameters(paramLabel = "NAME", description = "Dialect name.") String name) {
        return LibraryCommands.show(store().library().dialectText(name), out());
    }

    @Command(name = "save", mixinStandardHelpOptions = true,
            description = {"Checks a dialect file by posting the built-in sample job with it, and saves it under"
                    + " the name it states (its \"name\" key, else the file name).",
                    "A dialect that cannot post a program is refused with every problem found."})
    int save(@Parameters(paramLabel = "FILE", description = "Dialect file (.json).") Path file,
             @Option(names = "--force", description = "Replace a saved dialect of the same name.") boolean force) {
        String text = text(file);
        String name = name(file, text);
        Store store = store();
        HobJob sample = Store.readable(store.reader().read(Store.builtinText("jobs/" + PlanRun.SAMPLE_JOB + ".json"),
                "built-in job " + PlanRun.SAMPLE_JOB)).get();
        List<Finding> problems = DialectTrial.findings(name, text, sample, parent.env().loader(),
                GeneratedOn.resolve(null, parent.env()));
        if (Finding.anyError(problems)) {
            var err = spec.commandLine().getErr();
            err.println("hobwright: dialect " + name + " (" + file + ") cannot post a program; nothing saved:");
            problems.forEach(f -> err.println("  " + f.line()));
            return ExitCodes.USAGE;
        }
        problems.forEach(f -> out().println("  " + f.line()));
        return LibraryCommands.changed(store.library().saveDialect(file, name, force), "Saved", out());
    }

    @Command(name = "remove", mixinStandardHelpOptions = true,
            description = "Removes a saved dialect (machines naming it can no longer post).")
    int remove(@Parameters(paramLabel = "NAME", description = "Dialect name.") String name) {
        return LibraryCommands.changed(store().library().removeDialect(name), "Removed", out());
    }

    private static String text(Path file) {
        try {
            return JsonTrees.withoutByteOrderMark(Files.readString(file));
        } catch (IOException | RuntimeException e) {
            throw CliFailure.usage(file + ": cannot be read as UTF-8 text (" + e.getMessage() + ")");
        }
    }

    /** The dialect's own "name", else the file name without ".json". */
    private static String name(Path file, String text) {
        String fileName = file.getFileName().toString();
        String stem = fileName.endsWith(".json") ? fileName.substring(0, fileName.length() - 5) : fileName;
        try {
            return JsonTrees.parse(text).path("name").asString(stem);
        } catch (RuntimeException e) {
            return stem;   // the library's reader reports the malformed file
        }
    }
}
