package org.resonancegate.criteria;

import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import org.resonancegate.spec.Criterion;
import org.resonancegate.spec.Quantity;

/**
 * static-deflection: the deflection under gravity of every spring lies within [min, max]. The
 * governing limit is the bound nearer to being broken (smaller relative distance); with several
 * springs the largest relative violation (or smallest clearance) governs. It does not depend on
 * speed, so speed and frequency stay empty.
 */
final class StaticDeflectionRule {

    private StaticDeflectionRule() {
    }

    static Finding evaluate(Criterion.StaticDeflection c, RuleContext ctx) {
        List<Double> deflections = ctx.system().staticDeflections();
        if (deflections.isEmpty()) {
            throw new CriterionProblem("static-deflection does not apply to this model (no gravity along a torsion line)");
        }
        List<String> labels = ctx.system().elementLabels();
        String worstLabel = "";
        double worstBadness = Double.NEGATIVE_INFINITY;
        double worstValue = Double.NaN;
        Quantity worstBound = null;
        boolean worstIsMin = false;
        for (int i = 0; i < deflections.size(); i++) {
            double d = deflections.get(i);
            String label = i < labels.size() ? labels.get(i) : "";
            CriterionProblem.requireFinite(d, "static deflection" + Display.named(" of ", label));
            if (c.min().isPresent()) {
                double b = Finding.belowBound(d, c.min().get().si());
                if (b > worstBadness) {
                    worstBadness = b;
                    worstValue = d;
                    worstBound = c.min().get();
                    worstIsMin = true;
                    worstLabel = label;
                }
            }
            if (c.max().isPresent()) {
                double b = Finding.aboveBound(d, c.max().get().si());
                if (b > worstBadness) {
                    worstBadness = b;
                    worstValue = d;
                    worstBound = c.max().get();
                    worstIsMin = false;
                    worstLabel = label;
                }
            }
        }
        if (worstBound == null) {
            throw new CriterionProblem("static-deflection needs a min or a max bound");
        }
        Display.UserUnit uu = Display.UserUnit.of(worstBound, "m");
        String bound = (worstIsMin ? "minimum " : "maximum ") + uu.format(worstBound.si());
        String verdict;
        if (worstBadness > 0) {
            verdict = (worstIsMin ? " is below the " : " is above the ") + bound + " by "
                    + Display.percent(worstBadness);
        } else {
            verdict = " keeps " + Display.percent(-worstBadness) + " from the " + bound;
        }
        Optional<String> range = c.min().isPresent() && c.max().isPresent()
                ? Optional.of(" (allowed " + uu.format(c.min().get().si()) + " to " + uu.format(c.max().get().si()) + ")")
                : Optional.empty();
        String message = "static deflection" + Display.named(" of ", worstLabel) + " " + uu.format(worstValue) + verdict + range.orElse("");
        return new Finding(worstValue, worstBound.si(), "m", OptionalDouble.empty(), OptionalDouble.empty(),
                worstBadness, message);
    }
}
