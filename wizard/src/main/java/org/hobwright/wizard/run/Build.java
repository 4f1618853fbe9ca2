package org.hobwright.wizard.run;

/** The version of this build of Hobwright, printed in every output's header. */
public final class Build {
    /** The build version (the Maven project version; a test keeps them equal). */
    public static final String VERSION = "0.2.0";

    private Build() {
    }
}
