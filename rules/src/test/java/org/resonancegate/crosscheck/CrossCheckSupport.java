package org.resonancegate.crosscheck;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.math.MathContext;
import java.nio.file.Path;
import java.time.Clock;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Random;
import org.resonancegate.check.CheckRequest;
import org.resonancegate.check.CheckRun;
import org.resonancegate.report.CheckResult;
import org.resonancegate.report.CheckStatus;
import org.resonancegate.report.ModeResult;
import org.resonancegate.report.Results;
import org.resonancegate.report.SpecResult;
import org.resonancegate.report.SpecStatus;

/**
 * What the mounted-model cross-checks share: writing numbers and criteria into spec JSON, drawing
 * limits away from the independently computed worst value, running the engine end to end, and
 * comparing every governing value, limit, status and mode. Nothing here calls the engine's
 * dynamics or criteria; only {@link CheckRun} is run, as a user's build would.
 */
final class CrossCheckSupport {

    /** Frequencies must agree within 0.5 %, governing values and damping ratios within 1 % (issue 3, "Done when"). */
    static final double FREQUENCY_TOLERANCE = 0.005;
    static final double VALUE_TOLERANCE = 0.01;

    private CrossCheckSupport() {
    }

    /** What the independent computation expects of one criterion. {@code limit} is NaN where it is not compared. */
    record Expected(double value, boolean fails, boolean warning, double limit, boolean efficiency) {
        CheckStatus status() {
            return !fails ? CheckStatus.PASS : warning ? CheckStatus.WARNING : CheckStatus.FAIL;
        }
    }

    /** The nominal modes (Hz and damping ratio) and every criterion's expectation of one spec. */
    record SpecExpectation(double[] frequenciesHz, double[] dampingRatios, Map<String, Expected> checks,
                           String json) {
    }

    /**
     * The draw's seed: fixed, so every build judges the same specs; {@code -Dresonancegate.crosscheck.seed=N}
     * varies it to hunt for disagreements by hand.
     */
    static long seed(long fixed) {
        return fixed ^ Long.getLong("resonancegate.crosscheck.seed", 0L);
    }

    /** A number in plain decimal notation with ten significant digits (no exponent, whatever the reader accepts). */
    static String num(double v) {
        return new BigDecimal(v).round(new MathContext(10)).stripTrailingZeros().toPlainString();
    }

    /** A quantity string such as {@code "12.5 mm"}, quoted for JSON. */
    /** The {@code operation.speed} value: one speed, or a min/max range. */
    static String speedJson(double nMinRpm, double nMaxRpm) {
        return nMinRpm == nMaxRpm ? q(nMinRpm, "rpm")
                : "{\"min\": " + q(nMinRpm, "rpm") + ", \"max\": " + q(nMaxRpm, "rpm") + "}";
    }

    /** The {@code tolerances} member (with its leading comma), or nothing without tolerances. */
    static String tolerancesJson(double tolK, double tolM) {
        return tolK > 0 ? ",\n  \"tolerances\": {\"stiffness\": \"" + num(tolK * 100)
                + " %\", \"mass\": \"" + num(tolM * 100) + " %\"}" : "";
    }

    static String q(double v, String unit) {
        return "\"" + num(v) + " " + unit + "\"";
    }

    /** A point {"x","y","z"} in metres. */
    static String point(double[] p) {
        return String.format(Locale.ROOT, "{\"x\": %s, \"y\": %s, \"z\": %s}", q(p[0], "m"), q(p[1], "m"), q(p[2], "m"));
    }

    /**
     * A limit factor relative to the worst value: either 0.6–0.95 or 1.05–1.55, so a limit is
     * never within 5 % of the independent value and a 1 % disagreement cannot flip a status.
     */
    static double factor(Random r) {
        return r.nextBoolean() ? 0.6 + 0.35 * r.nextDouble() : 1.05 + 0.5 * r.nextDouble();
    }

    /** Collects criteria JSON with their expectations for one spec. */
    static final class Criteria {
        private final Random random;
        private final StringBuilder json = new StringBuilder();
        private final Map<String, Expected> expected = new LinkedHashMap<>();

        Criteria(Random random) {
            this.random = random;
        }

        private String severity(boolean[] warning) {
            warning[0] = random.nextInt(7) == 0;
            return warning[0] ? ", \"severity\": \"warning\"" : "";
        }

        private void add(String text) {
            if (!json.isEmpty()) {
                json.append(",\n    ");
            }
            json.append(text);
        }

        /** separation: the smallest |β − 1| over modes, excitations and cases; fails below the margin. */
        void separation(double worst) {
            double margin;
            if (worst == 0) {
                margin = 0.05 + 0.3 * random.nextDouble();
            } else {
                margin = worst * factor(random);
                if (margin >= 0.95) {
                    margin = worst < 1 ? worst * (0.6 + 0.35 * random.nextDouble()) : 0.3 + 0.5 * random.nextDouble();
                }
            }
            boolean[] w = new boolean[1];
            String sev = severity(w);
            add(String.format(Locale.ROOT, "{\"id\": \"SEP\", \"rule\": \"separation\", \"margin\": %s%s}",
                    num(margin), sev));
            expected.put("SEP", new Expected(worst, worst < margin, w[0], Double.NaN, false));
        }

        /** isolation: the largest force (or base-motion) transmissibility; {@code keys} may hold an "at"; stated as maxTransmissibility or minEfficiency = 1 − T. */
        void isolation(double worstT, String keys) {
            double limitT = worstT * factor(random);
            boolean efficiency = limitT < 0.9 && random.nextInt(3) == 0;
            boolean[] w = new boolean[1];
            String sev = severity(w);
            if (efficiency) {
                add(String.format(Locale.ROOT, "{\"id\": \"ISO\", \"rule\": \"isolation\", \"minEfficiency\": %s%s%s}",
                        num(1 - limitT), keys, sev));
            } else {
                add(String.format(Locale.ROOT,
                        "{\"id\": \"ISO\", \"rule\": \"isolation\", \"maxTransmissibility\": %s%s%s}", num(limitT), keys,
                        sev));
            }
            expected.put("ISO", new Expected(worstT, worstT > limitT, w[0], Double.NaN, efficiency));
        }

        /**
         * A maximum-type criterion (displacement, velocity, transmitted-force). {@code scale}
         * turns SI into {@code unit}; {@code keys} holds the other keys (at, axis, measure).
         */
        void maximum(String id, String rule, double worst, double scale, String unit, String keys) {
            double limit = worst * factor(random);
            boolean[] w = new boolean[1];
            String sev = severity(w);
            add(String.format(Locale.ROOT, "{\"id\": \"%s\", \"rule\": \"%s\", \"max\": %s%s%s}", id, rule,
                    q(limit * scale, unit), keys, sev));
            expected.put(id, new Expected(worst, worst > limit, w[0], Double.NaN, false));
        }

        /**
         * static-deflection over every element and tolerance case: with a min bound the smallest
         * deflection is nearest to breaking it, with a max the largest; with both, the smaller
         * relative distance |d − bound|/|bound| governs (negative when broken: the largest
         * violation governs), spec-format.md "Fine points".
         */
        void staticDeflection(List<double[]> deflections) {
            double dMin = Double.MAX_VALUE;
            double dMax = 0;
            for (double[] c : deflections) {
                for (double d : c) {
                    dMin = Math.min(dMin, d);
                    dMax = Math.max(dMax, d);
                }
            }
            int form = random.nextInt(3);
            double min;
            double max;
            double marginMin;
            double marginMax;
            do {
                min = form != 1 ? dMin * factor(random) : Double.NaN;
                max = form != 0 ? dMax * factor(random) : Double.NaN;
                marginMin = form != 1 ? (dMin - min) / min : Double.MAX_VALUE;
                marginMax = form != 0 ? (max - dMax) / max : Double.MAX_VALUE;
            } while (form == 2 && (Math.abs(marginMin - marginMax) < 0.02 || min >= max));
            boolean minGoverns = marginMin <= marginMax;
            double value = minGoverns ? dMin : dMax;
            double limit = minGoverns ? min : max;
            boolean[] w = new boolean[1];
            String sev = severity(w);
            StringBuilder bounds = new StringBuilder();
            if (!Double.isNaN(min)) {
                bounds.append(", \"min\": ").append(q(min * 1e3, "mm"));
            }
            if (!Double.isNaN(max)) {
                bounds.append(", \"max\": ").append(q(max * 1e3, "mm"));
            }
            add(String.format(Locale.ROOT, "{\"id\": \"DEFL\", \"rule\": \"static-deflection\"%s%s}", bounds, sev));
            expected.put("DEFL", new Expected(value, Math.min(marginMin, marginMax) < 0, w[0], limit, false));
        }

        String json() {
            return json.toString();
        }

        Map<String, Expected> expected() {
            return expected;
        }
    }

    /** Every feature string appears in at least two of the drawn specs. */
    static void assertCoverage(Map<String, SpecExpectation> bySpec, List<String> features) {
        if (Long.getLong("resonancegate.crosscheck.seed", 0L) != 0) {
            return; // a hand-varied draw is for hunting disagreements; the guard is for the fixed one
        }
        for (String feature : features) {
            long n = bySpec.values().stream().filter(e -> e.json().contains(feature)).count();
            assertTrue(n >= 2, "the random draw has " + n + " specs with " + feature);
        }
    }

    /** Runs the engine on the files, as a build would, and compares everything with the expectations. */
    static void runAndCompare(Path project, List<Path> files, Map<String, SpecExpectation> bySpec) {
        Results results = CheckRun.run(new CheckRequest(project, files,
                Clock.fixed(Instant.parse("2026-12-02T12:00:00Z"), ZoneOffset.UTC)));
        assertEquals(files.size(), results.specs().size());
        int fails = 0;
        int passes = 0;
        for (SpecResult spec : results.specs()) {
            String id = spec.id().orElseThrow();
            SpecExpectation e = bySpec.get(id);
            String context = "\n--- spec " + id + " ---\n" + e.json();
            assertTrue(spec.errors().isEmpty(), () -> id + " has diagnostics: " + spec.errors() + context);
            compareModes(id, spec.modes(), e, context);
            assertEquals(e.checks().size(), spec.checks().size(), id + " check count" + context);
            boolean anyFail = false;
            for (CheckResult check : spec.checks()) {
                Expected x = e.checks().get(check.criterion());
                String where = id + " " + check.criterion() + " (" + check.message() + ")";
                assertTrue(x != null, where + " is not expected");
                double got = x.efficiency() ? 1 - check.value() : check.value();
                if (x.value() == 0) {
                    assertEquals(0.0, got, 1e-12, where + context);
                } else {
                    assertEquals(x.value(), got, Math.abs(x.value()) * VALUE_TOLERANCE,
                            where + ": expected " + x.value() + ", got " + got + context);
                }
                if (!Double.isNaN(x.limit())) {
                    assertEquals(x.limit(), check.limit(), Math.abs(x.limit()) * 1e-6, where + " limit" + context);
                }
                assertEquals(x.status(), check.status(), where + " status" + context);
                anyFail |= x.status() == CheckStatus.FAIL;
                if (x.fails()) {
                    fails++;
                } else {
                    passes++;
                }
            }
            assertEquals(anyFail ? SpecStatus.FAIL : SpecStatus.PASS, spec.status(), id + " spec status" + context);
        }
        // The draw must exercise both verdicts, or a status comparison would prove little.
        assertTrue(fails > 5 && passes > 5, "fails " + fails + ", passes " + passes);
    }

    private static void compareModes(String id, List<ModeResult> modes, SpecExpectation e, String context) {
        assertEquals(e.frequenciesHz().length, modes.size(), id + " mode count" + context);
        for (int r = 0; r < modes.size(); r++) {
            ModeResult mode = modes.get(r);
            double f = e.frequenciesHz()[r];
            if (f == 0) {
                assertEquals(0, mode.frequencyHz(), 1e-6, id + " mode " + (r + 1) + " frequency" + context);
                assertTrue(mode.dampingRatio().isEmpty(), id + " zero-frequency mode has a damping ratio" + context);
                continue;
            }
            assertEquals(f, mode.frequencyHz(), f * FREQUENCY_TOLERANCE,
                    id + " mode " + (r + 1) + " frequency" + context);
            double z = e.dampingRatios()[r];
            assertTrue(mode.dampingRatio().isPresent(), id + " mode " + (r + 1) + " has no damping ratio");
            assertEquals(z, mode.dampingRatio().getAsDouble(), z * VALUE_TOLERANCE,
                    id + " mode " + (r + 1) + " damping ratio" + context);
        }
    }

    /** Modal damping ratio from a model-level damping form (spec-format.md, Damping; check-values 1.11). */
    static double ratioOf(String form, double value) {
        return switch (form) {
            case "ratio" -> value;
            case "lossFactor" -> value / 2;
            case "q" -> 1 / (2 * value);
            case "logDecrement" -> value / Math.sqrt(4 * Math.PI * Math.PI + value * value);
            default -> throw new IllegalArgumentException(form);
        };
    }
}
