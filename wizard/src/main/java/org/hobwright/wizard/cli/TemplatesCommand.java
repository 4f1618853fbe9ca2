package org.hobwright.wizard.cli;

import java.nio.file.Path;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code hobwright templates list|show|save|remove}: the cycle templates of each machine. */
@Command(name = "templates", mixinStandardHelpOptions = true,
        description = "Lists, shows, saves and removes cycle templates; each belongs to one machine."
                + " 'plan JOB --template NAME' applies one.",
        subcommands = {CommandLine.HelpCommand.class})
final class TemplatesCommand extends Verb {
    @Command(name = "list", mixinStandardHelpOptions = true,
            description = "Lists the templates of every machine, or of one.")
    int list(@Option(names = "--machine", paramLabel = "NAME", description = "Only this machine's.") String machine) {
        var library = store().library();
        return LibraryCommands.list(machine == null ? library.templates() : library.templates(machine),
                out(), "No templates.");
    }

    @Command(name = "show", mixinStandardHelpOptions = true, description = "Prints a template file.")
    int show(@Parameters(paramLabel = "NAME", description = "Template name.") String name,
             @Option(names = "--machine", required = true, paramLabel = "NAME", description = "Its machine.")
             String machine) {
        return LibraryCommands.show(store().library().templateText(machine, name), out());
    }

    @Command(name = "save", mixinStandardHelpOptions = true,
            description = "Checks a template file and saves it under the machine and name it states.")
    int save(@Parameters(paramLabel = "FILE", description = "Template file (.json).") Path file,
             @Option(names = "--force", description = "Replace a saved template of the same name.") boolean force) {
        return LibraryCommands.changed(store().library().saveTemplate(file, force), "Saved",
                out());
    }

    @Command(name = "remove", mixinStandardHelpOptions = true, description = "Removes a saved template.")
    int remove(@Parameters(paramLabel = "NAME", description = "Template name.") String name,
               @Option(names = "--machine", required = true, paramLabel = "NAME", description = "Its machine.")
               String machine) {
        return LibraryCommands.changed(store().library().removeTemplate(machine, name), "Removed",
                out());
    }
}
