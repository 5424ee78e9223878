package org.chirocore.proof;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.stream.Collectors;

import org.chirocore.matroid.ElementSet;
import org.chirocore.orient.BasisIndex;
import org.chirocore.orient.ClauseEncoding;
import org.chirocore.orient.ClauseEncoding.Term;
import org.chirocore.orient.GpRelation;
import org.chirocore.proof.ReadableProof.Branch;
import org.chirocore.proof.ReadableProof.Closed;
import org.chirocore.proof.ReadableProof.Forced;
import org.chirocore.proof.ReadableProof.Split;

/**
 * The text of a {@link ReadableProof}: numbered steps, sub-cases indented, bases written with
 * element labels in sorted order. Replays the signs along the way, so each step can name the
 * known values it uses. Costs O(steps · rank).
 */
final class ProofText {
    private final BasisIndex index;
    private final StringBuilder out = new StringBuilder();
    private int number;

    private ProofText(BasisIndex index) {
        this.index = index;
    }

    static String of(ReadableProof proof, BasisIndex index) {
        ProofText t = new ProofText(index);
        byte[] signs = new byte[index.basisCount()];
        t.out.append("Normalisation (docs/certificate-format.md): ");
        t.out.append(proof.normalised().stream().map(v -> t.basis(v) + " = +1").collect(Collectors.joining(", ")));
        t.out.append(".\n");
        proof.normalised().forEach(v -> signs[v - 1] = 1);
        t.branch(proof.root(), signs, "");
        t.out.append("Every case is closed, so no chirotope has this matroid's bases as support: the matroid is not orientable.\n");
        return t.out.toString();
    }

    private void branch(Branch b, byte[] signs, String indent) {
        for (Forced f : b.forced()) {
            List<Term> terms = ClauseEncoding.terms(index, f.relation());
            line(indent, relation(f.relation(), terms) + given(terms, signs, f.variable()) + ", this forces "
                    + basis(f.variable()) + " = " + sign(f.sign()) + ".");
            signs[f.variable() - 1] = (byte) f.sign();
        }
        if (b.ending() instanceof Closed c) {
            List<Term> terms = ClauseEncoding.terms(index, c.relation());
            // a violated relation has all terms equal; on the two sides of "χ1χ2 = ±χ3χ4" that is
            // the left side s·t against the right side −s·t
            int left = terms.get(0).sign() * RelationState.value(terms.get(0), signs);
            String why = terms.size() == 2
                    ? "the left side is " + sign(left) + " and the right side is " + sign(-left)
                    : "all three terms are " + sign(RelationState.value(terms.get(0), signs));
            line(indent, relation(c.relation(), terms) + given(terms, signs, 0) + ", the relation cannot hold: " + why
                    + ". This case is closed.");
            return;
        }
        Split s = (Split) b.ending();
        line(indent, "Nothing more is forced; split on the sign of " + basis(s.variable()) + ".");
        byte[] minus = signs.clone();
        out.append(indent).append("  Case ").append(basis(s.variable())).append(" = +1:\n");
        signs[s.variable() - 1] = 1;
        branch(s.plus(), signs, indent + "    ");
        out.append(indent).append("  Case ").append(basis(s.variable())).append(" = −1:\n");
        minus[s.variable() - 1] = -1;
        branch(s.minus(), minus, indent + "    ");
    }

    private void line(String indent, String text) {
        out.append(indent).append(++number).append(". ").append(text).append('\n');
    }

    /** "Relation (X; a, b, c, d): <its statement>". */
    private String relation(GpRelation r, List<Term> terms) {
        String name = "Relation (" + labels(r.x()) + (r.x().isEmpty() ? "" : "; ") + label(r.a()) + ", " + label(r.b()) + ", "
                + label(r.c()) + ", " + label(r.d()) + ")";
        if (terms.size() == 2) {
            Term t = terms.get(0);
            Term u = terms.get(1);
            // s·χ1χ2 = −s'·χ3χ4, written with the product χ1χ2 alone on the left
            return name + ": " + product(t) + " = " + (t.sign() * u.sign() < 0 ? "" : "−") + product(u);
        }
        return name + ": the terms " + terms.stream().map(t -> (t.sign() < 0 ? "−" : "") + product(t))
                .collect(Collectors.joining(", ")) + " are not all equal";
    }

    /** "; with χ(B) = s, ..." for the known bases of the relation other than {@code skip}. */
    private String given(List<Term> terms, byte[] signs, int skip) {
        List<String> known = new ArrayList<>();
        for (Term t : terms) {
            for (int v : new int[] {t.first(), t.second()}) {
                String s = basis(v) + " = " + sign(signs[v - 1]);
                if (v != skip && signs[v - 1] != 0 && !known.contains(s)) {
                    known.add(s);
                }
            }
        }
        return "; with " + String.join(", ", known);
    }

    private String product(Term t) {
        return basis(t.first()) + basis(t.second());
    }

    private String basis(int v) {
        return "χ(" + labels(index.basis(v)) + ")";
    }

    private String labels(ElementSet set) {
        return Arrays.stream(set.elements()).mapToObj(this::label).collect(Collectors.joining(","));
    }

    private String label(int e) {
        return index.labels().get(e);
    }

    private static String sign(int s) {
        return s > 0 ? "+1" : "−1";
    }
}
