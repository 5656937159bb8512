package org.resonancegate.dynamics;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import org.resonancegate.spec.Direction;
import org.resonancegate.spec.Model;
import org.resonancegate.spec.Placement;
import org.resonancegate.spec.ResponsePoint;

/**
 * Masses (or inertias) along one line joined by springs, one degree of freedom per mass; the
 * ground is fixed (or moves as a whole under base motion). M is diagonal, K is assembled from
 * the springs; modes from the generalised symmetric eigen solve. A translation line is vertical
 * (gravity along it); in torsion the coordinates are angles and the forces torques.
 */
public final class LumpedLine implements LinearSystem {

    private final Model.Lumped model;
    private final MatrixModel core;
    private final Map<String, Integer> index = new HashMap<>();
    private final List<ElementRow> elementRows = new ArrayList<>();
    private final List<String> elementLabels = new ArrayList<>();
    private final ShapeCache<Placement, MatrixModel.Pattern> patterns = new ShapeCache<>();
    private final MatrixModel.BaseShape base;
    private final List<Probe> allMasses = new ArrayList<>();
    private final double[] masses;

    /** @param sameModel this very model built at another tolerance scale, whose modes are reused */
    LumpedLine(Model.Lumped model, ModelScale scale, OptionalDouble modalRatio, Optional<LumpedLine> sameModel) {
        this.model = model;
        int n = model.masses().size();
        if (n == 0) {
            throw new IllegalArgumentException("a lumped model needs at least one mass");
        }
        double[][] m = new double[n][n];
        masses = new double[n];
        String[] names = new String[n];
        for (int j = 0; j < n; j++) {
            Model.LumpedMass lm = model.masses().get(j);
            if (index.put(lm.name(), j) != null) {
                throw new IllegalArgumentException("two masses are named '" + lm.name() + "'");
            }
            masses[j] = lm.mass().si() * scale.mass();
            m[j][j] = masses[j];
            names[j] = lm.name();
        }
        boolean several = model.springs().size() > 1;
        List<MatrixModel.Row> rows = new ArrayList<>();
        for (int e = 0; e < model.springs().size(); e++) {
            Model.Spring s = model.springs().get(e);
            double[] g = new double[n];
            boolean fromGround = Model.Lumped.GROUND.equals(s.from());
            boolean toGround = Model.Lumped.GROUND.equals(s.to());
            if (fromGround && toGround) {
                throw new IllegalArgumentException("spring '" + s.name() + "' joins the ground to itself");
            }
            // Deformation Δ = body-side motion − ground-side motion (to − from between masses).
            if (!toGround) {
                g[massIndex(s.to(), s)] += 1;
            }
            if (!fromGround) {
                g[massIndex(s.from(), s)] += toGround ? 1 : -1;
            }
            double k = s.stiffness().si() * scale.stiffness();
            double c = 0;
            double eta = 0;
            if (s.damping().isPresent()) {
                // A dashpot keeps its coefficient in every tolerance case; a loss factor is a ratio.
                if (s.damping().get() instanceof org.resonancegate.spec.ElementDamping.Viscous v) {
                    c = v.values().x();
                } else {
                    eta = s.damping().get().values().x();
                }
            }
            rows.add(new MatrixModel.Row(g, k, c, eta, fromGround || toGround ? 0 : -1));
            String label = several ? "spring '" + s.name() + "'" : "";
            elementRows.add(new ElementRow(e, Optional.empty(), label));
            elementLabels.add(label);
        }
        core = new MatrixModel(m, rows, 1, modalRatio, names, names, scale,
                sameModel.filter(l -> l.model == model).map(l -> l.core.modesForScaling()));
        double[] ones = new double[n];
        java.util.Arrays.fill(ones, 1);
        double[] rowGround = new double[rows.size()];
        for (int r = 0; r < rows.size(); r++) {
            rowGround[r] = rows.get(r).groundComponent() >= 0 ? 1 : 0;
        }
        base = core.baseShape(ones, rowGround);
        for (int j = 0; j < n; j++) {
            allMasses.add(new Probe(n > 1 ? "mass '" + names[j] + "'" : "", unit(n, j)));
        }
    }

    private int massIndex(String name, Model.Spring s) {
        Integer j = index.get(name);
        if (j == null) {
            throw new IllegalArgumentException("spring '" + s.name() + "' names an unknown mass '" + name + "'");
        }
        return j;
    }

    private static double[] unit(int n, int j) {
        double[] g = new double[n];
        g[j] = 1;
        return g;
    }

    @Override
    public List<Mode> modes() {
        return core.modes;
    }

    @Override
    public boolean rotational() {
        return model.motion() == Model.Motion.TORSION;
    }

    @Override
    public int degreesOfFreedom() {
        return core.n;
    }

    /**
     * Translation: K·u = −M·gn·1 (the line is vertical, gravity down), each spring's deflection
     * |g·u|. Torsion: gravity does not apply, so the list is empty.
     */
    @Override
    public List<Double> staticDeflections() {
        if (rotational()) {
            return List.of();
        }
        double[] b = new double[core.n];
        for (int j = 0; j < core.n; j++) {
            b[j] = -masses[j] * StandardGravity.GN;
        }
        double[] u = core.staticSolve(b);
        List<Double> out = new ArrayList<>();
        for (MatrixModel.Row r : core.rows) {
            out.add(Math.abs(MatrixModel.dot(r.gather(), u)));
        }
        return out;
    }

    @Override
    public List<String> elementLabels() {
        return List.copyOf(elementLabels);
    }

    @Override
    public List<ElementRow> elementRows() {
        return List.copyOf(elementRows);
    }

    @Override
    public Response respond(Load load, double omega) {
        if (load instanceof Load.Force f) {
            MatrixModel.Pattern p = patterns.get(f.placement(), this::patternOf);
            return core.force(p, f.amplitude(), omega);
        }
        return core.base(base, load.amplitude(), omega);
    }

    private MatrixModel.Pattern patternOf(Placement placement) {
        int j;
        if (placement instanceof Placement.AtMass at) {
            Integer found = index.get(at.mass());
            if (found == null) {
                throw new IllegalArgumentException("an excitation acts on an unknown mass '" + at.mass() + "'");
            }
            j = found;
        } else if (placement instanceof Placement.Line && core.n == 1) {
            j = 0;
        } else {
            throw new IllegalArgumentException("an excitation on a lumped line needs \"at\": a mass name");
        }
        return core.pattern(unit(core.n, j), new double[core.n]);
    }

    @Override
    public List<Probe> probes(Optional<ResponsePoint> at) {
        if (at.isEmpty()) {
            return List.copyOf(allMasses);
        }
        if (at.get() instanceof ResponsePoint.Mass m) {
            Integer j = index.get(m.name());
            if (j == null) {
                throw new IllegalArgumentException("a criterion looks at an unknown mass '" + m.name() + "'");
            }
            return List.of(allMasses.get(j));
        }
        throw new IllegalArgumentException("a lumped line names its response point by mass, not by position");
    }

    /** Along the line every direction is the line itself. */
    @Override
    public List<Probe> probesAlong(Optional<ResponsePoint> at, Direction direction) {
        return probes(at);
    }
}
