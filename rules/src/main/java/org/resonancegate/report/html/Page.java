package org.resonancegate.report.html;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * Everything the page template shows, already worded: the template only places and escapes it.
 * Status words double as style classes ("pass", "fail", "warning", "waived", "error").
 */
/** {@code shown}: when only some specs have a section, a sentence saying which; empty otherwise. */
public record Page(String heading, String summary, String summaryStatus, String caution, String shown,
                   Optional<Changes> changes,
                   List<Row> overview, List<SpecView> specs) {

    /**
     * What changed since the baseline, shown near the top: the revision, a line of counts and a
     * block per spec that changed, appeared, went away or moved.
     */
    public record Changes(String ref, String commit, String judgedOn, String lead, List<String> notes,
                          List<SpecDelta> specs) {
    }

    /** {@code anchor}: the spec's section on this page, empty for a removed spec. */
    public record SpecDelta(String anchor, String name, String kind, String file, String status,
                            List<ErrorRow> baselineErrors, List<InputDelta> inputs, List<ModeDelta> modes,
                            List<CriterionDelta> criteria) {
    }

    public record InputDelta(String path, String before, String after, String where) {
    }

    public record ModeDelta(String index, String before, String after, String change) {
    }

    /** {@code transition}: the style class and word ({@code new}, {@code carried-over}, ...). */
    public record CriterionDelta(String criterion, String rule, String transition, String transitionWords,
                                 String status, String value, String limit, String margin) {
    }

    /** One line of the overview table. */
    /** {@code change}: the spec's change since the baseline ("changed", "added", ...), empty without one. */
    public record Row(String anchor, String id, String title, String file, String status, long pass, long fail,
                      long warning, long waived, int errors, List<Broken> headline, String change) {

        /** The file path cut after each '/', so the template can offer a line break there and nowhere else. */
        public List<String> fileParts() {
            // as file.split("(?<=/)") would cut it (no trailing empty part), without a regex per row
            List<String> parts = new ArrayList<>();
            int start = 0;
            for (int slash = file.indexOf('/'); slash >= 0; slash = file.indexOf('/', start)) {
                parts.add(file.substring(start, slash + 1));
                start = slash + 1;
            }
            if (start < file.length() || parts.isEmpty()) {
                parts.add(file.substring(start));
            }
            return List.copyOf(parts);
        }
    }

    /** One entry of the overview's "what broke": {@code status} (fail, warning, waived, error) picks the style. */
    public record Broken(String status, String text) {
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

    /**
     * {@code marginStatus}: "pass" with room to spare, "fail" past the limit. {@code transition}:
     * since the baseline ({@code new}, {@code carried-over}, {@code fixed}), empty without one or
     * for a criterion that passes on both sides.
     */
    public record CheckRow(String criterion, String rule, String severity, String status, String worst, String limit,
                           String margin, String marginStatus, String speed, String frequency, String where,
                           String basis, String message, String transition, String transitionWords) {
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
