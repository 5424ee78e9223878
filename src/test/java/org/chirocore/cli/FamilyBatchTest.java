package org.chirocore.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.chirocore.family.FamilyDefinition;
import org.chirocore.family.FamilyRun;
import org.chirocore.family.MemberResult;
import org.chirocore.orient.Budget;
import org.chirocore.search.Strategy;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A family run in a batch job: each member is reported as soon as it is complete (so a job
 * stopped by its time limit leaves every finished member in its log), and {@code --progress}
 * writes progress lines even when standard error is not a terminal.
 */
class FamilyBatchTest {
    @TempDir
    Path dir;

    @Test
    void eachMemberIsReportedBeforeTheNextStarts() throws IOException {
        List<String> events = new ArrayList<>();
        FamilyRun.Listener listener = new FamilyRun.Listener() {
            @Override
            public void stage(int n, String stage) {
                events.add(n + " " + stage);
            }

            @Override
            public void finished(MemberResult member) {
                events.add(member.n() + " finished");
            }
        };
        new FamilyRun(FamilyDefinition.read(Path.of("families/corner.json")), dir.resolve("run"),
                new FamilyRun.Settings(0, Strategy.CONTRACT_FIRST, Budget.UNLIMITED, 1), listener).run(3, 4);
        int fourStarts = events.indexOf(events.stream().filter(e -> e.startsWith("4 reducing")).findFirst()
                .orElseThrow());
        assertTrue(events.indexOf("3 finished") >= 0 && events.indexOf("3 finished") < fourStarts, events.toString());
        assertEquals(events.size() - 1, events.indexOf("4 finished"), events.toString());
    }

    @Test
    void progressLinesAreForcedIntoALog() {
        Path out = dir.resolve("corner");
        CliRun quiet = CliRun.of("family", "run", "families/corner.json", "--n", "3", "--out", out.toString());
        assertEquals(0, quiet.exit(), quiet.err());
        assertEquals("", quiet.err(), "no terminal, no --progress: no progress lines");
        CliRun run = CliRun.of("family", "run", "families/corner.json", "--n", "3", "--out", out.toString(), "--progress");
        assertEquals(0, run.exit(), run.err());
        assertTrue(run.err().contains("n = 3: checking the existing certificate"), run.err());
        assertTrue(run.out().startsWith("n = 3: core rank 3 on 7 elements, 28 bases (F7); verified (reused)"), run.out());
    }

    @Test
    void anotherRunsDirectoryIsReplacedOnlyWithForce() {
        Path out = dir.resolve("seed0");
        assertEquals(0, CliRun.of("family", "run", "families/corner.json", "--n", "3", "--out", out.toString()).exit());
        CliRun refused = CliRun.of("family", "run", "families/corner.json", "--n", "3", "--seed", "1", "--out", out.toString());
        assertEquals(2, refused.exit());
        assertTrue(refused.err().contains("with seed 0 and strategy contract-first, not this one"), refused.err());
        CliRun forced = CliRun.of("family", "run", "families/corner.json", "--n", "3", "--seed", "1", "--out", out.toString(),
                "--force");
        assertEquals(0, forced.exit(), forced.err());
        assertTrue(forced.out().startsWith("n = 3: core"), forced.out());
    }
}
