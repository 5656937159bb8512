package org.resonancegate.maven;

import java.io.File;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.util.List;
import org.apache.maven.plugin.AbstractMojo;
import org.apache.maven.plugin.MojoExecutionException;
import org.apache.maven.plugin.MojoFailureException;
import org.apache.maven.plugin.logging.Log;
import org.apache.maven.plugins.annotations.LifecyclePhase;
import org.apache.maven.plugins.annotations.Mojo;
import org.apache.maven.plugins.annotations.Parameter;
import org.apache.maven.plugins.annotations.ResolutionScope;
import org.resonancegate.baseline.Ratchet;
import org.resonancegate.check.CheckRequest;
import org.resonancegate.check.CheckRun;
import org.resonancegate.report.ConsoleLine;
import org.resonancegate.report.ConsoleReport;
import org.resonancegate.report.Results;
import org.resonancegate.report.ResultsJson;

/**
 * Recomputes the dynamics of every equipment spec in the project and fails the build when one
 * breaks a criterion or cannot be read. Writes {@code results.json} (the record other reports are
 * drawn from) and prints one {@code path:line:col:} line per finding.
 */
@Mojo(name = "check", defaultPhase = LifecyclePhase.VERIFY, threadSafe = true,
        requiresDependencyResolution = ResolutionScope.NONE)
public class CheckMojo extends AbstractMojo {

    static final String DEFAULT_INCLUDE = "**/*.json";

    /** The project's base directory: report paths are relative to it, and profiles may not leave it. */
    @Parameter(defaultValue = "${project.basedir}", readonly = true, required = true)
    private File basedir;

    /** Where the spec files live. */
    @Parameter(property = "resonance-gate.specDirectory", defaultValue = "${project.basedir}/src/vibration")
    private File specDirectory;

    /** Patterns, relative to {@code specDirectory}, of the files to check ({@code **} spans directories). */
    @Parameter(property = "resonance-gate.includes", defaultValue = DEFAULT_INCLUDE)
    private List<String> includes;

    /** Patterns, relative to {@code specDirectory}, of files to leave out although an include matches. */
    @Parameter(property = "resonance-gate.excludes")
    private List<String> excludes;

    /** Fail the build when a spec fails or has errors; {@code false} reports the same findings and passes. */
    @Parameter(property = "resonance-gate.failOnViolation", defaultValue = "true")
    private boolean failOnViolation;

    /**
     * Fail when there is no spec to check (no spec directory, or no file matching the patterns):
     * a mistyped path must not switch the gate off unnoticed. {@code false} for a module that
     * declares the plugin but has no specs (yet): then it only warns.
     */
    @Parameter(property = "resonance-gate.requireSpecs", defaultValue = "true")
    private boolean requireSpecs;

    /** Skip the check altogether (nothing is read or written). */
    @Parameter(property = "resonance-gate.skip", defaultValue = "false")
    private boolean skip;

    /**
     * A Git revision to compare with ({@code origin/main}, a tag, a commit, {@code HEAD}): the specs
     * and profiles as they were there are judged too, and the report says what changed. Unset: no
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

    /** Where {@code results.json} is written. */
    @Parameter(property = "resonance-gate.outputDirectory", defaultValue = "${project.build.directory}/resonance-gate")
    private File outputDirectory;

    @Override
    public void execute() throws MojoExecutionException, MojoFailureException {
        Log log = getLog();
        if (skip) {
            log.info("Skipping resonance-gate check");
            return;
        }
        if (basedir == null || specDirectory == null || outputDirectory == null) {
            throw new MojoExecutionException("resonance-gate: basedir, specDirectory and outputDirectory must be set"
                    + " (they default to the project's directories; check the plugin configuration)");
        }
        Path base = basedir.toPath().toAbsolutePath().normalize();
        Path specs = base.resolve(specDirectory.toPath()).normalize();
        Path resultsFile = base.resolve(outputDirectory.toPath()).normalize().resolve(ResultsJson.FILE_NAME);
        BaselineOptions compared = BaselineOptions.of(baseline, failOn);
        Clock clock = Clock.systemDefaultZone();

        Results results;
        String nothing = "";
        if (!Files.exists(specs)) {
            nothing = "no spec directory " + display(base, specs);
            results = new Results(List.of());
        } else if (!Files.isDirectory(specs)) {
            throw new MojoExecutionException("resonance-gate: specDirectory " + display(base, specs)
                    + " is a file, not a directory; point resonance-gate.specDirectory at the folder holding the specs");
        } else {
            List<Path> files = collect(specs);
            if (files.isEmpty()) {
                nothing = "no file in " + display(base, specs) + " matches includes " + includeList()
                        + (excludeList().isEmpty() ? "" : " minus excludes " + excludeList());
                results = new Results(List.of());
            } else {
                results = run(new CheckRequest(base, files, clock));
                if (results.specs().isEmpty()) {
                    nothing = "the files in " + display(base, specs) + " are all profiles, none is a spec";
                }
            }
        }

        results = compared.compare(base, clock, results, specs, new SpecFileScanner(includeList(), excludeList()));

        // written before any verdict so a failed build still leaves its record for the reports
        try {
            ResultsJson.write(results, resultsFile);
        } catch (IOException e) {
            throw new MojoExecutionException("resonance-gate: cannot write " + display(base, resultsFile) + ": " + e, e);
        }
        for (ConsoleLine line : ConsoleReport.lines(results, compared.carriedOverPasses())) {
            print(log, line);
        }
        log.info("resonance-gate: results written to " + display(base, resultsFile));
        if (!nothing.isEmpty()) {
            if (requireSpecs) {
                throw new MojoFailureException("resonance-gate: " + nothing + "; nothing was checked. Point"
                        + " resonance-gate.specDirectory (or includes) at the specs, or set"
                        + " resonance-gate.requireSpecs=false for a module that has none");
            }
            log.warn("resonance-gate: " + nothing + "; nothing to check (requireSpecs=false)");
        }

        Ratchet.Verdict judged = compared.verdict(results);
        if (!judged.note().isEmpty()) {
            log.warn("resonance-gate: " + judged.note());
        }
        String verdict = judged.failure();
        if (verdict.isEmpty()) {
            return;
        }
        if (failOnViolation) {
            throw new MojoFailureException("resonance-gate: " + verdict + "; see the lines above or "
                    + display(base, resultsFile));
        }
        log.warn("resonance-gate: " + verdict + "; failOnViolation=false, not failing the build");
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
    private static String display(Path base, Path path) {
        Path shown = path.startsWith(base) ? base.relativize(path) : path;
        String text = shown.toString().replace(shown.getFileSystem().getSeparator(), "/");
        return text.isEmpty() ? "." : text;
    }
}
