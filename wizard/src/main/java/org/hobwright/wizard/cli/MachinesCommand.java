package org.hobwright.wizard.cli;

import java.nio.file.Path;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code hobwright machines list|show|save|remove}: the machine profiles of the library. */
@Command(name = "machines", mixinStandardHelpOptions = true,
        description = "Lists, shows, saves and removes machine profiles. The built-in invented machines are"
                + " always there, read-only; a saved profile of the same name wins.",
        subcommands = {CommandLine.HelpCommand.class})
final class MachinesCommand extends Verb {
    @Command(name = "list", mixinStandardHelpOptions = true, description = "Lists every machine profile.")
    int list() {
        return LibraryCommands.list(store().library().machines(), out(), "No machines.");
    }

    @Command(name = "show", mixinStandardHelpOptions = true, description = "Prints a machine profile file.")
    int show(@Parameters(paramLabel = "NAME", description = "Machine name.") String name) {
        return LibraryCommands.show(store().library().machineText(name), out());
    }

    @Command(name = "save", mixinStandardHelpOptions = true,
            description = "Checks a machine profile file and saves it under the name it states.")
    int save(@Parameters(paramLabel = "FILE", description = "Machine profile file (.json).") Path file,
             @Option(names = "--force", description = "Replace a saved profile of the same name.") boolean force) {
        return LibraryCommands.changed(store().library().saveMachine(file, force), "Saved", out());
    }

    @Command(name = "remove", mixinStandardHelpOptions = true,
            description = "Removes a saved machine profile (its templates stay).")
    int remove(@Parameters(paramLabel = "NAME", description = "Machine name.") String name) {
        return LibraryCommands.changed(store().library().removeMachine(name), "Removed", out());
    }
}
