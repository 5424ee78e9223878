package org.chirocore.check;

import java.util.Arrays;
import java.util.List;

import org.chirocore.check.CertificateVerifier.Failure;

/**
 * Minimality witnesses by symmetry (docs/certificate-format.md, {@code minimality}): the witness
 * of core\e or core/e given as the witness of the same kind at another element f, relabelled by a
 * stated automorphism σ of the core with σ(f) = e.
 *
 * <p>Why no relation is scanned (docs/mathematics.md §8, docs/verifier.md): σ maps the bases of
 * the core onto themselves and f to e, so it maps the minor at f isomorphically onto the minor at
 * e, and relabelling a chirotope by an isomorphism gives a chirotope of the image. What is
 * checked here is that σ is an automorphism ({@link #checkAutomorphism}) and, as a guard that the
 * automorphism check already implies, that the relabelled signs have exactly the target minor's
 * bases as support ({@link #transport}). Sets are handled as increasing element lists.
 *
 * <p>Cost: O(b · (r + log b)) for b bases of rank r, per automorphism and per transported witness.
 */
final class TransportedWitness {
    private TransportedWitness() {
    }

    /**
     * A transported witness as stated: {@code {"image": label f, "under": [σ(0), …, σ(N−1)]}}.
     *
     * @param image the label f
     * @param under σ as its list of images
     */
    record Stated(String image, int[] under) {
        /**
         * Reads the object {@code o}, whose members must be exactly {@code image} and {@code under}.
         *
         * @throws JsonTree.Mistyped naming the member of the wrong type or the unknown member
         */
        static Stated read(JsonTree.Obj o, String what) {
            o.requireOnly(List.of("image", "under"));
            return new Stated(o.require("image").asString(what + ".image"), ParsedCertificate.ints(o.requireArray("under"), what + ".under"));
        }
    }

    /** Whether a witness member is an object of this form (it names its kind by the member {@code image}). */
    static boolean isTransported(JsonTree.Value witness) {
        return witness instanceof JsonTree.Obj o && o.has("image");
    }

    /**
     * Checks that {@code sigma} ({@code sigma[i]} = σ(i)) is a bijection of the core's elements
     * 0..n−1 that maps every basis to a basis; it is then an automorphism (an injective map of the
     * finite family of bases into itself is onto).
     *
     * @param what the entry stating σ, for messages
     * @throws Failure naming the first repeated or missing element, or a basis whose image is not a basis
     */
    static void checkAutomorphism(BasisTable core, int[] sigma, String what) throws Failure {
        if (sigma.length != core.size) {
            throw new Failure(what + ": the permutation " + Arrays.toString(sigma) + " has " + sigma.length
                    + " entries; the core has " + core.size + " elements");
        }
        boolean[] hit = new boolean[core.size];
        for (int i = 0; i < sigma.length; i++) {
            if (sigma[i] < 0 || sigma[i] >= core.size || hit[sigma[i]]) {
                throw new Failure(what + ": " + Arrays.toString(sigma) + " is not a bijection of the elements 0.."
                        + (core.size - 1) + " (entry " + i + " is " + sigma[i] + ")");
            }
            hit[sigma[i]] = true;
        }
        for (int k = 0; k < core.count(); k++) {
            int[] basis = core.basis(k);
            int[] image = new int[basis.length];
            for (int i = 0; i < basis.length; i++) {
                image[i] = sigma[basis[i]];
            }
            Arrays.sort(image);
            if (core.positionOf(image) < 0) {
                throw new Failure(what + ": the permutation " + Arrays.toString(sigma) + " is not an automorphism of the core: "
                        + "it maps the basis " + Arrays.toString(basis) + " to " + Arrays.toString(image) + ", which is not a basis");
            }
        }
    }

    /**
     * The transported witness on the minor at e: for each basis B' of {@code target} (in its
     * canonical order), χ_e(B') = sign(π)·χ_f(sort(σ⁻¹(B'))), where π sorts the sequence
     * σ⁻¹(b'_1), …, σ⁻¹(b'_k) of B' = {b'_1 < … < b'_k}. The minors number their elements as the
     * core does with e (resp. f) taken out and the later ones moved down by one.
     *
     * @param source the minor at f, with its explicit signs {@code sourceSigns} (+1 / −1 per basis)
     * @param target the minor at e = σ(f), of the same kind
     * @param sigma an automorphism of the core with σ(f) = e, already checked
     * @throws Failure when the preimage of a basis of {@code target} is not a basis of {@code source},
     *     i.e. the signs would not have the target's bases as support
     */
    static int[] transport(BasisTable source, int f, int[] sourceSigns, BasisTable target, int e, int[] sigma, String what)
            throws Failure {
        int[] inverse = new int[sigma.length];
        for (int i = 0; i < sigma.length; i++) {
            inverse[sigma[i]] = i;
        }
        int[] out = new int[target.count()];
        for (int k = 0; k < out.length; k++) {
            int[] basis = target.basis(k);
            int[] preimage = new int[basis.length];
            for (int i = 0; i < basis.length; i++) {
                int y = inverse[basis[i] >= e ? basis[i] + 1 : basis[i]];
                preimage[i] = y > f ? y - 1 : y;
            }
            int sign = sortWithSign(preimage);
            int position = source.positionOf(preimage);
            if (position < 0) {
                throw new Failure(what + ": the preimage " + Arrays.toString(preimage) + " of the minor's basis " + Arrays.toString(basis)
                        + " is not a basis of the minor it is transported from");
            }
            out[k] = sign * sourceSigns[position];
        }
        return out;
    }

    /** Sorts {@code a} (distinct entries) in place by insertion; returns the sign of the sorting permutation. */
    private static int sortWithSign(int[] a) {
        int sign = 1;
        for (int i = 1; i < a.length; i++) {
            for (int j = i; j > 0 && a[j - 1] > a[j]; j--) {
                int t = a[j];
                a[j] = a[j - 1];
                a[j - 1] = t;
                sign = -sign;
            }
        }
        return sign;
    }
}
