package org.hobwright.wizard.store;

import java.util.Optional;
import org.hobwright.api.check.Finding;

/**
 * Library names: 1 to {@value #MAX_LENGTH} letters, digits, '.', '_' or '-', not starting with a
 * dot. A checked name is a plain file-name stem, so it can never reach outside its folder.
 */
public final class Names {
    /** Longest allowed name. */
    public static final int MAX_LENGTH = 64;

    private Names() {
    }

    /** True when {@code name} is an allowed library name. */
    public static boolean valid(String name) {
        if (name == null || name.isEmpty() || name.length() > MAX_LENGTH || name.charAt(0) == '.') {
            return false;
        }
        for (int i = 0; i < name.length(); i++) {
            char c = name.charAt(i);
            boolean letterOrDigit = c >= 'A' && c <= 'Z' || c >= 'a' && c <= 'z' || c >= '0' && c <= '9';
            if (!letterOrDigit && c != '.' && c != '_' && c != '-') {
                return false;
            }
        }
        return true;
    }

    /**
     * Checks a name.
     *
     * @param what  what the name is for, e.g. {@code machine}, used as the field of the finding
     * @param name  the name to check
     * @return empty when the name is allowed, else a {@link InputCode#LIBRARY_BAD_NAME} finding
     */
    public static Optional<Finding> check(String what, String name) {
        if (valid(name)) {
            return Optional.empty();
        }
        String shown = name == null ? "(none)"
                : "\"" + (name.length() > 40 ? name.substring(0, 40) + "..." : name) + "\"";
        String why = name == null || name.isEmpty() ? "it is empty"
                : name.length() > MAX_LENGTH
                ? "it has " + name.length() + " characters, at most " + MAX_LENGTH + " are allowed"
                : name.startsWith(".") ? "it starts with a dot"
                : "only letters, digits, '.', '_' and '-' are allowed";
        return Optional.of(InputCode.LIBRARY_BAD_NAME.at(what,
                (what.equals("name") || what.endsWith(".name") ? what : what + " name") + " " + shown
                        + " is not allowed: " + why,
                "use a name like varrow-1605 or brass_fine.2"));
    }
}
