package org.chirocore.cert;

/** Which forms the minimality witnesses of a certificate take. */
public enum WitnessForms {
    /** One sign per basis of each single-element minor (the default, as the stored certificates have). */
    SIGNS,
    /**
     * Signs only for one element per orbit of the core's automorphism group; every other element's
     * witnesses are its orbit representative's, transported by a stated automorphism ({@link ElementOrbits}).
     */
    ORBITS,
    /**
     * An integer matrix realising the minor wherever the core's construction gives one
     * (the real cube's configurations, docs/realisations.md), one sign per basis elsewhere.
     */
    MATRICES
}
