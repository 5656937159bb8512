package org.resonancegate.bench;

import java.time.LocalDate;
import org.resonancegate.check.SpecEvaluator;
import org.resonancegate.report.SpecResult;
import org.resonancegate.spec.Spec;

/** A rough wall-clock look while developing; the JMH benchmark gives the figures to report. */
public final class QuickTiming {

    private QuickTiming() {
    }

    public static void main(String[] args) {
        LocalDate today = LocalDate.of(2027, 1, 15);
        for (Spec s : new Spec[] {BenchSpecs.rigidBody(), BenchSpecs.lumped(), BenchSpecs.single()}) {
            SpecResult r = SpecEvaluator.evaluate(s, today);
            System.out.println(r.status() + " " + r.errors());
            r.checks().forEach(c -> System.out.println("  " + c.criterion() + " " + c.status() + " " + c.message()));
            int n = 0;
            long t0 = System.nanoTime();
            while (System.nanoTime() - t0 < 3_000_000_000L) {
                SpecEvaluator.evaluate(s, today);
                n++;
            }
            System.out.printf("%s: %.3f ms per spec%n", s.model().getClass().getSimpleName(),
                    (System.nanoTime() - t0) / 1e6 / n);
        }
    }
}
