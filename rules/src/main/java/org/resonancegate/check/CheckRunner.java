package org.resonancegate.check;

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.stream.Stream;
import org.resonancegate.report.DetailedSpecs;
import org.resonancegate.report.ErrorEntry;
import org.resonancegate.report.Results;
import org.resonancegate.report.SpecResult;
import org.resonancegate.report.SpecStatus;
import org.resonancegate.spec.Diagnostic;
import org.resonancegate.spec.LoadedSpec;
import org.resonancegate.spec.SourceLocation;

/**
 * The whole run over a set of files, with the reader passed in: a spec with diagnostics is
 * reported as an error with no modes or checks; one broken spec never hides the others.
 */
public final class CheckRunner {

    private CheckRunner() {
    }

    public static Results run(CheckRequest request, SpecSource source) {
        return run(request, source, true);
    }

    /**
     * Reads the files, then judges the specs, in parallel across the machine's cores when
     * {@code parallel}. Each spec is judged on its own: the engine keeps no state between specs
     * (its caches live in one spec's system or rule context), so the only shared thing is the
     * list of inputs. The results keep the input order and are then sorted by file, so the
     * output does not depend on which thread finished first.
     */
    static Results run(CheckRequest request, SpecSource source, boolean parallel) {
        LocalDate today = LocalDate.now(request.clock());
        List<LoadedSpec> loaded = source.load(request.projectBase(), request.specFiles());
        // Curves go only to the specs shown in full (all of a small run); in a large run those
        // are known once every spec is judged, and judging them again with curves gives the same verdict.
        boolean curvesForAll = request.curves() && loaded.size() <= DetailedSpecs.LIMIT;
        Stream<LoadedSpec> specs = parallel ? loaded.parallelStream() : loaded.stream();
        List<SpecResult> results = new ArrayList<>(specs.map(l -> evaluate(l, today, curvesForAll)).toList());
        results.sort(Comparator.comparing(SpecResult::file));
        if (request.curves() && !curvesForAll) {
            Set<String> detailed = DetailedSpecs.files(results);
            Map<String, LoadedSpec> byFile = new HashMap<>();
            loaded.forEach(l -> byFile.put(l.file(), l));
            List<Integer> again = new ArrayList<>();
            for (int i = 0; i < results.size(); i++) {
                if (detailed.contains(results.get(i).file()) && byFile.containsKey(results.get(i).file())) {
                    again.add(i);
                }
            }
            List<SpecResult> withCurves = (parallel ? again.parallelStream() : again.stream())
                    .map(i -> evaluate(byFile.get(results.get(i).file()), today, true)).toList();
            for (int j = 0; j < again.size(); j++) {
                results.set(again.get(j), withCurves.get(j));
            }
        }
        return new Results(results);
    }

    static SpecResult evaluate(LoadedSpec loaded, LocalDate today, boolean curves) {
        if (!loaded.diagnostics().isEmpty() || loaded.spec().isEmpty()) {
            List<ErrorEntry> errors = new ArrayList<>();
            for (Diagnostic d : loaded.diagnostics()) {
                errors.add(new ErrorEntry(d.location(), d.message()));
            }
            return new SpecResult(loaded.file(), loaded.id(), SpecStatus.ERROR, List.of(), List.of(), errors);
        }
        try {
            return SpecEvaluator.evaluate(loaded.spec().get(), today, curves);
        } catch (RuntimeException e) {
            // A defect in the engine must not turn into a pass or hide the other specs.
            return new SpecResult(loaded.file(), loaded.id(), SpecStatus.ERROR, List.of(), List.of(),
                    List.of(new ErrorEntry(new SourceLocation(loaded.file(), 1, 1),
                            "internal error while evaluating this spec: " + e)));
        }
    }
}
