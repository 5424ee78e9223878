package org.chirocore.cli;

import picocli.CommandLine;

/** The version shown by {@code --version} on every command, so the commands cannot disagree. */
final class VersionProvider implements CommandLine.IVersionProvider {
    /** Kept equal to the version in pom.xml. */
    static final String VERSION = "chirocore 0.1.0";

    @Override
    public String[] getVersion() {
        return new String[] {VERSION};
    }
}
