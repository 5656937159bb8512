package org.resonancegate.spec;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;

import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.EigenDecomposition;
import org.apache.commons.math3.linear.RealVector;

/**
 * The physical checks of a rigid-body model that no single value shows: a real inertia tensor, and a
 * mount layout that restrains all six rigid-body motions.
 */
final class RigidBodyChecks {

    /** Relative size below which an eigenvalue counts as zero (the stiffness check) or a sum as equal. */
    static final double ZERO = 1e-9;
    /**
     * Relative size below which a stiffness eigenvalue means a free motion. Round-off in forming
     * and solving K leaves a truly free motion near 1e-16 of the largest eigenvalue; 1e-12 keeps
     * four decades of margin above that and still takes mounts whose stiffnesses differ by nine
     * decades or more (ZERO, at 1e-9, refused such a layout as free).
     */
    static final double FREE = 1e-12;
    private static final String[] MOTIONS = {"translation along x", "translation along y", "translation along z",
            "rotation about x", "rotation about y", "rotation about z"};

    private RigidBodyChecks() {
    }

    /**
     * A physical body's inertia tensor is positive definite and its principal moments satisfy
     * I1 + I2 ≥ I3 for every ordering (each moment is a sum of two of the three second moments of
     * the mass distribution, which are non-negative). Off-diagonal terms are −P.
     */
    static void inertia(Model.Inertia inertia, Problems problems) {
        double[][] j = {
                {inertia.xx().si(), -inertia.xy(), -inertia.xz()},
                {-inertia.xy(), inertia.yy().si(), -inertia.yz()},
                {-inertia.xz(), -inertia.yz(), inertia.zz().si()}};
        double[] principal = new EigenDecomposition(new Array2DRowRealMatrix(j)).getRealEigenvalues();
        Arrays.sort(principal);
        double largest = Math.abs(principal[2]);
        if (!(principal[0] > ZERO * largest)) {
            problems.add(inertia.location(), "the inertia tensor (" + written(inertia) + ") is not positive definite: its"
                    + " principal moments are " + moments(principal) + ", and a real body has all three positive; the products"
                    + " of inertia are too large for these moments (check their values and signs)");
            return;
        }
        if (principal[0] + principal[1] < principal[2] * (1 - ZERO)) {
            problems.add(inertia.location(), "the inertia tensor (" + written(inertia) + ") has principal moments "
                    + moments(principal)
                    + ", which break the triangle inequality: " + number(principal[0]) + " + " + number(principal[1])
                    + " < " + number(principal[2]) + "; no body has these (each principal moment is at most the sum"
                    + " of the other two); check the moments and products");
        }
    }

    /**
     * Farthest a mount may sit from the centre of gravity, in metres. The largest machines set on
     * mounts span some tens of metres (common practice, no source); a mount farther out than this
     * is almost always a unit slip (millimetres written as metres), and it would make the rocking
     * stiffness dwarf every other term of the model.
     */
    static final double MAX_REACH_M = 100;

    /** Refuses a mount farther than {@link #MAX_REACH_M} from the centre of gravity. */
    static void reach(Point cg, List<Model.Mount> mounts, Problems problems) {
        double[] c = cg.si();
        for (Model.Mount m : mounts) {
            double[] p = m.position().si();
            double distance = Math.sqrt(sq(p[0] - c[0]) + sq(p[1] - c[1]) + sq(p[2] - c[2]));
            if (!(distance <= MAX_REACH_M)) {
                problems.add(m.position().location(), "mount \"" + m.name() + "\" sits " + number(distance)
                        + " m from the centre of gravity, beyond the " + number(MAX_REACH_M) + " m a machine on mounts"
                        + " could span; check the unit of its \"position\" and of \"centreOfGravity\""
                        + " (millimetres written as metres?)");
            }
        }
    }

    /**
     * Builds the 6×6 stiffness K = Σ T_iᵀ·diag(kx, ky, kz)·T_i about the centre of gravity,
     * T_i = [I₃ | −[r_i]×], and refuses a layout where some motion meets no stiffness. Rotations
     * are scaled by the mounts' rms distance from the centre of gravity, so that translations and
     * rotations compare in one unit and the zero test does not depend on the body's size.
     */
    static void layout(Point cg, List<Model.Mount> mounts, SourceLocation at, Problems problems) {
        double[] c = cg.si();
        double sum = 0;
        for (Model.Mount m : mounts) {
            double[] p = m.position().si();
            sum += sq(p[0] - c[0]) + sq(p[1] - c[1]) + sq(p[2] - c[2]);
        }
        double length = Math.sqrt(sum / mounts.size());
        if (!(length > 1e-6)) {
            length = 1;
        }
        double[][] k = new double[6][6];
        for (Model.Mount m : mounts) {
            double[] p = m.position().si();
            double[] r = {(p[0] - c[0]) / length, (p[1] - c[1]) / length, (p[2] - c[2]) / length};
            double[][] t = {
                    {1, 0, 0, 0, r[2], -r[1]},
                    {0, 1, 0, -r[2], 0, r[0]},
                    {0, 0, 1, r[1], -r[0], 0}};
            double[] kd = {m.stiffness().x(), m.stiffness().y(), m.stiffness().z()};
            for (int a = 0; a < 6; a++) {
                for (int b = 0; b < 6; b++) {
                    for (int i = 0; i < 3; i++) {
                        k[a][b] += t[i][a] * kd[i] * t[i][b];
                    }
                }
            }
        }
        EigenDecomposition eigen = new EigenDecomposition(new Array2DRowRealMatrix(k));
        double[] values = eigen.getRealEigenvalues();
        double largest = Arrays.stream(values).map(Math::abs).max().orElse(0);
        List<double[]> free = new ArrayList<>();
        for (int i = 0; i < values.length; i++) {
            if (values[i] <= FREE * largest) {
                RealVector v = eigen.getEigenvector(i);
                free.add(v.unitVector().toArray());
            }
        }
        if (free.isEmpty()) {
            return;
        }
        problems.add(at, "the mounts leave the body free: nothing resists " + String.join("; ", describe(free))
                + " (a zero frequency); place the mounts so they do not all lie on one line, and give some"
                + " mount stiffness along each axis");
    }

    /**
     * Names the free motions: a pure translation or rotation when it lies wholly in the free space,
     * else each free combination by its dominant components.
     */
    private static List<String> describe(List<double[]> free) {
        Set<String> names = new LinkedHashSet<>();
        List<Integer> pure = new ArrayList<>();
        for (int j = 0; j < 6; j++) {
            double share = 0;
            for (double[] v : free) {
                share += v[j] * v[j];
            }
            if (share > 1 - 1e-6) {
                pure.add(j);
                names.add(MOTIONS[j]);
            }
        }
        if (pure.size() < free.size()) {
            for (double[] v : free) {
                double[] rest = v.clone();
                pure.forEach(j -> rest[j] = 0);
                double max = Arrays.stream(rest).map(Math::abs).max().orElse(0);
                if (max < 1e-3) {
                    continue;
                }
                List<Integer> order = new ArrayList<>();
                for (int j = 0; j < 6; j++) {
                    if (Math.abs(rest[j]) >= 0.3 * max) {
                        order.add(j);
                    }
                }
                order.sort((a, b) -> Double.compare(Math.abs(rest[b]), Math.abs(rest[a])));
                StringBuilder s = new StringBuilder(MOTIONS[order.get(0)]);
                if (order.size() > 1) {
                    s.append(" (with ").append(String.join(" and ",
                            order.subList(1, order.size()).stream().map(j -> MOTIONS[j]).toList())).append(")");
                }
                names.add(s.toString());
            }
        }
        return new ArrayList<>(names);
    }

    /** The tensor as written, for a message (put together only when there is one). */
    private static String written(Model.Inertia inertia) {
        return "xx " + inertia.xx().text() + ", yy " + inertia.yy().text() + ", zz " + inertia.zz().text()
                + "; products xy " + number(inertia.xy()) + ", xz " + number(inertia.xz()) + ", yz "
                + number(inertia.yz()) + " kg·m²";
    }

    private static String moments(double[] principal) {
        return number(principal[0]) + ", " + number(principal[1]) + ", " + number(principal[2]) + " kg·m²";
    }

    private static double sq(double v) {
        return v * v;
    }

    private static String number(double v) {
        // Only zeros after a decimal point are trailing: "5000" stays 5000.
        return String.format(Locale.ROOT, "%.4g", v).replaceAll("(\\.\\d*?)0+($|e)", "$1$2")
                .replaceAll("\\.($|e)", "$1");
    }

}
