package org.chirocore.cli;

import org.chirocore.cert.WitnessForms;

import picocli.CommandLine.Option;

/** How a certifying command states the minimality witnesses (docs/certificate-format.md, {@code minimality}). */
final class WitnessOption {
    @Option(names = "--orbit-witnesses",
            description = "State the witnesses of the single-element minors by their signs for one element per orbit of "
                    + "the core's automorphism group only; every other element's are transported from its orbit's "
                    + "representative by a stated automorphism (a smaller certificate, verified faster). Default: every "
                    + "witness by its signs.")
    private boolean orbits;

    WitnessForms form() {
        return orbits ? WitnessForms.ORBITS : WitnessForms.SIGNS;
    }
}
