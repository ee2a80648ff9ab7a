package dev.plumb.revisions;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.plumb.analysis.Analysis;
import dev.plumb.analysis.Binding;
import dev.plumb.analysis.DiskReads;
import dev.plumb.analysis.Settings;
import dev.plumb.analysis.Sources;
import dev.plumb.analysis.Workspace;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Reading calcs at a revision with JGit: what is listed, what is read, and what is refused. */
class GitRepoTest {
    @TempDir
    Path dir;

    private static final String PANEL = "use \"air.plumb\"\ninput V = 20 m/s\nq = 0.5 * rho_air * V^2 in Pa\n";

    private static double value(Analysis a, String name) {
        return ((Binding.ValueBinding) a.scope().lookup(name)).value().si();
    }

    @Test
    void aCalcAndTheFilesItUsesAreReadAsTheRevisionHasThem() throws Exception {
        try (GitFixture git = GitFixture.init(dir)) {
            git.write("site/air.plumb", "input rho_air = 1.25 kg/m^3\n");
            git.write("site/panel.plumb", PANEL);
            git.commit("first issue");
            git.write("site/air.plumb", "input rho_air = 1.20 kg/m^3\n");
            git.commit("denser winter air dropped");
            git.write("site/air.plumb", "input rho_air = 1.30 kg/m^3\n");
            try (GitRepo repo = GitRepo.holding(dir)) {
                Path panel = repo.workTree().resolve("site/panel.plumb");
                // by hand: q = 0.5 · ρ · (20 m/s)² = 200 m²/s² · ρ: 250, 240 and 260 Pa.
                assertEquals(250, value(analysis(repo, "HEAD~1", panel), "q"), 1e-9);
                assertEquals(240, value(analysis(repo, "HEAD", panel), "q"), 1e-9);
                Workspace disk = new Workspace(repo.sources(repo.workingTree(), DiskReads.DEFAULT_MAX_BYTES), Settings.DEFAULT);
                assertEquals(260, value(disk.analyze(panel), "q"), 1e-9);
            }
        }
    }

    private static Analysis analysis(GitRepo repo, String rev, Path file) throws RevisionProblem {
        return new Workspace(repo.sources(repo.resolve(rev), DiskReads.DEFAULT_MAX_BYTES), Settings.DEFAULT).analyze(file);
    }

    @Test
    void theCalcsOfACommitAndOfTheWorkingTreeAreListed() throws Exception {
        try (GitFixture git = GitFixture.init(dir)) {
            git.write("a.plumb", "x = 1\n");
            git.write("sub/b.plumb", "y = 2\n");
            git.write("notes.txt", "not a calc\n");
            git.write(".gitignore", "build/\n");
            git.commit("two calcs");
            Files.delete(dir.resolve("a.plumb"));
            git.write("sub/c.plumb", "z = 3\n");
            git.write("build/copy.plumb", "x = 1\n");
            try (GitRepo repo = GitRepo.holding(dir.resolve("sub"))) {
                Path top = repo.workTree();
                assertEquals(List.of(top.resolve("a.plumb"), top.resolve("sub/b.plumb")),
                    repo.calcs(repo.resolve("HEAD"), List.of()));
                assertEquals(List.of(top.resolve("sub/b.plumb"), top.resolve("sub/c.plumb")),
                    repo.calcs(repo.workingTree(), List.of()), "new files count, ignored and deleted ones do not");
                List<String> sub = repo.inRepository(List.of(dir.resolve("sub")));
                assertEquals(List.of("sub"), sub);
                assertEquals(List.of(top.resolve("sub/b.plumb")), repo.calcs(repo.resolve("HEAD"), sub));
            }
        }
    }

    @Test
    void aLinkInACommitIsFollowedOnlyInsideTheWorkspace() throws Exception {
        Path outside = Files.createDirectories(dir.resolve("outside"));
        Files.writeString(outside.resolve("secret.plumb"), "input k = 1\n");
        Path top = Files.createDirectories(dir.resolve("repo"));
        try (GitFixture git = GitFixture.init(top)) {
            git.write("b.plumb", "y = 2\n");
            Files.createSymbolicLink(top.resolve("inside.plumb"), Path.of("b.plumb"));
            Files.createSymbolicLink(top.resolve("out.plumb"), Path.of("../outside/secret.plumb"));
            git.commit("links");
            try (GitRepo repo = GitRepo.holding(top)) {
                Sources at = repo.sources(repo.resolve("HEAD"), DiskReads.DEFAULT_MAX_BYTES);
                Path root = repo.workTree();
                assertEquals(new Sources.Text("y = 2\n"), at.load(root.resolve("inside.plumb"), root));
                assertEquals(new Sources.Missing(DiskReads.NO_SUCH_FILE), at.load(root.resolve("out.plumb"), root));
                assertEquals(new Sources.Missing(DiskReads.NO_SUCH_FILE), at.load(root.resolve("../outside/secret.plumb"), root));
            }
        }
    }

    @Test
    void aCommittedFileOverTheSizeLimitOrNotUtf8IsRefusedLikeOneOnDisk() throws Exception {
        try (GitFixture git = GitFixture.init(dir)) {
            git.write("big.plumb", "x = 1\n".repeat(100));
            Files.write(dir.resolve("binary.plumb"), new byte[] {'x', 0, 'y'});
            git.commit("odd files");
            try (GitRepo repo = GitRepo.holding(dir)) {
                Sources at = repo.sources(repo.resolve("HEAD"), 100);
                Path root = repo.workTree();
                assertEquals(new Sources.Missing(DiskReads.tooLarge(100)), at.load(root.resolve("big.plumb"), root));
                assertTrue(at.load(root.resolve("binary.plumb"), root) instanceof Sources.NotText);
            }
        }
    }

    @Test
    void headStateGivesTheCommitAndWhetherTheCalcDiffersFromIt() throws Exception {
        try (GitFixture git = GitFixture.init(dir)) {
            Path calc = git.write("panel.plumb", "input V = 20 m/s\n");
            git.write("other.plumb", "x = 1\n");
            String id = git.commit("first issue");
            HeadState clean = HeadState.of(calc).orElseThrow();
            assertEquals(id, clean.fullId());
            assertEquals(id.substring(0, 7), clean.shortId());
            assertFalse(clean.fileChanged());
            assertFalse(clean.treeChanged());
            git.write("other.plumb", "x = 2\n");
            HeadState otherEdited = HeadState.of(calc).orElseThrow();
            assertFalse(otherEdited.fileChanged());
            assertTrue(otherEdited.treeChanged());
            git.write("panel.plumb", "input V = 22 m/s\n");
            assertTrue(HeadState.of(calc).orElseThrow().fileChanged());
            Path fresh = git.write("new.plumb", "y = 1\n");
            assertTrue(HeadState.of(fresh).orElseThrow().fileChanged(), "a calc git does not know yet differs from HEAD");
        }
    }

    @Test
    void oneReaderForManyCalcsGivesEachCalcItsOwnState() throws Exception {
        Path loose = Files.createDirectories(dir.resolve("loose"));
        try (GitFixture git = GitFixture.init(dir.resolve("repo"))) {
            Path kept = git.write("kept.plumb", "x = 1\n");
            Path edited = git.write("sub/edited.plumb", "y = 1\n");
            String id = git.commit("two calcs");
            git.write("sub/edited.plumb", "y = 2\n");
            Path fresh = git.write("fresh.plumb", "z = 1\n");
            Path outside = Files.writeString(loose.resolve("calc.plumb"), "w = 1\n");
            HeadState.Reader reader = new HeadState.Reader();
            for (Path calc : List.of(kept, edited, fresh, outside)) {
                assertEquals(HeadState.of(calc), reader.of(calc), calc.toString());
            }
            assertFalse(reader.of(kept).orElseThrow().fileChanged());
            assertTrue(reader.of(kept).orElseThrow().treeChanged(), "sub/edited.plumb differs from HEAD");
            assertTrue(reader.of(edited).orElseThrow().fileChanged());
            assertTrue(reader.of(fresh).orElseThrow().fileChanged());
            assertEquals(id, reader.of(edited).orElseThrow().fullId());
            assertEquals(Optional.empty(), reader.of(outside));
        }
    }

    @Test
    void headStateIsEmptyOutsideARepositoryOrBeforeTheFirstCommit() throws Exception {
        Path loose = Files.createDirectories(dir.resolve("loose"));
        assertEquals(Optional.empty(), HeadState.of(loose.resolve("calc.plumb")));
        try (GitFixture git = GitFixture.init(dir.resolve("fresh"))) {
            assertEquals(Optional.empty(), HeadState.of(git.write("calc.plumb", "x = 1\n")));
        }
    }

    @Test
    void badRevisionsAndPlacesAreRefusedWithASentence() throws Exception {
        RevisionProblem none = assertThrows(RevisionProblem.class, () -> GitRepo.holding(dir));
        assertTrue(none.getMessage().endsWith("is not inside a git repository: run plumb diff inside one, or compare two calc "
            + "files with `plumb diff OLD.plumb NEW.plumb`"), none.getMessage());
        try (GitFixture git = GitFixture.init(dir.resolve("r"))) {
            git.write("a.plumb", "x = 1\n");
            try (GitRepo repo = GitRepo.holding(git.dir())) {
                assertTrue(assertThrows(RevisionProblem.class, () -> repo.resolve("HEAD")).getMessage()
                    .contains("has no commit yet"));
            }
            git.commit("one");
            try (GitRepo repo = GitRepo.holding(git.dir())) {
                String unknown = assertThrows(RevisionProblem.class, () -> repo.resolve("no-such\u001b[31m")).getMessage();
                assertTrue(unknown.startsWith("unknown revision 'no-such\\u001B[31m' in the repository at "), unknown);
                String outside = assertThrows(RevisionProblem.class, () -> repo.inRepository(List.of(dir))).getMessage();
                assertTrue(outside.contains(" is outside the repository at "), outside);
            }
        }
    }
}
