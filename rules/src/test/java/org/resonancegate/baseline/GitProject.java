package org.resonancegate.baseline;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.List;
import java.util.function.Predicate;
import java.util.stream.Stream;
import org.eclipse.jgit.api.Git;
import org.eclipse.jgit.api.errors.GitAPIException;
import org.eclipse.jgit.lib.PersonIdent;
import org.resonancegate.check.CheckRequest;
import org.resonancegate.check.CheckRun;
import org.resonancegate.report.Results;

/**
 * A real Git repository in a temporary folder, built with JGit: write files, commit them at a
 * chosen time, then judge the working tree against a revision as the plugin would.
 */
public final class GitProject implements AutoCloseable {

    /** A single mass under one unbalance over 900–1480 rpm, with a 20 % separation margin. */
    public static String spec(String id, String stiffness, String extra) {
        return """
                {
                  "format": "resonance-gate/1",
                  "id": "%s",
                  "model": {"kind": "single", "mass": "1000 kg", "stiffness": "%s", "damping": {"ratio": 0.05}},
                  "operation": {"speed": {"min": "900 rpm", "max": "1480 rpm"}},
                  "excitations": [{"name": "impeller", "kind": "unbalance", "unbalance": "120 g·mm"}],
                  "criteria": [{"id": "SEP", "rule": "separation", "margin": "20 %%"}]%s
                }
                """.formatted(id, stiffness, extra);
    }

    final Path workTree;
    final Path project;
    final Git git;

    /** @param projectDir the Maven project's folder inside the work tree ("" for the root) */
    public GitProject(Path workTree, String projectDir) {
        try {
            this.workTree = workTree;
            this.project = projectDir.isEmpty() ? workTree : workTree.resolve(projectDir);
            Files.createDirectories(project);
            this.git = Git.init().setDirectory(workTree.toFile()).setInitialBranch("main").call();
        } catch (GitAPIException | IOException e) {
            throw new IllegalStateException(e);
        }
    }

    public Path write(String relative, String content) {
        try {
            Path file = project.resolve(relative);
            Files.createDirectories(file.getParent());
            Files.writeString(file, content, StandardCharsets.UTF_8);
            return file;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    void delete(String relative) {
        try {
            Files.delete(project.resolve(relative));
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** Stages everything (deletions too) and commits it at {@code when}. */
    public String commit(String message, Instant when) {
        try {
            git.add().addFilepattern(".").call();
            git.add().addFilepattern(".").setUpdate(true).call();
            PersonIdent who = new PersonIdent("Test Engineer", "engineer@example.invalid", when, ZoneOffset.UTC);
            return git.commit().setMessage(message).setAuthor(who).setCommitter(who).setSign(false).call().name();
        } catch (GitAPIException e) {
            throw new IllegalStateException(e);
        }
    }

    /** The spec files now on disk below src/vibration, as the plugin's default includes pick them. */
    List<Path> specFiles() {
        Path dir = project.resolve("src/vibration");
        if (!Files.isDirectory(dir)) {
            return List.of();
        }
        try (Stream<Path> walk = Files.walk(dir)) {
            return walk.filter(Files::isRegularFile).filter(p -> p.toString().endsWith(".json")).sorted().toList();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** The current run, compared with {@code ref}. */
    public Results judge(String ref, java.time.Clock clock) throws BaselineException {
        CheckRequest request = new CheckRequest(project, specFiles(), clock);
        Results current = CheckRun.run(request);
        Predicate<String> json = p -> p.endsWith(".json");
        return BaselineRun.compare(request, current, new BaselineRequest(ref, Path.of("src/vibration"), json));
    }

    @Override
    public void close() {
        git.close();
    }
}
