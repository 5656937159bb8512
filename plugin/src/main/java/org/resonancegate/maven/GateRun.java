package org.resonancegate.maven;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.ThreadFactory;
import java.util.function.Consumer;
import java.util.stream.Collectors;
import org.resonancegate.check.CheckRequest;
import org.resonancegate.check.CheckRun;
import org.resonancegate.report.AtomicWrite;
import org.resonancegate.report.ConsoleLevel;
import org.resonancegate.report.ConsoleLine;
import org.resonancegate.report.ConsoleReport;
import org.resonancegate.report.EngineInfo;
import org.resonancegate.report.MarkdownSummary;
import org.resonancegate.report.ReportFormat;
import org.resonancegate.report.Results;

/**
 * One run of the gate, free of Maven types so that it can go on in Maven's JVM or in a separate
 * one: find the spec files, run the engine, compare with the baseline, write the chosen report
 * files (and the summary copy), and hand each console line to {@code out}. What the run means for
 * the build comes back as a {@link Verdict}; the goal decides what to do with it.
 */
final class GateRun {

    /** Summary copies from modules built in parallel go one at a time, so none is lost. */
    private static final Object SUMMARY_LOCK = new Object();

    /** Report writers run on daemon threads, so a stuck disk cannot keep Maven's JVM alive. */
    private static final ThreadFactory REPORT_THREADS = task -> {
        Thread thread = new Thread(task, "resonance-gate-report");
        thread.setDaemon(true);
        return thread;
    };

    /**
     * @param verdict what the run means for the build
     * @param report  the file a person should open first, as shown to the user
     */
    record Outcome(Verdict verdict, String report) {
    }

    private GateRun() {
    }

    /** Where the Markdown summary part goes when a summary file is set. */
    @FunctionalInterface
    interface SummarySink {
        void append(Path target, byte[] part) throws GateException;
    }

    /** As {@link #run(GateSettings, Consumer, SummarySink)}, appending the summary part to its file here. */
    static Outcome run(GateSettings settings, Consumer<ConsoleLine> out) throws GateException {
        return run(settings, out, (target, part) -> appendSummary(settings.base(), target, part));
    }

    static Outcome run(GateSettings settings, Consumer<ConsoleLine> out, SummarySink summary) throws GateException {
        Set<ReportFormat> chosen = chosenFormats(settings.formats());
        BaselineOptions compared = BaselineOptions.of(settings.baseline().orElse(null), settings.failOn());
        Clock clock = Clock.systemDefaultZone();
        Path base = settings.base();
        Path output = settings.output();
        SpecFileScanner scanner = new SpecFileScanner(settings.includes(), settings.excludes());

        // the response curves cost more than the judging itself; only the HTML report draws them
        SpecRun run = findAndRun(settings, scanner, clock, chosen.contains(ReportFormat.HTML));
        Results results = compared.compare(base, clock, run.results(), settings.specs(), scanner);
        // written before any verdict so a failed build still leaves its record and reports; the
        // console lines go out while the files are written (thousands of lines take a while to log)
        List<ConsoleLine> lines = ConsoleReport.lines(results, compared.carriedOverPasses());
        Path reader = writeReports(base, output, results, chosen, () -> lines.forEach(out));
        if (settings.summaryFile().isPresent()) {
            Path target = settings.summaryFile().get();
            summary.append(target, summaryPart(settings, target, results, chosen));
        }
        String others = chosen.stream().filter(f -> !output.resolve(f.fileName()).equals(reader))
                .map(ReportFormat::fileName).collect(Collectors.joining(", "));
        out.accept(new ConsoleLine(ConsoleLevel.INFO, "resonance-gate: report: " + display(base, reader)
                + (others.isEmpty() ? "" : " (also " + others + ")")));
        Verdict verdict = Verdict.of(compared.verdict(results), run.nothing());
        verdict.letThrough().ifPresent(note -> out.accept(new ConsoleLine(ConsoleLevel.WARNING, "resonance-gate: " + note)));
        return new Outcome(verdict, display(base, reader));
    }

    /** Checks the settings that need no spec file (formats, failOn with baseline), so a typo stops the build before any work. */
    static void validate(GateSettings settings) throws GateException {
        chosenFormats(settings.formats());
        BaselineOptions.of(settings.baseline().orElse(null), settings.failOn());
        if (Files.exists(settings.output()) && !Files.isDirectory(settings.output())) {
            throw new GateException("resonance-gate: outputDirectory " + display(settings.base(), settings.output())
                    + " is a file, not a directory; point resonance-gate.outputDirectory at a folder (it is created"
                    + " when missing), or remove the file");
        }
    }

    /** Whether the settings select at least {@code n} files (false when the spec directory is missing). */
    static boolean atLeast(GateSettings settings, int n) throws GateException {
        Path specs = settings.specs();
        if (!Files.isDirectory(specs)) {
            return false; // a missing directory or a file: the run itself says so
        }
        return listed(settings, scanner -> scanner.atLeast(specs, n));
    }

    /** The spec files the settings select, in report order; empty when the spec directory does not exist. */
    static List<Path> specFiles(GateSettings settings) throws GateException {
        Path specs = settings.specs();
        if (!Files.exists(specs)) {
            return List.of();
        }
        if (!Files.isDirectory(specs)) {
            throw new GateException("resonance-gate: specDirectory " + display(settings.base(), specs)
                    + " is a file, not a directory; point resonance-gate.specDirectory at the folder holding the specs");
        }
        List<Path> files = listed(settings, scanner -> scanner.scan(specs));
        // a spec folder that holds the report folder (specDirectory=.) must not read the reports as specs
        Path output = settings.output();
        return output.startsWith(specs) ? files.stream().filter(f -> !f.startsWith(output)).toList() : files;
    }

    /** One way of listing the spec directory with the settings' patterns. */
    @FunctionalInterface
    private interface Listing<T> {
        T list(SpecFileScanner scanner) throws IOException;
    }

    private static <T> T listed(GateSettings settings, Listing<T> listing) throws GateException {
        try {
            return listing.list(new SpecFileScanner(settings.includes(), settings.excludes()));
        } catch (IOException | java.io.UncheckedIOException e) {
            throw new GateException("resonance-gate: cannot list the spec files in " + settings.specs() + ": " + e, e);
        }
    }

    private static Set<ReportFormat> chosenFormats(List<String> formats) throws GateException {
        try {
            return ReportFormat.parse(formats);
        } catch (IllegalArgumentException e) {
            throw new GateException("resonance-gate: " + e.getMessage()
                    + ". Fix resonance-gate.formats (a comma-separated list), or leave it out to write every format", e);
        }
    }

    private static SpecRun findAndRun(GateSettings settings, SpecFileScanner scanner, Clock clock, boolean curves)
            throws GateException {
        Path base = settings.base();
        Path specs = settings.specs();
        if (!Files.exists(specs)) {
            return new SpecRun(new Results(List.of()), "no spec directory " + display(base, specs));
        }
        List<Path> files = specFiles(settings);
        List<String> missing = scanner.missingNamedFiles(specs, files);
        if (!missing.isEmpty()) {
            throw new GateException("resonance-gate: includes name " + missing + " but no such file is in "
                    + display(base, specs) + (settings.excludes().isEmpty() ? "" : " (or an exclude removes it)")
                    + "; correct the name (paths are relative to specDirectory), or drop it from includes");
        }
        if (files.isEmpty()) {
            return new SpecRun(new Results(List.of()), "no file in " + display(base, specs) + " matches includes "
                    + settings.includes() + (settings.excludes().isEmpty() ? "" : " minus excludes " + settings.excludes()));
        }
        Results results;
        try {
            results = CheckRun.run(new CheckRequest(base, files, clock, curves));
        } catch (RuntimeException e) {
            // a spec's own faults come back as diagnostics; anything thrown is the engine's or the disk's
            throw new GateException("resonance-gate: the check could not run: " + e, e);
        }
        return new SpecRun(results, results.specs().isEmpty()
                ? "the files in " + display(base, specs) + " are all profiles, none is a spec" : "");
    }

    /**
     * Writes the chosen files side by side, one writer per thread on a pool no larger than the
     * machine's cores: each only reads the same immutable {@link Results}, and each goes to its own
     * file atomically. A failure names its file as before; when several fail, the first in
     * writing order is reported, after every writer has finished, so no thread is left behind.
     *
     * @param meanwhile run on this thread while the files are written
     * @return the file a person should open first
     */
    private static Path writeReports(Path base, Path output, Results results, Set<ReportFormat> chosen,
                                     Runnable meanwhile) throws GateException {
        Optional<String> inRepository = folderInWorkTree(base);
        int threads = Math.max(1, Math.min(chosen.size(), Runtime.getRuntime().availableProcessors()));
        ExecutorService pool = Executors.newFixedThreadPool(threads, REPORT_THREADS);
        try {
            Map<ReportFormat, Future<Path>> running = new LinkedHashMap<>();
            for (ReportFormat format : chosen) {
                running.put(format, pool.submit(() -> format.write(results, output, chosen, inRepository)));
            }
            meanwhile.run();
            GateException first = null;
            for (Map.Entry<ReportFormat, Future<Path>> writing : running.entrySet()) {
                try {
                    writing.getValue().get();
                } catch (ExecutionException e) {
                    Throwable cause = e.getCause();
                    if (cause instanceof Error error) {
                        throw error;
                    }
                    if (first == null) {
                        first = new GateException("resonance-gate: cannot write "
                                + display(base, output.resolve(writing.getKey().fileName())) + ": " + cause, cause);
                    }
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                    throw new GateException("resonance-gate: interrupted while writing the reports", e);
                }
            }
            if (first != null) {
                throw first;
            }
        } finally {
            pool.shutdownNow();
        }
        return output.resolve(ReportFormat.forReaders(chosen).orElseThrow().fileName());
    }

    /**
     * The project's folder relative to the Git work tree it sits in ({@code "sample-project/"}),
     * found by the nearest {@code .git} above it; empty at the work tree's root or outside one.
     */
    static Optional<String> folderInWorkTree(Path base) {
        for (Path dir = base; dir != null; dir = dir.getParent()) {
            if (Files.exists(dir.resolve(".git"))) {
                if (dir.equals(base)) {
                    return Optional.empty();
                }
                Path rel = dir.relativize(base);
                return Optional.of(rel.toString().replace(rel.getFileSystem().getSeparator(), "/") + "/");
            }
        }
        return Optional.empty();
    }

    private static byte[] summaryPart(GateSettings settings, Path target, Results results, Set<ReportFormat> chosen) {
        // the link is relative to the summary file's own folder, so it resolves wherever that file is read
        Optional<String> href = ReportFormat.fullReport(chosen)
                .map(f -> relativeLink(target, settings.output().resolve(f.fileName())));
        String title = EngineInfo.NAME + (settings.artifactId().isBlank() ? "" : ": " + settings.artifactId());
        return MarkdownSummary.toBytes(results, title, href);
    }

    /** Appends {@code part} to {@code target} (created with its folder when missing), one module at a time. */
    static void appendSummary(Path base, Path target, byte[] part) throws GateException {
        synchronized (SUMMARY_LOCK) {
            try {
                byte[] before = Files.isRegularFile(target) ? Files.readAllBytes(target) : new byte[0];
                byte[] separator = before.length == 0 ? new byte[0] : "\n".getBytes(StandardCharsets.UTF_8);
                byte[] all = new byte[before.length + separator.length + part.length];
                System.arraycopy(before, 0, all, 0, before.length);
                System.arraycopy(separator, 0, all, before.length, separator.length);
                System.arraycopy(part, 0, all, before.length + separator.length, part.length);
                AtomicWrite.write(target, all);
            } catch (IOException e) {
                throw new GateException("resonance-gate: cannot write the summary to "
                        + display(base, target) + " (resonance-gate.summaryFile): " + e, e);
            }
        }
    }

    private static String relativeLink(Path from, Path to) {
        Path dir = from.getParent();
        try {
            Path rel = dir == null ? to : dir.relativize(to);
            return rel.toString().replace(rel.getFileSystem().getSeparator(), "/");
        } catch (IllegalArgumentException e) {
            return to.toUri().toString(); // another drive or root: no relative path leads there
        }
    }

    /** A path as the user sees it: relative to the project when inside it, with {@code /}. */
    static String display(Path base, Path path) {
        Path shown = path.startsWith(base) ? base.relativize(path) : path;
        String text = shown.toString().replace(shown.getFileSystem().getSeparator(), "/");
        return text.isEmpty() ? "." : text;
    }
}
