package org.hobwright.wizard.cli;

import java.io.PrintWriter;
import picocli.CommandLine;
import picocli.CommandLine.ParentCommand;

/** What every verb shares: the top command (environment, {@code --home}) and its own output writer. */
abstract class Verb {
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

    /** A plan or demo run on this verb's writers. */
    int plan(PlanRequest request) {
        return new PlanRun(parent.env(), out(), spec.commandLine().getErr()).run(request);
    }
}
