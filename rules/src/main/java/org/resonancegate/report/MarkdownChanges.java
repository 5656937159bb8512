package org.resonancegate.report;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.StringJoiner;

/**
 * The part of the Markdown summary that says what a change did against its baseline: one line of
 * counts, then a short table of the inputs that changed and the modes that moved, the rest
 * counted. The same edit made in several places is one row. The inputs that change numbers come
 * first, then the modes that moved, then the spec's title and revision. A mode that moved by less than {@link #MODE_SHIFT} is left out of the table: it moved
 * because something moved, but it is not what a reviewer needs to see first.
 */
final class MarkdownChanges {

    /** Rows in the table of changes; beyond it they are counted. Keeps the summary on one screen. */
    static final int MAX_CHANGES = 8;

    /** A relative shift of a mode below this is not listed (common practice, no source: 1 % is inside any model's accuracy). */
    static final double MODE_SHIFT = 0.01;

    private static final int MAX_TEXT = 60;

    private MarkdownChanges() {
    }

    static void lead(Comparison c, boolean fullReport, StringBuilder md) {
        long[] n = new long[Transition.values().length];
        c.specs().forEach(s -> s.criteria().forEach(k -> n[k.transition().ordinal()]++));
        // "new" also counts warnings (they are findings too); say how many of them fail
        long newWarnings = c.specs().stream().flatMap(s -> s.criteria().stream())
                .filter(k -> k.transition() == Transition.NEW && k.currentStatus().equals(Optional.of(CheckStatus.WARNING)))
                .count();
        long newFailing = n[Transition.NEW.ordinal()] - newWarnings;
        long changed = c.specs().stream().filter(s -> s.kind() != SpecChange.Kind.UNCHANGED).count();
        md.append("**Against ").append(MarkdownSummary.cell(c.ref(), MAX_TEXT)).append(" (`")
                .append(ChangeWords.shortCommit(c).replaceAll("[^0-9a-fA-F]", "")).append("`): ")
                .append(newFailing).append(" new failing, ")
                .append(newWarnings > 0 ? newWarnings + (newWarnings == 1 ? " new warning, " : " new warnings, ") : "")
                .append(n[Transition.CARRIED_OVER.ordinal()]).append(" carried over, ")
                .append(n[Transition.FIXED.ordinal()]).append(" fixed; ")
                .append(changed).append(changed == 1 ? " spec changed" : " specs changed").append("**\n\n");
        List<String[]> rows = new ArrayList<>();
        List<String[]> wording = new ArrayList<>();
        for (SpecChange s : c.specs()) {
            String spec = s.id().orElse(s.file());
            switch (s.kind()) {
                case ADDED, REMOVED -> rows.add(new String[] {spec, "spec " + s.kind().key(), "", "", s.file()});
                case RENAMED -> rows.add(new String[] {spec, "spec renamed", s.baselineFile().orElseThrow(),
                        s.currentFile().orElseThrow(), ""});
                default -> {
                }
            }
            // the same edit made in several places (four mounts, two axes) is one row
            Map<String, List<InputChange>> alike = new LinkedHashMap<>();
            for (InputChange i : s.inputs()) {
                alike.computeIfAbsent(ChangeWords.before(i) + "\n" + ChangeWords.after(i), k -> new ArrayList<>()).add(i);
            }
            for (List<InputChange> group : alike.values()) {
                InputChange i = group.get(0);
                String what = i.path() + (group.size() > 1 ? " and " + (group.size() - 1) + " more alike" : "");
                (wordingOnly(i) ? wording : rows).add(new String[] {spec, what, ChangeWords.before(i),
                        ChangeWords.after(i), i.location().map(l -> l.display()).orElse(s.file())});
            }
            s.modes().stream().filter(MarkdownChanges::matters)
                    .sorted(Comparator.comparingDouble(MarkdownChanges::shift).reversed())
                    .forEach(m -> rows.add(new String[] {spec, "mode " + m.index(), ChangeWords.hz(m.baselineHz()),
                            ChangeWords.hz(m.currentHz()) + ChangeWords.change(m.baselineHz(), m.currentHz()), ""}));
        }
        // words that describe the spec (its title, revision) come after what moves the physics
        rows.addAll(wording);
        if (rows.isEmpty()) {
            return;
        }
        md.append("| spec | changed | at ").append(MarkdownSummary.cell(c.ref(), MAX_TEXT)).append(" | now | where |\n");
        md.append("|---|---|---|---|---|\n");
        for (String[] r : rows.subList(0, Math.min(rows.size(), MAX_CHANGES))) {
            StringJoiner j = new StringJoiner(" | ", "| ", " |\n");
            for (String cell : r) {
                j.add(cell.isEmpty() ? "–" : MarkdownSummary.cell(cell, MAX_TEXT));
            }
            md.append(j);
        }
        md.append('\n');
        if (rows.size() > MAX_CHANGES) {
            int more = rows.size() - MAX_CHANGES;
            md.append("…and ").append(more).append(more == 1 ? " more change" : " more changes")
                    .append(fullReport ? " in the full report.\n\n" : " in results.json.\n\n");
        }
    }

    /** Names the criteria that failed at the baseline and do not fail now: they are in no table. */
    static void fixed(Comparison c, StringBuilder md) {
        StringJoiner j = new StringJoiner(", ");
        for (SpecChange s : c.specs()) {
            for (CriterionChange k : s.criteria()) {
                if (k.transition() == Transition.FIXED) {
                    j.add(MarkdownSummary.cell(s.id().orElse(s.file()) + " " + k.criterion() + " " + k.rule(), MAX_TEXT));
                }
            }
        }
        if (j.length() > 0) {
            md.append("Fixed since ").append(MarkdownSummary.cell(c.ref(), MAX_TEXT)).append(": ").append(j)
                    .append(".\n\n");
        }
    }

    /** An input that only names or describes the spec: it changes no number the engine uses. */
    private static boolean wordingOnly(InputChange i) {
        return i.path().equals("title") || i.path().equals("revision");
    }

    private static boolean matters(ModeChange m) {
        return m.moved() && (m.baselineHz().isEmpty() || m.currentHz().isEmpty() || shift(m) >= MODE_SHIFT);
    }

    private static double shift(ModeChange m) {
        if (m.baselineHz().isEmpty() || m.currentHz().isEmpty() || m.baselineHz().getAsDouble() == 0) {
            return Double.POSITIVE_INFINITY;
        }
        return Math.abs(m.currentHz().getAsDouble() / m.baselineHz().getAsDouble() - 1);
    }
}
