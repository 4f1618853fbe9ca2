package org.hobwright.api.spi;

import org.hobwright.api.Validate;

/**
 * One file a writer produced, not yet on disk. The caller writes all files of a run atomically
 * or none at all.
 *
 * @param fileName plain file name (no folder part)
 * @param text     contents, written as UTF-8
 */
public record OutputFile(String fileName, String text) {
    public OutputFile {
        Validate.text("fileName", fileName);
        if (fileName.contains("/") || fileName.contains("\\") || fileName.startsWith(".")) {
            throw new IllegalArgumentException("fileName must be a plain file name, was \"" + fileName + "\"");
        }
        Validate.present("text", text);
    }
}
