package org.chirocore.cli;

import org.chirocore.cert.CertificateForms;
import org.chirocore.cert.WitnessForms;

import picocli.CommandLine.ArgGroup;
import picocli.CommandLine.Option;

/**
 * How a certifying command states its proofs (docs/certificate-format.md): the minimality
 * witnesses ({@code minimality}), and the relations and the clausal proof of the refutation
 * ({@code nonOrientability}).
 */
final class ProofFormOptions {
    @ArgGroup(exclusive = true)
    private Choice choice;

    @Option(names = "--trim-relations",
            description = "List only the 3-term relations the refutation needs: of those the search added, an "
                    + "unsatisfiable core found by the solver (not necessarily minimal). A smaller certificate, verified "
                    + "faster, for one more search. Default: every relation the search added.")
    private boolean trim;

    @Option(names = "--lrat-proof",
            description = "Write the refutation's proof as LRAT: every step with the clauses unit propagation uses to "
                    + "check it, and only the steps the empty clause needs. The verifier then follows the hints instead "
                    + "of propagating, which is much faster for large proofs; the file is larger (gzip-compressed beside "
                    + "the certificate as NAME.lrat.gz when over 1 MiB). Default: the solver's DRAT proof.")
    private boolean lrat;

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

    CertificateForms forms() {
        WitnessForms witnesses = choice == null ? WitnessForms.SIGNS
                : choice.orbits ? WitnessForms.ORBITS : choice.matrices ? WitnessForms.MATRICES : WitnessForms.SIGNS;
        return new CertificateForms(witnesses, trim, lrat);
    }
}
