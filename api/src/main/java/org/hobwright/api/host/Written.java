package org.hobwright.api.host;

import java.nio.file.Path;
import java.util.List;
import org.hobwright.api.ApiStatus;
import org.hobwright.api.check.Finding;
import org.hobwright.api.internal.Checks;

/**
 * What writing a run's files into a folder did: every file, or none and the findings that say why.
 *
 * @param folder   the output folder
 * @param files    the files written, in the order the writers gave them (empty when nothing was written)
 * @param findings the writers' findings; an error means nothing was written
 */
@ApiStatus(since = "1.1")
public record Written(Path folder, List<Path> files, List<Finding> findings) {

    /**
     * Checks the components: a value out of range throws {@link IllegalArgumentException} naming the field and the
     * value.
     *
     * @param folder the output folder
     * @param files the files written, in the order the writers gave them (empty when nothing was written)
     * @param findings the writers' findings; an error means nothing was written
     */
    public Written {
        Checks.present("folder", folder);
        files = List.copyOf(Checks.present("files", files));
        findings = Finding.errorsFirst(Checks.present("findings", findings));
        if (Finding.anyError(findings) && !files.isEmpty()) {
            throw new IllegalArgumentException("a write with error findings must have written nothing");
        }
    }

    /** {@return true when the files were written} */
    public boolean ok() {
        return !Finding.anyError(findings);
    }

    /** One line per file written (or "nothing written"), then one line per finding. */
    @Override
    public String toString() {
        StringBuilder sb = new StringBuilder();
        if (files.isEmpty()) {
            sb.append("nothing written to ").append(folder);
        } else {
            sb.append(files.size()).append(" file(s) written to ").append(folder);
            files.forEach(f -> sb.append(System.lineSeparator()).append("  ").append(f.getFileName()));
        }
        if (!findings.isEmpty()) {
            sb.append(System.lineSeparator()).append(Finding.lines(findings));
        }
        return sb.toString();
    }
}
