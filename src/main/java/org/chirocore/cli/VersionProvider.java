package org.chirocore.cli;

import org.chirocore.cert.CertificateWriter;

import picocli.CommandLine;

/** The version shown by {@code --version} on every command, so the commands cannot disagree. */
final class VersionProvider implements CommandLine.IVersionProvider {
    /** The same string certificates name as their tool, so the two cannot disagree. */
    static final String VERSION = CertificateWriter.TOOL;

    @Override
    public String[] getVersion() {
        return new String[] {VERSION};
    }
}
