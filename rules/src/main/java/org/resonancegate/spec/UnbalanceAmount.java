package org.resonancegate.spec;

/** How an unbalance is stated: directly, or through a balance grade and the rotor's mass. */
public sealed interface UnbalanceAmount {

    /** {@code "unbalance": "120 g·mm"} (SI value in kg·m). */
    record Direct(Quantity unbalance) implements UnbalanceAmount {
    }

    /**
     * {@code "balanceGrade": "G 6.3", "rotorMass": "180 kg"}: the permissible residual unbalance
     * of ISO 21940-11 at the rotor's maximum service speed.
     *
     * @param gradeMmPerS the grade number G in mm/s (6.3 for "G 6.3")
     * @param gradeText   the grade as written
     */
    record FromBalanceGrade(double gradeMmPerS, String gradeText, SourceLocation gradeLocation, Quantity rotorMass)
            implements UnbalanceAmount {
    }
}
