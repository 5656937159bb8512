package org.resonancegate.maven;

import org.resonancegate.report.Results;

/**
 * The engine's results with, when nothing was checked, the reason in the user's terms.
 *
 * @param nothing why nothing was checked, or {@code ""}
 */
record SpecRun(Results results, String nothing) {
}
