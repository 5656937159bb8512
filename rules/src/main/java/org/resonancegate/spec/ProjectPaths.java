package org.resonancegate.spec;

import java.io.IOException;
import java.nio.file.Path;

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

    /** Whether a real path (symbolic links resolved) lies inside the project. */
    boolean inside(Path realPath) {
        return realPath.startsWith(realBase);
    }
}
