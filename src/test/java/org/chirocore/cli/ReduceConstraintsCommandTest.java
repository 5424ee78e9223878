package org.chirocore.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code reduce --rank/--keep/--avoid}: a verified core, "none exists" with exit 5, bad constraints with exit 2. */
class ReduceConstraintsCommandTest {
    @TempDir
    Path dir;

    private static final String[] CORNER3 = {"reduce", "--cube", "3", "--hyperplane", "100,010,001", "--pull", "111"};

    private CliRun run(String... more) {
        String[] args = new String[CORNER3.length + more.length];
        System.arraycopy(CORNER3, 0, args, 0, CORNER3.length);
        System.arraycopy(more, 0, args, CORNER3.length, more.length);
        return CliRun.of(args);
    }

    /** The 3-cube's corner construction is the Fano plane (docs/mathematics.md §7), a rank-3 core keeping every element. */
    @Test
    void rankThreeKeepingAVertexGivesTheVerifiedFanoCore() {
        Path out = dir.resolve("f.json");
        CliRun r = run("--rank", "3", "--keep", "110", "--out", out.toString());
        assertEquals(0, r.exit(), r.err() + r.out());
        assertTrue(r.out().startsWith("non-orientable core: rank 3 on 7 elements, 28 bases"), r.out());
        assertTrue(r.out().contains("verified by the independent checker"), r.out());
        assertTrue(Files.exists(out));
    }

    /** F7 minus a point is M(K4), graphic and so orientable (Oxley, Matroid Theory, 2nd ed., Appendix, F7). */
    @Test
    void avoidingAFanoPointProvesThatNoneExists() {
        Path out = dir.resolve("none.json");
        CliRun r = run("--avoid", "110", "--out", out.toString());
        assertEquals(ExitCodes.NONE_EXISTS, r.exit(), r.err() + r.out());
        assertTrue(r.out().startsWith("none exists:"), r.out());
        assertFalse(Files.exists(out));
    }

    @Test
    void badConstraintsAreBadInput() {
        String out = dir.resolve("x.json").toString();
        assertEquals(2, run("--rank", "4", "--out", out).exit());
        assertEquals(2, run("--rank", "2", "--out", out).exit());
        CliRun r = run("--keep", "999", "--out", out);
        assertEquals(2, r.exit());
        assertTrue(r.err().contains("\"999\" (in --keep) is not an element"), r.err());
    }
}
