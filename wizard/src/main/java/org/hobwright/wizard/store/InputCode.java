package org.hobwright.wizard.store;

import org.hobwright.api.check.FindingCode;
import org.hobwright.api.check.Severity;

/**
 * Finding codes of the file readers and the library, with their severity and whether they make
 * the input unreadable (exit code 2) rather than wrong (exit code 1); listed in
 * {@code wizard/FINDINGS.md}. Codes are never reused for another meaning.
 */
public enum InputCode implements FindingCode {
    /** The file does not exist. */
    INPUT_NO_FILE(Severity.ERROR, true, "the file does not exist"),
    /** The path names a folder or something else that is not a regular file. */
    INPUT_NOT_A_FILE(Severity.ERROR, true, "the path is a folder or not a regular file"),
    /** The file is larger than {@link JsonDocument#MAX_BYTES}. */
    INPUT_TOO_LARGE(Severity.ERROR, true, "the file is larger than the 1 MB limit"),
    /** The file could not be read (permissions, I/O error, not UTF-8). */
    INPUT_IO(Severity.ERROR, true, "the file could not be read"),
    /** Not well-formed JSON, a repeated key, or not a JSON object at the top. */
    INPUT_MALFORMED(Severity.ERROR, true, "not well-formed JSON, a repeated key, or no object at the top"),
    /** A key the format does not define. */
    INPUT_UNKNOWN_KEY(Severity.ERROR, false, "a key the format does not define"),
    /** A value of the wrong JSON type (text where a number belongs, ...). */
    INPUT_WRONG_TYPE(Severity.ERROR, false, "a value of the wrong JSON type"),
    /** {@code format} missing or not the expected one. */
    INPUT_FORMAT(Severity.ERROR, true, "\"format\" missing or not the expected one"),
    /** {@code version} missing, not a whole number, or newer than this program reads. */
    INPUT_VERSION(Severity.ERROR, true, "\"version\" missing or not one this program reads"),
    /** {@code units} missing or neither {@code mm} nor {@code in}. */
    INPUT_UNITS(Severity.ERROR, true, "\"units\" missing or neither mm nor in"),
    /** A required key is missing. */
    INPUT_MISSING(Severity.ERROR, false, "a required key is missing"),
    /** A number outside its allowed range (zero module, negative face width, NaN, ...). */
    INPUT_VALUE(Severity.ERROR, false, "a number outside its allowed range"),
    /** A text that is not an angle (decimal degrees or degrees-minutes-seconds). */
    INPUT_ANGLE(Severity.ERROR, false, "a text that is not an angle"),
    /** A word that is not one of the allowed choices (hand, method, scale, tooth system, ...). */
    INPUT_CHOICE(Severity.ERROR, false, "a word that is not one of the allowed choices"),
    /** Both or neither of {@code module} and {@code diametralPitch}. */
    INPUT_PITCH(Severity.ERROR, false, "both or neither of module and diametralPitch"),
    /** Values that contradict each other (minimum above maximum, custom proportions without the custom system). */
    INPUT_CONFLICT(Severity.ERROR, false, "values that contradict each other"),
    /** A file of an older version was read and migrated in memory. */
    INPUT_MIGRATED(Severity.INFO, false, "an older file version was migrated on reading"),
    /** A library name with characters other than letters, digits, '.', '_', '-', empty or too long. */
    LIBRARY_BAD_NAME(Severity.ERROR, true, "a library name with forbidden characters, empty or too long"),
    /** No saved or built-in machine, template or dialect of that name. */
    LIBRARY_NOT_FOUND(Severity.ERROR, true, "no saved or built-in entry of that name"),
    /** A saved file of that name exists and replacing it was not asked for. */
    LIBRARY_EXISTS(Severity.ERROR, true, "the entry exists and replacing was not asked for"),
    /** A built-in entry cannot be removed or changed. */
    LIBRARY_READ_ONLY(Severity.ERROR, true, "a built-in entry cannot be removed"),
    /** Writing or removing a library file failed; the old file is unchanged. */
    LIBRARY_WRITE_FAILED(Severity.ERROR, true, "writing or removing a library file failed"),
    /** A template made for another machine than the job's. */
    LIBRARY_WRONG_MACHINE(Severity.ERROR, true, "a template made for another machine");

    /** The source named in every finding of this catalogue. */
    public static final String SOURCE = "Hobwright file formats, version 1 (wizard/README.md)";

    private final Severity severity;
    private final boolean unreadable;
    private final String meaning;

    InputCode(Severity severity, boolean unreadable, String meaning) {
        this.severity = severity;
        this.unreadable = unreadable;
        this.meaning = meaning;
    }

    @Override
    public String code() {
        return name();
    }

    @Override
    public Severity severity() {
        return severity;
    }

    /**
     * True when this problem stops the tool with exit code 2: input that cannot be read as a
     * file of its format, or a library request that cannot be carried out (bad name, unknown
     * entry, existing entry without replacing, built-in entry, failing disk). False for wrong
     * values in a readable file (exit code 1) and for notes.
     */
    public boolean unreadable() {
        return unreadable;
    }

    @Override
    public String meaning() {
        return meaning;
    }

    @Override
    public String source() {
        return SOURCE;
    }
}
