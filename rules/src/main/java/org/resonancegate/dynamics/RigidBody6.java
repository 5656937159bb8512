package org.resonancegate.dynamics;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import org.resonancegate.spec.Axis;
import org.resonancegate.spec.Direction;
import org.resonancegate.spec.ElementDamping;
import org.resonancegate.spec.Model;
import org.resonancegate.spec.Placement;
import org.resonancegate.spec.Point;
import org.resonancegate.spec.ResponsePoint;
import org.resonancegate.spec.ShaftAxis;

/**
 * A rigid body on discrete mounts, six degrees of freedom q = (x, y, z, rx, ry, rz) at the centre
 * of gravity. M = diag(m, m, m) ⊕ I_G (off-diagonal terms the negative products of inertia). A
 * point p moves by u(p) = x_c + θ × r = T(r)·q with r = p − cg and T(r) = [I₃ | −[r]×]; mount i
 * adds T_iᵀ·diag(kx, ky, kz)·T_i to K and acts as three axial springs, each tied to the ground.
 */
public final class RigidBody6 implements LinearSystem {

    private static final String[] NAMES = {"x", "y", "z", "rx", "ry", "rz"};
    private static final String[] READINGS = {"x", "y", "z", "rocking about x", "rocking about y", "rotation about z"};

    private final double[] cg;
    private final double mass;
    private final MatrixModel core;
    private final List<Model.Mount> mounts;
    private final List<ElementRow> elementRows = new ArrayList<>();
    private final List<String> elementLabels = new ArrayList<>();
    private final ShapeCache<Placement, MatrixModel.Pattern> patterns = new ShapeCache<>();
    private final ShapeCache<Direction, MatrixModel.BaseShape> bases = new ShapeCache<>();

    private final Model.RigidBody model;

    /** @param sameModel this very model built at another tolerance scale, whose modes are reused */
    RigidBody6(Model.RigidBody model, ModelScale scale, OptionalDouble modalRatio, Optional<RigidBody6> sameModel) {
        this.model = model;
        cg = model.centreOfGravity().si();
        mass = model.mass().si() * scale.mass();
        mounts = model.mounts();
        Model.Inertia in = model.inertia();
        double s = scale.mass();
        double[][] m = new double[6][6];
        m[0][0] = mass;
        m[1][1] = mass;
        m[2][2] = mass;
        m[3][3] = in.xx().si() * s;
        m[4][4] = in.yy().si() * s;
        m[5][5] = in.zz().si() * s;
        m[3][4] = -in.xy() * s;
        m[4][3] = m[3][4];
        m[3][5] = -in.xz() * s;
        m[5][3] = m[3][5];
        m[4][5] = -in.yz() * s;
        m[5][4] = m[4][5];
        List<MatrixModel.Row> rows = new ArrayList<>();
        for (int i = 0; i < mounts.size(); i++) {
            Model.Mount mount = mounts.get(i);
            double[] r = relative(mount.position());
            for (Axis a : Axis.values()) {
                double k = mount.stiffness().get(a) * scale.stiffness();
                double c = 0;
                double eta = 0;
                if (mount.damping().isPresent()) {
                    ElementDamping d = mount.damping().get();
                    if (d instanceof ElementDamping.Viscous) {
                        c = d.values().get(a); // a dashpot is not scaled by the tolerances
                    } else {
                        eta = d.values().get(a);
                    }
                }
                rows.add(new MatrixModel.Row(transferRow(r, a.index()), k, c, eta, a.index()));
                elementRows.add(new ElementRow(i, Optional.of(a), "mount '" + mount.name() + "' (" + a.key() + ")"));
            }
            elementLabels.add(mounts.size() > 1 ? "mount '" + mount.name() + "'" : "");
        }
        core = new MatrixModel(m, rows, 3, modalRatio, NAMES, READINGS, scale,
                sameModel.filter(b -> b.model == model).map(b -> b.core.modesForScaling()));
    }

    private double[] relative(Point p) {
        double[] x = p.si();
        return new double[] {x[0] - cg[0], x[1] - cg[1], x[2] - cg[2]};
    }

    /** Row {@code axis} of T(r) = [I₃ | −[r]×]: u_axis = x_axis + (θ × r)_axis. */
    static double[] transferRow(double[] r, int axis) {
        double[] t = new double[6];
        t[axis] = 1;
        switch (axis) {
            case 0 -> { // θy·rz − θz·ry
                t[4] = r[2];
                t[5] = -r[1];
            }
            case 1 -> { // θz·rx − θx·rz
                t[5] = r[0];
                t[3] = -r[2];
            }
            default -> { // θx·ry − θy·rx
                t[3] = r[1];
                t[4] = -r[0];
            }
        }
        return t;
    }

    @Override
    public List<Mode> modes() {
        return core.modes;
    }

    @Override
    public int degreesOfFreedom() {
        return 6;
    }

    /** K·q = (0, 0, −m·gn, 0, 0, 0); each mount's vertical compression −(T_i·q)_z. */
    @Override
    public List<Double> staticDeflections() {
        double[] u = core.staticSolve(new double[] {0, 0, -mass * StandardGravity.GN, 0, 0, 0});
        List<Double> out = new ArrayList<>();
        for (Model.Mount mount : mounts) {
            out.add(-MatrixModel.dot(transferRow(relative(mount.position()), 2), u));
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
            return core.force(patterns.get(f.placement(), this::patternOf), f.amplitude(), omega);
        }
        Direction d = ((Load.GroundMotion) load).direction();
        MatrixModel.BaseShape b = bases.get(d, this::baseOf);
        return core.base(b, load.amplitude(), omega);
    }

    /**
     * Generalised force of a unit force F at p: [F; r × F]. A fixed force has F = direction; a
     * rotating one F = e1 − i·sign·e2, so Re(F·e^{iωt}) = cos ωt·e1 + sign·sin ωt·e2.
     */
    private MatrixModel.Pattern patternOf(Placement placement) {
        if (!(placement instanceof Placement.AtPoint at)) {
            throw new IllegalArgumentException("a force on a rigid body needs \"at\": {\"x\", \"y\", \"z\"} with "
                    + "\"axis\" (rotating) or \"direction\" (fixed)");
        }
        double[] fr = new double[3];
        double[] fi = new double[3];
        if (at.axis().isPresent()) {
            ShaftAxis shaft = at.axis().get();
            fr[shaft.first().index()] = 1;
            fi[shaft.second().index()] = -shaft.sign();
        } else if (at.direction().isPresent()) {
            double[] d = at.direction().get().components();
            System.arraycopy(d, 0, fr, 0, 3);
        } else {
            throw new IllegalArgumentException("a force at a point needs \"axis\" (rotating) or \"direction\" (fixed)");
        }
        double[] r = relative(at.point());
        return core.pattern(generalised(r, fr), generalised(r, fi));
    }

    private static double[] generalised(double[] r, double[] f) {
        return new double[] {f[0], f[1], f[2],
                r[1] * f[2] - r[2] * f[1], r[2] * f[0] - r[0] * f[2], r[0] * f[1] - r[1] * f[0]};
    }

    /** The ground translation Y·d carries the body along rigidly: s = (d, 0, 0, 0); mount axis a moves by d_a. */
    private MatrixModel.BaseShape baseOf(Direction d) {
        double[] dir = d.components();
        double[] shift = {dir[0], dir[1], dir[2], 0, 0, 0};
        double[] rowGround = new double[core.rows.length];
        for (int r = 0; r < rowGround.length; r++) {
            rowGround[r] = dir[core.rows[r].groundComponent()];
        }
        return core.baseShape(shift, rowGround);
    }

    @Override
    public List<Probe> probes(Optional<ResponsePoint> at) {
        double[] r = new double[3];
        String where = "the centre of gravity";
        Optional<Axis> axis = Optional.empty();
        if (at.isPresent()) {
            if (!(at.get() instanceof ResponsePoint.OnBody body)) {
                throw new IllegalArgumentException("a rigid body names its response point by position, not by mass");
            }
            r = relative(body.point());
            where = describe(body.point());
            axis = body.axis();
        }
        List<Probe> out = new ArrayList<>();
        for (Axis a : Axis.values()) {
            if (axis.isEmpty() || axis.get() == a) {
                out.add(new Probe(where + " along " + a.key(), transferRow(r, a.index())));
            }
        }
        return out;
    }

    @Override
    public List<Probe> probesAlong(Optional<ResponsePoint> at, Direction direction) {
        double[] r = new double[3];
        String where = "the centre of gravity";
        if (at.isPresent()) {
            if (!(at.get() instanceof ResponsePoint.OnBody body)) {
                throw new IllegalArgumentException("a rigid body names its response point by position, not by mass");
            }
            // the motion's own direction is read; an axis named beside the point does not change it
            r = relative(body.point());
            where = describe(body.point());
        }
        double[] d = direction.components();
        double[] g = new double[6];
        for (int a = 0; a < 3; a++) {
            double[] t = transferRow(r, a);
            for (int j = 0; j < 6; j++) {
                g[j] += d[a] * t[j];
            }
        }
        return List.of(new Probe(where + " along the motion", g));
    }

    private static String describe(Point p) {
        return "point (" + p.x().text() + ", " + p.y().text() + ", " + p.z().text() + ")";
    }
}
