package org.resonancegate.bench;

import java.io.IOException;
import java.lang.management.ManagementFactory;
import java.lang.management.MemoryPoolMXBean;
import java.lang.management.MemoryType;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.stream.Stream;

import org.resonancegate.check.CheckRequest;
import org.resonancegate.check.CheckRun;
import org.resonancegate.hardening.Pipeline;
import org.resonancegate.hardening.SpecGenerator;
import org.resonancegate.report.Results;
import org.resonancegate.report.SpecStatus;

/**
 * A measured run at scale, by hand (not a test; surefire never picks it up). Writes a Maven
 * project of N invented specs (a third each single, lumped, rigid body) that uses the plugin,
 * then judges them in this JVM and prints the time and the peak heap. Time Maven on the same
 * project with and without the check to know the plugin's share:
 *
 * <pre>
 * mvn -q -B -f rules test-compile dependency:build-classpath -Dmdep.outputFile=cp.txt
 * java -Xmx512m -cp rules/target/classes:rules/target/test-classes:$(cat rules/cp.txt) \
 *      org.resonancegate.bench.ScaleRun /tmp/rg-scale 10000 0.1.0-SNAPSHOT [curves]
 * (cd /tmp/rg-scale &amp;&amp; MAVEN_OPTS=-Xmx512m mvn -B -o verify)                          # with the check
 * (cd /tmp/rg-scale &amp;&amp; MAVEN_OPTS=-Xmx512m mvn -B -o verify -Dresonance-gate.skip=true) # Maven alone
 * </pre>
 */
public final class ScaleRun {

    private ScaleRun() {
    }

    public static void main(String[] args) throws IOException {
        Path project = Path.of(args.length > 0 ? args[0] : "target/scale-project").toAbsolutePath();
        int count = args.length > 1 ? Integer.parseInt(args[1]) : 10_000;
        String pluginVersion = args.length > 2 ? args[2] : "0.1.0-SNAPSHOT";
        // "curves": also the HTML report's response curves, as a run that writes report.html does
        boolean curves = args.length > 3 && args[3].equals("curves");
        List<Path> files = write(project, count, pluginVersion);

        for (MemoryPoolMXBean pool : ManagementFactory.getMemoryPoolMXBeans()) {
            pool.resetPeakUsage();
        }
        long start = System.nanoTime();
        Results results = CheckRun.run(new CheckRequest(project, files, Pipeline.CLOCK, curves));
        double seconds = (System.nanoTime() - start) / 1e9;
        long peak = 0;
        for (MemoryPoolMXBean pool : ManagementFactory.getMemoryPoolMXBeans()) {
            if (pool.getType() == MemoryType.HEAP) {
                peak += pool.getPeakUsage().getUsed();
            }
        }
        long errors = results.specs().stream().filter(s -> s.status() == SpecStatus.ERROR).count();
        System.out.printf(Locale.ROOT, "%d specs judged in %.2f s on %d cores (%d in error); peak heap %.0f MB of %.0f MB%n",
                results.specs().size(), seconds, Runtime.getRuntime().availableProcessors(), errors,
                peak / 1048576.0, Runtime.getRuntime().maxMemory() / 1048576.0);
    }

    /** The project: a pom that runs the check, and {@code count} specs in 100 folders. */
    static List<Path> write(Path project, int count, String pluginVersion) throws IOException {
        if (Files.exists(project)) {
            Pipeline.delete(project);
        }
        Files.createDirectories(project);
        Files.writeString(project.resolve("pom.xml"), """
                <project xmlns="http://maven.apache.org/POM/4.0.0">
                  <modelVersion>4.0.0</modelVersion>
                  <groupId>org.resonancegate.scale</groupId>
                  <artifactId>scale-project</artifactId>
                  <version>1.0</version>
                  <packaging>pom</packaging>
                  <build>
                    <plugins>
                      <plugin>
                        <groupId>org.resonancegate</groupId>
                        <artifactId>resonance-gate-maven-plugin</artifactId>
                        <version>%s</version>
                        <executions><execution><goals><goal>check</goal></goals></execution></executions>
                        <!-- invented specs are not all designed to pass: measure, do not fail -->
                        <configuration><failOnViolation>false</failOnViolation></configuration>
                      </plugin>
                    </plugins>
                  </build>
                </project>
                """.formatted(pluginVersion));
        SpecGenerator generator = new SpecGenerator(10_000L);
        List<Path> files = new ArrayList<>();
        for (int i = 0; i < count; i++) {
            Path file = project.resolve(String.format(Locale.ROOT, "src/vibration/area-%02d/item-%05d.json", i % 100, i));
            Files.createDirectories(file.getParent());
            Files.writeString(file, generator.any(String.format(Locale.ROOT, "GEN-%05d", i)));
            files.add(file);
        }
        try (Stream<Path> walk = Files.walk(project.resolve("src"))) {
            if (walk.filter(Files::isRegularFile).count() != count) {
                throw new IllegalStateException("wrote the wrong number of files");
            }
        }
        return files;
    }
}
