package org.resonancegate.report;

import java.io.BufferedOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;

/**
 * Replaces a file in one step. The bytes go to a temporary file in the target's own directory
 * (the same file system, so the move can be atomic), which is then moved over the target: a
 * reader, or a build killed half-way, sees the old file or the new one, never a part of one.
 */
public final class AtomicWrite {

    private AtomicWrite() {
    }

    /** What writes a file's bytes; the stream is buffered, and closed by {@link AtomicWrite}. */
    @FunctionalInterface
    public interface Body {
        void writeTo(OutputStream out) throws IOException;
    }

    /** Writes {@code bytes} to {@code target}, creating its directory, replacing any file there. */
    public static void write(Path target, byte[] bytes) throws IOException {
        write(target, out -> out.write(bytes));
    }

    /**
     * Streams {@code body} to {@code target}, creating its directory, replacing any file there. A
     * large report goes to the disk as it is made instead of being held whole in memory first.
     */
    public static void write(Path target, Body body) throws IOException {
        Path dir = target.toAbsolutePath().getParent();
        Files.createDirectories(dir);
        Path temp = Files.createTempFile(dir, "." + target.getFileName() + ".", ".tmp");
        try {
            try (OutputStream out = new BufferedOutputStream(Files.newOutputStream(temp), 1 << 16)) {
                body.writeTo(out);
            }
            readableLikeAnyFile(temp);
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

    /**
     * A temporary file is created readable by its owner alone; a report is read by CI artifact
     * publishers and web servers running as other users, so it gets the permissions an ordinary
     * new file gets (rw-r--r--), where the file system has POSIX permissions.
     */
    private static void readableLikeAnyFile(Path file) throws IOException {
        if (Files.getFileStore(file).supportsFileAttributeView(java.nio.file.attribute.PosixFileAttributeView.class)) {
            Files.setPosixFilePermissions(file, java.nio.file.attribute.PosixFilePermissions.fromString("rw-r--r--"));
        }
    }
}
