package org.chirocore.check;

/**
 * Every limit of the verifier, declared once. Each bounds the memory or the work of one check, so
 * that a small hostile file cannot make the verifier run for hours or exhaust its heap; a file
 * beyond a limit is rejected with a FAIL line naming the limit, never accepted unchecked.
 * Stored certificates are far inside every limit (the largest has 64 KB and 1 400 bases).
 */
final class VerifierLimits {
    /** Largest certificate file read, in bytes; the size is checked before reading. */
    static final long MAX_CERTIFICATE_BYTES = 64L << 20;
    /** Largest proof read from a separate file, in bytes after decompression; the proof is streamed. */
    static final long MAX_PROOF_BYTES = 256L << 20;
    /**
     * Most elements of a core and of a given matroid (sets are sorted element arrays; the exchange
     * check packs two elements p·n + q into 24 bits, which allows up to 4096).
     */
    static final int MAX_ELEMENTS = 1024;
    /** Most elements of the matroid of an enumeration whose completeness is checked (its sets are 64-bit masks). */
    static final int MAX_ENUMERATED_ELEMENTS = 64;
    /** Most bases of a core. */
    static final int MAX_BASES = 4_000_000;
    /** Most listed relations (each gives up to 16 clauses of the CNF, which the proof checker holds). */
    static final int MAX_RELATIONS = 250_000;
    /** Longest element label, in characters. */
    static final int MAX_LABEL = 256;
    /** Most literals in the lemmas of a proof (the checker holds them all), bounding its memory. */
    static final long MAX_PROOF_LITERALS = 50_000_000;
    /**
     * Most watch-list visits of unit propagation in one proof check, bounding its work: the
     * rank-10 spike's proof (docs/families.md) needs 7.8·10^8, about 45 s of CPU at some
     * 1.7·10^7 visits a second; at the limit a check takes a few minutes.
     */
    static final long MAX_PROPAGATION_STEPS = 2_000_000_000L;
    /** Most entries (a basis with one or two of its elements) sorted by the basis-exchange check; three longs each. */
    static final long MAX_EXCHANGE_PAIRS = 12_000_000;
    /** Most 3-term relations evaluated over all minimality witnesses together. */
    static final long MAX_WITNESS_RELATIONS = 100_000_000L;
    /**
     * Most decimal digits of an entry of a matrix witness (sign not counted): bounds the size of
     * the numbers in the exact elimination, together with {@link #MAX_DETERMINANT_STEPS}.
     */
    static final int MAX_MATRIX_DIGITS = 40;
    /**
     * Most elimination steps for the matrix witnesses together, counted as C(m, r) · r³ for a
     * witness of rank r on m elements (one determinant per r-subset of its columns). About 10 s of
     * CPU at the limit: the 40 matrices of the rank-10 spike (3.19·10^9 steps) took 9.2 s.
     */
    static final long MAX_DETERMINANT_STEPS = 4_000_000_000L;
    /**
     * Most basis lookups for the witnesses transported by symmetry, counted as twice the core's
     * basis count per transported witness (one lookup per basis of its minor, and at most one per
     * basis of the core to check its automorphism).
     */
    static final long MAX_TRANSPORT_LOOKUPS = 100_000_000L;
    /** Largest cube dimension rebuilt: 2^16 vertices, as many as the producer builds. */
    static final int MAX_CUBE = 16;
    /**
     * Most r-subsets of the core's ground set whose rank is computed when rebuilding the core:
     * 2^21, the most r-subsets of any matroid the producer holds as a list of bases, so every core
     * it certifies can be rebuilt.
     */
    static final long MAX_CANDIDATES = 1L << 21;
    /** Most span-membership tests (one dot product each) when testing general position. */
    static final long MAX_VECTOR_TESTS = 200_000_000L;

    /**
     * Most sets held while computing the minimal transversals of one contraction set's complements
     * (completeness evidence); the minimality pass is quadratic in this number.
     */
    static final int MAX_TRANSVERSALS = 20_000;

    private VerifierLimits() {
    }
}
