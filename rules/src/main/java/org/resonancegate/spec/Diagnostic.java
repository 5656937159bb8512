package org.resonancegate.spec;

/**
 * One problem with a spec or profile file, as a value. The message says what was found and what
 * would be accepted, so a reader can fix the file without opening the documentation.
 */
public record Diagnostic(SourceLocation location, String message) {
}
