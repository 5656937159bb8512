package org.resonancegate.check;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.resonancegate.fixtures.Specs.AT;
import static org.resonancegate.fixtures.Specs.fixed;
import static org.resonancegate.fixtures.Specs.force;
import static org.resonancegate.fixtures.Specs.kg;
import static org.resonancegate.fixtures.Specs.maxTransmissibility;
import static org.resonancegate.fixtures.Specs.newtonsPerMetre;
import static org.resonancegate.fixtures.Specs.orderOnly;
import static org.resonancegate.fixtures.Specs.range;
import static org.resonancegate.fixtures.Specs.ratio;
import static org.resonancegate.fixtures.Specs.separation;
import static org.resonancegate.fixtures.Specs.single;
import static org.resonancegate.fixtures.Specs.spec;
import static org.resonancegate.fixtures.Specs.staticDeflection;
import static org.resonancegate.fixtures.Specs.tolerances;
import static org.resonancegate.fixtures.Specs.unbalance;
import static org.resonancegate.fixtures.Specs.waiver;

import java.time.LocalDate;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.resonancegate.report.CheckResult;
import org.resonancegate.report.CheckStatus;
import org.resonancegate.report.SpecResult;
import org.resonancegate.report.SpecStatus;
import org.resonancegate.spec.Criterion;
import org.resonancegate.spec.Model;
import org.resonancegate.spec.Severity;
import org.resonancegate.spec.Spec;
import org.resonancegate.spec.Stiffness;
import org.resonancegate.spec.Tolerances;

/** Tolerance cases, waivers and statuses as spec-format.md defines them. */
class SpecEvaluatorTest {

    private static final LocalDate TODAY = LocalDate.of(2027, 1, 15);
    private static final Model.Single PUMP_SET = single(1850, 2.4e6, 0.05);
    private static final double PUMP_FN = Math.sqrt(2.4e6 / 1850) / (2 * Math.PI);

    private static CheckResult only(SpecResult r) {
        assertEquals(1, r.checks().size(), r.toString());
        return r.checks().get(0);
    }

    @Test
    void modesAreReportedWithTheirDampingRatio() {
        SpecResult r = SpecEvaluator.evaluate(spec(PUMP_SET, range(600, 1500), List.of(unbalance("impeller", 1, 500)),
                List.of(separation("SEP", 0.2))), TODAY);
        assertEquals(1, r.modes().size());
        assertEquals(PUMP_FN, r.modes().get(0).frequencyHz(), 1e-12);
        assertEquals(0.05, r.modes().get(0).dampingRatio().getAsDouble(), 1e-12);
        assertEquals(SpecStatus.PASS, r.status());
        assertTrue(only(r).governingCase().isEmpty(), "no tolerances, no case");
    }

    // spec-format.md: corners in the order nominal, (k−, m−), (k−, m+), (k+, m−), (k+, m+). A
    // fixed 6.5 Hz line above the 5.73 Hz mode comes nearest when f_n is highest: k+, m−.
    @Test
    void toleranceCornerThatGovernsSeparation() {
        Spec s = spec(PUMP_SET, range(600, 1500), List.of(force("compressor", fixed(6.5), 100, 0)),
                List.of(separation("SEP", 0.1)), tolerances(0.15, 0.05), List.of());
        SpecResult r = SpecEvaluator.evaluate(s, TODAY);
        CheckResult c = only(r);
        double fnCorner = PUMP_FN * Math.sqrt(1.15 / 0.95);
        assertEquals(6.5 / fnCorner - 1, c.value(), 1e-12);
        assertEquals("stiffness +15 %, mass -5 %", c.governingCase().orElseThrow());
        assertEquals(CheckStatus.FAIL, c.status());
        assertTrue(c.message().contains("governing case: stiffness +15 %, mass -5 %"), c.message());
        // Modes in the results are the nominal ones.
        assertEquals(PUMP_FN, r.modes().get(0).frequencyHz(), 1e-12);
    }

    // δ = m·gn/k is largest at (k−, m+).
    @Test
    void toleranceCornerThatGovernsStaticDeflection() {
        Model.Single m = new Model.Single(kg(1000), new Stiffness.Direct(newtonsPerMetre(1000 * 9.80665 / 0.010)),
                ratio(0.05), AT);
        Spec s = spec(m, range(600, 1500), List.of(unbalance("r", 1, 100)), List.of(staticDeflection("SD", null, 12.0)),
                tolerances(0.15, 0.05), List.of());
        CheckResult c = only(SpecEvaluator.evaluate(s, TODAY));
        assertEquals(0.010 * 1.05 / 0.85, c.value(), 1e-12);
        assertEquals("stiffness -15 %, mass +5 %", c.governingCase().orElseThrow());
        assertEquals(CheckStatus.FAIL, c.status());
    }

    // When every case gives the same value, the first in order (nominal) governs. Base-motion
    // transmissibility peaks at the same height for every case (it depends on ζ alone) and the
    // range crosses every case's resonance.
    @Test
    void equalValuesGoToTheFirstCase() {
        Spec s = spec(PUMP_SET, range(150, 1500),
                List.of(new org.resonancegate.spec.Excitation.BaseMotion("floor", 0, org.resonancegate.fixtures.Specs.order(1),
                        org.resonancegate.spec.Excitation.MotionMeasure.DISPLACEMENT,
                        org.resonancegate.fixtures.Specs.mm(0.05), AT)),
                List.of(maxTransmissibility("ISO", 0.5)), tolerances(0.15, 0.05), List.of());
        CheckResult c = only(SpecEvaluator.evaluate(s, TODAY));
        assertEquals("nominal", c.governingCase().orElseThrow());
        // check-values.md §1 table: T_max = 10.062214 at ζ = 0.05.
        assertEquals(10.062214, c.value(), 5.1e-7);
    }

    // Only a stiffness tolerance: the corner names leave the mass out.
    @Test
    void caseNamesWithOneTolerance() {
        List<ToleranceCase> cases = ToleranceCase.all(tolerances(0.1, null));
        assertEquals(List.of("nominal", "stiffness -10 %", "stiffness -10 %", "stiffness +10 %", "stiffness +10 %"),
                cases.stream().map(ToleranceCase::name).toList());
        assertEquals(0.9, cases.get(1).scale().stiffness(), 1e-15);
        assertEquals(1.0, cases.get(1).scale().mass(), 0);
        assertEquals(1, ToleranceCase.all(Tolerances.none()).size());
    }

    // --- waivers: valid through `expires` inclusive, the build's local date ---

    private static Spec failingSeparation(Severity severity, LocalDate expires) {
        return spec(PUMP_SET, range(300, 1500), List.of(unbalance("impeller", 1, 500)),
                List.of(new Criterion.Separation("SEP", severity, org.resonancegate.fixtures.Specs.number(0.2), AT)),
                Tolerances.none(), List.of(waiver("SEP", expires)));
    }

    @Test
    void aWaiverHoldsOnItsExpiryDate() {
        LocalDate expires = LocalDate.of(2027, 3, 31);
        SpecResult r = SpecEvaluator.evaluate(failingSeparation(Severity.ERROR, expires), expires);
        assertEquals(CheckStatus.WAIVED, only(r).status());
        assertTrue(only(r).waiver().orElseThrow().valid());
        assertEquals(SpecStatus.WAIVED, r.status());
    }

    @Test
    void aWaiverLapsesTheDayAfter() {
        LocalDate expires = LocalDate.of(2027, 3, 31);
        SpecResult r = SpecEvaluator.evaluate(failingSeparation(Severity.ERROR, expires), expires.plusDays(1));
        CheckResult c = only(r);
        assertEquals(CheckStatus.FAIL, c.status());
        assertTrue(c.message().contains("waiver expired on 2027-03-31"), c.message());
        assertFalse(c.waiver().orElseThrow().valid());
        assertEquals(SpecStatus.FAIL, r.status());
    }

    @Test
    void anExpiredWaiverOnAWarningLeavesAWarning() {
        LocalDate expires = LocalDate.of(2027, 3, 31);
        SpecResult r = SpecEvaluator.evaluate(failingSeparation(Severity.WARNING, expires), expires.plusDays(1));
        assertEquals(CheckStatus.WARNING, only(r).status());
        assertEquals(SpecStatus.PASS, r.status(), "a failing warning does not fail its spec");
        SpecResult waived = SpecEvaluator.evaluate(failingSeparation(Severity.WARNING, expires), expires);
        assertEquals(CheckStatus.WAIVED, only(waived).status(), "a valid waiver waives any severity");
    }

    @Test
    void failOutranksWaived() {
        Spec s = spec(PUMP_SET, range(300, 1500), List.of(unbalance("impeller", 1, 500)),
                List.of(separation("SEP", 0.2), maxTransmissibility("ISO", 0.3)), Tolerances.none(),
                List.of(waiver("SEP", LocalDate.of(2027, 3, 31))));
        SpecResult r = SpecEvaluator.evaluate(s, TODAY);
        assertEquals(CheckStatus.WAIVED, r.checks().get(0).status());
        assertEquals(CheckStatus.FAIL, r.checks().get(1).status());
        assertEquals(SpecStatus.FAIL, r.status());
    }

    // --- numerical trouble is an error, never a pass ---

    @Test
    void anUnsolvableModelIsAnError() {
        Model.Single broken = single(Double.NaN, 2.4e6, 0.05);
        SpecResult r = SpecEvaluator.evaluate(spec(broken, range(600, 1500), List.of(unbalance("impeller", 1, 500)),
                List.of(separation("SEP", 0.2))), TODAY);
        assertEquals(SpecStatus.ERROR, r.status());
        assertTrue(r.checks().isEmpty());
        assertFalse(r.errors().isEmpty());
    }

    @Test
    void aNanDampingIsAnError() {
        Model.Single broken = single(1850, 2.4e6, Double.NaN);
        SpecResult r = SpecEvaluator.evaluate(spec(broken, range(600, 1500), List.of(unbalance("impeller", 1, 500)),
                List.of(maxTransmissibility("ISO", 0.2))), TODAY);
        assertEquals(SpecStatus.ERROR, r.status());
    }

    @Test
    void aCriterionWithNothingToJudgeIsAnErrorNamingIt() {
        SpecResult r = SpecEvaluator.evaluate(spec(PUMP_SET, range(600, 1500), List.of(orderOnly("gear mesh", 23)),
                List.of(separation("SEP", 0.2), maxTransmissibility("ISO", 0.2))), TODAY);
        assertEquals(SpecStatus.ERROR, r.status());
        assertEquals(1, r.checks().size());
        assertEquals(1, r.errors().size());
        assertTrue(r.errors().get(0).message().contains("'ISO'"), r.errors().get(0).message());
        assertEquals(AT, r.errors().get(0).location());
    }
}
