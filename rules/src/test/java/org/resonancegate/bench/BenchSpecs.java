package org.resonancegate.bench;

import static org.resonancegate.fixtures.Models.atMass;
import static org.resonancegate.fixtures.Models.body;
import static org.resonancegate.fixtures.Models.fixedAt;
import static org.resonancegate.fixtures.Models.inertia;
import static org.resonancegate.fixtures.Models.mass;
import static org.resonancegate.fixtures.Models.mount;
import static org.resonancegate.fixtures.Models.point;
import static org.resonancegate.fixtures.Models.rotatingAt;
import static org.resonancegate.fixtures.Models.spring;
import static org.resonancegate.fixtures.Models.translation;
import static org.resonancegate.fixtures.Specs.AT;
import static org.resonancegate.fixtures.Specs.fixed;
import static org.resonancegate.fixtures.Specs.gramMillimetres;
import static org.resonancegate.fixtures.Specs.maxTransmissibility;
import static org.resonancegate.fixtures.Specs.mmPerS;
import static org.resonancegate.fixtures.Specs.newtons;
import static org.resonancegate.fixtures.Specs.order;
import static org.resonancegate.fixtures.Specs.range;
import static org.resonancegate.fixtures.Specs.ratio;
import static org.resonancegate.fixtures.Specs.separation;

import static org.resonancegate.fixtures.Specs.spec;
import static org.resonancegate.fixtures.Specs.staticDeflection;
import static org.resonancegate.fixtures.Specs.tolerances;
import static org.resonancegate.fixtures.Specs.transmittedForce;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.resonancegate.spec.Criterion;
import org.resonancegate.spec.Excitation;
import org.resonancegate.spec.Model;
import org.resonancegate.spec.Placement;
import org.resonancegate.spec.ResponsePoint;
import org.resonancegate.spec.Severity;
import org.resonancegate.spec.ShaftAxis;
import org.resonancegate.spec.Spec;
import org.resonancegate.spec.UnbalanceAmount;

/** The specs the benchmark judges: invented equipment of the Harbourside district cooling plant. */
public final class BenchSpecs {

    private BenchSpecs() {
    }

    private static Excitation.Unbalance unbalance(String name, double orderN, double gramMm, Placement where) {
        return new Excitation.Unbalance(name, 0, order(orderN), new UnbalanceAmount.Direct(gramMillimetres(gramMm)),
                where, AT);
    }

    /** A fan set on six mounts: three excitations, five criteria, ±15 % stiffness. */
    public static Spec rigidBody() {
        List<Model.Mount> mounts = new ArrayList<>();
        double[][] at = {{-0.9, -0.5}, {0.9, -0.5}, {-0.9, 0.5}, {0.9, 0.5}, {0, -0.55}, {0, 0.55}};
        for (int i = 0; i < 6; i++) {
            mounts.add(mount("A" + (i + 1), point(at[i][0], at[i][1], 0), 0.4e6, 0.4e6, 1.1e6));
        }
        Model.RigidBody fanSet = body(2300, point(0.05, 0, 0.65), inertia(310, 520, 640), mounts,
                Optional.of(ratio(0.05)));
        List<Excitation> ex = List.of(
                unbalance("fan wheel", 1, 3000, rotatingAt(point(0.3, 0, 1.1), ShaftAxis.X)),
                unbalance("motor", 1, 800, rotatingAt(point(-0.5, 0, 0.7), ShaftAxis.X)),
                new Excitation.Force("belt", 0, order(2), newtons(150), fixedAt(point(0, 0.2, 0.9), 0, 0.6, 0.8), AT));
        List<Criterion> criteria = List.of(separation("SEP", 0.2), maxTransmissibility("ISO", 0.2),
                new Criterion.Velocity("VEL", Severity.ERROR, mmPerS(2.8), Criterion.VelocityMeasure.RMS,
                        Optional.of(new ResponsePoint.OnBody(point(0.3, 0, 1.1), Optional.empty())), AT),
                transmittedForce("FORCE", 2000), staticDeflection("SD", 5.0, 25.0));
        return spec(fanSet, range(740, 1480), ex, criteria, tolerances(0.15, null), List.of());
    }

    /** A pump on an inertia base on springs: two masses, same excitations and criteria. */
    public static Spec lumped() {
        Model.Lumped line = translation(List.of(mass("inertia base", 1800), mass("pump", 900)),
                List.of(spring("springs", "ground", "inertia base", 2.0e6), spring("pads", "inertia base", "pump", 4.0e7)),
                Optional.of(ratio(0.04)));
        List<Excitation> ex = List.of(unbalance("impeller", 1, 1500, atMass("pump")),
                unbalance("motor", 1, 600, atMass("pump")),
                new Excitation.Force("vane pass", 0, fixed(120), newtons(80), atMass("pump"), AT));
        List<Criterion> criteria = List.of(separation("SEP", 0.2), maxTransmissibility("ISO", 0.2),
                new Criterion.Velocity("VEL", Severity.ERROR, mmPerS(2.8), Criterion.VelocityMeasure.RMS,
                        Optional.of(new ResponsePoint.Mass("pump", AT)), AT),
                transmittedForce("FORCE", 2000), staticDeflection("SD", 5.0, 25.0));
        return spec(line, range(740, 1480), ex, criteria, tolerances(0.15, null), List.of());
    }

    /** The single-mass equivalent: one mass, same excitations along the line. */
    public static Spec single() {
        List<Excitation> ex = List.of(unbalance("impeller", 1, 1500, Placement.LINE),
                unbalance("motor", 1, 600, Placement.LINE),
                new Excitation.Force("vane pass", 0, fixed(120), newtons(80), Placement.LINE, AT));
        List<Criterion> criteria = List.of(separation("SEP", 0.2), maxTransmissibility("ISO", 0.2),
                new Criterion.Velocity("VEL", Severity.ERROR, mmPerS(2.8), Criterion.VelocityMeasure.RMS, AT),
                transmittedForce("FORCE", 2000), staticDeflection("SD", 5.0, 25.0));
        return spec(org.resonancegate.fixtures.Specs.single(2700, 2.0e6, 0.04), range(740, 1480), ex, criteria, tolerances(0.15, null), List.of());
    }
}
