package org.resonancegate.hardening;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.Comparator;
import java.util.List;
import java.util.stream.Stream;

import org.resonancegate.check.CheckRequest;
import org.resonancegate.check.CheckRun;
import org.resonancegate.report.CheckResult;
import org.resonancegate.report.ModeResult;
import org.resonancegate.report.Results;
import org.resonancegate.report.SpecResult;
import org.resonancegate.report.SpecStatus;

/** Runs spec text through the whole engine (files, reader, dynamics, criteria) in a scratch project. */
public final class Pipeline {

    public static final Clock CLOCK = Clock.fixed(Instant.parse("2026-06-01T12:00:00Z"), ZoneOffset.UTC);

    private Pipeline() {
    }

    /** The result for one spec written as {@code text}. */
    public static SpecResult run(String text) {
        Path dir = null;
        try {
            dir = Files.createTempDirectory("rg-pipeline");
            Path file = dir.resolve("spec.json");
            Files.writeString(file, text);
            Results results = CheckRun.run(new CheckRequest(dir, List.of(file), CLOCK));
            return results.specs().get(0);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        } finally {
            delete(dir);
        }
    }

    /** The result for {@code text}, which must be read and judged (not an error). */
    public static SpecResult judged(String text) {
        SpecResult r = run(text);
        if (r.status() == SpecStatus.ERROR) {
            throw new AssertionError("expected a judged spec, got " + r.errors() + "\n" + text);
        }
        return r;
    }

    /** The natural frequencies of a result, lowest first, in Hz. */
    public static double[] frequencies(SpecResult r) {
        return r.modes().stream().mapToDouble(ModeResult::frequencyHz).toArray();
    }

    /** The check of the criterion {@code id}. */
    public static CheckResult check(SpecResult r, String id) {
        return r.checks().stream().filter(c -> c.criterion().equals(id)).findFirst().orElseThrow();
    }

    public static void delete(Path dir) {
        if (dir == null) {
            return;
        }
        try (Stream<Path> walk = Files.walk(dir)) {
            for (Path p : walk.sorted(Comparator.reverseOrder()).toList()) {
                Files.deleteIfExists(p);
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
