package org.hobwright.wizard.store;

import java.util.Objects;

/**
 * One machine profile, template or dialect as the library lists it.
 *
 * @param name          its name
 * @param machine       for a template, the machine it belongs to; empty text otherwise
 * @param builtIn       true for a read-only entry of the bundled sample scenario
 * @param hidesBuiltIn  true for a saved entry that hides a built-in one of the same name
 * @param description   its description, empty when it has none or cannot be read
 * @param location      the saved file's path, or {@code built-in} for a bundled entry
 */
public record LibraryEntry(String name, String machine, boolean builtIn, boolean hidesBuiltIn, String description,
                           String location) {
    public LibraryEntry {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(machine, "machine");
        Objects.requireNonNull(description, "description");
        Objects.requireNonNull(location, "location");
    }
}
