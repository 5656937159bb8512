/**
 * Comparison with a Git baseline. {@link org.resonancegate.baseline.BaselineRun} reads the spec
 * files and profiles as they were at a revision straight from the repository (JGit, no checkout),
 * judges them with the same reader and engine as the current run, and attaches a
 * {@link org.resonancegate.report.Comparison} to the current results.
 * {@link org.resonancegate.baseline.Ratchet} turns results into a build verdict under
 * {@link org.resonancegate.baseline.FailOn}: every failure, or only those new since the baseline.
 */
package org.resonancegate.baseline;
