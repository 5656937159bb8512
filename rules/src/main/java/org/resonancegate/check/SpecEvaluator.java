package org.resonancegate.check;

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import org.resonancegate.criteria.CriterionProblem;
import org.resonancegate.criteria.Finding;
import org.resonancegate.criteria.RuleContext;
import org.resonancegate.criteria.Rules;
import org.resonancegate.criteria.Ties;
import org.resonancegate.dynamics.LinearSystem;
import org.resonancegate.dynamics.Mode;
import org.resonancegate.dynamics.MotionShare;
import org.resonancegate.dynamics.SystemBuilder;
import org.resonancegate.report.CheckResult;
import org.resonancegate.report.CheckStatus;
import org.resonancegate.report.ErrorEntry;
import org.resonancegate.report.ModeResult;
import org.resonancegate.report.SpecResult;
import org.resonancegate.report.SpecStatus;
import org.resonancegate.spec.Criterion;
import org.resonancegate.spec.Spec;

/**
 * Judges one spec: builds the model at each tolerance case, evaluates every criterion on every
 * case, keeps the worst case per criterion, applies waivers and sets the statuses. Anything that
 * cannot be computed becomes an error entry and status error, never a pass.
 */
public final class SpecEvaluator {

    private SpecEvaluator() {
    }

    /** As {@link #evaluate(Spec, LocalDate, boolean)}, with the response curves the HTML report draws. */
    public static SpecResult evaluate(Spec spec, LocalDate today) {
        return evaluate(spec, today, true);
    }

    /**
     * @param curves whether to work out each amplitude criterion's response curve over speed for
     *               the plots; it reads the model at some 130 speeds per criterion, several times
     *               the cost of judging, so a run that draws no plots leaves it out
     */
    public static SpecResult evaluate(Spec spec, LocalDate today, boolean curves) {
        List<ErrorEntry> errors = new ArrayList<>();
        List<ToleranceCase> cases = ToleranceCase.all(spec.tolerances());
        List<RuleContext> contexts = new ArrayList<>();
        for (ToleranceCase c : cases) {
            int same = firstWithScale(cases, c);
            if (same < contexts.size()) {
                // A tolerance given for stiffness only makes corners twice over; one model serves both.
                contexts.add(contexts.get(same));
                continue;
            }
            try {
                // Every case scales all stiffness by one factor and all mass by another: the
                // first case's modes serve the others exactly, so the eigenproblem is solved once.
                Optional<LinearSystem> first = contexts.isEmpty() ? Optional.empty()
                        : Optional.of(contexts.get(0).system());
                LinearSystem system = SystemBuilder.build(spec.model(), c.scale(), first);
                requireFiniteModes(system, c);
                contexts.add(new RuleContext(system, spec.operation(), spec.excitations()));
            } catch (IllegalArgumentException | CriterionProblem e) {
                errors.add(new ErrorEntry(spec.model().location(), "the model cannot be solved ("
                        + c.name() + "): " + e.getMessage()));
                return new SpecResult(spec.file(), Optional.of(spec.id()), SpecStatus.ERROR, List.of(), List.of(),
                        errors);
            }
        }
        List<ModeResult> modes = new ArrayList<>();
        for (Mode m : contexts.get(0).system().modes()) {
            List<ModeResult.Share> shares = new ArrayList<>();
            for (MotionShare share : m.shares()) {
                shares.add(new ModeResult.Share(share.motion(), share.fraction()));
            }
            modes.add(new ModeResult(m.index(), m.frequencyHz(), m.dampingRatio(), shares));
        }
        boolean tolerances = !spec.tolerances().isEmpty();
        List<CheckResult> checks = new ArrayList<>();
        for (Criterion criterion : spec.criteria()) {
            try {
                checks.add(judge(spec, criterion, cases, contexts, tolerances, today));
            } catch (CriterionProblem e) {
                errors.add(new ErrorEntry(criterion.location(), "criterion '" + criterion.id() + "' ("
                        + criterion.rule().key() + "): " + e.getMessage()));
            }
        }
        return new SpecResult(spec.file(), Optional.of(spec.id()), status(checks, errors), modes, checks, errors,
                SpecDetailsBuilder.build(spec, cases, contexts, checks, curves));
    }

    private static CheckResult judge(Spec spec, Criterion criterion, List<ToleranceCase> cases,
                                     List<RuleContext> contexts, boolean tolerances, LocalDate today) {
        Finding worst = null;
        int worstCase = 0;
        for (int i = 0; i < cases.size(); i++) {
            if (firstWithScale(cases, cases.get(i)) < i) {
                continue; // the same model as an earlier case gives the same finding, and the first of equals governs
            }
            Finding f = Rules.evaluate(criterion, contexts.get(i));
            if (!Double.isFinite(f.value()) || !Double.isFinite(f.badness()) || !Double.isFinite(f.limit())) {
                throw new CriterionProblem("numerical trouble: the value came out as " + f.value() + " ("
                        + cases.get(i).name() + "); check mass, stiffness and damping");
            }
            // First of equals governs; otherwise the larger exceedance is worse in the rule's direction.
            if (worst == null || (!Ties.same(f.value(), worst.value()) && f.badness() > worst.badness())) {
                worst = f;
                worstCase = i;
            }
        }
        WaiverJudgement.Verdict verdict = WaiverJudgement.judge(criterion.id(), criterion.severity(), worst.fails(),
                spec.waivers(), today);
        Optional<String> governing = tolerances ? Optional.of(cases.get(worstCase).name()) : Optional.empty();
        String message = worst.message()
                + governing.map(g -> "; governing case: " + g).orElse("")
                + verdict.suffix();
        OptionalDouble speed = worst.speedRpm();
        return new CheckResult(criterion.id(), criterion.rule().key(), criterion.severity(), verdict.status(),
                worst.value(), worst.limit(), worst.unit(), speed, worst.frequencyHz(), message,
                criterion.location(), governing, verdict.note());
    }

    /** The first case with the same model scale as {@code c}. */
    private static int firstWithScale(List<ToleranceCase> cases, ToleranceCase c) {
        for (int i = 0; i < cases.size(); i++) {
            if (cases.get(i).scale().equals(c.scale())) {
                return i;
            }
        }
        throw new IllegalStateException("case not listed");
    }

    private static void requireFiniteModes(LinearSystem system, ToleranceCase c) {
        for (Mode m : system.modes()) {
            if (!Double.isFinite(m.angularFrequency())
                    || (m.dampingRatio().isPresent() && !Double.isFinite(m.dampingRatio().getAsDouble()))) {
                throw new CriterionProblem("numerical trouble: mode " + m.index() + " came out as "
                        + m.angularFrequency() + " rad/s (" + c.name() + "); check that masses and stiffnesses"
                        + " are stated in plausible units: their ratio is beyond what double precision can hold");
            }
        }
    }

    /** error (any error entry) > fail (an error-severity check fails) > waived > pass. */
    static SpecStatus status(List<CheckResult> checks, List<ErrorEntry> errors) {
        if (!errors.isEmpty()) {
            return SpecStatus.ERROR;
        }
        if (checks.stream().anyMatch(c -> c.status() == CheckStatus.FAIL)) {
            return SpecStatus.FAIL;
        }
        if (checks.stream().anyMatch(c -> c.status() == CheckStatus.WAIVED)) {
            return SpecStatus.WAIVED;
        }
        return SpecStatus.PASS;
    }
}
