package org.chirocore.cli;

import java.util.List;
import java.util.Optional;

import org.chirocore.matroid.Catalogue;
import org.chirocore.matroid.ExplicitMatroid;
import org.chirocore.matroid.NamedMatroid;

import org.chirocore.pipeline.CertifiedReduction;

/** Wording shared by the commands' summaries. */
final class Format {
    private Format() {
    }

    /** "rank 3 on 7 elements". */
    /** "verified by the independent checker in T ms", naming any check that did not run. */
    static String verified(CertifiedReduction.Checked checked) {
        return "verified by the independent checker in " + checked.verifyMillis() + " ms"
                + (checked.notChecked().isEmpty() ? ""
                        : "; not checked: " + String.join(", ", checked.notChecked()) + " (run verify with --input)");
    }

    static String shape(int rank, int elements) {
        return "rank " + rank + " on " + elements + " element" + (elements == 1 ? "" : "s");
    }

    /** "rank 3 on 7 elements, 28 bases". */
    static String shape(int rank, int elements, long bases) {
        return shape(rank, elements) + ", " + bases + " bas" + (bases == 1 ? "is" : "es");
    }

    /** A core's shape, "rank 3 on 7 elements, 28 bases", with " (F7)" after it when the catalogue names it. */
    static String core(ExplicitMatroid core) {
        return shape(core.rank(), core.size(), core.basisCount())
                + Catalogue.identify(core).map(n -> " (" + n.symbol() + ")").orElse("");
    }

    /** "the Fano plane F7 (source)", or says that the catalogue has no such matroid. */
    static String named(Optional<NamedMatroid> name) {
        return name.map(n -> n.title() + " (" + n.source() + ")").orElse("not in the catalogue of named matroids");
    }

    /** The labels in sorted order separated by spaces, or "none". */
    static String labels(List<String> labels) {
        return labels.isEmpty() ? "none" : String.join(" ", labels.stream().sorted().toList());
    }

    /**
     * The deleted set D of a path M/C\D to a core: "all other elements (|D|)" when D is everything
     * of M outside the core and C (as it is after a search), otherwise its sorted labels.
     */
    static String deleted(List<String> deleted, int coreSize, int contractedSize, int inputSize) {
        return !deleted.isEmpty() && coreSize + contractedSize + deleted.size() == inputSize
                ? "all other elements (" + deleted.size() + ")" : labels(deleted);
    }
}
