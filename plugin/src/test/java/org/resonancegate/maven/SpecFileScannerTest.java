package org.resonancegate.maven;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Which files the goal hands to the engine, and in which order, on a real temporary file tree. */
class SpecFileScannerTest {

    @Test
    void scannerSortsByRelativePathAndAppliesExcludes(@TempDir Path dir) throws IOException {
        for (String f : List.of("b.json", "a/z.json", "a/b/c.json", "drafts/d.json", "notes.txt")) {
            Path file = dir.resolve(f);
            Files.createDirectories(file.getParent());
            Files.writeString(file, "{}");
        }
        List<String> found = new SpecFileScanner(List.of("**/*.json"), List.of("drafts/**"))
                .scan(dir).stream().map(p -> SpecFileScanner.relative(dir, p)).toList();
        assertEquals(List.of("a/b/c.json", "a/z.json", "b.json"), found);
    }

    @Test
    void aSpecDirectoryThatIsALinkIsWalkedAtItsTarget(@TempDir Path dir) throws IOException {
        Path shared = Files.createDirectories(dir.resolve("shared/specs"));
        Files.writeString(shared.resolve("p.json"), "{}");
        Files.createDirectories(dir.resolve("project/src"));
        Path link = Files.createSymbolicLink(dir.resolve("project/src/vibration"), shared);
        List<Path> found = new SpecFileScanner(List.of("**/*.json"), List.of()).scan(link);
        assertEquals(List.of(link.resolve("p.json")), found);
    }
}
