package org.chirocore.check;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.function.Supplier;

import org.chirocore.fixtures.NamedMatroids;
import org.chirocore.io.Json;
import org.chirocore.io.MatroidFiles;
import org.chirocore.matroid.CubeConstruction;
import org.chirocore.matroid.ElementSets;
import org.chirocore.matroid.ElementSet;
import org.chirocore.matroid.ExplicitMatroid;
import org.chirocore.matroid.Matroid;
import org.chirocore.matroid.Minor;
import org.chirocore.orient.BasisIndex;
import org.chirocore.orient.Budget;
import org.chirocore.orient.Chirotope;
import org.chirocore.orient.ClauseEncoding;
import org.chirocore.orient.GpRelation;
import org.chirocore.orient.Normalisation;
import org.chirocore.search.MinimalCore;
import org.chirocore.search.MinorWitness;
import org.chirocore.search.Operation;
import org.chirocore.search.Progress;
import org.chirocore.search.SearchResult;
import org.chirocore.search.SearchSettings;
import org.chirocore.search.Strategy;
import org.chirocore.search.UnsatCoreSearch;
import org.sat4j.core.VecInt;
import org.sat4j.minisat.SolverFactory;
import org.sat4j.specs.ContradictionException;
import org.sat4j.specs.ISolver;
import org.sat4j.specs.TimeoutException;
import org.sat4j.tools.RupSearchListener;

/**
 * Certificates assembled per docs/certificate-format.md from the project's own search, encoder and
 * sat4j (a DRUP proof from {@link RupSearchListener}), for testing the verifier while the real
 * writer is built elsewhere. Test code only: the verifier itself may use none of this.
 */
final class TestCertificates {
    private TestCertificates() {
    }

    /** The solver used for proofs unless a test asks for another configuration. */
    static final Supplier<ISolver> DEFAULT_SOLVER = SolverFactory::newDefault;

    /** F7 (Oxley, Matroid Theory, 2nd ed., §1.5) with a given-matroid provenance; writes its matroid file as dir/f7.json. */
    static Json.Obj fano(Path dir, Supplier<ISolver> solver) {
        ExplicitMatroid f7 = ExplicitMatroid.of(NamedMatroids.fano());
        Path input = dir.resolve("f7.json");
        try {
            Files.writeString(input, MatroidFiles.toJson(f7).toText() + "\n");
            MinimalCore found = core(f7);
            Json.Obj given = Json.Obj.builder().put("sha256", CertificateVerifier.sha256(Files.readAllBytes(input)))
                    .put("elements", 7).put("rank", 3).build();
            Json.Obj provenance = Json.Obj.builder().put("given", given).put("path", path(found)).build();
            return certificate(found, provenance, solver);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /**
     * The n = 3 corner construction (docs/mathematics.md §7): the real 3-cube pulled at 111 onto
     * H = {100, 010, 001}, 111 contracted; its core is the Fano plane on 000, …, 110.
     */
    static Json.Obj corner(Supplier<ISolver> solver) {
        return construction(CubeConstruction.corner(3), solver);
    }

    /** The certificate of the core that the search finds in {@code c}'s matroid. */
    static Json.Obj construction(CubeConstruction c, Supplier<ISolver> solver) {
        MinimalCore found = core(c.build());
        Json.Obj construction = Json.Obj.builder().put("cube", c.n()).put("field", "Q")
                .put("hyperplane", Json.Arr.ofStrings(c.hyperplaneVertices())).put("pulled", c.pulledVertex())
                .put("contractPulled", c.contractPulled()).build();
        return certificate(found, Json.Obj.builder().put("construction", construction).put("path", path(found)).build(), solver);
    }

    private static MinimalCore core(Matroid m) {
        SearchResult r = new UnsatCoreSearch(new SearchSettings(0, Strategy.CONTRACT_FIRST, Budget.UNLIMITED), Progress.SILENT).reduce(m);
        return ((SearchResult.Found) r).core();
    }

    private static Json.Obj path(MinimalCore found) {
        return Json.Obj.builder().put("contracted", Json.Arr.ofStrings(found.contracted()))
                .put("deleted", Json.Arr.ofStrings(found.deleted())).build();
    }

    /** Every relation (X; a < b < c < d) of the core with at least one clause, in enumeration order. */
    static List<GpRelation> allRelations(BasisIndex index) {
        List<GpRelation> out = new ArrayList<>();
        int n = index.size();
        int r = index.rank();
        int[] x = ElementSets.range(r - 2);
        do {
            ElementSet xm = ElementSet.of(x);
            for (int a = 0; a < n; a++) {
                for (int b = a + 1; b < n; b++) {
                    for (int c = b + 1; c < n; c++) {
                        for (int d = c + 1; d < n; d++) {
                            if (ElementSet.of(a, b, c, d).intersectionSize(xm) == 0 && !ClauseEncoding.clauses(index, new GpRelation(xm, a, b, c, d)).isEmpty()) {
                                out.add(new GpRelation(xm, a, b, c, d));
                            }
                        }
                    }
                }
            }
        } while (ElementSets.nextCombination(x, n));
        return out;
    }

    /** The spec's CNF: normalisation units, then each relation's clauses. */
    static List<int[]> cnf(BasisIndex index, int[] fixed, List<GpRelation> relations) {
        List<int[]> clauses = new ArrayList<>();
        for (int v : fixed) {
            clauses.add(new int[] {v});
        }
        for (GpRelation rel : relations) {
            clauses.addAll(ClauseEncoding.clauses(index, rel));
        }
        return clauses;
    }

    /** A DRUP proof of the CNF's unsatisfiability from sat4j. */
    static String proof(int variables, List<int[]> clauses, Supplier<ISolver> factory) {
        try {
            Path file = Files.createTempFile("chirocore-proof", ".drat");
            ISolver solver = factory.get();
            solver.setSearchListener(new RupSearchListener<>(file.toString()));
            solver.newVar(variables);
            for (int[] c : clauses) {
                solver.addClause(new VecInt(c));
            }
            if (solver.isSatisfiable()) {
                throw new IllegalStateException("The CNF is satisfiable: the matroid is orientable.");
            }
            String text = Files.readString(file);
            Files.delete(file);
            return text;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        } catch (ContradictionException | TimeoutException e) {
            throw new IllegalStateException("Unexpected while solving: " + e, e);
        }
    }

    private static Json.Obj certificate(MinimalCore found, Json.Obj provenance, Supplier<ISolver> solver) {
        ExplicitMatroid core = found.core();
        BasisIndex index = BasisIndex.of(core);
        int[] fixed = Normalisation.fixedVariables(index);
        List<GpRelation> relations = allRelations(index);
        List<Json> bases = new ArrayList<>();
        for (ElementSet b : index.bases()) {
            bases.add(Json.Arr.ofInts(b.elements()));
        }
        List<Json> normalised = new ArrayList<>();
        for (int v : fixed) {
            normalised.add(Json.Arr.ofInts(index.basis(v).elements()));
        }
        List<Json> rels = new ArrayList<>();
        for (GpRelation r : relations) {
            rels.add(new Json.Arr(List.of(Json.Arr.ofInts(r.x().elements()), Json.Num.of(r.a()), Json.Num.of(r.b()),
                    Json.Num.of(r.c()), Json.Num.of(r.d()))));
        }
        String drat = proof(index.basisCount(), cnf(index, fixed, relations), solver);
        List<Json> minimality = new ArrayList<>();
        for (int e = 0; e < core.size(); e++) {
            String label = core.labels().get(e);
            minimality.add(Json.Obj.builder().put("element", label).put("deletion", signs(core, e, found, Operation.DELETION))
                    .put("contraction", signs(core, e, found, Operation.CONTRACTION)).build());
        }
        Json.Obj content = Json.Obj.builder().put("statement", "minor-minimal non-orientable")
                .put("core", Json.Obj.builder().put("rank", core.rank()).put("labels", Json.Arr.ofStrings(core.labels()))
                        .put("bases", new Json.Arr(bases)).build())
                .put("provenance", provenance)
                .put("nonOrientability", Json.Obj.builder().put("normalised", new Json.Arr(normalised))
                        .put("relations", new Json.Arr(rels)).put("drat", drat).build())
                .put("minimality", new Json.Arr(minimality)).build();
        return rehash(Json.Obj.builder().put("format", "chirocore-certificate").put("version", 1).put("tool", "chirocore test")
                .put("sha256", "").put("content", content).put("run", Json.Obj.builder().build()).build());
    }

    /** The search's witness for core\e or core/e as the spec's sign string over the minor's canonical bases. */
    private static String signs(ExplicitMatroid core, int e, MinimalCore found, Operation op) {
        MinorWitness w = found.witnesses().stream()
                .filter(x -> x.element().equals(core.labels().get(e)) && x.operation() == op).findFirst().orElseThrow();
        Chirotope chi = w.witness();
        int[] single = {e};
        BasisIndex minor = BasisIndex.of(op == Operation.DELETION ? new Minor(core, new int[0], single) : new Minor(core, single, new int[0]));
        StringBuilder s = new StringBuilder();
        for (ElementSet b : minor.bases()) {
            int i = 0;
            while (!chi.basis(i).equals(b)) {
                i++;
            }
            s.append(chi.sign(i) > 0 ? '+' : '-');
        }
        return s.toString();
    }

    /** {@code cert} with its sha256 recomputed from its content. */
    static Json.Obj rehash(Json.Obj cert) {
        String hash = CertificateVerifier.sha256(((Json.Obj) cert.require("content")).toText().getBytes(StandardCharsets.UTF_8));
        return (Json.Obj) with(cert, List.of("sha256"), new Json.Str(hash));
    }

    /** The value at a path of member names and array indices. */
    static Json get(Json root, String... path) {
        Json v = root;
        for (String step : path) {
            v = v instanceof Json.Obj o ? o.require(step) : ((Json.Arr) v).get(Integer.parseInt(step));
        }
        return v;
    }

    /** {@code root} with the value at {@code path} replaced (or, for a missing member, added; null removes it). */
    static Json with(Json root, List<String> path, Json value) {
        if (path.isEmpty()) {
            return value;
        }
        String step = path.get(0);
        List<String> rest = path.subList(1, path.size());
        if (root instanceof Json.Obj o) {
            java.util.LinkedHashMap<String, Json> members = new java.util.LinkedHashMap<>(o.members());
            Json replaced = with(members.getOrDefault(step, Json.NULL), rest, value);
            if (replaced == null) {
                members.remove(step);
            } else {
                members.put(step, replaced);
            }
            return new Json.Obj(members);
        }
        List<Json> elements = new ArrayList<>(((Json.Arr) root).elements());
        int i = Integer.parseInt(step);
        Json replaced = with(elements.get(i), rest, value);
        if (replaced == null) {
            elements.remove(i);
        } else {
            elements.set(i, replaced);
        }
        return new Json.Arr(elements);
    }

    /** {@code with} on the content, then rehashed: a tampered certificate whose hash still matches. */
    static Json.Obj tamper(Json.Obj cert, Json value, String... contentPath) {
        List<String> path = new ArrayList<>(List.of("content"));
        path.addAll(Arrays.asList(contentPath));
        return rehash((Json.Obj) with(cert, path, value));
    }

    static byte[] bytes(Json cert) {
        return (cert.toText() + "\n").getBytes(StandardCharsets.UTF_8);
    }
}
