package org.hobwright.wizard.cli;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collection;
import java.util.List;

/**
 * The output folder of {@code plan}, {@code demo} and the wizard: checked before anything is
 * planned, and asked which of the files about to be written are already there. Outputs of the same
 * names are replaced (they are Hobwright's own files, and planning again is the usual way to
 * change them); the run names every file it replaced.
 */
final class OutputFolder {
    private OutputFolder() {
    }

    /**
     * Refuses a folder that cannot be one: a path that names a file, or that lies below a file.
     *
     * @throws CliFailure (exit 2) naming the path
     */
    static void check(Path folder) {
        for (Path p = folder.toAbsolutePath().normalize(); p != null; p = p.getParent()) {
            if (Files.exists(p) && !Files.isDirectory(p)) {
                throw CliFailure.usage("--out " + folder + ": " + (p.equals(folder.toAbsolutePath().normalize())
                        ? "is a file, not a folder" : p + " is a file, not a folder")
                        + "; name a folder (it is created when missing)");
            }
        }
    }

    /** The names among {@code names} that are already files in {@code folder}, in the order given. */
    static List<String> existing(Path folder, Collection<String> names) {
        List<String> out = new ArrayList<>();
        for (String n : names) {
            if (Files.isRegularFile(folder.resolve(n))) {
                out.add(n);
            }
        }
        return out;
    }
}
