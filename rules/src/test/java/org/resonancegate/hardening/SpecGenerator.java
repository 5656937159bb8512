package org.resonancegate.hardening;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Random;

/**
 * Invents valid specs of all three models from a seed: plausible machines on plausible mounts
 * (masses of tens of kilograms to tonnes, mounts of 0.1 to 5 MN/m, speeds of 300 to 3000 rpm),
 * with every excitation kind and rule the model takes. The same seed gives the same text.
 */
public final class SpecGenerator {

    private final Random random;

    public SpecGenerator(long seed) {
        this.random = new Random(seed);
    }

    /** One spec, its kind chosen by the seed: a third of each. */
    public String any(String id) {
        return switch (random.nextInt(3)) {
            case 0 -> single(id);
            case 1 -> lumped(id);
            default -> rigidBody(id, RigidBody.random(random));
        };
    }

    static String num(double v) {
        return String.format(Locale.ROOT, "%.9g", v);
    }

    static String q(double v, String unit) {
        return "\"" + num(v) + " " + unit + "\"";
    }

    private double between(double low, double high) {
        return low + (high - low) * random.nextDouble();
    }

    private double logBetween(double low, double high) {
        return Math.exp(between(Math.log(low), Math.log(high)));
    }

    private String speed() {
        double min = between(300, 1500);
        return random.nextBoolean()
                ? "{\"speed\": " + q(min, "rpm") + "}"
                : "{\"speed\": {\"min\": " + q(min, "rpm") + ", \"max\": " + q(min * between(1, 2), "rpm") + "}}";
    }

    private String tolerances() {
        return random.nextBoolean() ? ""
                : ",\n  \"tolerances\": {\"stiffness\": \"" + (5 + random.nextInt(15)) + " %\", \"mass\": \"" + random.nextInt(8) + " %\"}";
    }

    private String modalDamping(boolean allowCoefficient, double k, double m) {
        double zeta = between(0.01, 0.15);
        return switch (random.nextInt(allowCoefficient ? 5 : 4)) {
            case 0 -> "{\"ratio\": " + num(zeta) + "}";
            case 1 -> "{\"lossFactor\": " + num(2 * zeta) + "}";
            case 2 -> "{\"q\": " + num(1 / (2 * zeta)) + "}";
            case 3 -> "{\"logDecrement\": " + num(2 * Math.PI * zeta) + "}";
            default -> "{\"coefficient\": " + q(2 * zeta * Math.sqrt(k * m) / 1000, "kN·s/m") + "}";
        };
    }

    private static String spec(String id, String title, String model, String operation, List<String> excitations,
                               List<String> criteria, String tail) {
        return "{\n  \"format\": \"resonance-gate/1\",\n  \"id\": \"" + id + "\",\n  \"title\": \"" + title + "\",\n"
                + "  \"model\": " + model + ",\n  \"operation\": " + operation + ",\n"
                + "  \"excitations\": [\n    " + String.join(",\n    ", excitations) + "\n  ],\n"
                + "  \"criteria\": [\n    " + String.join(",\n    ", criteria) + "\n  ]" + tail + "\n}\n";
    }

    public String single(String id) {
        double m = logBetween(50, 5000);
        double fn = between(2, 40);
        double k = m * Math.pow(2 * Math.PI * fn, 2);
        String spring = switch (random.nextInt(3)) {
            case 0 -> "\"stiffness\": " + q(k / 1e6, "MN/m");
            case 1 -> "\"staticDeflection\": " + q(9.80665 / Math.pow(2 * Math.PI * fn, 2) * 1000, "mm");
            default -> "\"naturalFrequency\": " + q(fn, "Hz");
        };
        String model = "{\"kind\": \"single\", \"mass\": " + q(m, "kg") + ", " + spring + ", \"damping\": "
                + modalDamping(true, k, m) + "}";
        List<String> ex = new ArrayList<>();
        ex.add("{\"name\": \"rotor\", \"kind\": \"unbalance\", \"order\": 1, \"unbalance\": " + q(logBetween(10, 5000), "g·mm") + "}");
        if (random.nextBoolean()) {
            ex.add("{\"name\": \"mains\", \"kind\": \"force\", \"frequency\": " + q(between(20, 120), "Hz")
                    + ", \"amplitude\": " + q(between(1, 200), "N") + ", \"phase\": " + q(between(-180, 180), "deg") + "}");
        }
        if (random.nextBoolean()) {
            ex.add("{\"name\": \"floor\", \"kind\": \"base-motion\", \"order\": 1, \"velocity\": " + q(between(0.01, 1), "mm/s") + "}");
        }
        ex.add("{\"name\": \"blade pass\", \"kind\": \"order\", \"order\": " + (2 + random.nextInt(9)) + "}");
        List<String> crit = List.of(
                "{\"id\": \"SEP\", \"rule\": \"separation\", \"margin\": \"20 %\"}",
                "{\"id\": \"ISO\", \"rule\": \"isolation\", \"minEfficiency\": \"80 %\", \"severity\": \"warning\"}",
                "{\"id\": \"DISP\", \"rule\": \"displacement\", \"max\": \"50 µm\", \"measure\": \"peak-to-peak\"}",
                "{\"id\": \"VEL\", \"rule\": \"velocity\", \"max\": \"4.5 mm/s\"}",
                "{\"id\": \"FORCE\", \"rule\": \"transmitted-force\", \"max\": \"500 N\"}",
                "{\"id\": \"DEFL\", \"rule\": \"static-deflection\", \"max\": \"50 mm\"}");
        return spec(id, "invented single mass", model, speed(), ex, crit, tolerances());
    }

    public String lumped(String id) {
        boolean torsion = random.nextInt(4) == 0;
        int n = 2 + random.nextInt(3);
        List<String> masses = new ArrayList<>();
        List<String> springs = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            masses.add(torsion ? "{\"name\": \"J" + i + "\", \"inertia\": " + q(logBetween(1, 50), "kg·m²") + "}"
                    : "{\"name\": \"M" + i + "\", \"mass\": " + q(logBetween(50, 3000), "kg") + "}");
            String from = i == 0 ? (torsion ? null : "ground") : (torsion ? "J" : "M") + (i - 1);
            if (from != null) {
                springs.add("{\"name\": \"S" + i + "\", \"from\": \"" + from + "\", \"to\": \"" + (torsion ? "J" : "M") + i
                        + "\", \"stiffness\": " + (torsion ? q(logBetween(1e5, 1e7) / 1000, "kN·m/rad")
                        : q(logBetween(1e5, 1e8) / 1e6, "MN/m")) + "}");
            }
        }
        String last = (torsion ? "J" : "M") + (n - 1);
        String model = "{\n    \"kind\": \"lumped\", \"motion\": \"" + (torsion ? "torsion" : "translation") + "\","
                + (torsion ? " \"free\": true," : "")
                + "\n    \"masses\": [" + String.join(", ", masses) + "],\n    \"springs\": [\n      "
                + String.join(",\n      ", springs) + "\n    ],\n    \"damping\": " + modalDamping(false, 1, 1) + "\n  }";
        List<String> ex = new ArrayList<>();
        List<String> crit = new ArrayList<>();
        crit.add("{\"id\": \"SEP\", \"rule\": \"separation\", \"margin\": \"15 %\"}");
        if (torsion) {
            ex.add("{\"name\": \"torque ripple\", \"kind\": \"force\", \"order\": 2, \"amplitude\": " + q(between(10, 500), "N·m")
                    + ", \"at\": \"" + last + "\"}");
            crit.add("{\"id\": \"VEL\", \"rule\": \"velocity\", \"max\": \"0.5 rad/s\", \"at\": \"" + last + "\"}");
            crit.add("{\"id\": \"TORQUE\", \"rule\": \"transmitted-force\", \"max\": \"5 kN·m\"}");
        } else {
            ex.add("{\"name\": \"rotor\", \"kind\": \"unbalance\", \"order\": 1, \"unbalance\": " + q(logBetween(10, 5000), "g·mm")
                    + ", \"at\": \"" + last + "\"}");
            ex.add("{\"name\": \"floor\", \"kind\": \"base-motion\", \"frequency\": " + q(between(5, 60), "Hz")
                    + ", \"displacement\": " + q(between(1, 50), "µm") + "}");
            crit.add("{\"id\": \"VEL\", \"rule\": \"velocity\", \"max\": \"4.5 mm/s\", \"at\": \"" + last + "\"}");
            crit.add("{\"id\": \"ISO\", \"rule\": \"isolation\", \"maxTransmissibility\": 0.3, \"at\": \"" + last + "\"}");
            crit.add("{\"id\": \"FORCE\", \"rule\": \"transmitted-force\", \"max\": \"2 kN\"}");
            crit.add("{\"id\": \"DEFL\", \"rule\": \"static-deflection\", \"max\": \"80 mm\"}");
        }
        ex.add("{\"name\": \"vane pass\", \"kind\": \"order\", \"order\": " + (3 + random.nextInt(8)) + "}");
        return spec(id, "invented " + (torsion ? "shaft train" : "two-stage mounting"), model, speed(), ex, crit, tolerances());
    }

    /**
     * A rigid body: mass, centre of gravity, moments and small products of inertia of a box, and
     * mounts with stiffness along x, y, z. Kept as numbers so tests can move or turn it.
     */
    public record RigidBody(double mass, double[] cg, double[] inertia, double[] products,
                            List<double[]> mountPositions, List<double[]> mountStiffness, double zeta) {

        static RigidBody random(Random r) {
            double m = 100 + 4900 * r.nextDouble();
            double a = 0.3 + 1.7 * r.nextDouble();
            double b = 0.3 + 1.2 * r.nextDouble();
            double h = 0.3 + 1.7 * r.nextDouble();
            double[] cg = {(r.nextDouble() - 0.5) * 0.4 * a, (r.nextDouble() - 0.5) * 0.4 * b, 0.2 + 1.3 * r.nextDouble()};
            double[] inertia = {m / 12 * (4 * b * b + h * h), m / 12 * (4 * a * a + h * h), m / 12 * (4 * a * a + 4 * b * b)};
            double small = 0.05 * Math.min(inertia[0], Math.min(inertia[1], inertia[2]));
            double[] products = {(r.nextDouble() - 0.5) * small, (r.nextDouble() - 0.5) * small, (r.nextDouble() - 0.5) * small};
            List<double[]> positions = new ArrayList<>();
            List<double[]> stiffness = new ArrayList<>();
            int count = r.nextBoolean() ? 4 : 6;
            for (int i = 0; i < count; i++) {
                double x = i < 4 ? (i % 2 == 0 ? -a : a) : 0;
                double y = i < 4 ? (i < 2 ? -b : b) : (i == 4 ? -b : b);
                positions.add(new double[] {x * (0.9 + 0.2 * r.nextDouble()), y * (0.9 + 0.2 * r.nextDouble()), 0.05 * r.nextDouble()});
                double kz = Math.exp(Math.log(1e5) + (Math.log(5e6) - Math.log(1e5)) * r.nextDouble());
                stiffness.add(new double[] {kz * (0.3 + 0.7 * r.nextDouble()), kz * (0.3 + 0.7 * r.nextDouble()), kz});
            }
            return new RigidBody(m, cg, inertia, products, positions, stiffness, 0.02 + 0.08 * r.nextDouble());
        }

        /** The same body and mounts moved by {@code d} metres. */
        public RigidBody translated(double[] d) {
            List<double[]> moved = mountPositions.stream().map(p -> new double[] {p[0] + d[0], p[1] + d[1], p[2] + d[2]}).toList();
            return new RigidBody(mass, new double[] {cg[0] + d[0], cg[1] + d[1], cg[2] + d[2]}, inertia, products, moved,
                    mountStiffness, zeta);
        }

        /**
         * The same body with its centre of gravity and mount positions rounded to multiples of
         * {@code step} metres. Moved by a multiple of {@code step}, such a body is still written
         * exactly in the spec text's nine significant digits, however far it goes; an unrounded
         * one 20 m away loses about 5e-8 m of its geometry to the text alone.
         */
        public RigidBody onGrid(double step) {
            List<double[]> snapped = mountPositions.stream()
                    .map(p -> new double[] {snap(p[0], step), snap(p[1], step), snap(p[2], step)}).toList();
            return new RigidBody(mass, new double[] {snap(cg[0], step), snap(cg[1], step), snap(cg[2], step)}, inertia, products,
                    snapped, mountStiffness, zeta);
        }

        private static double snap(double v, double step) {
            return Math.round(v / step) * step;
        }

        /**
         * The same body and mounts turned a quarter turn about z: (x, y, z) → (−y, x, z). Mount
         * stiffness is axis-aligned, so kx and ky swap; Ixx and Iyy swap; the products follow from
         * P'xy = ∫x'y' dm = −Pxy, P'xz = −Pyz, P'yz = Pxz.
         */
        public RigidBody quarterTurnAboutZ() {
            List<double[]> turned = mountPositions.stream().map(p -> new double[] {-p[1], p[0], p[2]}).toList();
            List<double[]> k = mountStiffness.stream().map(s -> new double[] {s[1], s[0], s[2]}).toList();
            return new RigidBody(mass, new double[] {-cg[1], cg[0], cg[2]}, new double[] {inertia[1], inertia[0], inertia[2]},
                    new double[] {-products[0], -products[2], products[1]}, turned, k, zeta);
        }

        /** Every mass and inertia times {@code f}, every stiffness times {@code g}. */
        public RigidBody scaled(double f, double g) {
            List<double[]> k = mountStiffness.stream().map(s -> new double[] {s[0] * g, s[1] * g, s[2] * g}).toList();
            return new RigidBody(mass * f, cg, new double[] {inertia[0] * f, inertia[1] * f, inertia[2] * f},
                    new double[] {products[0] * f, products[1] * f, products[2] * f}, mountPositions, k, zeta);
        }
    }

    private static String point(double[] p) {
        return "{\"x\": " + q(p[0], "m") + ", \"y\": " + q(p[1], "m") + ", \"z\": " + q(p[2], "m") + "}";
    }

    /** A rigid-body spec of {@code body}, with an unbalance above the centre of gravity and five rules. */
    public static String rigidBody(String id, RigidBody body) {
        StringBuilder mounts = new StringBuilder();
        for (int i = 0; i < body.mountPositions().size(); i++) {
            double[] k = body.mountStiffness().get(i);
            mounts.append(i == 0 ? "" : ",\n      ").append("{\"name\": \"K").append(i + 1).append("\", \"position\": ")
                    .append(point(body.mountPositions().get(i))).append(", \"stiffness\": {\"x\": ").append(q(k[0], "N/m"))
                    .append(", \"y\": ").append(q(k[1], "N/m")).append(", \"z\": ").append(q(k[2], "N/m")).append("}}");
        }
        double[] c = body.cg();
        double[] bearing = {c[0], c[1], c[2] + 0.3};
        String model = "{\n    \"kind\": \"rigid-body\", \"mass\": " + q(body.mass(), "kg") + ",\n    \"centreOfGravity\": " + point(c)
                + ",\n    \"inertia\": {\"xx\": " + q(body.inertia()[0], "kg·m²") + ", \"yy\": " + q(body.inertia()[1], "kg·m²")
                + ", \"zz\": " + q(body.inertia()[2], "kg·m²") + "},\n    \"productsOfInertia\": {\"xy\": "
                + q(body.products()[0], "kg·m²") + ", \"xz\": " + q(body.products()[1], "kg·m²") + ", \"yz\": "
                + q(body.products()[2], "kg·m²") + "},\n    \"mounts\": [\n      " + mounts + "\n    ],\n    \"damping\": {\"ratio\": "
                + num(body.zeta()) + "}\n  }";
        List<String> ex = List.of(
                "{\"name\": \"rotor\", \"kind\": \"unbalance\", \"order\": 1, \"unbalance\": \"800 g·mm\", \"at\": " + point(bearing)
                        + ", \"axis\": \"x\"}",
                "{\"name\": \"belt\", \"kind\": \"force\", \"order\": 2, \"amplitude\": \"40 N\", \"at\": " + point(bearing)
                        + ", \"direction\": {\"x\": 0, \"y\": 0, \"z\": 1}}",
                "{\"name\": \"blade pass\", \"kind\": \"order\", \"order\": 7}");
        List<String> crit = List.of(
                "{\"id\": \"SEP\", \"rule\": \"separation\", \"margin\": \"20 %\"}",
                "{\"id\": \"ISO\", \"rule\": \"isolation\", \"minEfficiency\": \"90 %\"}",
                "{\"id\": \"VEL\", \"rule\": \"velocity\", \"max\": \"4.5 mm/s\", \"at\": " + point(bearing) + "}",
                "{\"id\": \"FORCE\", \"rule\": \"transmitted-force\", \"max\": \"200 N\", \"axis\": \"z\"}",
                "{\"id\": \"DEFL\", \"rule\": \"static-deflection\", \"max\": \"60 mm\"}");
        return spec(id, "invented rigid body", model, "{\"speed\": {\"min\": \"600 rpm\", \"max\": \"1480 rpm\"}}", ex, crit, "");
    }
}
