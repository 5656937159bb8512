package org.resonancegate.baseline;

import java.io.IOException;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.function.Predicate;
import org.eclipse.jgit.errors.MissingObjectException;
import org.eclipse.jgit.errors.RevisionSyntaxException;
import org.eclipse.jgit.lib.Constants;
import org.eclipse.jgit.lib.FileMode;
import org.eclipse.jgit.lib.ObjectId;
import org.eclipse.jgit.lib.ObjectReader;
import org.eclipse.jgit.lib.Repository;
import org.eclipse.jgit.revwalk.RevCommit;
import org.eclipse.jgit.revwalk.RevTree;
import org.eclipse.jgit.revwalk.RevWalk;
import org.eclipse.jgit.storage.file.FileRepositoryBuilder;
import org.eclipse.jgit.treewalk.TreeWalk;
import org.resonancegate.spec.SpecFiles;

/**
 * The project's files as they are in one commit, read straight from the repository with JGit
 * (no {@code git} process, no checkout). Paths are the absolute paths the files would have on
 * disk; the project may sit anywhere inside the work tree. Git stores a symbolic link as a link,
 * not as its target, so a link is never a regular file here.
 */
final class GitSnapshot implements SpecFiles, AutoCloseable {

    private final Repository repository;
    private final ObjectReader reader;
    private final RevCommit commit;
    private final Path base;
    private final Path baseReal;
    private final Path workTreeReal;
    /** Directory listings read so far, by tree path; guarded by this snapshot's lock. */
    private final Map<String, Map<String, Entry>> listings = new HashMap<>();

    private GitSnapshot(Repository repository, RevCommit commit, Path base) throws IOException {
        this.repository = repository;
        this.reader = repository.newObjectReader();
        this.commit = commit;
        this.base = base;
        this.baseReal = base.toRealPath();
        this.workTreeReal = repository.getWorkTree().toPath().toRealPath();
    }

    /** Opens the repository holding {@code projectBase} and the commit {@code ref} names. */
    static GitSnapshot open(Path projectBase, String ref) throws BaselineException {
        Path base = projectBase.toAbsolutePath().normalize();
        FileRepositoryBuilder builder = new FileRepositoryBuilder().findGitDir(base.toFile());
        if (builder.getGitDir() == null) {
            throw new BaselineException("the baseline \"" + ref + "\" needs a Git repository, but " + base
                    + " is not inside one: looked for .git there and in every folder above it. Run the build in a"
                    + " clone of the repository, or leave resonance-gate.baseline unset");
        }
        Repository repository;
        try {
            repository = builder.setMustExist(true).build();
        } catch (IOException | RuntimeException e) {
            throw new BaselineException("cannot open the Git repository at " + builder.getGitDir() + ": " + e.getMessage(), e);
        }
        try {
            if (repository.isBare()) {
                throw new BaselineException("the Git repository at " + builder.getGitDir() + " has no work tree;"
                        + " run the build in a clone with a working copy");
            }
            RevCommit commit = resolve(repository, ref);
            return new GitSnapshot(repository, commit, base);
        } catch (BaselineException e) {
            repository.close();
            throw e;
        } catch (IOException | RuntimeException e) {
            repository.close();
            throw new BaselineException("cannot read the Git repository at " + builder.getGitDir() + ": " + e, e);
        }
    }

    private static RevCommit resolve(Repository repository, String ref) throws BaselineException, IOException {
        if (ref.isBlank()) {
            throw new BaselineException("the baseline is empty; name a Git revision such as HEAD, origin/main, a tag or"
                    + " a commit id");
        }
        ObjectId id;
        try {
            id = repository.resolve(ref + "^{commit}");
        } catch (RevisionSyntaxException | MissingObjectException e) {
            id = null;
        } catch (IOException | RuntimeException e) {
            // an ambiguous abbreviation, or a name that is a tree or a file rather than a commit
            throw new BaselineException("the baseline \"" + ref + "\" does not name one commit (" + e.getMessage()
                    + "); give a branch, a tag or a longer commit id", e);
        }
        boolean shallow = !repository.getObjectDatabase().getShallowCommits().isEmpty();
        if (id == null) {
            throw new BaselineException("unknown Git revision \"" + ref + "\" in " + repository.getWorkTree()
                    + ": no branch, tag or commit of that name. List what there is with `git branch -a` and"
                    + " `git tag`; a remote branch such as origin/main must be fetched first (`git fetch origin"
                    + " main`)" + (shallow ? ". " + shallowAdvice() : ""));
        }
        try (RevWalk walk = new RevWalk(repository)) {
            RevCommit commit = walk.parseCommit(id);
            walk.parseTree(commit.getTree());
            return commit;
        } catch (MissingObjectException e) {
            throw new BaselineException("the baseline \"" + ref + "\" (" + id.name() + ") is not in this clone"
                    + (shallow ? ". " + shallowAdvice() : "; fetch it (`git fetch origin`)"), e);
        }
    }

    private static String shallowAdvice() {
        return "This clone is shallow (its history is cut off), so older commits are missing: fetch them with"
                + " `git fetch --unshallow`, or `git fetch --depth=50 origin main` for enough of the history"
                + " (in CI, set the checkout's fetch depth to 0)";
    }

    String commitId() {
        return commit.name();
    }

    Instant commitTime() {
        return Instant.ofEpochSecond(commit.getCommitTime());
    }

    /**
     * The regular files below {@code directory} at this commit whose {@code /}-separated path
     * relative to it is selected, sorted by that path; empty when the directory does not exist there.
     */
    synchronized List<Path> files(Path directory, Predicate<String> selected) throws IOException {
        Optional<String> dir = treePath(directory);
        List<Path> out = new ArrayList<>();
        if (dir.isEmpty()) {
            return out;
        }
        RevTree root = commit.getTree();
        try (TreeWalk walk = new TreeWalk(repository, reader)) {
            if (dir.get().isEmpty()) {
                walk.addTree(root);
            } else {
                try (TreeWalk at = TreeWalk.forPath(repository, reader, dir.get(), root)) {
                    if (at == null || at.getFileMode(0) != FileMode.TREE) {
                        return out;
                    }
                    walk.addTree(at.getObjectId(0));
                }
            }
            walk.setRecursive(true);
            while (walk.next()) {
                String relative = walk.getPathString();
                if (regular(walk.getFileMode(0)) && selected.test(relative)) {
                    out.add(directory.resolve(relative).normalize());
                }
            }
        }
        out.sort((a, b) -> directory.relativize(a).toString().compareTo(directory.relativize(b).toString()));
        return out;
    }

    boolean isDirectory(Path directory) {
        return entry(directory).map(e -> e.mode == FileMode.TREE).orElse(false);
    }

    @Override
    public boolean exists(Path file) {
        return entry(file).isPresent();
    }

    @Override
    public boolean isRegularFile(Path file) {
        return entry(file).map(e -> regular(e.mode)).orElse(false);
    }

    @Override
    public Path realPath(Path file) throws IOException {
        // Git does not follow links; the path is its own real path (inside the project when under its base).
        Path abs = file.toAbsolutePath().normalize();
        if (!exists(abs)) {
            throw new java.nio.file.NoSuchFileException(abs.toString(), null, "not in commit " + commit.name());
        }
        return abs;
    }

    @Override
    public synchronized long size(Path file) throws IOException {
        return reader.getObjectSize(blob(file), Constants.OBJ_BLOB);
    }

    @Override
    public synchronized byte[] read(Path file) throws IOException {
        return reader.open(blob(file), Constants.OBJ_BLOB).getBytes();
    }

    /**
     * Several threads may read: the object reader, which is not safe for that, is only used under
     * this snapshot's lock, and fetching a blob is quick next to parsing and judging it.
     */
    @Override
    public boolean concurrent() {
        return true;
    }

    @Override
    public void close() {
        reader.close();
        repository.close();
    }

    private ObjectId blob(Path file) throws IOException {
        Entry e = entry(file).filter(x -> regular(x.mode))
                .orElseThrow(() -> new java.nio.file.NoSuchFileException(file.toString(), null,
                        "no such file in commit " + commit.name()));
        return e.id;
    }

    private record Entry(ObjectId id, FileMode mode) {
    }

    /**
     * The entry at {@code file}. Each directory's tree is listed once and kept, so the five or so
     * lookups per spec file do not each walk the commit's tree from its root again.
     */
    private synchronized Optional<Entry> entry(Path file) {
        Optional<String> path = treePath(file);
        if (path.isEmpty()) {
            return Optional.empty();
        }
        if (path.get().isEmpty()) {
            return Optional.of(new Entry(commit.getTree(), FileMode.TREE));
        }
        String p = path.get();
        int slash = p.lastIndexOf('/');
        Map<String, Entry> listing = listing(slash < 0 ? "" : p.substring(0, slash));
        return Optional.ofNullable(listing.get(p.substring(slash + 1)));
    }

    /** The entries of the directory at {@code dir} ("" for the root) by name; empty when there is no such directory. */
    private Map<String, Entry> listing(String dir) {
        Map<String, Entry> known = listings.get(dir);
        if (known != null) {
            return known;
        }
        Map<String, Entry> entries = new HashMap<>();
        ObjectId tree = null;
        if (dir.isEmpty()) {
            tree = commit.getTree();
        } else {
            int slash = dir.lastIndexOf('/');
            Entry self = listing(slash < 0 ? "" : dir.substring(0, slash)).get(dir.substring(slash + 1));
            if (self != null && self.mode == FileMode.TREE) {
                tree = self.id;
            }
        }
        if (tree != null) {
            try (TreeWalk walk = new TreeWalk(repository, reader)) {
                walk.addTree(tree);
                walk.setRecursive(false);
                while (walk.next()) {
                    entries.put(walk.getNameString(), new Entry(walk.getObjectId(0), walk.getFileMode(0)));
                }
            } catch (IOException e) {
                entries.clear(); // an unreadable tree reads as absent, as a failed lookup did before
            }
        }
        listings.put(dir, entries);
        return entries;
    }

    /** The path inside the repository's tree, {@code /}-separated ("" for the work tree's root); empty outside it. */
    private Optional<String> treePath(Path file) {
        Path abs = file.toAbsolutePath().normalize();
        Path inRealTerms = abs.startsWith(base) ? baseReal.resolve(base.relativize(abs)).normalize() : abs;
        if (!inRealTerms.startsWith(workTreeReal)) {
            return Optional.empty();
        }
        String relative = workTreeReal.relativize(inRealTerms).toString()
                .replace(abs.getFileSystem().getSeparator(), "/");
        if (relative.equals(".git") || relative.startsWith(".git/")) {
            return Optional.empty();
        }
        return Optional.of(relative);
    }

    private static boolean regular(FileMode mode) {
        return mode == FileMode.REGULAR_FILE || mode == FileMode.EXECUTABLE_FILE;
    }
}
