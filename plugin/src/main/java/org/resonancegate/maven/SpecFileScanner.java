package org.resonancegate.maven;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.stream.Stream;

/**
 * The candidate spec files below a directory: regular files matching at least one include and no
 * exclude, sorted by their {@code /}-separated relative path so the order (and so every report) is
 * the same on every platform and file system. Symbolic links to directories below it are not
 * followed, which keeps a link cycle from hanging the build.
 */
final class SpecFileScanner {

    private final List<GlobPattern> includes;
    private final List<GlobPattern> excludes;

    SpecFileScanner(List<String> includes, List<String> excludes) {
        this.includes = includes.stream().filter(p -> !p.isBlank()).map(GlobPattern::of).toList();
        this.excludes = excludes.stream().filter(p -> !p.isBlank()).map(GlobPattern::of).toList();
    }

    /**
     * @return the selected files, as paths below {@code directory} as given (a spec directory that
     *         is itself a symbolic link is walked at its target, but reported under its own name)
     */
    List<Path> scan(Path directory) throws IOException {
        try (Stream<Path> files = regularFiles(directory)) {
            // each file's relative name is worked out once, not again in every comparison of the sort
            Map<String, Path> byName = new TreeMap<>();
            files.forEach(file -> {
                String name = relative(directory, file);
                if (selected(name)) {
                    byName.put(name, file);
                }
            });
            return List.copyOf(byName.values());
        }
    }

    /**
     * Whether at least {@code n} files below {@code directory} are selected; stops walking at the
     * {@code n}-th, so a large spec folder is not listed twice just to learn that it is large.
     */
    boolean atLeast(Path directory, int n) throws IOException {
        try (Stream<Path> files = regularFiles(directory)) {
            return files.filter(file -> selected(relative(directory, file))).limit(n).count() >= n;
        }
    }

    /**
     * The regular files below {@code directory}, lazily, as paths below it as given (a spec
     * directory that is itself a symbolic link is walked at its target); the caller closes the stream.
     */
    private static Stream<Path> regularFiles(Path directory) throws IOException {
        Path root = Files.isSymbolicLink(directory) ? directory.toRealPath() : directory;
        return Files.walk(root).filter(Files::isRegularFile).map(file -> directory.resolve(root.relativize(file)));
    }

    /**
     * The includes, as written, that name a single file (no wildcard) which is not among
     * {@code found}: a mistyped or deleted file name would otherwise leave a spec unchecked
     * without a word, while the other includes still find something.
     */
    List<String> missingNamedFiles(Path directory, List<Path> found) {
        List<String> named = includes.stream().map(GlobPattern::toString)
                .filter(p -> p.chars().noneMatch(c -> c == '*' || c == '?' || c == '[' || c == '{'))
                .toList();
        if (named.isEmpty()) {
            return List.of(); // the usual case: only wildcards, and no need to name every file found
        }
        List<String> names = found.stream().map(file -> relative(directory, file)).toList();
        return named.stream().filter(p -> names.stream().noneMatch(GlobPattern.of(p)::matches)).toList();
    }

    boolean selected(String relativePath) {
        return includes.stream().anyMatch(p -> p.matches(relativePath))
                && excludes.stream().noneMatch(p -> p.matches(relativePath));
    }

    static String relative(Path directory, Path file) {
        return directory.relativize(file).toString().replace(file.getFileSystem().getSeparator(), "/");
    }
}
