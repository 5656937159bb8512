package org.resonancegate.spec;

import java.time.LocalDate;

/** An accepted deviation from one criterion, valid through {@code expires} (inclusive). */
public record Waiver(String criterion, String reason, LocalDate expires, SourceLocation location) {
}
