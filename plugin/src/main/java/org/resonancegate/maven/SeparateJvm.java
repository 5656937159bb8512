package org.resonancegate.maven;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStreamReader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.function.Consumer;
import java.util.stream.Collectors;
import java.util.stream.Stream;
import org.resonancegate.report.ConsoleLevel;
import org.resonancegate.report.ConsoleLine;

/**
 * Runs the gate in a JVM of its own, started for this one batch. A run over thousands of specs in
 * Maven's JVM spends about half its processor time in the optimising just-in-time compiler, on
 * code that runs for a few seconds and is then thrown away; a JVM that only uses the quick
 * compiler ({@code -XX:TieredStopAtLevel=1}) does the same work in about half the processor time.
 * Output, reports and verdict are the same as in Maven's JVM; the settings go over in a file, the
 * console lines and the verdict come back on the child's standard output.
 */
final class SeparateJvm {

    /**
     * Where {@code jvm=auto} starts a separate JVM. Measured on two cores (Maven total, same JVM
     * against separate): 8 specs 2.7-3.0 s against 2.2-3.6 s (a draw), 200 specs 6.7-8.2 s
     * against 4.9-5.0 s, 1,000 specs 9.9-10.3 s against 6.3-6.4 s.
     */
    static final int FROM_SPEC_FILES = 200;

    /**
     * For a short batch: the quick compiler only, and a collector that uses every core (on 10,000
     * specs the serial one paused the run for about 1 s in all, the parallel one for about 0.55 s).
     */
    static final List<String> OPTIONS = List.of("-XX:TieredStopAtLevel=1", "-XX:+UseParallelGC");

    /** Which JVM a goal runs in: the user's {@code jvm} parameter. */
    enum Choice {
        AUTO, SAME, SEPARATE;

        static Optional<Choice> parse(String text) {
            String t = text == null || text.isBlank() ? "auto" : text.trim().toLowerCase(Locale.ROOT);
            for (Choice c : values()) {
                if (c.name().toLowerCase(Locale.ROOT).equals(t)) {
                    return Optional.of(c);
                }
            }
            return Optional.empty();
        }
    }

    /** The separate JVM could not be started at all (no {@code java} there, say): nothing has run. */
    static final class CannotStart extends GateException {
        private static final long serialVersionUID = 1L;

        CannotStart(String message, Throwable cause) {
            super(message, cause);
        }
    }

    private SeparateJvm() {
    }

    /**
     * @param classpath the plugin's own jar and its dependencies
     * @param out       each console line, as the child prints it
     */
    static GateRun.Outcome run(GateSettings settings, List<Path> classpath, Consumer<ConsoleLine> out)
            throws GateException {
        Path work;
        try {
            Files.createDirectories(settings.output());
            removeLeftovers(settings.output());
            work = Files.createTempDirectory(settings.output(), "separate-jvm-");
        } catch (IOException e) {
            throw new GateException("resonance-gate: cannot prepare " + settings.output() + " for the separate JVM: " + e, e);
        }
        try {
            return runIn(work, settings, classpath, out);
        } finally {
            delete(work);
        }
    }

    private static GateRun.Outcome runIn(Path work, GateSettings settings, List<Path> classpath,
                                         Consumer<ConsoleLine> out) throws GateException {
        Path settingsFile = work.resolve("settings.txt");
        Path errors = work.resolve("stderr.txt");
        Optional<Path> summaryPart = settings.summaryFile().map(f -> work.resolve("summary-part.md"));
        List<String> command = new ArrayList<>();
        command.add(Path.of(System.getProperty("java.home"), "bin", "java").toString());
        // the same heap limit as Maven's JVM, so a run that fits there fits here
        command.add("-Xmx" + Math.max(64, Runtime.getRuntime().maxMemory() / (1024 * 1024)) + "m");
        command.addAll(OPTIONS);
        // the Git reader logs through SLF4J, which Maven's JVM provides; alone, SLF4J would say it found no logger
        command.add("-Dslf4j.internal.verbosity=ERROR");
        // the day a waiver is judged on, and any locale-dependent wording, as in Maven's JVM
        // (MAVEN_OPTS or .mvn/jvm.config may set them, and a child does not inherit -D options)
        command.add("-Duser.timezone=" + java.util.TimeZone.getDefault().getID());
        java.util.Locale locale = java.util.Locale.getDefault();
        command.add("-Duser.language=" + locale.getLanguage());
        command.add("-Duser.country=" + locale.getCountry());
        command.add("-cp");
        command.add(classpath.stream().map(Path::toString).collect(Collectors.joining(java.io.File.pathSeparator)));
        command.add(SeparateJvmMain.class.getName());
        command.add(settingsFile.toString());
        Optional<GateRun.Outcome> outcome = Optional.empty();
        Optional<String> problem = Optional.empty();
        int exit;
        try {
            SeparateJvmProtocol.writeSettings(settings, settingsFile, summaryPart);
            Process process;
            try {
                process = new ProcessBuilder(command).directory(settings.base().toFile())
                        .redirectError(errors.toFile()).start();
            } catch (IOException e) {
                throw new CannotStart("resonance-gate: cannot start a separate JVM (" + command.get(0) + "): " + e
                        + "; set resonance-gate.jvm=same to check in Maven's own JVM", e);
            }
            // the child's input stays open while this JVM lives: when it closes (this JVM ended,
            // even by SIGKILL, when no shutdown hook runs) the child stops itself
            java.io.OutputStream lifeline = process.getOutputStream();
            // a build stopped with Ctrl-C takes its check with it, instead of leaving it to run on
            Thread stop = new Thread(process::destroy, "resonance-gate separate JVM stop");
            Runtime.getRuntime().addShutdownHook(stop);
            try (BufferedReader reader = new BufferedReader(new InputStreamReader(process.getInputStream(),
                    StandardCharsets.UTF_8), 1 << 16)) {
                for (String line = reader.readLine(); line != null; line = reader.readLine()) {
                    List<String> f = SeparateJvmProtocol.fields(line);
                    switch (f.get(0)) {
                        case SeparateJvmProtocol.LINE -> out.accept(new ConsoleLine(ConsoleLevel.valueOf(f.get(1)), f.get(2)));
                        case SeparateJvmProtocol.VERDICT -> outcome = Optional.of(new GateRun.Outcome(
                                new Verdict(Verdict.text(f.get(1)), Verdict.text(f.get(2)), Verdict.text(f.get(3))), f.get(4)));
                        case SeparateJvmProtocol.PROBLEM -> problem = Optional.of(f.get(1));
                        default -> out.accept(new ConsoleLine(ConsoleLevel.INFO, line));
                    }
                }
                exit = process.waitFor();
            } finally {
                if (process.isAlive()) {
                    process.destroy(); // whatever stopped the reading, the child does not outlive it
                }
                try {
                    lifeline.close();
                } catch (IOException e) {
                    // the child is gone already
                }
                try {
                    Runtime.getRuntime().removeShutdownHook(stop);
                } catch (IllegalStateException shuttingDown) {
                    // the JVM is already stopping; the hook runs and finds the child gone
                }
            }
        } catch (IOException | RuntimeException e) {
            throw new GateException("resonance-gate: the separate JVM for the check failed: " + e
                    + "; set resonance-gate.jvm=same to check in Maven's own JVM", e);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new GateException("resonance-gate: interrupted while the separate JVM was checking", e);
        }
        List<String> stderr = readLines(errors).stream().filter(line -> !pickedUp(line)).toList();
        if (problem.isPresent()) {
            throw new GateException(problem.get());
        }
        if (outcome.isEmpty() || exit != 0) {
            throw new GateException("resonance-gate: the separate JVM for the check stopped without a verdict (exit "
                    + exit + ")" + (stderr.isEmpty() ? "" : ": " + String.join(" | ", tail(stderr)))
                    + "; set resonance-gate.jvm=same to check in Maven's own JVM");
        }
        // the JVM's own warnings (a flag it does not know, say) are the user's to see
        stderr.forEach(line -> out.accept(new ConsoleLine(ConsoleLevel.WARNING, "resonance-gate (separate JVM): " + line)));
        if (settings.summaryFile().isPresent()) {
            try {
                GateRun.appendSummary(settings.base(), settings.summaryFile().get(),
                        Files.readAllBytes(summaryPart.orElseThrow()));
            } catch (IOException e) {
                throw new GateException("resonance-gate: the separate JVM left no summary to append: " + e, e);
            }
        }
        return outcome.get();
    }

    /** Scratch folders of runs that were killed before they could clean up (one run per output folder at a time). */
    private static void removeLeftovers(Path output) {
        try (Stream<Path> list = Files.list(output)) {
            list.filter(p -> p.getFileName().toString().startsWith("separate-jvm-") && Files.isDirectory(p))
                    .forEach(SeparateJvm::delete);
        } catch (IOException | UncheckedIOException e) {
            // leftovers under target/ harm nothing; the next clean removes them
        }
    }

    /** The JVM's notes about options it picked up from the environment (Maven's JVM printed them already). */
    private static boolean pickedUp(String line) {
        return line.startsWith("Picked up JAVA_TOOL_OPTIONS") || line.startsWith("Picked up _JAVA_OPTIONS")
                || line.startsWith("Picked up JDK_JAVA_OPTIONS");
    }

    private static List<String> readLines(Path file) {
        try {
            return Files.exists(file) ? Files.readAllLines(file, StandardCharsets.UTF_8).stream()
                    .filter(l -> !l.isBlank()).toList() : List.of();
        } catch (IOException | UncheckedIOException e) {
            return List.of("(its error output could not be read: " + e + ")");
        }
    }

    private static List<String> tail(List<String> lines) {
        return lines.subList(Math.max(0, lines.size() - 5), lines.size());
    }

    private static void delete(Path dir) {
        try (Stream<Path> walk = Files.walk(dir)) {
            for (Path p : walk.sorted(Comparator.reverseOrder()).toList()) {
                Files.deleteIfExists(p);
            }
        } catch (IOException | UncheckedIOException e) {
            // a leftover scratch folder under target/ harms nothing; the next clean removes it
        }
    }
}
