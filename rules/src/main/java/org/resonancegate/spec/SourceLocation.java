package org.resonancegate.spec;

/**
 * Where a value stands in a file: the project-relative path (always with {@code /}), and the
 * one-based line and column of its first character.
 */
public record SourceLocation(String file, int line, int column) {

    /** The {@code path:line:col} form that IDE and CI log matchers recognise. */
    public String display() {
        return file + ":" + line + ":" + column;
    }
}
