package org.resonancegate.maven;

import java.io.File;
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
import java.util.stream.Collectors;
import org.apache.maven.plugin.AbstractMojo;
import org.apache.maven.plugin.MojoExecutionException;
import org.apache.maven.plugin.MojoFailureException;
import org.apache.maven.plugin.logging.Log;
import org.apache.maven.plugins.annotations.Parameter;
import org.resonancegate.check.CheckRequest;
import org.resonancegate.check.CheckRun;
import org.resonancegate.report.AtomicWrite;
import org.resonancegate.report.ConsoleLine;
import org.resonancegate.report.ConsoleReport;
import org.resonancegate.report.EngineInfo;
import org.resonancegate.report.MarkdownSummary;
import org.resonancegate.report.ReportFormat;
import org.resonancegate.report.Results;

/**
 * What the goals share: finding the spec files, running the engine, writing the chosen report
 * files (and the summary copy), and printing the console lines. Each goal then turns the
 * {@link Verdict} into its own outcome ({@link #conclude}).
 */
public abstract class AbstractGateMojo extends AbstractMojo {

    static final String DEFAULT_INCLUDE = "**/*.json";

    /** Summary copies from modules built in parallel go one at a time, so none is lost. */
    private static final Object SUMMARY_LOCK = new Object();

    /** Report writers run on daemon threads, so a stuck disk cannot keep Maven's JVM alive. */
    private static final ThreadFactory REPORT_THREADS = task -> {
        Thread thread = new Thread(task, "resonance-gate-report");
        thread.setDaemon(true);
        return thread;
    };

    /** The project's base directory: report paths are relative to it, and profiles may not leave it. */
    @Parameter(defaultValue = "${project.basedir}", readonly = true, required = true)
    private File basedir;

    /** The module's artifact id, named in the heading of the summary copy. */
    @Parameter(defaultValue = "${project.artifactId}", readonly = true)
    private String artifactId;

    /** Where the spec files live. */
    @Parameter(property = "resonance-gate.specDirectory", defaultValue = "${project.basedir}/src/vibration")
    private File specDirectory;

    /** Patterns, relative to {@code specDirectory}, of the files to check ({@code **} spans directories). */
    @Parameter(property = "resonance-gate.includes", defaultValue = DEFAULT_INCLUDE)
    private List<String> includes;

    /** Patterns, relative to {@code specDirectory}, of files to leave out although an include matches. */
    @Parameter(property = "resonance-gate.excludes")
    private List<String> excludes;

    /** Skip the goal altogether (nothing is read or written). */
    @Parameter(property = "resonance-gate.skip", defaultValue = "false")
    private boolean skip;

    /** Where the report files are written. */
    @Parameter(property = "resonance-gate.outputDirectory", defaultValue = "${project.build.directory}/resonance-gate")
    private File outputDirectory;

    /**
     * Which report files to write, by name: {@code json} (results.json), {@code html}
     * (report.html), {@code markdown}
     * (summary.md), {@code sarif} (results.sarif), {@code junit} (junit.xml), or {@code all}.
     * Empty (the default) writes every one. On the command line a comma-separated list, e.g.
     * {@code -Dresonance-gate.formats=json,sarif}. An unknown name is a configuration error.
     */
    @Parameter(property = "resonance-gate.formats")
    private List<String> formats;

    /**
     * A further file to append the Markdown summary to, for a CI system that shows a job summary
     * from a file it names. Appended, not replaced, so every module of a multi-module build (and
     * any earlier step) keeps its part; the file and its folder are created when missing. Unset
     * by default.
     */
    @Parameter(property = "resonance-gate.summaryFile")
    private File summaryFile;

    /**
     * A Git revision to compare with ({@code origin/main}, a tag, a commit, {@code HEAD}): the specs
     * and profiles as they were there are judged too, and the reports say what changed. Unset: no
     * comparison.
     */
    @Parameter(property = "resonance-gate.baseline")
    private String baseline;

    /**
     * {@code violation}: every failing criterion fails the build. {@code new-violation} (needs
     * {@code baseline}): only criteria that fail now and did not fail at the baseline do; spec
     * errors always do.
     */
    @Parameter(property = "resonance-gate.failOn", defaultValue = "violation")
    private String failOn;

    /** The goal's name, for log lines. */
    abstract String goal();

    /**
     * Turns the verdict into the goal's outcome: fail the build, or only say so.
     *
     * @param report the file a person should open, as shown to the user (for the failure message)
     */
    abstract void conclude(Verdict verdict, String report) throws MojoFailureException;

    @Override
    public final void execute() throws MojoExecutionException, MojoFailureException {
        Log log = getLog();
        if (skip) {
            log.info("Skipping resonance-gate " + goal());
            return;
        }
        if (basedir == null || specDirectory == null || outputDirectory == null) {
            throw new MojoExecutionException("resonance-gate: basedir, specDirectory and outputDirectory must be set"
                    + " (they default to the project's directories; check the plugin configuration)");
        }
        Set<ReportFormat> chosen = chosenFormats();
        BaselineOptions compared = BaselineOptions.of(baseline, failOn);
        Clock clock = Clock.systemDefaultZone();
        Path base = basedir.toPath().toAbsolutePath().normalize();
        Path output = base.resolve(outputDirectory.toPath()).normalize();
        Path specs = base.resolve(specDirectory.toPath()).normalize();

        // the response curves cost more than the judging itself; only the HTML report draws them
        SpecRun run = findAndRun(base, specs, clock, chosen.contains(ReportFormat.HTML));
        Results results = compared.compare(base, clock, run.results(), specs,
                new SpecFileScanner(includeList(), excludeList()));
        // written before any verdict so a failed build still leaves its record and reports
        Path reader = writeReports(base, output, results, chosen);
        if (summaryFile != null) {
            appendSummary(base, base.resolve(summaryFile.toPath()).normalize(), output, results, chosen);
        }
        for (ConsoleLine line : ConsoleReport.lines(results, compared.carriedOverPasses())) {
            print(log, line);
        }
        String others = chosen.stream().filter(f -> !output.resolve(f.fileName()).equals(reader))
                .map(ReportFormat::fileName).collect(Collectors.joining(", "));
        log.info("resonance-gate: report: " + display(base, reader) + (others.isEmpty() ? "" : " (also " + others + ")"));
        Verdict verdict = Verdict.of(compared.verdict(results), run.nothing());
        verdict.letThrough().ifPresent(note -> log.warn("resonance-gate: " + note));
        conclude(verdict, display(base, reader));
    }

    private Set<ReportFormat> chosenFormats() throws MojoExecutionException {
        try {
            return ReportFormat.parse(formats == null ? List.of() : formats);
        } catch (IllegalArgumentException e) {
            throw new MojoExecutionException("resonance-gate: " + e.getMessage()
                    + ". Fix resonance-gate.formats (a comma-separated list), or leave it out to write every format", e);
        }
    }

    private SpecRun findAndRun(Path base, Path specs, Clock clock, boolean curves) throws MojoExecutionException {
        if (!Files.exists(specs)) {
            return new SpecRun(new Results(List.of()), "no spec directory " + display(base, specs));
        }
        if (!Files.isDirectory(specs)) {
            throw new MojoExecutionException("resonance-gate: specDirectory " + display(base, specs)
                    + " is a file, not a directory; point resonance-gate.specDirectory at the folder holding the specs");
        }
        List<Path> files = collect(specs);
        List<String> missing = new SpecFileScanner(includeList(), excludeList()).missingNamedFiles(specs, files);
        if (!missing.isEmpty()) {
            throw new MojoExecutionException("resonance-gate: includes name " + missing + " but no such file is in "
                    + display(base, specs) + (excludeList().isEmpty() ? "" : " (or an exclude removes it)")
                    + "; correct the name (paths are relative to specDirectory), or drop it from includes");
        }
        if (files.isEmpty()) {
            return new SpecRun(new Results(List.of()), "no file in " + display(base, specs) + " matches includes "
                    + includeList() + (excludeList().isEmpty() ? "" : " minus excludes " + excludeList()));
        }
        Results results = run(new CheckRequest(base, files, clock, curves));
        return new SpecRun(results, results.specs().isEmpty()
                ? "the files in " + display(base, specs) + " are all profiles, none is a spec" : "");
    }

    /**
     * Writes the chosen files side by side, one writer per thread on a pool no larger than the
     * machine's cores: each only reads the same immutable {@link Results}, and each goes to its own
     * file atomically. A failure names its file as before; when several fail, the first in
     * writing order is reported, after every writer has finished, so no thread is left behind.
     *
     * @return the file a person should open first
     */
    private static Path writeReports(Path base, Path output, Results results, Set<ReportFormat> chosen)
            throws MojoExecutionException {
        Optional<String> inRepository = folderInWorkTree(base);
        int threads = Math.max(1, Math.min(chosen.size(), Runtime.getRuntime().availableProcessors()));
        ExecutorService pool = Executors.newFixedThreadPool(threads, REPORT_THREADS);
        try {
            Map<ReportFormat, Future<Path>> running = new LinkedHashMap<>();
            for (ReportFormat format : chosen) {
                running.put(format, pool.submit(() -> format.write(results, output, chosen, inRepository)));
            }
            MojoExecutionException first = null;
            for (Map.Entry<ReportFormat, Future<Path>> writing : running.entrySet()) {
                try {
                    writing.getValue().get();
                } catch (ExecutionException e) {
                    Throwable cause = e.getCause();
                    if (cause instanceof Error error) {
                        throw error;
                    }
                    if (first == null) {
                        first = new MojoExecutionException("resonance-gate: cannot write "
                                + display(base, output.resolve(writing.getKey().fileName())) + ": " + cause, cause);
                    }
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                    throw new MojoExecutionException("resonance-gate: interrupted while writing the reports", e);
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

    private void appendSummary(Path base, Path target, Path output, Results results, Set<ReportFormat> chosen)
            throws MojoExecutionException {
        // the link is relative to the summary file's own folder, so it resolves wherever that file is read
        Optional<String> href = ReportFormat.fullReport(chosen).map(f -> relativeLink(target, output.resolve(f.fileName())));
        String title = EngineInfo.NAME + (artifactId == null || artifactId.isBlank() ? "" : ": " + artifactId);
        byte[] part = MarkdownSummary.toBytes(results, title, href);
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
                throw new MojoExecutionException("resonance-gate: cannot write the summary to "
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

    private List<Path> collect(Path specs) throws MojoExecutionException {
        try {
            return new SpecFileScanner(includeList(), excludeList()).scan(specs);
        } catch (IOException | java.io.UncheckedIOException e) {
            throw new MojoExecutionException("resonance-gate: cannot list the spec files in " + specs + ": " + e, e);
        }
    }

    private static Results run(CheckRequest request) throws MojoExecutionException {
        try {
            return CheckRun.run(request);
        } catch (RuntimeException e) {
            // a spec's own faults come back as diagnostics; anything thrown is the engine's or the disk's
            throw new MojoExecutionException("resonance-gate: the check could not run: " + e, e);
        }
    }

    private List<String> includeList() {
        List<String> list = includes == null ? List.of() : includes.stream().filter(p -> !p.isBlank()).toList();
        return list.isEmpty() ? List.of(DEFAULT_INCLUDE) : list;
    }

    private List<String> excludeList() {
        return excludes == null ? List.of() : excludes.stream().filter(p -> !p.isBlank()).toList();
    }

    private static void print(Log log, ConsoleLine line) {
        switch (line.level()) {
            case INFO -> log.info(line.text());
            case WARNING -> log.warn(line.text());
            case ERROR -> log.error(line.text());
        }
    }

    /** A path as the user sees it: relative to the project when inside it, with {@code /}. */
    static String display(Path base, Path path) {
        Path shown = path.startsWith(base) ? base.relativize(path) : path;
        String text = shown.toString().replace(shown.getFileSystem().getSeparator(), "/");
        return text.isEmpty() ? "." : text;
    }
}
