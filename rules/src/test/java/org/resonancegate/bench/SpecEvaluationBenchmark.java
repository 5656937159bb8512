package org.resonancegate.bench;

import java.time.LocalDate;
import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;
import org.openjdk.jmh.runner.Runner;
import org.openjdk.jmh.runner.RunnerException;
import org.openjdk.jmh.runner.options.OptionsBuilder;
import org.resonancegate.check.SpecEvaluator;
import org.resonancegate.report.SpecResult;
import org.resonancegate.spec.Spec;

/**
 * Time to judge one spec on one core: a rigid body on six mounts (three excitations, five
 * criteria, ±15 % stiffness, so five model cases), a two-mass line and a single mass with the
 * same excitations and criteria. Not a test (surefire never picks it up): after
 * {@code mvn -f rules test-compile} and {@code mvn -f rules dependency:build-classpath
 * -Dmdep.outputFile=cp.txt}, run {@code java -cp rules/target/classes:rules/target/test-classes:$(cat cp.txt)
 * org.resonancegate.bench.SpecEvaluationBenchmark}.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(1)
public class SpecEvaluationBenchmark {

    private static final LocalDate TODAY = LocalDate.of(2027, 1, 15);

    private final Spec rigidBody = BenchSpecs.rigidBody();
    private final Spec lumped = BenchSpecs.lumped();
    private final Spec single = BenchSpecs.single();

    // Judging alone (what check costs when no HTML report is written) ...

    @Benchmark
    public SpecResult rigidBodySixMounts() {
        return SpecEvaluator.evaluate(rigidBody, TODAY, false);
    }

    @Benchmark
    public SpecResult lumpedTwoMasses() {
        return SpecEvaluator.evaluate(lumped, TODAY, false);
    }

    @Benchmark
    public SpecResult singleMass() {
        return SpecEvaluator.evaluate(single, TODAY, false);
    }

    // ... and with the response curves the HTML report draws.

    @Benchmark
    public SpecResult rigidBodySixMountsWithCurves() {
        return SpecEvaluator.evaluate(rigidBody, TODAY, true);
    }

    public static void main(String[] args) throws RunnerException {
        new Runner(new OptionsBuilder().include(SpecEvaluationBenchmark.class.getSimpleName()).build()).run();
    }
}
