package org.resonancegate.baseline;

import java.nio.file.Path;
import java.util.Objects;
import java.util.function.Predicate;

/**
 * Which revision to compare with, and which files are specs there: the same spec directory and
 * the same include/exclude selection as the current run.
 *
 * @param ref           a Git revision: a branch ({@code origin/main}), a tag, a commit id, {@code HEAD~1}
 * @param specDirectory the spec directory as it is on disk (absolute, or relative to the project base)
 * @param selected      whether a file is a candidate, given its {@code /}-separated path relative to
 *                      {@code specDirectory}
 */
public record BaselineRequest(String ref, Path specDirectory, Predicate<String> selected) {

    public BaselineRequest {
        Objects.requireNonNull(ref, "ref");
        Objects.requireNonNull(specDirectory, "specDirectory");
        Objects.requireNonNull(selected, "selected");
    }
}
