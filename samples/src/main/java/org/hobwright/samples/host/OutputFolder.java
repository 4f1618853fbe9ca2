package org.hobwright.samples.host;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.ArrayList;
import java.util.List;
import org.hobwright.api.spi.OutputFile;

/** Writes a run's files into a folder: each to a temporary file first, then moved into place. */
public final class OutputFolder {
    private OutputFolder() {
    }

    /**
     * Writes the files.
     *
     * @param folder the output folder (created when missing)
     * @param files  the files
     * @return the paths written, in order
     * @throws IOException when the folder cannot be written
     */
    public static List<Path> write(Path folder, List<OutputFile> files) throws IOException {
        Files.createDirectories(folder);
        List<Path> temps = new ArrayList<>();
        try {
            for (OutputFile f : files) {
                Path tmp = Files.createTempFile(folder, ".host-", ".tmp");
                temps.add(tmp);
                Files.writeString(tmp, f.text(), StandardCharsets.UTF_8);
            }
            List<Path> written = new ArrayList<>();
            for (int i = 0; i < files.size(); i++) {
                Path target = folder.resolve(files.get(i).fileName());
                move(temps.get(i), target);
                written.add(target);
            }
            return written;
        } finally {
            for (Path t : temps) {
                Files.deleteIfExists(t);
            }
        }
    }

    private static void move(Path from, Path to) throws IOException {
        try {
            Files.move(from, to, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
        } catch (AtomicMoveNotSupportedException e) {
            Files.move(from, to, StandardCopyOption.REPLACE_EXISTING);
        }
    }
}
