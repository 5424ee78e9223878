package org.chirocore.pipeline;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

import org.chirocore.cert.CoreFinding;
import org.chirocore.cert.Source;
import org.chirocore.check.ChirotopeCheck;
import org.chirocore.matroid.ElementSet;
import org.chirocore.matroid.Matroid;
import org.chirocore.orient.BasisIndex;
import org.chirocore.orient.Budget;
import org.chirocore.orient.Chirotope;
import org.chirocore.search.MinimalCore;

/**
 * Passes what a producer computed through the independent checker ({@code org.chirocore.check}),
 * for the contract tests of the problem interfaces: a claimed orientation is checked by
 * {@link ChirotopeCheck} against the bases the matroid's rank oracle gives, and a claimed minimal
 * core is certified through {@link CertifiedReduction#certify}, which writes the certificate and
 * runs the verifier on the file.
 */
public final class IndependentCheck {
    private static final String NO_FILE_DIGEST = "0".repeat(64);

    private IndependentCheck() {
    }

    /** Asserts that the checker accepts {@code witness} as a chirotope of {@code m}. */
    public static void assertOrients(Matroid m, Chirotope witness) {
        BasisIndex index = BasisIndex.of(m);
        Map<ElementSet, Integer> signs = new HashMap<>();
        for (int i = 0; i < witness.size(); i++) {
            signs.put(witness.basis(i), witness.sign(i));
        }
        List<int[]> bases = new ArrayList<>();
        StringBuilder text = new StringBuilder();
        for (int v = 1; v <= index.basisCount(); v++) {
            bases.add(index.basis(v).elements());
            Integer sign = signs.get(index.basis(v));
            assertTrue(sign != null && sign != 0, "the witness gives no sign to basis " + v + " of the matroid");
            text.append(sign > 0 ? '+' : '-');
        }
        assertEquals(bases.size(), witness.size(), "the witness signs a set that is not a basis");
        assertEquals(Optional.empty(), ChirotopeCheck.violation(m.size(), m.rank(), bases, text.toString()));
    }

    /**
     * Certifies {@code found}, a core reduced from a matroid that was not read from a file, into
     * {@code dir}; the verifier must accept the file (the pipeline throws otherwise).
     */
    public static CertifiedReduction.Verified assertCertified(MinimalCore found, Path dir) {
        Source source = new Source.Given(NO_FILE_DIGEST, found.core().size() + found.contracted().size()
                + found.deleted().size(), found.core().rank() + found.contracted().size());
        try {
            return assertInstanceOf(CertifiedReduction.Verified.class, CertifiedReduction.certify(
                    CoreFinding.searched(found, source), Budget.UNLIMITED, dir.resolve("core.cert.json")));
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
