package org.hobwright.wizard.cli;

import java.io.PrintWriter;
import picocli.CommandLine;
import picocli.CommandLine.ParentCommand;

/** What the {@code machines} and {@code templates} verbs share: the library and the output writer. */
abstract class LibraryVerb {
    @ParentCommand
    HobwrightCommand parent;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    /** The library of {@code --home}, {@code $HOBWRIGHT_HOME} or {@code ~/.hobwright}. */
    Store store() {
        return Store.open(parent.home(), parent.env());
    }

    PrintWriter out() {
        return spec.commandLine().getOut();
    }
}
