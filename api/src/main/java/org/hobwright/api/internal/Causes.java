package org.hobwright.api.internal;

/**
 * The text of a failure with every cause behind it. <strong>Not part of the api.</strong>
 */
public final class Causes {
    private Causes() {
    }

    /**
     * The failure and its causes, e.g. the class a missing dependency should have held.
     *
     * @param e the failure
     * @return {@code e; caused by ...; caused by ...}
     */
    public static String chain(Throwable e) {
        StringBuilder sb = new StringBuilder(String.valueOf(e));
        for (Throwable c = e.getCause(); c != null && c != c.getCause(); c = c.getCause()) {
            sb.append("; caused by ").append(c);
        }
        return sb.toString();
    }
}
