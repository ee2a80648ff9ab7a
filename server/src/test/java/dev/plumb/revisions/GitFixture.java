package dev.plumb.revisions;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.eclipse.jgit.api.Git;
import org.eclipse.jgit.api.errors.GitAPIException;
import org.eclipse.jgit.lib.PersonIdent;

/** A throw-away git repository built with JGit for tests: write files, commit them, read ids. */
public final class GitFixture implements AutoCloseable {
    private final Git git;
    private final Path dir;
    private int clock;

    private GitFixture(Git git, Path dir) {
        this.git = git;
        this.dir = dir;
    }

    /** A new repository on branch main in {@code dir}. */
    public static GitFixture init(Path dir) throws GitAPIException {
        return new GitFixture(Git.init().setDirectory(dir.toFile()).setInitialBranch("main").call(), dir);
    }

    public Path dir() {
        return dir;
    }

    /** Writes a file in the working tree, making folders as needed. */
    public Path write(String name, String text) throws IOException {
        Path p = dir.resolve(name);
        Files.createDirectories(p.getParent());
        Files.writeString(p, text);
        return p;
    }

    /** Stages everything (new, changed and deleted files) and commits it; returns the commit's full id. */
    public String commit(String message) throws GitAPIException {
        git.add().addFilepattern(".").call();
        git.add().setUpdate(true).addFilepattern(".").call();
        // A fixed author and clock: the same test makes the same commits.
        PersonIdent who = new PersonIdent("Plumb Test", "test@plumb.invalid", 1_700_000_000_000L + 60_000L * clock++, 0);
        return git.commit().setMessage(message).setAuthor(who).setCommitter(who).setSign(false).call().name();
    }

    @Override
    public void close() {
        git.close();
    }
}
