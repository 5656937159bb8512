package org.resonancegate.maven;

import java.io.File;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.apache.maven.artifact.Artifact;
import org.apache.maven.plugin.AbstractMojo;
import org.apache.maven.plugin.MojoExecutionException;
import org.apache.maven.plugin.MojoFailureException;
import org.apache.maven.plugin.descriptor.PluginDescriptor;
import org.apache.maven.plugin.logging.Log;
import org.apache.maven.plugins.annotations.Parameter;
import org.resonancegate.report.ConsoleLine;

/**
 * What the goals share: their parameters, and a {@link GateRun} (find the spec files, run the
 * engine, write the chosen report files and the summary copy, print the console lines) in Maven's
 * JVM or in a {@link SeparateJvm}. Each goal then turns the {@link Verdict} into its own outcome
 * ({@link #conclude}).
 */
public abstract class AbstractGateMojo extends AbstractMojo {

    static final String DEFAULT_INCLUDE = "**/*.json";

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

    /**
     * Which JVM does the work: {@code same} (Maven's own), {@code separate} (one started for this
     * run, tuned for a short batch: for thousands of specs it needs about half the processor
     * time), or {@code auto} (the default: separate from 200 spec files on). Output, reports and
     * verdict are the same either way.
     */
    @Parameter(property = "resonance-gate.jvm", defaultValue = "auto")
    private String jvm;

    /** The plugin's own jar and dependencies, the classpath of a separate JVM. */
    @Parameter(defaultValue = "${plugin}", readonly = true)
    private PluginDescriptor plugin;

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
        SeparateJvm.Choice choice = SeparateJvm.Choice.parse(jvm).orElseThrow(() -> new MojoExecutionException(
                "resonance-gate: jvm is \"" + jvm + "\"; use auto (the default), same (Maven's own JVM) or separate"));
        Path base = basedir.toPath().toAbsolutePath().normalize();
        GateSettings settings = new GateSettings(base, base.resolve(specDirectory.toPath()).normalize(),
                base.resolve(outputDirectory.toPath()).normalize(), includeList(), excludeList(),
                nonBlank(formats),
                Optional.ofNullable(summaryFile).map(f -> base.resolve(f.toPath()).normalize()),
                Optional.ofNullable(baseline).map(String::trim).filter(b -> !b.isEmpty()),
                failOn == null ? "" : failOn, artifactId == null ? "" : artifactId);
        GateRun.Outcome outcome;
        try {
            GateRun.validate(settings);
            Optional<List<Path>> separate = separateClasspath(choice, settings);
            if (separate.isPresent()) {
                log.info("resonance-gate: checking in a separate JVM (" + String.join(" ", SeparateJvm.OPTIONS)
                        + "; resonance-gate.jvm=" + choice.name().toLowerCase(java.util.Locale.ROOT) + ")");
                outcome = separately(choice, settings, separate.get(), log);
            } else {
                outcome = GateRun.run(settings, line -> print(log, line));
            }
        } catch (GateException e) {
            throw new MojoExecutionException(e.getMessage(), e.getCause() == null ? e : e.getCause());
        }
        conclude(outcome.verdict(), outcome.report());
    }

    /** In a separate JVM; when {@code auto} chose one that cannot be started, here after all, with a warning. */
    private static GateRun.Outcome separately(SeparateJvm.Choice choice, GateSettings settings, List<Path> classpath,
                                              Log log) throws GateException {
        try {
            return SeparateJvm.run(settings, classpath, line -> print(log, line));
        } catch (SeparateJvm.CannotStart e) {
            if (choice == SeparateJvm.Choice.SEPARATE) {
                throw e;
            }
            log.warn(e.getMessage().replace("; set resonance-gate.jvm=same to check in Maven's own JVM", "")
                    + "; checking in Maven's own JVM instead");
            return GateRun.run(settings, line -> print(log, line));
        }
    }

    /** The classpath for a separate JVM when this run goes to one; empty to run here. */
    private Optional<List<Path>> separateClasspath(SeparateJvm.Choice choice, GateSettings settings)
            throws GateException, MojoExecutionException {
        if (choice == SeparateJvm.Choice.SAME
                || (choice == SeparateJvm.Choice.AUTO && !GateRun.atLeast(settings, SeparateJvm.FROM_SPEC_FILES))) {
            return Optional.empty();
        }
        Optional<List<Path>> classpath = pluginClasspath();
        if (classpath.isEmpty() && choice == SeparateJvm.Choice.SEPARATE) {
            throw new MojoExecutionException("resonance-gate: jvm=separate, but Maven did not say where the plugin's"
                    + " jars are; use jvm=same");
        }
        return classpath;
    }

    private Optional<List<Path>> pluginClasspath() {
        if (plugin == null || plugin.getPluginArtifact() == null || plugin.getPluginArtifact().getFile() == null
                || plugin.getArtifacts() == null) {
            return Optional.empty();
        }
        List<Path> jars = new ArrayList<>();
        jars.add(plugin.getPluginArtifact().getFile().toPath());
        for (Artifact a : plugin.getArtifacts()) {
            if (a.getFile() == null) {
                return Optional.empty();
            }
            if (!a.getFile().toPath().equals(jars.get(0))) {
                jars.add(a.getFile().toPath());
            }
        }
        return Optional.of(jars);
    }

    static Optional<String> folderInWorkTree(Path base) {
        return GateRun.folderInWorkTree(base);
    }

    private List<String> includeList() {
        List<String> list = nonBlank(includes);
        return list.isEmpty() ? List.of(DEFAULT_INCLUDE) : list;
    }

    private List<String> excludeList() {
        return nonBlank(excludes);
    }

    /** The entries that say something: {@code -Dresonance-gate.formats=json,} or an empty {@code <exclude/>} leaves blanks (or nulls). */
    private static List<String> nonBlank(List<String> entries) {
        return entries == null ? List.of() : entries.stream().filter(e -> e != null && !e.isBlank()).map(String::trim).toList();
    }

    private static void print(Log log, ConsoleLine line) {
        switch (line.level()) {
            case INFO -> log.info(line.text());
            case WARNING -> log.warn(line.text());
            case ERROR -> log.error(line.text());
        }
    }
}
