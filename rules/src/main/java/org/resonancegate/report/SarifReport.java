package org.resonancegate.report;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.SortedMap;
import java.util.TreeMap;
import org.resonancegate.spec.Rule;
import org.resonancegate.spec.Severity;
import tools.jackson.core.JsonEncoding;
import tools.jackson.core.JsonGenerator;
import tools.jackson.core.json.JsonFactory;

/**
 * Writes {@link Results} as a SARIF 2.1.0 log (OASIS Static Analysis Results Interchange Format),
 * the file code-review tools read to put findings on the lines they concern.
 *
 * <ul>
 * <li>One {@code result} per failed, warning or waived criterion and per diagnostic; passing
 *     criteria are not results.</li>
 * <li>One rule per criterion kind ({@code separation}, ...) and one, {@code spec-error}, for
 *     files that cannot be read; {@code level} is {@code error} or {@code warning} by the
 *     criterion's severity.</li>
 * <li>A waived criterion keeps its level and carries an {@code inSource} suppression with status
 *     {@code accepted} and the waiver's reason: SARIF's way of saying "found, and accepted by a
 *     person", which viewers show apart from open findings. (A {@code note} level would instead
 *     claim the finding is minor.) An expired waiver is no suppression: the result is open again.</li>
 * <li>Locations are project-relative, against the base id {@code PROJECTROOT}, which the log
 *     declares without an absolute path (the consumer knows where the checkout is), so the file
 *     is the same on every machine. Columns count UTF-16 code units, SARIF's default
 *     {@code columnKind}, which is how the spec reader counts them.</li>
 * <li>With a baseline, every result carries SARIF's own {@code baselineState}: {@code new} for a
 *     criterion that fails now and did not at the baseline (or a diagnostic the baseline did not
 *     have), {@code unchanged} for one carried over with the same status, value and limit,
 *     {@code updated} for one carried over whose value, limit or status moved. The standard's
 *     fourth state, {@code absent} (found at the baseline, not now), is not written: a fixed
 *     criterion would need a result of its own, on a line where nothing is wrong, and viewers that
 *     ignore {@code baselineState} (several code-review tools do) would show it as an open
 *     finding. Fixed criteria are named in the run's {@code properties} instead, with the
 *     revision and commit compared against. The standard's {@code run.baselineGuid} names an
 *     earlier SARIF run; the baseline here is a Git revision, judged afresh, so it is not set.</li>
 * </ul>
 * Deterministic: fixed property order, sorted maps, {@code "\n"} line ends, no timestamps.
 */
public final class SarifReport {

    /** The file name the plugin writes inside its output directory. */
    public static final String FILE_NAME = "results.sarif";

    /** The rule id of a diagnostic (a spec or profile that cannot be read). */
    public static final String SPEC_ERROR = "spec-error";

    static final String SCHEMA = "https://docs.oasis-open.org/sarif/sarif/v2.1.0/errata01/os/schemas/sarif-schema-2.1.0.json";
    static final String PROJECT_ROOT = "PROJECTROOT";
    static final String SOURCE_ROOT = "SRCROOT";

    /** Jackson's defaults: plain JSON escapes, UTF-8 written as it is (SARIF is UTF-8). */
    private static final JsonFactory FACTORY = JsonFactory.builder().build();

    private SarifReport() {
    }

    public static byte[] toBytes(Results results) {
        return toBytes(results, Optional.empty());
    }

    /**
     * @param projectInRepository the project's folder relative to the root of its Git work tree,
     *                            with a trailing {@code /} ({@code "sample-project/"}), when it is
     *                            not the root itself: then {@code PROJECTROOT} is declared relative
     *                            to {@code SRCROOT}, the work tree, so a code-review tool that knows
     *                            only the checkout finds every file
     */
    public static byte[] toBytes(Results results, Optional<String> projectInRepository) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        writeTo(results, projectInRepository, out);
        return out.toByteArray();
    }

    /** Writes the log to {@code target}, creating its directory; atomic ({@link AtomicWrite}). */
    public static void write(Results results, Path target, Optional<String> projectInRepository) throws IOException {
        AtomicWrite.write(target, out -> writeTo(results, projectInRepository, out));
    }

    /** Streams the log to {@code out} (closed when done) rather than holding its bytes whole first. */
    private static void writeTo(Results results, Optional<String> projectInRepository, OutputStream out) {
        SarifLog log = log(results, projectInRepository);
        try (JsonGenerator g = FACTORY.createGenerator(new ResultsJsonPrinter.Context(null), out, JsonEncoding.UTF8)) {
            SarifJson.write(g, log);
            g.writeRaw('\n');
        }
    }

    static SarifLog log(Results results, Optional<String> projectInRepository) {
        List<String> ruleIds = new ArrayList<>();
        List<SarifLog.Descriptor> rules = new ArrayList<>();
        for (Rule rule : Rule.values()) {
            ruleIds.add(rule.key());
            rules.add(descriptor(rule.key(), name(rule), description(rule)));
        }
        ruleIds.add(SPEC_ERROR);
        rules.add(descriptor(SPEC_ERROR, "SpecError", "The spec file, or a profile it uses, cannot be read or is not "
                + "valid, so none of its criteria was judged. The message says what to fix."));

        List<SarifLog.Result> out = new ArrayList<>();
        for (ReportRow row : ReportRow.of(results)) {
            String ruleId = row.check().map(CheckResult::rule).orElse(SPEC_ERROR);
            int ruleIndex = ruleIds.indexOf(ruleId);
            if (ruleIndex < 0) {
                throw new IllegalStateException("criterion kind '" + ruleId + "' has no SARIF rule; add it to "
                        + "SarifReport.description");
            }
            Optional<Transition> transition = row.check()
                    .flatMap(c -> ChangeWords.transition(results.baseline(), row.spec(), c));
            out.add(result(row, ruleId, ruleIndex, baselineState(results.baseline(), row), transition));
        }
        SortedMap<String, SarifLog.UriBase> bases = new TreeMap<>();
        String what = "The base directory of the Maven project that was checked.";
        if (projectInRepository.isPresent()) {
            bases.put(PROJECT_ROOT, new SarifLog.UriBase(projectInRepository, Optional.of(SOURCE_ROOT),
                    new SarifLog.Message(what)));
            bases.put(SOURCE_ROOT, new SarifLog.UriBase(Optional.empty(), Optional.empty(),
                    new SarifLog.Message("The root of the Git work tree that holds the project.")));
        } else {
            bases.put(PROJECT_ROOT, new SarifLog.UriBase(Optional.empty(), Optional.empty(), new SarifLog.Message(what)));
        }
        SarifLog.Driver driver = new SarifLog.Driver(EngineInfo.NAME, EngineInfo.version(), List.copyOf(rules));
        return new SarifLog(SCHEMA, "2.1.0", List.of(new SarifLog.Run(new SarifLog.Tool(driver), bases,
                "utf16CodeUnits", List.copyOf(out), Optional.of(runProperties(results)))));
    }

    /**
     * The state against the baseline, in SARIF's words: a failing criterion by its transition; a
     * waived one (which is not failing) as {@code new} if the baseline did not judge it; a
     * diagnostic as {@code unchanged} if the baseline spec had the same one, else {@code new}.
     */
    static Optional<String> baselineState(Optional<Comparison> comparison, ReportRow row) {
        if (comparison.isEmpty()) {
            return Optional.empty();
        }
        if (row.check().isEmpty()) {
            boolean before = comparison.get().current(row.spec().file()).stream()
                    .flatMap(s -> s.baselineErrors().stream())
                    .anyMatch(e -> e.message().equals(row.message()));
            return Optional.of(before ? "unchanged" : "new");
        }
        Optional<CriterionChange> change = comparison.get().criterion(row.spec().file(), row.check().get().criterion());
        if (change.isEmpty() || change.get().baselineStatus().isEmpty() || change.get().transition() == Transition.NEW) {
            return Optional.of("new");
        }
        return Optional.of(change.get().changed() ? "updated" : "unchanged");
    }

    /** The caution every report carries, and with a baseline what it was and what it fixed. */
    private static SortedMap<String, Object> runProperties(Results results) {
        SortedMap<String, Object> p = new TreeMap<>();
        p.put("caution", ConsoleReport.CAUTION);
        results.baseline().ifPresent(c -> p.putAll(baselineProperties(c)));
        return p;
    }

    private static SortedMap<String, Object> baselineProperties(Comparison c) {
        List<String> fixed = new ArrayList<>();
        for (SpecChange s : c.specs()) {
            for (CriterionChange k : s.criteria()) {
                if (k.transition() == Transition.FIXED) {
                    fixed.add(s.id().orElse(s.file()) + " " + k.criterion() + " " + k.rule() + " (" + s.file() + ")");
                }
            }
        }
        SortedMap<String, Object> p = new TreeMap<>();
        p.put("baselineRef", c.ref());
        p.put("baselineCommit", c.commit());
        p.put("fixedSinceBaseline", List.copyOf(fixed));
        return p;
    }

    private static SarifLog.Result result(ReportRow row, String ruleId, int ruleIndex, Optional<String> baselineState,
                                          Optional<Transition> transition) {
        StringBuilder text = new StringBuilder(row.specName());
        row.judgedFile().ifPresent(f -> text.append(" [").append(f).append(']'));
        row.check().ifPresent(c -> text.append(' ').append(c.criterion()).append(' ').append(c.rule())
                .append(transition.filter(t -> t != Transition.PASS).map(ComparisonConsole::tag).orElse("")).append(':'));
        text.append(' ').append(row.message());
        boolean warning = row.check().map(c -> c.severity() == Severity.WARNING).orElse(false);
        if (warning && row.check().get().status() == CheckStatus.WARNING) {
            text.append(" (severity warning: does not fail the spec)");
        }
        Optional<List<SarifLog.Suppression>> suppressions = row.check()
                .filter(c -> c.status() == CheckStatus.WAIVED)
                .flatMap(CheckResult::waiver)
                .map(w -> List.of(new SarifLog.Suppression("inSource", "accepted",
                        w.reason() + " (waived through " + w.expires() + ")", location(w.location()))));
        SortedMap<String, String> fingerprints = new TreeMap<>();
        // stable across edits that move lines: the spec and the criterion (or the diagnostic's text)
        fingerprints.put("resonanceGateFinding/v1", row.spec().file() + "\n"
                + row.check().map(CheckResult::criterion).orElse(row.message()));
        SortedMap<String, String> properties = new TreeMap<>();
        properties.put("specFile", row.spec().file());
        row.spec().id().ifPresent(id -> properties.put("specId", id));
        row.check().ifPresent(c -> properties.put("criterion", c.criterion()));
        properties.put("status", row.status());
        transition.ifPresent(t -> properties.put("transition", t.key()));
        return new SarifLog.Result(ruleId, ruleIndex, warning ? "warning" : "error",
                new SarifLog.Message(text.toString()), List.of(location(row.location())), suppressions, baselineState,
                fingerprints, properties);
    }

    private static SarifLog.Location location(org.resonancegate.spec.SourceLocation at) {
        return new SarifLog.Location(new SarifLog.PhysicalLocation(
                new SarifLog.ArtifactLocation(UriPath.encode(at.file()), PROJECT_ROOT),
                new SarifLog.Region(Math.max(1, at.line()), Math.max(1, at.column()))));
    }

    private static SarifLog.Descriptor descriptor(String id, String name, String full) {
        String shortText = full.substring(0, full.indexOf('.') + 1);
        return new SarifLog.Descriptor(id, name, new SarifLog.Message(shortText), new SarifLog.Message(full),
                new SarifLog.Configuration("error"));
    }

    private static String name(Rule rule) {
        return switch (rule) {
            case SEPARATION -> "Separation";
            case ISOLATION -> "Isolation";
            case DISPLACEMENT -> "Displacement";
            case VELOCITY -> "Velocity";
            case TRANSMITTED_FORCE -> "TransmittedForce";
            case STATIC_DEFLECTION -> "StaticDeflection";
        };
    }

    private static String description(Rule rule) {
        return switch (rule) {
            case SEPARATION -> "Every natural frequency keeps a set margin from every excitation frequency over "
                    + "the speed range. Otherwise running speed, or one of its orders, meets a resonance.";
            case ISOLATION -> "The share of the exciting force or base motion that passes through the mounts "
                    + "stays within a limit. Given as a maximum transmissibility or a minimum isolation efficiency.";
            case DISPLACEMENT -> "The vibration displacement at a point stays below a limit over the speed range. "
                    + "Peak, peak-to-peak or rms, as the criterion says.";
            case VELOCITY -> "The vibration velocity at a point stays below a limit over the speed range. "
                    + "Peak or rms, as the criterion says.";
            case TRANSMITTED_FORCE -> "The dynamic force passed through the mounts into the structure stays below "
                    + "a limit. Judged over the speed range for every mount or spring.";
            case STATIC_DEFLECTION -> "The mounts' static deflection under the machine's weight lies within a "
                    + "window. Too little leaves the mounts stiff; too much, unstable or overloaded.";
        };
    }
}
