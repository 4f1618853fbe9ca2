package org.hobwright.wizard.cli;

import org.hobwright.api.check.Finding;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import org.hobwright.wizard.store.LibraryEntry;
import org.hobwright.wizard.store.Loaded;

/** What {@code machines} and {@code templates} share: listing entries and reporting a library change. */
final class LibraryCommands {
    private LibraryCommands() {
    }

    /** Prints one line per entry: name, where it lives, description. */
    static int list(List<LibraryEntry> entries, PrintWriter out, String none) {
        if (entries.isEmpty()) {
            out.println(none);
        }
        for (LibraryEntry e : entries) {
            String where = e.builtIn() ? "built-in" : e.hidesBuiltIn() ? "saved, hides the built-in one" : "saved";
            String name = e.machine().isEmpty() ? e.name() : e.machine() + "/" + e.name();
            out.println(Finding.printable(name + "  (" + where + ")" + (e.description().isEmpty() ? ""
                    : "  " + e.description())));
        }
        return ExitCodes.OK;
    }

    /** Prints a file's text. */
    static int show(Loaded<String> text, PrintWriter out) {
        Store.readable(ok(text)).get().strip().lines().forEach(l -> out.println(Finding.printable(l)));
        return ExitCodes.OK;
    }

    /** Reports a save or removal: the path on success, else a one-line failure (exit 2). */
    static int changed(Loaded<Path> result, String done, PrintWriter out) {
        out.println(Finding.printable(done + " " + ok(result).get()));
        return ExitCodes.OK;
    }

    private static <T> Loaded<T> ok(Loaded<T> loaded) {
        if (!loaded.ok()) {
            throw CliFailure.usage(loaded.errorLine());
        }
        return loaded;
    }
}
