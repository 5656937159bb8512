package org.resonancegate.report.html;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.StringJoiner;
import org.resonancegate.report.CheckResult;
import org.resonancegate.report.CheckStatus;
import org.resonancegate.report.ConsoleReport;
import org.resonancegate.report.DetailedSpecs;
import org.resonancegate.report.ErrorEntry;
import org.resonancegate.report.InputValue;
import org.resonancegate.report.ModeResult;
import org.resonancegate.report.ResponseCurve;
import org.resonancegate.report.Results;
import org.resonancegate.report.SpecResult;
import org.resonancegate.report.SpecStatus;
import org.resonancegate.spec.SourceLocation;

/** Words {@link Results} for the page: every number formatted, every status named, nothing computed anew. */
final class Pages {

    private Pages() {
    }

    static Page of(Results results) {
        List<Page.Row> rows = new ArrayList<>();
        List<Page.SpecView> specs = new ArrayList<>();
        Map<String, String> anchors = new HashMap<>();
        Set<String> detailed = DetailedSpecs.files(results.specs());
        for (int i = 0; i < results.specs().size(); i++) {
            SpecResult spec = results.specs().get(i);
            boolean full = detailed.contains(spec.file());
            String anchor = full ? "spec-" + (i + 1) : "";
            if (full) {
                anchors.put(spec.file(), anchor);
            }
            long[] n = counts(spec);
            rows.add(new Page.Row(anchor, spec.id().orElse("(no id)"), spec.details().title().orElse(""), spec.file(),
                    spec.status().key(), n[CheckStatus.PASS.ordinal()], n[CheckStatus.FAIL.ordinal()],
                    n[CheckStatus.WARNING.ordinal()], n[CheckStatus.WAIVED.ordinal()], spec.errors().size(),
                    headline(spec), Changes.kind(results.baseline(), spec.file())));
            if (full) {
                specs.add(SpecViews.of(spec, anchor, i + 1, results.baseline()));
            }
        }
        long failing = results.specs().stream()
                .filter(s -> s.status() == SpecStatus.FAIL || s.status() == SpecStatus.ERROR).count();
        String status = failing > 0 ? "fail"
                : results.specs().stream().anyMatch(s -> s.status() == SpecStatus.WAIVED) ? "waived" : "pass";
        int n = results.specs().size();
        String shown = detailed.size() == n ? "" : "Shown in full below: " + detailed.size() + " of " + n
                + " specs, those with errors, failures, waivers and warnings first; the others appear in this overview"
                + " only, and every spec's complete record is in results.json.";
        return new Page("Vibration check", summary(results), status, ConsoleReport.CAUTION, shown,
                results.baseline().map(c -> Changes.of(c, anchors)), rows, specs);
    }

    /** The spec's criteria counted by status, indexed by ordinal: one pass over them for the whole row. */
    private static long[] counts(SpecResult spec) {
        long[] n = new long[CheckStatus.values().length];
        for (CheckResult c : spec.checks()) {
            n[c.status().ordinal()]++;
        }
        return n;
    }

    private static String summary(Results results) {
        int n = results.specs().size();
        StringJoiner parts = new StringJoiner(", ");
        for (SpecStatus s : SpecStatus.values()) {
            long c = results.specs().stream().filter(r -> r.status() == s).count();
            if (c > 0 || s == SpecStatus.PASS || s == SpecStatus.FAIL) {
                parts.add(c + " " + s.key());
            }
        }
        return n + (n == 1 ? " spec: " : " specs: ") + parts;
    }

    /**
     * What a reviewer reads first in the overview: the errors, else the broken criteria, failing
     * ones before warnings (waived last), each with its status for the style.
     */
    static List<Page.Broken> headline(SpecResult spec) {
        List<Page.Broken> out = new ArrayList<>();
        if (!spec.errors().isEmpty()) {
            out.add(new Page.Broken("error", spec.errors().get(0).message()));
            return out;
        }
        for (CheckStatus s : List.of(CheckStatus.FAIL, CheckStatus.WARNING, CheckStatus.WAIVED)) {
            for (CheckResult c : spec.checks()) {
                if (c.status() == s) {
                    Units u = SpecViews.units(spec, c);
                    String worst = SpecViews.value(c, u);
                    String at = c.speedRpm().isPresent() ? " at " + Units.number(c.speedRpm().getAsDouble()) + " rpm" : "";
                    out.add(new Page.Broken(s.key(), c.criterion() + " " + c.rule() + " " + s.key() + ": " + worst
                            + " against " + SpecViews.value(c.rule(), c.limit(), u) + at));
                }
            }
        }
        return out;
    }

    static String where(SourceLocation l) {
        return l.file() + ":" + l.line() + ":" + l.column();
    }

    static List<Page.InputRow> inputs(List<InputValue> in) {
        List<Page.InputRow> out = new ArrayList<>();
        for (InputValue v : in) {
            out.add(new Page.InputRow(v.group(), v.label(), v.text(), where(v.location())));
        }
        return out;
    }

    static List<Page.ModeRow> modes(List<ModeResult> modes) {
        List<Page.ModeRow> out = new ArrayList<>();
        for (ModeResult m : modes) {
            StringJoiner shares = new StringJoiner(", ");
            for (ModeResult.Share s : m.shares()) {
                shares.add(s.motion() + " " + Math.round(s.fraction() * 100) + " %");
            }
            out.add(new Page.ModeRow(Integer.toString(m.index()), Units.number(m.frequencyHz()) + " Hz",
                    m.dampingRatio().isPresent() ? Units.percent(m.dampingRatio().getAsDouble()) : "–",
                    shares.toString()));
        }
        return out;
    }

    static List<Page.ErrorRow> errors(List<ErrorEntry> errors) {
        List<Page.ErrorRow> out = new ArrayList<>();
        for (ErrorEntry e : errors) {
            out.add(new Page.ErrorRow(where(e.location()), e.message()));
        }
        return out;
    }

    static Optional<ResponseCurve> curve(SpecResult spec, String criterion) {
        return spec.details().curves().stream().filter(c -> c.criterion().equals(criterion)).findFirst();
    }
}
