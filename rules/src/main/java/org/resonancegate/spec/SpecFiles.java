package org.resonancegate.spec;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

/**
 * Where the spec reader takes file contents from: the disk by default, or a snapshot such as a
 * Git commit, so a spec as it was at another revision goes through exactly the same reader, the
 * same diagnostics and the same profile resolution. Paths are absolute paths as they would be on
 * disk inside the project; an implementation maps them to its own store.
 */
public interface SpecFiles {

    /** The project's own files on disk. */
    static SpecFiles disk() {
        return Disk.INSTANCE;
    }

    boolean exists(Path file);

    boolean isRegularFile(Path file);

    /**
     * The path with symbolic links resolved, as far as the store knows them; the project rule
     * that a profile may not leave the project is checked on this path.
     */
    Path realPath(Path file) throws IOException;

    long size(Path file) throws IOException;

    byte[] read(Path file) throws IOException;

    /** Whether several threads may read at once (the disk may; a Git snapshot may, as it locks its object reader). */
    default boolean concurrent() {
        return false;
    }

    /** The plain file system. */
    enum Disk implements SpecFiles {
        INSTANCE;

        @Override
        public boolean concurrent() {
            return true;
        }

        @Override
        public boolean exists(Path file) {
            return Files.exists(file);
        }

        @Override
        public boolean isRegularFile(Path file) {
            return Files.isRegularFile(file);
        }

        @Override
        public Path realPath(Path file) throws IOException {
            return file.toRealPath();
        }

        @Override
        public long size(Path file) throws IOException {
            return Files.size(file);
        }

        @Override
        public byte[] read(Path file) throws IOException {
            return Files.readAllBytes(file);
        }
    }
}
