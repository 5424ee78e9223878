package org.chirocore.check;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.function.Predicate;
import java.util.function.UnaryOperator;

import org.chirocore.check.VerificationReport.Status;
import org.chirocore.cli.Chirocore;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import picocli.CommandLine;

/**
 * The completeness evidence of {@code enumerate}, checked by {@link CompletenessCheck}: the
 * evidence of AG(3,2) verifies in full, and each kind of tampering is rejected by the check that
 * should catch it. AG(3,2) is binary, so its orientable minors are its regular minors (Bland and
 * Las Vergnas, "Orientability of matroids", J. Combin. Theory B 24 (1978)); its minor-minimal
 * non-regular minors are its copies of F7 (AG(3,2)/e) and F7* (AG(3,2)\e) (Tutte's excluded
 * minors for regular matroids among binary ones; Oxley, Matroid Theory, 2nd ed., Thm. 6.6.3 and
 * the Appendix on AG(3,2)); its automorphism group is transitive, so every core is an image of a
 * certified one.
 */
class CompletenessCheckTest {
    private static final Path AG32 = Path.of("certificates/inputs/ag32.json");

    @TempDir
    static Path dir;

    private static Path evidence;
    private static JsonTree.Obj original;

    @BeforeAll
    static void enumerate() throws IOException {
        assertEquals(0, run("enumerate", AG32.toString(), "--out", dir.resolve("ag32").toString()));
        evidence = dir.resolve("ag32").resolve("completeness.json");
        original = JsonTree.parse(Files.readAllBytes(evidence)).asObject("evidence");
    }

    private static int run(String... args) {
        CommandLine cl = Chirocore.configure(new CommandLine(new Chirocore()));
        cl.setOut(new PrintWriter(new StringWriter(), true));
        cl.setErr(new PrintWriter(new StringWriter(), true));
        return cl.execute(args);
    }

    @Test
    void theEvidenceOfAg32VerifiesInFull() {
        VerificationReport r = CompletenessCheck.verify(evidence, Optional.of(AG32));
        assertTrue(r.complete(), r.toText());
        // rank 4: nothing contracted; rank 3: one point contracted, all 8 in one orbit
        assertTrue(r.check(CompletenessCheck.COVERAGE).detail().contains("9 independent sets"), r.toText());
        // 8 copies of F7* (AG(3,2)\e) and, for the one contraction set listed, 1 copy of F7
        assertTrue(r.check(CompletenessCheck.DUALITY).detail().contains("9 listed minimal sets"), r.toText());
    }

    @Test
    void verifyRunsTheCheckOnAFileNamedCompleteness() {
        StringWriter text = new StringWriter();
        int exit = VerifierMain.verify(List.of(evidence), Optional.of(AG32), false, new PrintWriter(text));
        assertEquals(VerifierMain.VERIFIED, exit, text.toString());
        assertTrue(text.toString().contains("transversal duality"), text.toString());
    }

    @Test
    void withoutTheMatroidFileNothingIsReportedAsPassedBeyondTheFormat() {
        VerificationReport r = CompletenessCheck.verify(evidence, Optional.empty());
        assertTrue(r.passed() && !r.complete(), r.toText());
        assertEquals(Status.NOT_RUN, r.check(CompletenessCheck.INPUT).status());
        assertEquals(Status.NOT_RUN, r.check(CompletenessCheck.DUALITY).status());
    }

    @Test
    void aTamperedWitnessIsRejected() throws IOException {
        JsonTree.Obj tampered = editFirstMaximal(t -> {
            String signs = ((JsonTree.Str) t.members().get("signs")).value();
            char flipped = signs.charAt(0) == '+' ? '-' : '+';
            return with(t, "signs", new JsonTree.Str(flipped + signs.substring(1)));
        });
        assertRejectedBy(CompletenessCheck.WITNESSES, tampered);
    }

    @Test
    void aDroppedMaximalSetIsRejected() throws IOException {
        assertRejectedBy(CompletenessCheck.DUALITY, editFirstSet(c -> with(c, "maximalOrientable",
                drop(c.requireArray("maximalOrientable")))));
    }

    @Test
    void aMissingMinimalSetIsRejected() throws IOException {
        assertRejectedBy(CompletenessCheck.DUALITY, editFirstSet(c -> with(c, "minimalNonOrientable",
                drop(c.requireArray("minimalNonOrientable")))));
    }

    @Test
    void anExtraMinimalSetIsRejected() throws IOException {
        // the whole ground set after contraction: non-orientable, but not minimal
        assertRejectedBy(CompletenessCheck.DUALITY, editFirstSet(c -> {
            List<JsonTree.Value> sets = new ArrayList<>(c.requireArray("minimalNonOrientable").elements());
            List<JsonTree.Value> all = new ArrayList<>(original.requireArray("labels").elements());
            all.removeAll(c.requireArray("contracted").elements());
            sets.add(new JsonTree.Obj(Map.of("elements", new JsonTree.Arr(all))));
            return with(c, "minimalNonOrientable", new JsonTree.Arr(sets));
        }));
    }

    @Test
    void aMissingContractionSetIsRejected() throws IOException {
        assertRejectedBy(CompletenessCheck.COVERAGE, with(original, "contractionSets",
                drop(original.requireArray("contractionSets"))));
    }

    @Test
    void aPermutationThatIsNoAutomorphismIsRejected() throws IOException {
        // swapping 000 and 001 only: the plane {000 010 100 110} (a circuit; the dependent 4-sets of
        // AG(3,2) are its affine planes, Oxley, Appendix) goes to {001 010 100 110}, a basis, so
        // some basis goes to a non-basis
        JsonTree.Obj symmetry = original.requireObject("symmetry");
        List<JsonTree.Value> permutations = new ArrayList<>(symmetry.requireArray("permutations").elements());
        List<JsonTree.Value> swap = new ArrayList<>();
        for (int e = 0; e < 8; e++) {
            swap.add(new JsonTree.Int(e == 0 ? 1 : e == 1 ? 0 : e));
        }
        permutations.add(new JsonTree.Arr(swap));
        assertRejectedBy(CompletenessCheck.SYMMETRY, with(original, "symmetry",
                with(symmetry, "permutations", new JsonTree.Arr(permutations))));
    }

    /**
     * The stored evidence of the n = 4 corner (docs/enumerations/corner-n4; its classes were
     * checked against a brute force in {@code CoreEnumerationTest}) has dead ends and class members
     * that no automorphism maps a certified core onto; the mutations below start from it.
     */
    @Test
    void theCornerEvidenceProvesItsDeadEndsAndClassMembers() throws IOException {
        VerificationReport r = CompletenessCheck.verify(corner(), Optional.empty());
        assertTrue(r.complete(), r.toText());
        assertTrue(r.check(CompletenessCheck.DEAD_ENDS).detail().matches("[1-9][0-9]* dead ends.*"), r.toText());
        assertTrue(r.check(CompletenessCheck.MEMBERS).detail().matches("[1-9][0-9]* class members.*"), r.toText());
    }

    @Test
    void aRemovedDeadEndProofLeavesItsSetsUnaccountedAndTheVerdictIncomplete() throws IOException {
        JsonTree.Obj tampered = editFirstMinimal(cornerOriginal(), m -> m.has("deadEnd"), m -> without(m, "deadEnd"));
        VerificationReport r = CompletenessCheck.verify(write(corner(), tampered), Optional.empty());
        assertEquals(Status.PASS, r.check(CompletenessCheck.DEAD_ENDS).status(), r.toText());
        assertEquals(Status.NOT_RUN, r.check(CompletenessCheck.ACCOUNTED).status(), r.toText());
        assertTrue(r.passed() && !r.complete(), r.toText());
        StringWriter text = new StringWriter();
        assertEquals(VerifierMain.INCOMPLETE, VerifierMain.verify(List.of(write(corner(), tampered)), Optional.empty(), false,
                new PrintWriter(text)), text.toString());
    }

    @Test
    void aCorruptedDeadEndProofIsRejected() throws IOException {
        // the proof cut to its last line, the empty clause, which unit propagation alone does not give
        assertRejectedBy(corner(), CompletenessCheck.DEAD_ENDS, editFirstMinimal(cornerOriginal(), m -> m.has("deadEnd"),
                m -> with(m, "deadEnd", editProof(m.requireObject("deadEnd"), "drat", new JsonTree.Str("0\n")))));
    }

    @Test
    void aDeadEndProofWithoutItsRelationsIsRejected() throws IOException {
        assertRejectedBy(corner(), CompletenessCheck.DEAD_ENDS, editFirstMinimal(cornerOriginal(), m -> m.has("deadEnd"),
                m -> with(m, "deadEnd", editProof(m.requireObject("deadEnd"), "relations", new JsonTree.Arr(List.of())))));
    }

    @Test
    void aDeadEndContractingAnElementOutsideItsSetIsRejected() throws IOException {
        List<JsonTree.Value> labels = cornerOriginal().requireArray("labels").elements();
        assertRejectedBy(corner(), CompletenessCheck.DEAD_ENDS, editFirstMinimal(cornerOriginal(), m -> m.has("deadEnd"), m -> {
            List<JsonTree.Value> outside = new ArrayList<>(labels);
            outside.removeAll(m.requireArray("elements").elements());
            return with(m, "deadEnd", with(m.requireObject("deadEnd"), "contracted", outside.get(0)));
        }));
    }

    @Test
    void aClassMemberMappedToAnotherClassIsRejected() throws IOException {
        // the three classes have 59, 56 and 48 bases (docs/enumerations/corner-n4/summary.md), so no
        // element map sends a member onto the core of another class
        assertRejectedBy(corner(), CompletenessCheck.MEMBERS, editFirstMinimal(cornerOriginal(), m -> m.has("classMember"), m -> {
            JsonTree.Obj member = m.requireObject("classMember");
            int other = member.requireInt("class") % 3 + 1;
            return with(m, "classMember", with(member, "class", new JsonTree.Int(other)));
        }));
    }

    @Test
    void aDroppedMaximalOrientableSetOfTheCornerIsRejected() throws IOException {
        JsonTree.Obj o = cornerOriginal();
        List<JsonTree.Value> sets = new ArrayList<>(o.requireArray("contractionSets").elements());
        JsonTree.Obj first = sets.get(0).asObject("set");
        sets.set(0, with(first, "maximalOrientable", drop(first.requireArray("maximalOrientable"))));
        assertRejectedBy(corner(), CompletenessCheck.DUALITY, with(o, "contractionSets", new JsonTree.Arr(sets)));
    }

    /** The copied corner evidence, once made. */
    private static Path corner;

    /** A copy of the stored corner evidence and its certificates, made once. */
    private static Path corner() throws IOException {
        if (corner == null) {
            corner = Files.createDirectories(dir.resolve("corner-copy"));
            try (var files = Files.list(Path.of("docs/enumerations/corner-n4"))) {
                for (Path f : files.toList()) {
                    Files.copy(f, corner.resolve(f.getFileName()));
                }
            }
            corner = corner.resolve("completeness.json");
        }
        return corner;
    }

    private static JsonTree.Obj cornerOriginal() throws IOException {
        return JsonTree.parse(Files.readAllBytes(corner())).asObject("evidence");
    }

    /** The evidence with the first minimal set satisfying {@code which} edited. */
    private static JsonTree.Obj editFirstMinimal(JsonTree.Obj o, Predicate<JsonTree.Obj> which,
            UnaryOperator<JsonTree.Obj> edit) {
        List<JsonTree.Value> sets = new ArrayList<>(o.requireArray("contractionSets").elements());
        for (int i = 0; i < sets.size(); i++) {
            JsonTree.Obj c = sets.get(i).asObject("set");
            List<JsonTree.Value> minimal = new ArrayList<>(c.requireArray("minimalNonOrientable").elements());
            for (int j = 0; j < minimal.size(); j++) {
                if (which.test(minimal.get(j).asObject("minimal"))) {
                    minimal.set(j, edit.apply(minimal.get(j).asObject("minimal")));
                    sets.set(i, with(c, "minimalNonOrientable", new JsonTree.Arr(minimal)));
                    return with(o, "contractionSets", new JsonTree.Arr(sets));
                }
            }
        }
        throw new AssertionError("no minimal set of the evidence is of the kind asked for");
    }

    private static JsonTree.Obj editProof(JsonTree.Obj deadEnd, String member, JsonTree.Value value) {
        return with(deadEnd, "nonOrientability", with(deadEnd.requireObject("nonOrientability"), member, value));
    }

    private static Path write(Path evidenceFile, JsonTree.Obj tampered) throws IOException {
        Path copy = evidenceFile.resolveSibling("tampered-completeness.json");
        Files.write(copy, JsonTree.canonical(tampered).getBytes(StandardCharsets.UTF_8));
        return copy;
    }

    private static void assertRejectedBy(Path evidenceFile, String check, JsonTree.Obj tampered) throws IOException {
        VerificationReport r = CompletenessCheck.verify(write(evidenceFile, tampered), Optional.empty());
        assertEquals(Status.FAIL, r.check(check).status(), r.toText());
        assertTrue(!r.passed(), r.toText());
    }

    private static void assertRejectedBy(String check, JsonTree.Obj tampered) throws IOException {
        VerificationReport r = CompletenessCheck.verify(write(evidence, tampered), Optional.of(AG32));
        assertEquals(Status.FAIL, r.check(check).status(), r.toText());
        assertTrue(!r.passed(), r.toText());
    }

    private static JsonTree.Obj editFirstSet(UnaryOperator<JsonTree.Obj> edit) {
        List<JsonTree.Value> sets = new ArrayList<>(original.requireArray("contractionSets").elements());
        sets.set(0, edit.apply(sets.get(0).asObject("set")));
        return with(original, "contractionSets", new JsonTree.Arr(sets));
    }

    private static JsonTree.Obj editFirstMaximal(UnaryOperator<JsonTree.Obj> edit) {
        return editFirstSet(c -> {
            List<JsonTree.Value> ts = new ArrayList<>(c.requireArray("maximalOrientable").elements());
            ts.set(0, edit.apply(ts.get(0).asObject("maximal")));
            return with(c, "maximalOrientable", new JsonTree.Arr(ts));
        });
    }

    private static JsonTree.Obj with(JsonTree.Obj o, String name, JsonTree.Value value) {
        Map<String, JsonTree.Value> members = new LinkedHashMap<>(o.members());
        members.put(name, value);
        return new JsonTree.Obj(members);
    }

    private static JsonTree.Obj without(JsonTree.Obj o, String name) {
        Map<String, JsonTree.Value> members = new LinkedHashMap<>(o.members());
        members.remove(name);
        return new JsonTree.Obj(members);
    }

    private static JsonTree.Arr drop(JsonTree.Arr a) {
        return new JsonTree.Arr(a.elements().subList(1, a.size()));
    }

    /**
     * The n = 4 corner construction enumerated afresh (slow: tens of seconds on the shared
     * machine): its evidence verifies in full, every listed minimal set accounted for.
     */
    @Test
    @Tag("slow")
    void theEvidenceOfTheFourCubeCornerVerifiesInFull() {
        Path out = dir.resolve("corner-n4");
        assertEquals(0, run("enumerate", "--cube", "4", "--hyperplane", "1000,0100,0010,0001", "--pull", "1111",
                "--out", out.toString()));
        VerificationReport r = CompletenessCheck.verify(out.resolve("completeness.json"), Optional.empty());
        assertTrue(r.complete(), r.toText());
        assertEquals(Status.PASS, r.check(CompletenessCheck.ACCOUNTED).status(), r.toText());
    }
}
