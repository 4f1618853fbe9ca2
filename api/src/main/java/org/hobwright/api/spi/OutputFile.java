package org.hobwright.api.spi;

import org.hobwright.api.ApiStatus;
import org.hobwright.api.internal.Checks;

/**
 * One file a writer produced, not yet on disk. The caller writes all files of a run atomically
 * or none at all.
 *
 * @param fileName plain file name (no folder part)
 * @param text     contents, written as UTF-8
 */
@ApiStatus(since = "1.0")
public record OutputFile(String fileName, String text) {
    /**
     * Checks the components: a value out of range throws {@link IllegalArgumentException} naming the field and the
     * value.
     *
     * @param fileName plain file name (no folder part)
     * @param text contents, written as UTF-8
     */
    public OutputFile {
        Checks.text("fileName", fileName);
        if (fileName.contains("/") || fileName.contains("\\") || fileName.startsWith(".")) {
            throw new IllegalArgumentException("fileName must be a plain file name, was \"" + fileName + "\"");
        }
        Checks.present("text", text);
    }
}
