package org.chirocore.cert;

/** How a certificate states the orientation witnesses of a core's single-element minors. */
public enum WitnessForm {
    /** The signs of every witness (the default, and the form of every stored certificate). */
    EXPLICIT,
    /**
     * The signs only for one element per orbit of the core's automorphism group; every other
     * element's witnesses are those of its orbit's representative transported by a stated
     * automorphism ({@link ElementOrbits}).
     */
    ORBITS
}
