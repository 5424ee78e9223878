package org.chirocore.matroid;

/**
 * The producer's table of limits, declared once: every command checks the limit that bounds
 * the work it is about to do <em>before</em> doing it, and refuses with a {@link TooLargeException}
 * (exit code 2) instead of running out of memory or time. The independent verifier keeps its
 * own table (it shares no code with the producer); a test cross-checks that it rebuilds every
 * cube the producer builds. DEVELOPERS.md lists the table with what each entry bounds.
 */
public final class Limits {
    /**
     * Largest cube dimension n built: the n-cube has 2^n vertices and its pulled matroid rank n
     * or n + 1. Bounds the construction's rank oracle (2^n columns of n + 1 small integers) and
     * the scans over its vertices; the reduction cuts such a matroid down before anything is
     * enumerated (n = 16 reduces in about 40 s within 0.5 GB).
     */
    public static final int CUBE_DIMENSION = 16;

    /**
     * Largest ground set of a matroid whose bases are enumerated or stored (an explicit matroid,
     * a SAT encoding's basis index, a matroid file, a certificate's core). An {@link ElementSet}
     * on it takes 16 words (128 bytes) instead of 1; what bounds the work is the number of
     * r-subsets ({@link #EXPLICIT_SUBSETS}, {@link #INDEXED_SUBSETS}), which already stops rank 3
     * at about 930 elements (C(930, 3) just under 2^27), and the relation scan, which the search
     * bounds on its own; so larger ground sets would only be usable in rank 2.
     */
    public static final int ELEMENTS = 1024;

    /**
     * Largest ground set whose restrictions are enumerated ({@code search.marco}, the steered
     * search) or whose enumeration's completeness is checked: those algorithms hold a set of
     * elements as one 64-bit mask, and an enumeration over more elements would not finish anyway.
     */
    public static final int ENUMERATED_ELEMENTS = 64;

    /**
     * Largest C(n, r) of a matroid held as its list of bases: the r-subsets enumerated to read
     * non-bases or to save a construction, and the bases a file may list. Bounds the memory of
     * the list (about 100 bytes per basis, so 200 MB) and the time of the enumeration (about 30 s
     * of exact rank tests for a saved cube construction).
     */
    public static final long EXPLICIT_SUBSETS = 1L << 21;

    /**
     * Largest C(n, r) a SAT encoding indexes: its table holds one int per r-subset (512 MiB), and
     * building it costs one basis test per r-subset.
     */
    public static final long INDEXED_SUBSETS = 1L << 27;

    /**
     * Largest input file read whole into memory: a matroid file, a family definition, a
     * prediction, a family table, a certificate read by a producer command. A parsed JSON tree
     * takes several times the file's size.
     */
    public static final long INPUT_BYTES = 64L << 20;

    /**
     * Largest proof read from a file beside a certificate, in bytes after decompression (a gzip
     * proof can inflate a thousandfold); the verifier's own bound is the same. The pipeline writes
     * no certificate whose proof (DRAT, or LRAT with its hints) is larger.
     */
    public static final long PROOF_BYTES = 256L << 20;

    /**
     * Most determinant work of the matrix witnesses of one certificate, counted as the verifier
     * counts it: C(m, r) · r³ per matrix of rank r on m elements. A minor whose matrix would pass
     * it keeps a sign witness. Large enough for a matrix at every one of the 40 single-element
     * minors of the rank-10 spike (3.19·10^9; docs/realisations.md, "The spike"), whose sign
     * witnesses would need about 7.8·10^8 relation evaluations, eight times the verifier's bound.
     */
    public static final long MATRIX_WITNESS_STEPS = 4_000_000_000L;

    /**
     * Most r-subsets walked while searching for matrix witnesses for one certificate: each
     * candidate tried on a minor of rank r on m elements is charged C(m, r) (one determinant sign
     * and one basis test each) before it is tried. Bounds the time of the search (about a minute);
     * once spent, the remaining minors keep sign witnesses.
     */
    public static final long MATRIX_SEARCH_SUBSETS = 1L << 26;

    /**
     * Most 3-term relations a certificate's proof may list, as the verifier's own bound (it holds
     * the CNF of every listed relation for the proof check). A core whose refutation needs more
     * is not certified: the pipeline answers unknown before writing anything (the spike of rank
     * 9 of docs/families.md needs 312,678).
     */
    public static final int CERTIFIED_RELATIONS = 250_000;

    private Limits() {
    }

    /**
     * Refuses a matroid of rank {@code rank} on {@code size} elements held as its list of bases.
     *
     * @param what the matroid, as named in the message (e.g. "the pulled matroid")
     * @throws TooLargeException when size exceeds {@link #ELEMENTS} or C(size, rank) exceeds
     *     {@link #EXPLICIT_SUBSETS}
     */
    public static void requireExplicit(int size, int rank, String what) {
        if (size > ELEMENTS) {
            throw new TooLargeException(what + " has " + size + " elements; a matroid given by its bases has at most "
                    + ELEMENTS + ".");
        }
        long subsets = ElementSets.binomial(size, rank);
        if (subsets > EXPLICIT_SUBSETS) {
            throw new TooLargeException(what + " (rank " + rank + " on " + size + " elements) has "
                    + count(subsets) + " " + rank + "-element subsets; a matroid given by its bases has at most "
                    + EXPLICIT_SUBSETS + ".");
        }
    }

    /**
     * Refuses a cube dimension beyond {@link #CUBE_DIMENSION} (or below 1).
     *
     * @param what the option or item that gave n, as named in the message (e.g. "--max-n")
     * @throws TooLargeException when n is greater than {@link #CUBE_DIMENSION}
     */
    public static void requireCube(int n, String what) {
        if (n > CUBE_DIMENSION) {
            throw new TooLargeException(what + " is " + n + "; cubes are built up to n = " + CUBE_DIMENSION
                    + " (2^" + CUBE_DIMENSION + " vertices).");
        }
    }

    /** A count that may have saturated at {@link Long#MAX_VALUE}. */
    static String count(long n) {
        return n == Long.MAX_VALUE ? "more than 2^63" : Long.toString(n);
    }
}
