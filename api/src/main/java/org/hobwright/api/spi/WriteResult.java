package org.hobwright.api.spi;

import java.util.List;
import org.hobwright.api.ApiStatus;
import org.hobwright.api.internal.Checks;
import org.hobwright.api.check.Finding;

/**
 * What a writer returns: the files, or findings that say why it would not write.
 *
 * @param files    files to write (empty when the findings hold an error)
 * @param findings problems met while writing (e.g. a dialect that does not load)
 */
@ApiStatus(since = "1.0")
public record WriteResult(List<OutputFile> files, List<Finding> findings) {
    /**
     * Checks the components: a value out of range throws {@link IllegalArgumentException} naming the field and the
     * value.
     *
     * @param files files to write (empty when the findings hold an error)
     * @param findings problems met while writing (e.g. a dialect that does not load)
     */
    public WriteResult {
        files = List.copyOf(Checks.present("files", files));
        findings = List.copyOf(Checks.present("findings", findings));
        if (Finding.anyError(findings) && !files.isEmpty()) {
            throw new IllegalArgumentException("a write result with error findings must have no files");
        }
    }

    /**
     * A result with files and no findings.
     *
     * @param files files to write (empty when the findings hold an error)
     * @return A result with files and no findings
     */
    public static WriteResult of(OutputFile... files) {
        return new WriteResult(List.of(files), List.of());
    }

    /**
     * A refusal with the findings that explain it.
     *
     * @param findings problems met while writing (e.g. a dialect that does not load)
     * @return A refusal with the findings that explain it
     */
    public static WriteResult refused(List<Finding> findings) {
        return new WriteResult(List.of(), findings);
    }
}
