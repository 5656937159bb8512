package org.resonancegate.hardening;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.resonancegate.report.CheckResult;
import org.resonancegate.report.ErrorEntry;
import org.resonancegate.report.ModeResult;
import org.resonancegate.report.SpecResult;
import org.resonancegate.report.SpecStatus;

/**
 * Inputs at the edges of what the numerics can take: each gives a correct result, checked
 * against an independent computation (EJML, or a closed form with its source named), or a
 * diagnostic saying why it cannot.
 */
class NumericalEdgeCasesTest {

    private static SpecGenerator.RigidBody box(List<double[]> stiffness, double[] inertia, double[] products) {
        return new SpecGenerator.RigidBody(800, new double[] {0, 0, 0.4}, inertia, products,
                List.of(new double[] {-0.7, -0.7, 0}, new double[] {0.7, -0.7, 0}, new double[] {-0.7, 0.7, 0},
                        new double[] {0.7, 0.7, 0}), stiffness, 0.05);
    }

    private static void assertModesMatch(SpecGenerator.RigidBody body, double relative) {
        String text = SpecGenerator.rigidBody("EDGE", body);
        double[] engine = Pipeline.frequencies(Pipeline.judged(text));
        double[] independent = EdgeCaseModes.frequenciesHz(body);
        assertEquals(6, engine.length);
        for (int i = 0; i < 6; i++) {
            assertEquals(independent[i], engine[i], relative * independent[i], "mode " + (i + 1) + "\n" + text);
        }
    }

    @Test
    void mountsWhoseStiffnessDiffersByANineDecadeRatioGiveTheIndependentModes() {
        double soft = 1e4;
        double hard = 1e13;
        List<double[]> k = List.of(new double[] {soft, soft, soft}, new double[] {hard, hard, hard},
                new double[] {soft, soft, soft}, new double[] {soft, soft, soft});
        assertModesMatch(box(k, new double[] {150, 150, 250}, new double[] {0, 0, 0}), 1e-6);
    }

    @Test
    void coincidentModesOfASymmetricBodyAreFoundBoth() {
        // a square layout under a body with Ixx = Iyy: the x and y motions have equal frequencies
        List<double[]> k = List.of(new double[] {2e5, 2e5, 5e5}, new double[] {2e5, 2e5, 5e5},
                new double[] {2e5, 2e5, 5e5}, new double[] {2e5, 2e5, 5e5});
        SpecGenerator.RigidBody body = box(k, new double[] {150, 150, 250}, new double[] {0, 0, 0});
        assertModesMatch(body, 1e-7);
        // and a hair apart (a product of inertia of 1e-6 kg·m² splits the pair)
        assertModesMatch(box(k, new double[] {150, 150, 250}, new double[] {1e-6, 0, 0}), 1e-7);
        SpecResult r = Pipeline.judged(SpecGenerator.rigidBody("EDGE", body));
        for (ModeResult m : r.modes()) {
            double sum = m.shares().stream().mapToDouble(ModeResult.Share::fraction).sum();
            assertTrue(sum <= 1 + 1e-9 && sum > 0.5, m::toString);
        }
    }

    @Test
    void anInertiaTensorNearTheEdgeOfPhysicalGivesTheIndependentModes() {
        // a flat plate: Izz = Ixx + Iyy, the triangle inequality met with equality (still a body)
        List<double[]> k = List.of(new double[] {2e5, 3e5, 5e5}, new double[] {2e5, 3e5, 5e5},
                new double[] {2e5, 3e5, 5e5}, new double[] {2e5, 3e5, 5e5});
        assertModesMatch(box(k, new double[] {100, 300, 400}, new double[] {0, 0, 0}), 1e-7);
        // a thin rod along x: Ixx a millionth of the others
        assertModesMatch(box(k, new double[] {3e-4, 300, 300}, new double[] {0, 0, 0}), 1e-6);
    }

    @Test
    void anInertiaTensorJustPastPhysicalIsADiagnosticNotAResult() {
        List<double[]> k = List.of(new double[] {2e5, 3e5, 5e5}, new double[] {2e5, 3e5, 5e5},
                new double[] {2e5, 3e5, 5e5}, new double[] {2e5, 3e5, 5e5});
        SpecResult r = Pipeline.run(SpecGenerator.rigidBody("EDGE", box(k, new double[] {100, 300, 401}, new double[] {0, 0, 0})));
        assertEquals(SpecStatus.ERROR, r.status());
        assertTrue(r.errors().stream().map(ErrorEntry::message).anyMatch(m -> m.contains("triangle inequality")), r.errors()::toString);
    }

    private static String single(double m, double k, double zeta, String operation, String excitation, String criteria) {
        return "{\"format\": \"resonance-gate/1\", \"id\": \"EDGE\",\n"
                + " \"model\": {\"kind\": \"single\", \"mass\": " + SpecGenerator.q(m, "kg") + ", \"stiffness\": "
                + SpecGenerator.q(k, "N/m") + ", \"damping\": {\"ratio\": " + SpecGenerator.num(zeta) + "}},\n"
                + " \"operation\": " + operation + ",\n \"excitations\": [" + excitation + "],\n \"criteria\": [" + criteria + "]}\n";
    }

    @Test
    void order100CrossingTheModeMeetsTheHandbookPeak() {
        double m = 400;
        double fn = 30; // Hz; order 100 crosses it at 18 rpm
        double k = m * Math.pow(2 * Math.PI * fn, 2);
        double zeta = 0.02;
        String text = single(m, k, zeta, "{\"speed\": {\"min\": \"10 rpm\", \"max\": \"40 rpm\"}}",
                "{\"name\": \"gear mesh\", \"kind\": \"force\", \"order\": 100, \"amplitude\": \"50 N\"}",
                "{\"id\": \"SEP\", \"rule\": \"separation\", \"margin\": \"10 %\"},"
                        + " {\"id\": \"DISP\", \"rule\": \"displacement\", \"max\": \"1 m\"}");
        SpecResult r = Pipeline.judged(text);
        // the band 100 × (10…40 rpm) = 16.7…66.7 Hz holds the mode, so the separation is 0 (SPEC-FORMAT.md, separation)
        assertEquals(0.0, Pipeline.check(r, "SEP").value(), 1e-12);
        // D_max = 1/(2ζ√(1−ζ²)) times F/k (check-values 1.3)
        double peak = 50 / k / (2 * zeta * Math.sqrt(1 - zeta * zeta));
        assertEquals(peak, Pipeline.check(r, "DISP").value(), 1e-6 * peak);
        assertEquals(fn * Math.sqrt(1 - 2 * zeta * zeta) * 60 / 100, Pipeline.check(r, "DISP").speedRpm().orElseThrow(), 1e-4);
    }

    @Test
    void aSpeedRangeFromZeroIsJudgedFromStandstill() {
        double m = 400;
        double fn = 10;
        double k = m * Math.pow(2 * Math.PI * fn, 2);
        double zeta = 0.05;
        String text = single(m, k, zeta, "{\"speed\": {\"min\": \"0 rpm\", \"max\": \"1480 rpm\"}}",
                "{\"name\": \"drive\", \"kind\": \"force\", \"order\": 1, \"amplitude\": \"100 N\"}",
                "{\"id\": \"DISP\", \"rule\": \"displacement\", \"max\": \"1 m\"},"
                        + " {\"id\": \"ISO\", \"rule\": \"isolation\", \"maxTransmissibility\": 20}");
        SpecResult r = Pipeline.run(text);
        if (r.status() == SpecStatus.ERROR) {
            // a refusal is acceptable only if it says what to write instead
            assertTrue(r.errors().stream().anyMatch(e -> e.message().contains("rpm")), r.errors()::toString);
            return;
        }
        double peak = 100 / k / (2 * zeta * Math.sqrt(1 - zeta * zeta)); // check-values 1.3
        assertEquals(peak, Pipeline.check(r, "DISP").value(), 1e-6 * peak);
        // T peaks at β_T = √(√(1+8ζ²) − 1)/(2ζ) (check-values 1.9); its height from 1.4
        double bt = Math.sqrt(Math.sqrt(1 + 8 * zeta * zeta) - 1) / (2 * zeta);
        double tmax = Math.sqrt((1 + Math.pow(2 * zeta * bt, 2)) / (Math.pow(1 - bt * bt, 2) + Math.pow(2 * zeta * bt, 2)));
        assertEquals(tmax, Pipeline.check(r, "ISO").value(), 1e-6 * tmax);
    }

    @Test
    void aLightlyDampedModeExactlyAtTheRunningSpeed() {
        double m = 250;
        double fn = 24.5;
        double k = m * Math.pow(2 * Math.PI * fn, 2);
        double zeta = 0.001;
        String text = single(m, k, zeta, "{\"speed\": " + SpecGenerator.q(fn * 60, "rpm") + "}",
                "{\"name\": \"drive\", \"kind\": \"force\", \"order\": 1, \"amplitude\": \"10 N\"}",
                "{\"id\": \"DISP\", \"rule\": \"displacement\", \"max\": \"1 m\"},"
                        + " {\"id\": \"ISO\", \"rule\": \"isolation\", \"maxTransmissibility\": 1000},"
                        + " {\"id\": \"SEP\", \"rule\": \"separation\", \"margin\": \"5 %\"}");
        SpecResult r = Pipeline.judged(text);
        // at β = 1 exactly D = 1/(2ζ) (check-values 1.3) and T = √(1 + 4ζ²)/(2ζ) (1.4 at β = 1)
        assertEquals(10 / k / (2 * zeta), Pipeline.check(r, "DISP").value(), 1e-6 * 10 / k / (2 * zeta));
        double t = Math.sqrt(1 + 4 * zeta * zeta) / (2 * zeta);
        assertEquals(t, Pipeline.check(r, "ISO").value(), 1e-6 * t);
        assertEquals(0.0, Pipeline.check(r, "SEP").value(), 1e-8);
    }
}
