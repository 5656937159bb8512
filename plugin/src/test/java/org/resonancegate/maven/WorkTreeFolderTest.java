package org.resonancegate.maven;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Where a module sits in its Git work tree, for report paths a code-review tool resolves from the checkout. */
class WorkTreeFolderTest {

    @TempDir
    Path dir;

    @Test
    void aModuleBelowTheWorkTreeRootIsNamedByItsFolders() throws IOException {
        Files.createDirectories(dir.resolve(".git"));
        Path module = Files.createDirectories(dir.resolve("plant/pumps"));
        assertEquals(Optional.of("plant/pumps/"), AbstractGateMojo.folderInWorkTree(module));
    }

    @Test
    void aLinkedWorkTreeWithAGitFileCountsToo() throws IOException {
        Files.writeString(dir.resolve(".git"), "gitdir: /elsewhere/.git/worktrees/x\n");
        Path module = Files.createDirectories(dir.resolve("fans"));
        assertEquals(Optional.of("fans/"), AbstractGateMojo.folderInWorkTree(module));
    }

    @Test
    void theRootItselfNamesNoFolder() throws IOException {
        Files.createDirectories(dir.resolve(".git"));
        assertEquals(Optional.empty(), AbstractGateMojo.folderInWorkTree(dir));
    }
}
