package org.resonancegate.report;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;

/**
 * A summary short enough for a pull-request comment or a CI job page: the count line, a table of
 * what needs a look (failed, warning and waived criteria, and diagnostics, the most serious
 * first) with the file and line of each, a pointer to the full report, and the caution.
 *
 * <p>With a baseline the summary leads with what the change did: one line of counts against the
 * revision, a short table of the inputs that changed and the modes that moved, and a column with
 * each finding's transition ({@code new}, {@code carried over}) in the findings table; criteria
 * fixed since the baseline are named below it.
 *
 * <p>All user text is escaped ({@link MarkdownText}) and long text is cut, so a hostile or very
 * long spec name can neither inject markup nor push the table off the screen. Deterministic:
 * {@code "\n"} line ends, no dates.
 */
public final class MarkdownSummary {

    /** The file name the plugin writes inside its output directory. */
    public static final String FILE_NAME = "summary.md";

    /** Rows beyond this are counted, not listed, so the summary fits on one screen. */
    static final int MAX_ROWS = 20;

    private static final int MAX_NAME = 40;
    private static final int MAX_LOCATION = 80;
    private static final int MAX_MESSAGE = 160;

    private MarkdownSummary() {
    }

    /**
     * @param title      the heading, e.g. "resonance-gate" or one naming the module
     * @param reportHref a relative link to the full report, when one is written
     */
    public static String render(Results results, String title, Optional<String> reportHref) {
        StringBuilder md = new StringBuilder();
        md.append("### ").append(MarkdownText.escape(MarkdownText.shorten(title, MAX_MESSAGE))).append("\n\n");
        results.baseline().ifPresent(c -> MarkdownChanges.lead(c, reportHref.isPresent(), md));
        md.append("**").append(ConsoleReport.countLine(results, false).text()).append("**\n\n"); // our own words, no markup in them
        List<ReportRow> rows = ReportRow.bySeriousness(results);
        boolean since = results.baseline().isPresent();
        if (rows.isEmpty()) {
            md.append(results.specs().isEmpty() ? "" : "Every criterion passes.\n\n");
        } else {
            md.append(since ? "| status | since " + cell(results.baseline().get().ref(), MAX_NAME) + " " : "| status ")
                    .append("| spec | criterion | rule | where | finding |\n");
            md.append(since ? "|---|---|---|---|---|---|---|\n" : "|---|---|---|---|---|---|\n");
            for (ReportRow row : rows.subList(0, Math.min(rows.size(), MAX_ROWS))) {
                md.append("| ").append(row.status());
                if (since) {
                    md.append(" | ").append(row.check()
                            .flatMap(c -> ChangeWords.transition(results.baseline(), row.spec(), c))
                            .filter(t -> t != Transition.PASS).map(Transition::words).orElse("–"));
                }
                md
                        .append(" | ").append(cell(row.specName(), MAX_NAME))
                        .append(" | ").append(row.check().map(c -> cell(c.criterion(), MAX_NAME)).orElse("–"))
                        .append(" | ").append(row.check().map(c -> cell(c.rule(), MAX_NAME)).orElse("spec error"))
                        .append(" | ").append(cell(row.location().display(), MAX_LOCATION))
                        .append(row.judgedFile().map(f -> " (for " + cell(f, MAX_LOCATION) + ")").orElse(""))
                        .append(" | ").append(cell(row.message(), MAX_MESSAGE))
                        .append(" |\n");
            }
            md.append('\n');
            if (rows.size() > MAX_ROWS) {
                int more = rows.size() - MAX_ROWS;
                md.append("…and ").append(more).append(more == 1 ? " more row" : " more rows")
                        .append(reportHref.isPresent() ? " in the full report.\n\n" : ", not listed here.\n\n");
            }
        }
        results.baseline().ifPresent(c -> MarkdownChanges.fixed(c, md));
        reportHref.ifPresent(href -> md.append("Full report: [").append(MarkdownText.escape(href)).append("](")
                .append(linkTarget(href)).append(")\n\n"));
        md.append("*").append(ConsoleReport.CAUTION).append("*\n");
        return md.toString();
    }

    public static byte[] toBytes(Results results, String title, Optional<String> reportHref) {
        return render(results, title, reportHref).getBytes(StandardCharsets.UTF_8);
    }

    /** Writes the summary to {@code target}, creating its directory; atomic ({@link AtomicWrite}). */
    public static void write(Results results, String title, Optional<String> reportHref, Path target)
            throws IOException {
        AtomicWrite.write(target, toBytes(results, title, reportHref));
    }

    static String cell(String text, int max) {
        return MarkdownText.escape(MarkdownText.shorten(text, max));
    }

    /** A link destination in angle brackets takes spaces; percent-encoding keeps it to one safe form. */
    private static String linkTarget(String href) {
        return "<" + UriPath.encode(href) + ">";
    }
}
