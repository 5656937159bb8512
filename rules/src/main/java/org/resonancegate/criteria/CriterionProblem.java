package org.resonancegate.criteria;

/**
 * A criterion that cannot be judged: numerical trouble (a value that is not a finite number) or a
 * criterion that has nothing to judge. It becomes an error entry, never a pass.
 */
public final class CriterionProblem extends RuntimeException {

    private static final long serialVersionUID = 1L;

    public CriterionProblem(String message) {
        super(message);
    }

    /** Refuses a value that is NaN or infinite, saying what it was. */
    static double requireFinite(double value, String what) {
        if (!Double.isFinite(value)) {
            throw new CriterionProblem("numerical trouble: " + what + " came out as " + value
                    + "; check that mass, stiffness and damping are positive and that damping is not zero");
        }
        return value;
    }
}
