package org.resonancegate.report;

import java.util.Optional;
import org.resonancegate.spec.SourceLocation;

/**
 * One input of a spec file that differs from the baseline, as written on each side (a JSON
 * literal: {@code "135 kN/m"} with its quotes, a number, {@code []}); empty on the side where the
 * value does not exist.
 *
 * @param path     the JSON path, {@code model.mounts[2].stiffness.z}
 * @param location where the current value stands; empty for a value that was removed
 */
public record InputChange(String path, Optional<String> before, Optional<String> after,
                          Optional<SourceLocation> location) {
}
