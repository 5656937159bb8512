package org.resonancegate.baseline;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import org.resonancegate.report.CheckResult;
import org.resonancegate.report.CheckStatus;
import org.resonancegate.report.CriterionChange;
import org.resonancegate.report.InputChange;
import org.resonancegate.report.ModeChange;
import org.resonancegate.report.ModeResult;
import org.resonancegate.report.SpecChange;
import org.resonancegate.report.SpecResult;
import org.resonancegate.report.Results;
import org.resonancegate.report.Transition;
import org.resonancegate.spec.SpecFiles;
import org.resonancegate.spec.SpecInputs;

/**
 * Pairs the baseline's specs with the current ones and says what moved. Specs pair by {@code id}
 * where the id is unique on both sides (so a file that moved keeps its history), then by file;
 * what is left is added or removed. Inputs are compared value by value as written, so the
 * comparison needs no knowledge of the models.
 */
final class SpecComparer {

    private SpecComparer() {
    }

    static List<SpecChange> compare(Path base, Results baseline, Results current, SpecFiles baselineFiles) {
        List<SpecResult> olds = new ArrayList<>(baseline.specs());
        List<SpecResult> news = new ArrayList<>(current.specs());
        Map<String, Integer> oldIds = idCounts(olds);
        Map<String, Integer> newIds = idCounts(news);
        List<SpecChange> out = new ArrayList<>();
        for (SpecResult now : List.copyOf(news)) {
            Optional<SpecResult> then = now.id()
                    .filter(id -> oldIds.getOrDefault(id, 0) == 1 && newIds.get(id) == 1)
                    .flatMap(id -> olds.stream().filter(o -> o.id().equals(now.id())).findFirst());
            if (then.isPresent()) {
                out.add(pair(base, then.get(), now, baselineFiles));
                olds.remove(then.get());
                news.remove(now);
            }
        }
        for (SpecResult now : List.copyOf(news)) {
            Optional<SpecResult> then = olds.stream().filter(o -> o.file().equals(now.file())).findFirst();
            if (then.isPresent()) {
                out.add(pair(base, then.get(), now, baselineFiles));
                olds.remove(then.get());
                news.remove(now);
            }
        }
        for (SpecResult now : news) {
            out.add(new SpecChange(SpecChange.Kind.ADDED, now.id(), Optional.empty(), Optional.of(now.file()),
                    Optional.empty(), Optional.of(now.status()), List.of(), modes(List.of(), now.modes()),
                    criteria(List.of(), now.checks()), List.of()));
        }
        for (SpecResult then : olds) {
            out.add(new SpecChange(SpecChange.Kind.REMOVED, then.id(), Optional.of(then.file()), Optional.empty(),
                    Optional.of(then.status()), Optional.empty(), List.of(), modes(then.modes(), List.of()),
                    criteria(then.checks(), List.of()), then.errors()));
        }
        out.sort(Comparator.comparing(SpecChange::file));
        return out;
    }

    private static Map<String, Integer> idCounts(List<SpecResult> specs) {
        Map<String, Integer> counts = new HashMap<>();
        for (SpecResult s : specs) {
            s.id().ifPresent(id -> counts.merge(id, 1, Integer::sum));
        }
        return counts;
    }

    private static SpecChange pair(Path base, SpecResult then, SpecResult now, SpecFiles baselineFiles) {
        List<InputChange> inputs = inputs(SpecInputs.read(base, base.resolve(then.file()), baselineFiles),
                SpecInputs.read(base, base.resolve(now.file()), SpecFiles.disk()));
        List<ModeChange> modes = modes(then.modes(), now.modes());
        List<CriterionChange> criteria = criteria(then.checks(), now.checks());
        boolean changed = !inputs.isEmpty() || then.status() != now.status()
                || modes.stream().anyMatch(ModeChange::moved) || criteria.stream().anyMatch(CriterionChange::changed)
                || !then.errors().equals(now.errors());
        SpecChange.Kind kind = !then.file().equals(now.file()) ? SpecChange.Kind.RENAMED
                : changed ? SpecChange.Kind.CHANGED : SpecChange.Kind.UNCHANGED;
        return new SpecChange(kind, now.id().or(then::id), Optional.of(then.file()), Optional.of(now.file()),
                Optional.of(then.status()), Optional.of(now.status()), inputs, modes, criteria, then.errors());
    }

    /** Current values in file order (changed or added), then the baseline's values that are gone. */
    static List<InputChange> inputs(List<SpecInputs.Input> then, List<SpecInputs.Input> now) {
        Map<String, SpecInputs.Input> old = new LinkedHashMap<>();
        then.forEach(i -> old.putIfAbsent(i.path(), i));
        Map<String, SpecInputs.Input> current = new LinkedHashMap<>();
        now.forEach(i -> current.putIfAbsent(i.path(), i));
        List<InputChange> out = new ArrayList<>();
        for (SpecInputs.Input i : current.values()) {
            SpecInputs.Input before = old.get(i.path());
            if (before == null || !before.text().equals(i.text())) {
                out.add(new InputChange(i.path(), Optional.ofNullable(before).map(SpecInputs.Input::text),
                        Optional.of(i.text()), Optional.of(i.location())));
            }
        }
        for (SpecInputs.Input i : old.values()) {
            if (!current.containsKey(i.path())) {
                out.add(new InputChange(i.path(), Optional.of(i.text()), Optional.empty(), Optional.empty()));
            }
        }
        return out;
    }

    private static List<ModeChange> modes(List<ModeResult> then, List<ModeResult> now) {
        Map<Integer, Double> old = new HashMap<>();
        then.forEach(m -> old.put(m.index(), m.frequencyHz()));
        Map<Integer, Double> current = new HashMap<>();
        now.forEach(m -> current.put(m.index(), m.frequencyHz()));
        int top = Math.max(then.stream().mapToInt(ModeResult::index).max().orElse(0),
                now.stream().mapToInt(ModeResult::index).max().orElse(0));
        List<ModeChange> out = new ArrayList<>();
        for (int i = 1; i <= top; i++) {
            if (old.containsKey(i) || current.containsKey(i)) {
                out.add(new ModeChange(i, optional(old.get(i)), optional(current.get(i))));
            }
        }
        return out;
    }

    private static List<CriterionChange> criteria(List<CheckResult> then, List<CheckResult> now) {
        Map<String, CheckResult> old = new LinkedHashMap<>();
        then.forEach(c -> old.putIfAbsent(c.criterion(), c));
        List<CriterionChange> out = new ArrayList<>();
        List<String> seen = new ArrayList<>();
        for (CheckResult c : now) {
            if (seen.contains(c.criterion())) {
                continue;
            }
            seen.add(c.criterion());
            out.add(change(Optional.ofNullable(old.get(c.criterion())), Optional.of(c)));
        }
        for (CheckResult c : old.values()) {
            if (!seen.contains(c.criterion())) {
                out.add(change(Optional.of(c), Optional.empty()));
            }
        }
        return out;
    }

    private static CriterionChange change(Optional<CheckResult> then, Optional<CheckResult> now) {
        CheckResult any = now.or(() -> then).orElseThrow();
        return new CriterionChange(any.criterion(), any.rule(), transition(then, now),
                then.map(CheckResult::status), now.map(CheckResult::status),
                value(then), value(now), limit(then), limit(now), any.unit(), margin(then), margin(now),
                any.location());
    }

    static Transition transition(Optional<CheckResult> then, Optional<CheckResult> now) {
        boolean failedThen = then.map(c -> failing(c.status())).orElse(false);
        if (now.isEmpty()) {
            return Transition.REMOVED;
        }
        if (failing(now.get().status())) {
            return failedThen ? Transition.CARRIED_OVER : Transition.NEW;
        }
        return failedThen ? Transition.FIXED : Transition.PASS;
    }

    /** Broken and not covered by a valid waiver. */
    private static boolean failing(CheckStatus status) {
        return status == CheckStatus.FAIL || status == CheckStatus.WARNING;
    }

    private static OptionalDouble value(Optional<CheckResult> c) {
        return c.map(x -> OptionalDouble.of(x.value())).orElse(OptionalDouble.empty());
    }

    private static OptionalDouble limit(Optional<CheckResult> c) {
        return c.map(x -> OptionalDouble.of(x.limit())).orElse(OptionalDouble.empty());
    }

    /** The distance to the limit as a fraction of it; the status says which side of the limit is the right one. */
    static OptionalDouble margin(Optional<CheckResult> c) {
        if (c.isEmpty() || c.get().limit() == 0 || !Double.isFinite(c.get().value())
                || !Double.isFinite(c.get().limit())) {
            return OptionalDouble.empty();
        }
        double distance = Math.abs(c.get().value() - c.get().limit()) / Math.abs(c.get().limit());
        return OptionalDouble.of(c.get().status() == CheckStatus.PASS ? distance : -distance);
    }

    private static OptionalDouble optional(Double d) {
        return d == null ? OptionalDouble.empty() : OptionalDouble.of(d);
    }
}
