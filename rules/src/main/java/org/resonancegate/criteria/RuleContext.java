package org.resonancegate.criteria;

import java.util.ArrayList;
import java.util.Collections;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.resonancegate.dynamics.Drive;
import org.resonancegate.dynamics.Drives;
import org.resonancegate.dynamics.LinearSystem;
import org.resonancegate.dynamics.Mode;
import org.resonancegate.dynamics.Probe;
import org.resonancegate.dynamics.Response;
import org.resonancegate.spec.Direction;
import org.resonancegate.spec.Excitation;
import org.resonancegate.spec.ExcitationFrequency;
import org.resonancegate.spec.Operation;
import org.resonancegate.spec.ResponsePoint;

/**
 * One model case to judge: the system, its speed range and its excitations. It remembers the
 * responses it has computed at each running speed, so the criteria of one case share them (they
 * sweep the same grid and the same resonance speeds). One context is used by one thread.
 */
public final class RuleContext {

    /** One excitation's load at a speed and the system's response to it. */
    public record Driven(Drive drive, Response response) {
    }

    /** The responses at one speed, each excitation's worked out when first asked for. */
    private static final class AtSpeed {
        final Driven[] byExcitation;
        List<Driven> all;

        AtSpeed(int excitations) {
            byExcitation = new Driven[excitations];
        }
    }

    private final LinearSystem system;
    private final Operation operation;
    private final List<Excitation> excitations;
    /** Per excitation (listing order) its prepared loads; empty for an order-only one. */
    private final List<Optional<Drives.Prepared>> prepared;
    private final SpeedMemo<AtSpeed> memo = new SpeedMemo<>();
    private double[] specialSpeeds;
    private double[] sweepSpeeds;
    private final Map<List<Object>, List<Probe>> probesAlong = new HashMap<>();

    public RuleContext(LinearSystem system, Operation operation, List<Excitation> excitations) {
        this.system = system;
        this.operation = operation;
        this.excitations = List.copyOf(excitations);
        List<Optional<Drives.Prepared>> p = new ArrayList<>();
        for (Excitation e : this.excitations) {
            p.add(e instanceof Excitation.OrderOnly ? Optional.empty() : Optional.of(Drives.prepare(e, operation)));
        }
        this.prepared = List.copyOf(p);
    }

    public LinearSystem system() {
        return system;
    }

    public Operation operation() {
        return operation;
    }

    public List<Excitation> excitations() {
        return excitations;
    }

    public double minSpeed() {
        return operation.minSpeed().si();
    }

    public double maxSpeed() {
        return operation.maxSpeed().si();
    }

    public boolean fixedSpeed() {
        return operation.fixedSpeed() || minSpeed() == maxSpeed();
    }

    /** The loads of every excitation that carries one, in listing order, at running speed {@code speed}. */
    public List<Drive> drivesAt(double speed) {
        List<Drive> out = new ArrayList<>();
        for (Driven d : respondAt(speed)) {
            out.add(d.drive());
        }
        return out;
    }

    /** Every loaded excitation at running speed {@code speed} with the response to it, in listing order. */
    public List<Driven> respondAt(double speed) {
        AtSpeed at = atSpeed(speed);
        if (at.all == null) {
            List<Driven> out = new ArrayList<>(excitations.size());
            for (int i = 0; i < excitations.size(); i++) {
                if (prepared.get(i).isPresent()) {
                    out.add(driven(at, i, speed));
                }
            }
            at.all = Collections.unmodifiableList(out);
        }
        return at.all;
    }

    /**
     * One excitation's load and response at running speed {@code speed}; the others are not
     * worked out (a criterion that judges each excitation alone refines each one's own peak).
     *
     * @throws IllegalArgumentException for an excitation that carries no load or is not this context's
     */
    public Driven respondTo(Excitation excitation, double speed) {
        for (int i = 0; i < excitations.size(); i++) {
            if (excitations.get(i) == excitation && prepared.get(i).isPresent()) {
                return driven(atSpeed(speed), i, speed);
            }
        }
        throw new IllegalArgumentException("excitation '" + excitation.name() + "' carries no load here");
    }

    private AtSpeed atSpeed(double speed) {
        AtSpeed at = memo.get(speed);
        if (at == null) {
            at = new AtSpeed(excitations.size());
            memo.put(speed, at);
        }
        return at;
    }

    private Driven driven(AtSpeed at, int i, double speed) {
        Driven d = at.byExcitation[i];
        if (d == null) {
            Drive drive = prepared.get(i).orElseThrow().at(speed);
            d = new Driven(drive, system.respond(drive.load(), drive.omega()));
            at.byExcitation[i] = d;
        }
        return d;
    }

    /**
     * The system's probes at {@code at} along {@code direction}, made once: base-motion isolation
     * reads them at every speed, and making them names the point in words each time.
     */
    public List<Probe> probesAlong(Optional<ResponsePoint> at, Direction direction) {
        return probesAlong.computeIfAbsent(List.of(at, direction), k -> system.probesAlong(at, direction));
    }

    /** Whether any excitation puts a load on the system (order-only ones do not). */
    public boolean hasDrives() {
        return excitations.stream().anyMatch(e -> !(e instanceof Excitation.OrderOnly));
    }

    /**
     * Relative offsets, in units of the mode's damping ratio, of the extra samples around each
     * resonance speed: the half-power band of a mode is about ±ζ wide, so these points keep two
     * neighbouring peaks of a lightly damped pair from sharing one bracket of the coarse grid.
     */
    private static final double[] AROUND = {-3, -1, 1, 3};

    /** Damping ratio below which the points around a resonance use this width instead (undamped modes). */
    private static final double NARROWEST = 1e-4;

    /**
     * Running speeds where a response peak can sit: for every mode (zero-frequency ones give 0,
     * outside any range) and every order that carries a load, the resonance speed ω_r/n and the
     * speeds of the closed-form single-mass peaks (displacement under a force β = √(1 − 2ζ²), under
     * unbalance β = 1/√(1 − 2ζ²), transmissibility β = √(√(1 + 8ζ²) − 1)/(2ζ)), plus a few points
     * across the mode's half-power band. They seed the sweep; refinement does the rest, so a
     * lightly damped coupled mode is not missed between grid points.
     */
    public double[] specialSpeeds() {
        if (specialSpeeds != null) {
            return specialSpeeds;
        }
        double[] orders = new double[excitations.size()];
        int distinct = 0;
        for (Excitation e : excitations) {
            if (e instanceof Excitation.OrderOnly || !(e.frequency() instanceof ExcitationFrequency.Order o)) {
                continue;
            }
            if (o.order() <= 0) {
                continue;
            }
            boolean seen = false;
            for (int i = 0; i < distinct; i++) {
                seen |= orders[i] == o.order();
            }
            if (!seen) {
                orders[distinct++] = o.order(); // the same order twice gives the same speeds
            }
        }
        List<Mode> modes = system.modes();
        double[] out = new double[distinct * modes.size() * (4 + AROUND.length)];
        int count = 0;
        for (int i = 0; i < distinct; i++) {
            for (Mode m : modes) {
                double base = m.angularFrequency() / orders[i];
                out[count++] = base;
                double z = m.dampingRatio().orElse(0);
                if (2 * z * z < 1) {
                    out[count++] = base * Math.sqrt(1 - 2 * z * z);
                    out[count++] = base / Math.sqrt(1 - 2 * z * z);
                }
                if (z > 0) {
                    out[count++] = base * Math.sqrt(Math.sqrt(1 + 8 * z * z) - 1) / (2 * z);
                }
                double width = Math.max(z, NARROWEST);
                for (double k : AROUND) {
                    out[count++] = base * (1 + k * width);
                }
            }
        }
        specialSpeeds = java.util.Arrays.copyOf(out, count);
        return specialSpeeds;
    }

    /**
     * The speeds every sweep of this case samples first ({@link SpeedSweep#samples} over the
     * speed range with {@link #specialSpeeds}), sorted once for all criteria and excitations.
     */
    double[] sweepSpeeds() {
        if (sweepSpeeds == null) {
            sweepSpeeds = SpeedSweep.samples(minSpeed(), maxSpeed(), specialSpeeds());
        }
        return sweepSpeeds;
    }

    /** The mode nearest (in frequency ratio) to angular frequency {@code omega}, if any. */
    public Optional<Mode> nearestMode(double omega) {
        Mode best = null;
        double bestDistance = Double.POSITIVE_INFINITY;
        for (Mode m : system.modes()) {
            if (!(m.angularFrequency() > 0)) {
                continue;
            }
            double d = Math.abs(Math.log(omega / m.angularFrequency()));
            if (d < bestDistance) {
                bestDistance = d;
                best = m;
            }
        }
        return Optional.ofNullable(best);
    }
}
