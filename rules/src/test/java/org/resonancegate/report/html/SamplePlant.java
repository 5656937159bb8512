package org.resonancegate.report.html;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.List;
import java.util.stream.Stream;
import org.resonancegate.check.CheckRequest;
import org.resonancegate.check.CheckRun;
import org.resonancegate.report.Results;

/**
 * The sample plant's results, judged by the engine from the committed specs in
 * {@code sample-project}: as committed, or with the proposed changes in place of their originals
 * (as the sample's {@code proposed-change} profile does).
 */
final class SamplePlant {

    static final Path BASE = Path.of("..", "sample-project").toAbsolutePath().normalize();

    /** A fixed build date, so waivers read the same on every run. */
    private static final Clock CLOCK = Clock.fixed(Instant.parse("2026-06-01T00:00:00Z"), ZoneOffset.UTC);

    private SamplePlant() {
    }

    static Results committed() {
        return CheckRun.run(new CheckRequest(BASE, files(false), CLOCK));
    }

    /** The plant with {@code src/proposed/*.json} replacing the specs of the same name. */
    static Results proposed() {
        return CheckRun.run(new CheckRequest(BASE, files(true), CLOCK));
    }

    private static List<Path> files(boolean proposed) {
        Path vibration = BASE.resolve("src/vibration");
        Path changes = BASE.resolve("src/proposed");
        List<Path> replaced = proposed ? list(changes) : List.of();
        List<String> names = replaced.stream().map(p -> p.getFileName().toString()).toList();
        return Stream.concat(list(vibration).stream()
                        .filter(p -> !(p.getParent().equals(vibration) && names.contains(p.getFileName().toString()))),
                replaced.stream()).sorted().toList();
    }

    private static List<Path> list(Path dir) {
        try (Stream<Path> s = Files.walk(dir)) {
            return s.filter(p -> p.toString().endsWith(".json")).sorted().toList();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** Writes the proposed plant's HTML report and results.json to the path given, for looking at by hand. */
    public static void main(String[] args) throws IOException {
        Results results = proposed();
        HtmlReport.write(results, Path.of(args[0]));
        org.resonancegate.report.ResultsJson.write(results, Path.of(args[0]).resolveSibling("results.json"));
    }
}
