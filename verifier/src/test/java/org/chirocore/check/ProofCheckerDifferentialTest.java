package org.chirocore.check;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import java.util.Random;

import org.junit.jupiter.api.Test;

/**
 * Differential tests of the two proof checkers: random unsatisfiable CNFs, proofs read off a
 * plain DPLL search tree (each node's negated decision path is a RUP lemma once both children's
 * are known, the root's is the empty clause: common practice), and mutations of those proofs.
 * Three judges must agree: {@link DratChecker}, {@link LratChecker} on the hints a deliberately
 * simple checker in this test finds, and that simple checker itself (propagation from scratch
 * by repeated passes over all clauses, RAT by trying every resolvent). And no judge may accept a
 * proof of a satisfiable formula (decided by trying every assignment).
 */
class ProofCheckerDifferentialTest {
    static final int VARIABLES = 7;

    /** The simple checker: unit propagation from the negated clause; returns the hints ending in a falsified clause, or null. */
    static List<Integer> rup(List<int[]> clauses, int[] lemma) {
        int[] value = new int[VARIABLES + 1];
        int[] reason = new int[VARIABLES + 1];
        List<Integer> trail = new ArrayList<>();
        for (int lit : lemma) {
            value[Math.abs(lit)] = -Integer.signum(lit);
            trail.add(-lit);
        }
        for (boolean changed = true; changed;) {
            changed = false;
            for (int id = 1; id < clauses.size(); id++) {
                int[] c = clauses.get(id);
                if (c == null) {
                    continue;
                }
                List<Integer> open = new ArrayList<>();
                boolean satisfied = false;
                for (int lit : c) {
                    int v = value[Math.abs(lit)] * Integer.signum(lit);
                    satisfied |= v > 0;
                    if (v == 0) {
                        open.add(lit);
                    }
                }
                if (satisfied || open.size() > 1) {
                    continue;
                }
                if (open.isEmpty()) {
                    // every clause whose propagation the trail records is a hint, in trail order: valid, if not minimal
                    List<Integer> hints = new ArrayList<>();
                    for (int lit : trail) {
                        if (reason[Math.abs(lit)] != 0) {
                            hints.add(reason[Math.abs(lit)]);
                        }
                    }
                    hints.add(id);
                    return hints;
                }
                int lit = open.get(0);
                value[Math.abs(lit)] = Integer.signum(lit);
                reason[Math.abs(lit)] = id;
                trail.add(lit);
                changed = true;
            }
        }
        return null;
    }

    /** The simple checker's verdict on a proof without deletions, and its LRAT text when it accepts. */
    record Judgement(boolean valid, String lrat) {
    }

    static Judgement simple(List<int[]> cnf, List<int[]> lemmas) {
        List<int[]> clauses = new ArrayList<>();
        clauses.add(null);
        clauses.addAll(cnf);
        StringBuilder lrat = new StringBuilder();
        for (int[] lemma : lemmas) {
            if (Arrays.stream(lemma).anyMatch(l -> Arrays.stream(lemma).anyMatch(m -> m == -l))) {
                return new Judgement(false, "");
            }
            int[] lits = Arrays.stream(lemma).distinct().toArray();
            StringBuilder hints = new StringBuilder();
            List<Integer> direct = rup(clauses, lits);
            if (direct != null) {
                direct.forEach(h -> hints.append(' ').append(h));
            } else if (lits.length == 0) {
                return new Judgement(false, "");
            } else {
                for (int id = 1; id < clauses.size(); id++) {
                    int[] d = clauses.get(id);
                    if (Arrays.stream(d).noneMatch(l -> l == -lits[0])) {
                        continue;
                    }
                    int[] resolvent = java.util.stream.IntStream.concat(Arrays.stream(lits),
                            Arrays.stream(d).filter(l -> l != -lits[0])).distinct().toArray();
                    if (Arrays.stream(resolvent).anyMatch(l -> Arrays.stream(resolvent).anyMatch(m -> m == -l))) {
                        continue;
                    }
                    List<Integer> h = rup(clauses, resolvent);
                    if (h == null) {
                        return new Judgement(false, "");
                    }
                    hints.append(" -").append(id);
                    h.forEach(x -> hints.append(' ').append(x));
                }
            }
            clauses.add(lits);
            lrat.append(clauses.size() - 1);
            for (int lit : lits) {
                lrat.append(' ').append(lit);
            }
            lrat.append(" 0").append(hints).append(" 0\n");
            if (lits.length == 0) {
                return new Judgement(true, lrat.toString());
            }
        }
        return new Judgement(false, "");
    }

    static boolean satisfiable(List<int[]> cnf) {
        for (int a = 0; a < 1 << VARIABLES; a++) {
            final int assignment = a;
            if (cnf.stream().allMatch(c -> Arrays.stream(c).anyMatch(l -> ((assignment >> (Math.abs(l) - 1)) & 1) == (l > 0 ? 1 : 0)))) {
                return true;
            }
        }
        return false;
    }

    static List<int[]> randomCnf(Random random) {
        List<int[]> cnf = new ArrayList<>();
        int size = 25 + random.nextInt(30);
        for (int i = 0; i < size; i++) {
            int[] c = new int[1 + random.nextInt(3)];
            for (int k = 0; k < c.length; k++) {
                c[k] = (1 + random.nextInt(VARIABLES)) * (random.nextBoolean() ? 1 : -1);
            }
            int[] distinct = Arrays.stream(c).distinct().toArray();
            if (Arrays.stream(distinct).noneMatch(l -> Arrays.stream(distinct).anyMatch(m -> m == -l))) {
                cnf.add(distinct);
            }
        }
        return cnf;
    }

    /** The post-order lemmas ¬path of a DPLL tree (decisions in variable order): a RUP proof of an unsatisfiable CNF. */
    static void dpll(List<int[]> cnf, List<Integer> path, List<int[]> lemmas) {
        List<int[]> all = new ArrayList<>();
        all.add(null);
        all.addAll(cnf);
        all.addAll(lemmas);
        int[] negatedPath = path.stream().mapToInt(l -> -l).toArray();
        if (rup(all, negatedPath) == null) {
            int next = 1;
            while (path.contains(next) || path.contains(-next)) {
                next++;
            }
            for (int lit : new int[] {next, -next}) {
                List<Integer> longer = new ArrayList<>(path);
                longer.add(lit);
                dpll(cnf, longer, lemmas);
            }
        }
        lemmas.add(negatedPath);
    }

    static String drat(List<int[]> lemmas) {
        StringBuilder s = new StringBuilder();
        for (int[] lemma : lemmas) {
            for (int lit : lemma) {
                s.append(lit).append(' ');
            }
            s.append("0\n");
        }
        return s.toString();
    }

    /** One of: drop a lemma, flip a literal, drop a literal, add a random literal, swap two lemmas, insert a random lemma. */
    static List<int[]> mutate(List<int[]> lemmas, Random random) {
        List<int[]> out = new ArrayList<>();
        lemmas.forEach(l -> out.add(l.clone()));
        int i = random.nextInt(out.size());
        int[] l = out.get(i);
        switch (random.nextInt(6)) {
            case 0 -> out.remove(i);
            case 1 -> {
                if (l.length > 0) {
                    l[random.nextInt(l.length)] *= -1;
                }
            }
            case 2 -> {
                if (l.length > 0) {
                    out.set(i, Arrays.copyOf(l, l.length - 1));
                }
            }
            case 3 -> {
                int[] longer = Arrays.copyOf(l, l.length + 1);
                longer[l.length] = (1 + random.nextInt(VARIABLES)) * (random.nextBoolean() ? 1 : -1);
                out.set(i, longer);
            }
            case 4 -> {
                int j = random.nextInt(out.size());
                out.set(i, out.get(j));
                out.set(j, l);
            }
            default -> out.add(i, new int[] {(1 + random.nextInt(VARIABLES)) * (random.nextBoolean() ? 1 : -1)});
        }
        return out;
    }

    @Test
    void theThreeJudgesAgreeOnRandomAndMutatedProofs() {
        Random random = new Random(10_2026);
        int unsatisfiable = 0;
        int accepted = 0;
        int rejected = 0;
        for (int round = 0; round < 400; round++) {
            List<int[]> cnfClauses = randomCnf(random);
            Cnf cnf = new Cnf(VARIABLES, cnfClauses);
            boolean sat = satisfiable(cnfClauses);
            List<List<int[]>> proofs = new ArrayList<>();
            if (!sat) {
                unsatisfiable++;
                List<int[]> lemmas = new ArrayList<>();
                dpll(cnfClauses, List.of(), lemmas);
                proofs.add(lemmas);
                for (int m = 0; m < 6; m++) {
                    proofs.add(mutate(lemmas, random));
                }
            }
            List<int[]> randomLemmas = new ArrayList<>();
            for (int k = 0; k < 8; k++) {
                randomLemmas.add(Arrays.stream(new int[random.nextInt(3)]).map(x -> (1 + random.nextInt(VARIABLES))
                        * (random.nextBoolean() ? 1 : -1)).toArray());
            }
            randomLemmas.add(new int[0]);
            proofs.add(randomLemmas);
            for (List<int[]> proof : proofs) {
                String text = drat(proof);
                Judgement reference = simple(cnfClauses, proof);
                DratChecker.Outcome drat = DratChecker.check(cnf, text);
                String where = "CNF " + cnfClauses.stream().map(Arrays::toString).toList() + "\nproof\n" + text;
                assertEquals(reference.valid(), drat.valid(), () -> where + "\nDRAT checker: " + drat.failure());
                if (reference.valid()) {
                    assertEquals(Optional.empty(), LratChecker.check(cnf, reference.lrat()), where);
                    assertFalse(sat, where);
                    accepted++;
                } else {
                    rejected++;
                }
            }
        }
        assertTrue(unsatisfiable > 50 && accepted > 100 && rejected > 100,
                unsatisfiable + " unsatisfiable formulas, " + accepted + " proofs accepted, " + rejected + " rejected");
    }

    /** Every mutation of a valid LRAT proof that the LRAT checker still accepts is a valid proof for the simple checker. */
    @Test
    void theLratCheckerAcceptsNoMutatedHintsThatProveNothing() {
        Random random = new Random(2026_12_02);
        int checked = 0;
        for (int round = 0; round < 300; round++) {
            List<int[]> cnfClauses = randomCnf(random);
            if (satisfiable(cnfClauses)) {
                continue;
            }
            List<int[]> lemmas = new ArrayList<>();
            dpll(cnfClauses, List.of(), lemmas);
            String lrat = simple(cnfClauses, lemmas).lrat();
            List<String> lines = new ArrayList<>(lrat.lines().toList());
            int i = random.nextInt(lines.size());
            String[] tokens = lines.get(i).split(" ");
            int t = 1 + random.nextInt(tokens.length - 1);
            tokens[t] = tokens[t].equals("0") ? "1" : Integer.toString(Integer.parseInt(tokens[t]) + (random.nextBoolean() ? 1 : -1));
            lines.set(i, String.join(" ", tokens));
            Optional<String> fault = LratChecker.check(new Cnf(VARIABLES, cnfClauses), String.join("\n", lines) + "\n");
            if (fault.isEmpty()) {
                // the accepted lemmas must still be a valid proof
                List<int[]> claimed = new ArrayList<>();
                for (String line : lines) {
                    String[] n = line.split(" ");
                    List<Integer> lits = new ArrayList<>();
                    for (int k = 1; !n[k].equals("0"); k++) {
                        lits.add(Integer.parseInt(n[k]));
                    }
                    claimed.add(lits.stream().mapToInt(Integer::intValue).toArray());
                }
                assertTrue(simple(cnfClauses, claimed).valid(), () -> String.join("\n", lines));
            }
            checked++;
        }
        assertTrue(checked > 50, "only " + checked + " unsatisfiable formulas drawn");
    }
}
