package org.hobwright.wizard.cli;

import picocli.CommandLine;

/** Version text for {@code --version}. */
public final class ToolVersion implements CommandLine.IVersionProvider {
    /** The version of this build. */
    public static final String VERSION = org.hobwright.wizard.run.Build.VERSION;

    @Override
    public String[] getVersion() {
        return new String[] {"hobwright " + VERSION};
    }
}
