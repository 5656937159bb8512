package org.resonancegate.check;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import org.resonancegate.criteria.ResponseCurves;
import org.resonancegate.criteria.RuleContext;
import org.resonancegate.dynamics.Mode;
import org.resonancegate.report.CheckResult;
import org.resonancegate.report.Interference;
import org.resonancegate.report.ResponseCurve;
import org.resonancegate.report.SpecDetails;
import org.resonancegate.spec.Criterion;
import org.resonancegate.spec.Excitation;
import org.resonancegate.spec.ExcitationFrequency;
import org.resonancegate.spec.Spec;

/**
 * The data of a spec's plots and inputs, worked out once during the check from the model cases
 * already built. Each plot uses the tolerance case that governs its criterion, so the drawn curve
 * passes through the reported worst value; the interference diagram uses the case that governs the
 * first separation criterion (nominal without one).
 */
final class SpecDetailsBuilder {

    private SpecDetailsBuilder() {
    }

    static SpecDetails build(Spec spec, List<ToleranceCase> cases, List<RuleContext> contexts,
                             List<CheckResult> checks, boolean withCurves) {
        List<ResponseCurve> curves = new ArrayList<>();
        Optional<Interference> interference = Optional.empty();
        for (Criterion criterion : spec.criteria()) {
            Optional<CheckResult> check = checks.stream().filter(c -> c.criterion().equals(criterion.id())).findFirst();
            if (check.isEmpty()) {
                continue; // the criterion could not be judged; its error entry says why
            }
            int i = caseIndex(cases, check.get());
            String basis = cases.get(i).name();
            if (criterion instanceof Criterion.Separation s && interference.isEmpty()) {
                interference = Optional.of(interference(spec, contexts.get(i), basis,
                        OptionalDouble.of(s.margin().value()), Optional.of(s.id())));
            }
            if (!withCurves) {
                continue;
            }
            ResponseCurves.of(criterion, contexts.get(i)).ifPresent(c -> curves.add(curve(criterion.id(), basis, c)));
        }
        if (interference.isEmpty()) {
            interference = Optional.of(interference(spec, contexts.get(0), cases.get(0).name(), OptionalDouble.empty(),
                    Optional.empty()));
        }
        return new SpecDetails(spec.title(), spec.revision(), SpecInputs.of(spec), interference, curves);
    }

    private static int caseIndex(List<ToleranceCase> cases, CheckResult check) {
        for (int i = 0; i < cases.size(); i++) {
            if (check.governingCase().isPresent() && cases.get(i).name().equals(check.governingCase().get())) {
                return i;
            }
        }
        return 0;
    }

    private static Interference interference(Spec spec, RuleContext ctx, String basis, OptionalDouble margin,
                                             Optional<String> criterion) {
        List<Interference.ModeLine> modes = new ArrayList<>();
        for (Mode m : ctx.system().modes()) {
            if (m.angularFrequency() > 0) {
                modes.add(new Interference.ModeLine(m.index(), m.frequencyHz()));
            }
        }
        List<Interference.ExcitationLine> lines = new ArrayList<>();
        for (Excitation e : spec.excitations()) {
            if (e.frequency() instanceof ExcitationFrequency.Order o) {
                lines.add(new Interference.ExcitationLine(e.name(), OptionalDouble.of(o.order()), OptionalDouble.empty()));
            } else {
                double hz = ((ExcitationFrequency.Fixed) e.frequency()).frequency().si() / (2 * Math.PI);
                lines.add(new Interference.ExcitationLine(e.name(), OptionalDouble.empty(), OptionalDouble.of(hz)));
            }
        }
        double toRpm = 60 / (2 * Math.PI);
        return new Interference(basis, modes, margin, criterion, lines, ctx.minSpeed() * toRpm,
                ctx.maxSpeed() * toRpm);
    }

    private static ResponseCurve curve(String criterion, String basis, ResponseCurves.Curve c) {
        List<ResponseCurve.Point> points = new ArrayList<>();
        for (ResponseCurves.Sample s : c.samples()) {
            points.add(new ResponseCurve.Point(s.speedRpm(), s.value()));
        }
        return new ResponseCurve(criterion, basis, c.quantity(), c.unit(), c.limit(), c.displayUnit(),
                c.displayFactor(), points);
    }
}
