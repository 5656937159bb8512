package org.resonancegate.report.html;

import java.util.List;
import java.util.Optional;

/**
 * Everything the page template shows, already worded: the template only places and escapes it.
 * Status words double as style classes ("pass", "fail", "warning", "waived", "error").
 */
public record Page(String heading, String summary, String summaryStatus, String caution, List<Row> overview,
                   List<SpecView> specs) {

    /** One line of the overview table. */
    public record Row(String anchor, String id, String title, String file, String status, long pass, long fail,
                      long warning, long waived, int errors, String headline) {
    }

    public record SpecView(String anchor, String id, String title, String revision, String file, String status,
                           String verdict, List<InputRow> inputs, List<ModeRow> modes, List<CheckRow> checks,
                           List<ErrorRow> errors, List<WaiverRow> waivers, Optional<PlotView> interference,
                           List<Legend> legend, List<PlotView> responses) {
    }

    public record InputRow(String group, String label, String text, String where) {
    }

    public record ModeRow(String index, String frequency, String damping, String shares) {
    }

    /** {@code marginStatus}: "pass" with room to spare, "fail" past the limit. */
    public record CheckRow(String criterion, String rule, String severity, String status, String worst, String limit,
                           String margin, String marginStatus, String speed, String frequency, String where,
                           String basis, String message) {
    }

    public record ErrorRow(String where, String message) {
    }

    public record WaiverRow(String criterion, String reason, String expires, String state, String where) {
    }

    /** A legend entry: the style class of an excitation's line and its words. */
    public record Legend(String cls, String text) {
    }

    public record PlotView(String title, String note, Svg svg) {
    }
}
