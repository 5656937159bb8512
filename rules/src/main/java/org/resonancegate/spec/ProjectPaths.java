package org.resonancegate.spec;

import java.io.IOException;
import java.nio.file.Path;
import java.util.Optional;

/** The project base directory, and how paths inside it are named in diagnostics. */
final class ProjectPaths {

    private final Path base;
    private final Path realBase;

    private final SpecFiles files;

    ProjectPaths(Path projectBase, SpecFiles files) {
        this.base = projectBase.toAbsolutePath().normalize();
        this.files = files;
        Path real;
        try {
            real = files.realPath(base);
        } catch (IOException | RuntimeException e) {
            real = base;
        }
        this.realBase = real;
    }

    /** Where the files' contents come from. */
    SpecFiles files() {
        return files;
    }

    /** The absolute, normalised form of {@code file}; a relative one is taken relative to the base. */
    Path absolute(Path file) {
        return base.resolve(file).toAbsolutePath().normalize();
    }

    /** Project-relative name with {@code /}, as every report shows it. */
    String display(Path file) {
        Path abs = absolute(file);
        Path from = abs.startsWith(base) ? base : abs.startsWith(realBase) ? realBase : base;
        String rel = from.relativize(abs).toString();
        return rel.replace(abs.getFileSystem().getSeparator(), "/");
    }

    /**
     * Where {@code file} really leads when it sits in the project but a symbolic link takes it
     * outside; empty for a file that stays inside, does not exist (reading reports that), or was
     * named outside the project in the first place.
     */
    Optional<String> linkLeavingTheProject(Path file) {
        Path abs = absolute(file);
        if (!abs.startsWith(base)) {
            return Optional.empty();
        }
        try {
            Path real = files.realPath(abs);
            return inside(real) ? Optional.empty() : Optional.of(real.toString());
        } catch (IOException | RuntimeException e) {
            return Optional.empty();
        }
    }

    /** Whether a real path (symbolic links resolved) lies inside the project. */
    boolean inside(Path realPath) {
        return realPath.startsWith(realBase);
    }
}
