package org.chirocore.io;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

import org.chirocore.matroid.ElementSet;
import org.chirocore.matroid.Limits;
import org.chirocore.matroid.Matroid;
import org.chirocore.matroid.MatrixMatroid;
import org.chirocore.matroid.Realisation;
import org.chirocore.orient.Chirotope;
import org.chirocore.orient.Orientability;
import org.chirocore.orient.Realised;
import org.chirocore.orient.SolveStats;

/**
 * JSON forms of results, as documented in {@code docs/matroid-format.md}: an orientability
 * verdict with its figures and witness, and a chirotope. Signs are written as one string of
 * {@code '+'} and {@code '-'}, one character per basis in canonical order (sorted tuples,
 * lexicographic), which keeps files with many bases compact. Cost: linear in the number of bases.
 */
public final class ResultJson {
    private ResultJson() {
    }

    /**
     * The verdict on {@code m}: {@code verdict}, {@code elements}, {@code rank}, {@code bases},
     * {@code stats}; plus {@code signs} when orientable and {@code reason} when unknown.
     *
     * @throws IllegalArgumentException when an orientable result's witness has other labels or
     *     another rank than {@code m}
     */
    public static Json.Obj orientability(Matroid m, Orientability result) {
        SolveStats s = result.stats();
        Json.Obj.Builder b = Json.Obj.builder()
                .put("verdict", result.verdict())
                .put("elements", m.size())
                .put("rank", m.rank())
                .put("bases", s.bases())
                .put("stats", Json.Obj.builder()
                        .put("relations", s.relations())
                        .put("clauses", s.clauses())
                        .put("rounds", s.rounds())
                        .put("conflicts", s.conflicts())
                        .put("millis", s.millis())
                        .build());
        if (result instanceof Orientability.Orientable o) {
            Chirotope w = o.witness();
            if (w.rank() != m.rank() || !w.labels().equals(m.labels())) {
                throw new IllegalArgumentException("The witness (rank " + w.rank() + " on " + w.labels()
                        + ") does not belong to the matroid (rank " + m.rank() + " on " + m.labels() + ").");
            }
            b.put("signs", signString(w));
        } else if (result instanceof Orientability.Unknown u) {
            b.put("reason", u.reason());
        }
        return b.build();
    }

    /**
     * The verdict on {@code m} decided from a realisation over Q: {@code verdict} "orientable",
     * {@code elements}, {@code rank}, {@code bases}, {@code stats} (no relations, clauses, rounds
     * or conflicts: no solver ran), and {@code realisation}, the matrix object of the matroid file
     * format with exactly {@code rank} rows.
     */
    public static Json.Obj realised(Matroid m, Realised result) {
        Json.Obj matrix = MatroidFiles.toJson(result.witness().matrix());
        return Json.Obj.builder()
                .put("verdict", "orientable")
                .put("elements", m.size())
                .put("rank", m.rank())
                .put("bases", result.bases())
                .put("stats", Json.Obj.builder()
                        .put("relations", 0)
                        .put("clauses", 0)
                        .put("rounds", 0)
                        .put("conflicts", 0)
                        .put("millis", result.millis())
                        .build())
                .put("realisation", matrix.require("matrix"))
                .build();
    }

    /**
     * A realisation witness file: a matroid file ({@code rank}, {@code labels}, {@code matrix})
     * whose matrix is over Q with exactly {@code rank} rows, so that its maximal minors are the
     * determinants of the r-subsets of columns.
     */
    public static Json.Obj realisation(Realisation r) {
        return MatroidFiles.toJson(r.matrix());
    }

    /**
     * Reads the form written by {@link #realisation}. Checks the shape (a matrix over Q with as
     * many rows as its rank); whether it realises a given matroid is {@code RealisationCheck}'s
     * question.
     *
     * @throws MatroidFileException naming {@code source} and the offending field
     */
    public static Realisation readRealisation(Json json, String source) throws MatroidFileException {
        Matroid m = MatroidFiles.fromJson(json, source);
        if (!(m instanceof MatrixMatroid matrix) || !matrix.field().isRational() || matrix.rows() != matrix.rank()) {
            throw new MatroidFileException(source, "a realisation needs a \"matrix\" over Q with exactly \"rank\" ("
                    + m.rank() + ") rows", null);
        }
        return Realisation.of(matrix).orElseThrow();
    }

    /** The chirotope as {@code labels}, {@code rank}, {@code bases} (canonical order) and {@code signs}. */
    public static Json.Obj chirotope(Chirotope c) {
        return Json.Obj.builder()
                .put("labels", Json.Arr.ofStrings(c.labels()))
                .put("rank", c.rank())
                .put("bases", new Json.Arr(c.bases().stream().<Json>map(Json.Arr::ofInts).toList()))
                .put("signs", signString(c))
                .build();
    }

    /**
     * Reads the form written by {@link #chirotope(Chirotope)}. Checks the shape only (bases of
     * the rank, in canonical order, one sign each); whether it is a chirotope is the checker's
     * question.
     *
     * @throws JsonValueException naming the offending field or item
     */
    public static Chirotope readChirotope(Json json) {
        Json.Obj o = json.asObject("the chirotope");
        o.requireOnly(List.of("labels", "rank", "bases", "signs"));
        List<String> labels = MatroidFiles.labels(o.require("labels"));
        if (labels.size() > Limits.ELEMENTS) {
            throw new JsonValueException("a chirotope has at most " + Limits.ELEMENTS + " elements, but there are "
                    + labels.size());
        }
        int rank = o.requireInt("rank");
        Json.Arr basisArray = o.requireArray("bases");
        List<ElementSet> bases = new ArrayList<>();
        int[] previous = null;
        for (int i = 0; i < basisArray.size(); i++) {
            String where = "bases[" + i + "]";
            Json.Arr b = basisArray.get(i).asArray(where);
            int[] basis = new int[b.size()];
            for (int j = 0; j < basis.length; j++) {
                basis[j] = b.get(j).asInt(where + "[" + j + "]");
                if (basis[j] < 0 || basis[j] >= labels.size() || (j > 0 && basis[j] <= basis[j - 1])) {
                    throw new JsonValueException(where + " must list " + rank + " increasing element indices in 0.."
                            + (labels.size() - 1) + ", found " + Arrays.toString(basis));
                }
            }
            if (basis.length != rank) {
                throw new JsonValueException(where + " has " + basis.length + " elements, but the rank is " + rank);
            }
            if (previous != null && Arrays.compare(previous, basis) >= 0) {
                throw new JsonValueException(where + " does not come after bases[" + (i - 1)
                        + "] in lexicographic order");
            }
            bases.add(ElementSet.of(basis));
            previous = basis;
        }
        String signText = o.requireString("signs");
        if (signText.length() != bases.size()) {
            throw new JsonValueException("field \"signs\" has " + signText.length() + " signs, but there are "
                    + bases.size() + " bases");
        }
        byte[] signs = new byte[bases.size()];
        for (int i = 0; i < signs.length; i++) {
            char c = signText.charAt(i);
            if (c != '+' && c != '-') {
                throw new JsonValueException("field \"signs\" must hold only '+' and '-', found '" + c
                        + "' at position " + i);
            }
            signs[i] = (byte) (c == '+' ? 1 : -1);
        }
        return new Chirotope(labels, rank, bases, signs);
    }

    /** The signs as '+' and '-', one per basis in canonical order. */
    public static String signString(Chirotope c) {
        StringBuilder sb = new StringBuilder(c.size());
        for (int i = 0; i < c.size(); i++) {
            sb.append(c.sign(i) > 0 ? '+' : '-');
        }
        return sb.toString();
    }
}
