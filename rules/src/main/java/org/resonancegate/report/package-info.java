/**
 * The record of a run and the views drawn from it.
 *
 * <p>{@link org.resonancegate.report.Results} (with its spec, mode, check and error records) is
 * what the engine returns. {@link org.resonancegate.report.ResultsJson} writes it as
 * {@code results.json} (spec-format.md, "Results file"): fixed key order, ASCII only, byte for
 * byte the same for the same results, replaced atomically. {@link org.resonancegate.report.ConsoleReport}
 * turns it into leveled {@link org.resonancegate.report.ConsoleLine}s, one per finding in the
 * {@code path:line:col:} shape, so every front end prints the same lines. Every further report
 * should be drawn from {@code Results} (or the file) in the same way, never from the engine's
 * internals.
 */
package org.resonancegate.report;
