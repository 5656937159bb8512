package org.resonancegate.report.html;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.StringJoiner;
import org.resonancegate.report.ChangeWords;
import org.resonancegate.report.CheckResult;
import org.resonancegate.report.CheckStatus;
import org.resonancegate.report.Comparison;
import org.resonancegate.report.Interference;
import org.resonancegate.report.ResponseCurve;
import org.resonancegate.report.SpecResult;
import org.resonancegate.report.Transition;

/** One spec's section: identity, inputs, modes, criteria, diagnostics, waivers and the two plots. */
final class SpecViews {

    private SpecViews() {
    }

    static Page.SpecView of(SpecResult spec, String anchor, int number, Optional<Comparison> baseline) {
        List<Page.CheckRow> checks = new ArrayList<>();
        List<Page.WaiverRow> waivers = new ArrayList<>();
        for (CheckResult c : spec.checks()) {
            Optional<Transition> t = ChangeWords.transition(baseline, spec, c).filter(x -> x != Transition.PASS);
            checks.add(row(spec, c, t));
            c.waiver().ifPresent(w -> waivers.add(new Page.WaiverRow(c.criterion(), w.reason(), w.expires().toString(),
                    w.valid() ? "in force" : "expired", Pages.where(w.location()))));
        }
        Optional<Page.PlotView> interference = Optional.empty();
        List<Page.Legend> legend = List.of();
        List<Page.PlotView> responses = new ArrayList<>();
        if (spec.details().interference().isPresent()) {
            Interference d = spec.details().interference().get();
            String note = "Natural frequencies of the " + d.basis() + " case"
                    + d.marginCriterion().map(id -> ", the case that governs " + id).orElse("")
                    + (d.margin().isPresent() ? "; bands ± " + Units.percent(d.margin().getAsDouble())
                    + " around each mode" : "; no separation criterion, so no bands")
                    + ". A filled marker on a thick stretch: an order meets a mode's band inside the operating"
                    + " range; a hollow marker: an order crosses a mode's line outside the operating range.";
            Optional<InterferencePlot.Baseline> was = Changes.overlay(baseline, spec.file());
            interference = Optional.of(new Page.PlotView("Interference diagram", note,
                    InterferencePlot.draw(d, "p" + number + "i", was)));
            legend = InterferencePlot.legend(d, was);
            int k = 0;
            for (ResponseCurve curve : spec.details().curves()) {
                Optional<CheckResult> check = spec.checks().stream()
                        .filter(c -> c.criterion().equals(curve.criterion())).findFirst();
                String status = check.map(c -> c.status().key()).orElse("");
                String title = curve.criterion() + ": " + curve.quantity() + (status.isEmpty() ? "" : " (" + status + ")");
                String how = "Computed on the " + curve.basis() + " case, the one that governs " + curve.criterion()
                        + "; " + curve.points().size() + " speeds up to 1.25 × the top speed.";
                responses.add(new Page.PlotView(title, how, ResponsePlot.draw(curve, check, d.minSpeedRpm(),
                        d.maxSpeedRpm(), "p" + number + "r" + (++k))));
            }
        }
        return new Page.SpecView(anchor, spec.id().orElse("(no id)"), spec.details().title().orElse(""),
                spec.details().revision().orElse(""), spec.file(), spec.status().key(), verdict(spec),
                Pages.inputs(spec.details().inputs()), Pages.modes(spec.modes()), checks, Pages.errors(spec.errors()),
                waivers, interference, legend, responses);
    }

    private static String verdict(SpecResult spec) {
        return switch (spec.status()) {
            case PASS -> "Every criterion holds.";
            case WAIVED -> "A broken criterion is waived; see the waivers below.";
            case ERROR -> "The spec could not be judged: see the diagnostics below. An error never counts as a pass.";
            case FAIL -> {
                StringJoiner j = new StringJoiner(", ");
                spec.checks().stream().filter(c -> c.status() == CheckStatus.FAIL).forEach(c -> j.add(c.criterion()));
                yield "Fails on " + j + ".";
            }
        };
    }

    /** The unit a check is shown in: that of its curve (as the user wrote the limit), else SI with a prefix. */
    static Units units(SpecResult spec, CheckResult c) {
        Optional<ResponseCurve> curve = Pages.curve(spec, c.criterion());
        if (curve.isPresent() && !c.rule().equals("isolation")) {
            return ResponsePlot.units(curve.get());
        }
        return Units.forSi(c.unit());
    }

    static String value(CheckResult c, Units u) {
        return value(c.rule(), c.value(), u);
    }

    /** Separation is a fraction read as a percentage; everything else in its unit. */
    static String value(String rule, double v, Units u) {
        return rule.equals("separation") ? Units.percent(v) : u.format(v);
    }

    private static Page.CheckRow row(SpecResult spec, CheckResult c, Optional<Transition> transition) {
        Units u = units(spec, c);
        boolean exceeded = c.status() != CheckStatus.PASS;
        // which side the bound is on follows from the verdict: a pass below the limit is an upper bound
        boolean upper = exceeded == c.value() > c.limit();
        String limit = (upper ? "≤ " : "≥ ") + value(c.rule(), c.limit(), u);
        String margin = "–";
        if (c.limit() != 0 && Double.isFinite(c.value())) {
            double m = Math.abs(c.limit() - c.value()) / Math.abs(c.limit());
            margin = (exceeded ? "−" : "+") + Units.percent(m);
        }
        return new Page.CheckRow(c.criterion(), c.rule(), c.severity().key(), c.status().key(), value(c, u), limit,
                margin, exceeded ? "fail" : "pass",
                c.speedRpm().isPresent() ? Units.number(c.speedRpm().getAsDouble()) + " rpm" : "–",
                c.frequencyHz().isPresent() ? Units.number(c.frequencyHz().getAsDouble()) + " Hz" : "–",
                Pages.where(c.location()), c.governingCase().orElse("–"), c.message(),
                transition.map(Transition::key).orElse(""), transition.map(Transition::words).orElse(""));
    }
}
