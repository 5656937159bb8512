package org.resonancegate.maven;

import java.nio.file.Path;
import java.util.List;
import java.util.Optional;

/**
 * Everything a run needs from the goal's parameters, resolved to absolute paths and plain values,
 * and free of Maven types so the same run can go on in a separate JVM ({@link SeparateJvm}).
 *
 * @param base        the project's base directory
 * @param specs       the spec directory
 * @param output      the report directory
 * @param includes    include patterns (never empty: the default is filled in)
 * @param excludes    exclude patterns
 * @param formats     the report formats as the user named them (empty: all)
 * @param summaryFile a further file the Markdown summary is appended to
 * @param baseline    the Git revision to compare with
 * @param failOn      {@code violation} or {@code new-violation}, as written
 * @param artifactId  the module's name for the summary heading, or {@code ""}
 */
record GateSettings(Path base, Path specs, Path output, List<String> includes, List<String> excludes,
                    List<String> formats, Optional<Path> summaryFile, Optional<String> baseline, String failOn,
                    String artifactId) {

    GateSettings {
        includes = List.copyOf(includes);
        excludes = List.copyOf(excludes);
        formats = List.copyOf(formats);
    }
}
