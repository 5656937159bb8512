package org.resonancegate.crosscheck;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.resonancegate.check.CheckRequest;
import org.resonancegate.check.CheckRun;
import org.resonancegate.report.CheckResult;
import org.resonancegate.report.CheckStatus;
import org.resonancegate.report.Results;
import org.resonancegate.report.SpecResult;
import org.resonancegate.report.SpecStatus;

/**
 * End to end, from spec files on disk to verdicts: randomly drawn single-mass specs that are not
 * in the repository are judged by the engine and, independently, by the textbook closed forms
 * evaluated by brute force on a dense speed grid written here from scratch. Every governing value
 * must agree within 1 % and every status must be the same.
 *
 * <p>Closed forms (check-values.md §1): dynamic magnification D = 1/√((1−β²)² + (2ζβ)²) and
 * transmissibility T = √(1 + (2ζβ)²)·D (Thomson, Theory of Vibration with Applications; Civil
 * Engineering Handbook eq. 3.23); rotating unbalance F = U·ω², transmitted force F·T (Carvill,
 * Mechanical Engineers' Data Handbook, 1993); velocity V = ω·X and rms = peak/√2 for one sinusoid
 * (check-values 3.9); static deflection m·gn/k with gn = 9.80665 m/s² (CGPM 1901); balance-grade
 * unbalance U = M·G/Ω_max (ISO 21940-11, check-values 4.4).
 */
class SingleMassCrossCheckTest {

    private static final double GN = 9.80665;
    private static final int GRID = 200_001;

    /** One randomly drawn design, in SI, with the text written into its spec file. */
    private record Design(String id, double mass, double stiffness, double zeta, double nMinRpm, double nMaxRpm,
                          double unbalance, double order, double forceAmplitude, double forceOrder,
                          double tolK, double tolM) {
    }

    private record Expected(double value, boolean fails) {
    }

    @TempDir
    Path project;

    @Test
    void randomSpecsAgreeWithIndependentClosedFormsWithinOnePercentAndInEveryStatus() throws IOException {
        Random random = new Random(20261202L);
        List<Path> files = new ArrayList<>();
        Map<String, Map<String, Expected>> expectedBySpec = new HashMap<>();
        Path dir = Files.createDirectories(project.resolve("src/vibration"));
        for (int i = 0; i < 24; i++) {
            Design d = draw(random, i);
            Map<String, Double> worst = independentWorstValues(d);
            Map<String, Expected> expected = new HashMap<>();
            StringBuilder criteria = new StringBuilder();
            // Limits are drawn away from the independent value (never within 5 %) so that a 1 %
            // disagreement cannot flip a status by itself; about half of them fail.
            double sepMargin = 0.05 + 0.3 * random.nextDouble();
            expected.put("SEP", new Expected(worst.get("SEP"), worst.get("SEP") < sepMargin));
            criteria.append(String.format(Locale.ROOT,
                    "{\"id\": \"SEP\", \"rule\": \"separation\", \"margin\": %.6f}", sepMargin));
            for (String id : List.of("ISO", "VEL", "DISP", "FORCE")) {
                double factor = random.nextBoolean() ? 0.6 + 0.35 * random.nextDouble() : 1.05 + 0.5 * random.nextDouble();
                double limit = worst.get(id) * factor;
                expected.put(id, new Expected(worst.get(id), factor < 1));
                criteria.append(",\n    ").append(switch (id) {
                    case "ISO" -> String.format(Locale.ROOT,
                            "{\"id\": \"ISO\", \"rule\": \"isolation\", \"maxTransmissibility\": %.9g}", limit);
                    case "VEL" -> String.format(Locale.ROOT,
                            "{\"id\": \"VEL\", \"rule\": \"velocity\", \"max\": \"%.9g mm/s\"}", limit * 1e3);
                    case "DISP" -> String.format(Locale.ROOT,
                            "{\"id\": \"DISP\", \"rule\": \"displacement\", \"max\": \"%.9g µm\"}", limit * 1e6);
                    default -> String.format(Locale.ROOT,
                            "{\"id\": \"FORCE\", \"rule\": \"transmitted-force\", \"max\": \"%.9g N\"}", limit);
                });
            }
            double minDefl = worst.get("DEFL") * (random.nextBoolean() ? 0.8 : 1.2);
            expected.put("DEFL", new Expected(worst.get("DEFL"), minDefl > worst.get("DEFL")));
            criteria.append(String.format(Locale.ROOT,
                    ",\n    {\"id\": \"DEFL\", \"rule\": \"static-deflection\", \"min\": \"%.9g mm\"}", minDefl * 1e3));
            Path file = dir.resolve(d.id().toLowerCase(Locale.ROOT) + ".json");
            Files.writeString(file, specJson(d, criteria.toString()), StandardCharsets.UTF_8);
            files.add(file);
            expectedBySpec.put(d.id(), expected);
        }

        Results results = CheckRun.run(new CheckRequest(project, files,
                Clock.fixed(Instant.parse("2026-12-02T12:00:00Z"), ZoneOffset.UTC)));

        assertEquals(files.size(), results.specs().size());
        for (SpecResult spec : results.specs()) {
            String id = spec.id().orElseThrow();
            assertTrue(spec.errors().isEmpty(), () -> id + " has diagnostics: " + spec.errors());
            Map<String, Expected> expected = expectedBySpec.get(id);
            assertEquals(expected.size(), spec.checks().size(), id + " check count");
            boolean anyFail = false;
            for (CheckResult check : spec.checks()) {
                Expected e = expected.get(check.criterion());
                String where = id + " " + check.criterion() + ": " + check.message();
                if (e.value() == 0) {
                    assertEquals(0.0, check.value(), 1e-12, where);
                } else {
                    assertEquals(e.value(), check.value(), Math.abs(e.value()) * 0.01, where);
                }
                assertEquals(e.fails() ? CheckStatus.FAIL : CheckStatus.PASS, check.status(), where);
                anyFail |= e.fails();
            }
            assertEquals(anyFail ? SpecStatus.FAIL : SpecStatus.PASS, spec.status(), id + " spec status");
        }
    }

    private static Design draw(Random r, int i) {
        double mass = 50 + 3000 * r.nextDouble();
        double fn = 3 + 30 * r.nextDouble();
        double stiffness = mass * Math.pow(2 * Math.PI * fn, 2);
        double zeta = 0.02 + 0.13 * r.nextDouble();
        double nMin = 300 + 1500 * r.nextDouble();
        double nMax = nMin * (1 + 0.8 * r.nextDouble());
        double order = r.nextInt(4) == 0 ? 2 : 1;
        double unbalance = 1e-4 + 2e-3 * r.nextDouble(); // kg·m: 100 to 2100 g·mm
        boolean withForce = r.nextBoolean();
        double forceAmplitude = withForce ? 50 + 500 * r.nextDouble() : 0;
        double forceOrder = 3;
        boolean tolerant = r.nextBoolean();
        return new Design(String.format(Locale.ROOT, "XC-%02d", i), mass, stiffness, zeta, nMin, nMax, unbalance,
                order, forceAmplitude, forceOrder, tolerant ? 0.15 : 0, tolerant ? 0.05 : 0);
    }

    private static String specJson(Design d, String criteria) {
        StringBuilder excitations = new StringBuilder(String.format(Locale.ROOT,
                "{\"name\": \"rotor\", \"kind\": \"unbalance\", \"order\": %s, \"unbalance\": \"%.9g g·mm\"}",
                fmt(d.order()), d.unbalance() * 1e6));
        if (d.forceAmplitude() > 0) {
            excitations.append(String.format(Locale.ROOT,
                    ",\n    {\"name\": \"vane pass\", \"kind\": \"force\", \"order\": %s, \"amplitude\": \"%.9g N\"}",
                    fmt(d.forceOrder()), d.forceAmplitude()));
        }
        String tolerances = d.tolK() > 0 ? String.format(Locale.ROOT,
                ",\n  \"tolerances\": {\"stiffness\": \"%s %%\", \"mass\": \"%s %%\"}",
                fmt(d.tolK() * 100), fmt(d.tolM() * 100)) : "";
        return String.format(Locale.ROOT, """
                {
                  "format": "resonance-gate/1",
                  "id": "%s",
                  "model": {"kind": "single", "mass": "%.9g kg", "stiffness": "%.9g N/m", "damping": {"ratio": %.9g}},
                  "operation": {"speed": {"min": "%.9g rpm", "max": "%.9g rpm"}},
                  "excitations": [
                    %s
                  ],
                  "criteria": [
                    %s
                  ]%s
                }
                """, d.id(), d.mass(), d.stiffness(), d.zeta(), d.nMinRpm(), d.nMaxRpm(), excitations, criteria,
                tolerances);
    }

    private static String fmt(double v) {
        return v == Math.rint(v) ? Long.toString((long) v) : Double.toString(v);
    }

    /**
     * The worst value of each criterion over the five tolerance cases and a dense speed grid,
     * from the closed forms alone. Separation is exact: a band either contains the mode (0) or
     * is nearest to it at one of its ends.
     */
    private static Map<String, Double> independentWorstValues(Design d) {
        double[][] cases = d.tolK() > 0
                ? new double[][] {{1, 1}, {1 - d.tolK(), 1 - d.tolM()}, {1 - d.tolK(), 1 + d.tolM()},
                        {1 + d.tolK(), 1 - d.tolM()}, {1 + d.tolK(), 1 + d.tolM()}}
                : new double[][] {{1, 1}};
        double sep = Double.MAX_VALUE;
        double iso = 0;
        double vel = 0;
        double disp = 0;
        double force = 0;
        double defl = Double.MAX_VALUE; // only a minimum bound is tested: the smallest deflection governs
        for (double[] c : cases) {
            double k = d.stiffness() * c[0];
            double m = d.mass() * c[1];
            double wn = Math.sqrt(k / m);
            double fnHz = wn / (2 * Math.PI);
            defl = Math.min(defl, m * GN / k);
            List<Double> orders = new ArrayList<>(List.of(d.order()));
            if (d.forceAmplitude() > 0) {
                orders.add(d.forceOrder());
            }
            for (double n : orders) {
                double lo = n * d.nMinRpm() / 60 / fnHz;
                double hi = n * d.nMaxRpm() / 60 / fnHz;
                sep = Math.min(sep, (lo <= 1 && hi >= 1) ? 0 : Math.min(Math.abs(lo - 1), Math.abs(hi - 1)));
            }
            for (int g = 0; g < GRID; g++) {
                double rpm = d.nMinRpm() + (d.nMaxRpm() - d.nMinRpm()) * g / (GRID - 1);
                double shaft = 2 * Math.PI * rpm / 60;
                // unbalance
                double w1 = d.order() * shaft;
                double b1 = w1 / wn;
                double f1 = d.unbalance() * w1 * w1;
                double x1 = f1 / k * magnification(b1, d.zeta());
                double t1 = transmissibility(b1, d.zeta());
                double dispSum = x1;
                double velSq = Math.pow(w1 * x1, 2);
                double forceSum = f1 * t1;
                iso = Math.max(iso, t1);
                if (d.forceAmplitude() > 0) {
                    double w2 = d.forceOrder() * shaft;
                    double b2 = w2 / wn;
                    double x2 = d.forceAmplitude() / k * magnification(b2, d.zeta());
                    double t2 = transmissibility(b2, d.zeta());
                    dispSum += x2; // distinct frequencies: peaks add arithmetically
                    velSq += Math.pow(w2 * x2, 2); // rms adds as a root sum of squares
                    forceSum += d.forceAmplitude() * t2;
                    iso = Math.max(iso, t2);
                }
                disp = Math.max(disp, dispSum);
                vel = Math.max(vel, Math.sqrt(velSq) / Math.sqrt(2));
                force = Math.max(force, forceSum);
            }
        }
        return Map.of("SEP", sep, "ISO", iso, "VEL", vel, "DISP", disp, "FORCE", force, "DEFL", defl);
    }

    private static double magnification(double beta, double zeta) {
        return 1 / Math.sqrt(Math.pow(1 - beta * beta, 2) + Math.pow(2 * zeta * beta, 2));
    }

    private static double transmissibility(double beta, double zeta) {
        return Math.sqrt(1 + Math.pow(2 * zeta * beta, 2)) * magnification(beta, zeta);
    }
}
