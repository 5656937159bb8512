/**
 * The record of a run and the views drawn from it.
 *
 * <p>{@link org.resonancegate.report.Results} (with its spec, mode, check and error records) is
 * what the engine returns. {@link org.resonancegate.report.ResultsJson} writes it as
 * {@code results.json} (spec-format.md, "Results file"): fixed key order, ASCII only, byte for
 * byte the same for the same results, replaced atomically. {@link org.resonancegate.report.ConsoleReport}
 * turns it into leveled {@link org.resonancegate.report.ConsoleLine}s, one per finding in the
 * {@code path:line:col:} shape, so every front end prints the same lines.
 * {@link org.resonancegate.report.MarkdownSummary}, {@link org.resonancegate.report.SarifReport}
 * and {@link org.resonancegate.report.JunitReport} write the short summary, SARIF 2.1.0 and JUnit
 * XML; {@link org.resonancegate.report.ReportFormat} names them all for a front end, with their
 * file names, and {@link org.resonancegate.report.AtomicWrite} replaces each file in one step.
 * Every report is drawn from {@code Results} in the same way, never from the engine's internals.
 */
package org.resonancegate.report;
