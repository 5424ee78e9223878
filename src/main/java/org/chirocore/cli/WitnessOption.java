package org.chirocore.cli;

import org.chirocore.cert.WitnessForms;

import picocli.CommandLine.ArgGroup;
import picocli.CommandLine.Option;

/** How a certifying command states the minimality witnesses (docs/certificate-format.md, {@code minimality}). */
final class WitnessOption {
    @ArgGroup(exclusive = true)
    private Choice choice;

    /** At most one of the options: the forms do not combine (a transported witness names signs). */
    static final class Choice {
        @Option(names = "--orbit-witnesses",
                description = "State the witnesses of the single-element minors by their signs for one element per orbit of "
                        + "the core's automorphism group only; every other element's are transported from its orbit's "
                        + "representative by a stated automorphism (a smaller certificate, verified faster). Default: every "
                        + "witness by its signs.")
        private boolean orbits;

        @Option(names = "--matrix-witnesses",
                description = "For a core of a cube construction over Q, write an integer matrix realising a single-element "
                        + "minor as its witness wherever the real cube (the pulled vertex moved onto the hyperplane, or not "
                        + "moved) gives one, one sign per basis elsewhere (docs/realisations.md). Default: every witness by "
                        + "its signs.")
        private boolean matrices;
    }

    WitnessForms form() {
        if (choice == null) {
            return WitnessForms.SIGNS;
        }
        return choice.orbits ? WitnessForms.ORBITS : choice.matrices ? WitnessForms.MATRICES : WitnessForms.SIGNS;
    }
}
