package org.resonancegate.report;

import org.resonancegate.spec.SourceLocation;

/** A diagnostic as reported: where (file may be a profile the spec uses) and what. */
public record ErrorEntry(SourceLocation location, String message) {
}
