package org.chirocore.cli;

import org.chirocore.cert.WitnessForms;

import picocli.CommandLine.Option;

/** The forms of the minimality witnesses a certifying command writes (docs/realisations.md). */
final class WitnessFormOption {
    @Option(names = "--matrix-witnesses",
            description = "For a core of a cube construction over Q, write an integer matrix realising a single-element "
                    + "minor as its witness wherever the real cube (the pulled vertex moved onto the hyperplane, or not "
                    + "moved) gives one, one sign per basis elsewhere (default: signs only).")
    private boolean matrices;

    WitnessForms forms() {
        return matrices ? WitnessForms.MATRICES : WitnessForms.SIGNS;
    }
}
