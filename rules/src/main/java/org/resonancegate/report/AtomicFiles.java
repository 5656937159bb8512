package org.resonancegate.report;

import java.io.IOException;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;

/** How every report file is written: whole or not at all. */
public final class AtomicFiles {

    private AtomicFiles() {
    }

    /**
     * Writes {@code bytes} to {@code target}, creating its directory. Atomic: the bytes go to a
     * temporary file in the same directory, which is then moved over the target, so a reader (or
     * an interrupted build) never sees half a file, and a failed write leaves the old file as it was.
     */
    public static void write(Path target, byte[] bytes) throws IOException {
        Path dir = target.toAbsolutePath().getParent();
        Files.createDirectories(dir);
        Path temp = Files.createTempFile(dir, "." + target.getFileName() + ".", ".tmp");
        try {
            Files.write(temp, bytes);
            try {
                Files.move(temp, target, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            } catch (AtomicMoveNotSupportedException e) {
                // same directory, so only an exotic file system lands here; a plain replace is the best left
                Files.move(temp, target, StandardCopyOption.REPLACE_EXISTING);
            }
        } finally {
            Files.deleteIfExists(temp);
        }
    }
}
