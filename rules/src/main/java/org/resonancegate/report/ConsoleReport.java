package org.resonancegate.report;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import java.util.StringJoiner;

/**
 * Turns {@link Results} into console lines any front end can print: a table of specs, one line
 * per finding in the {@code path:line:col: } shape that IDE and CI log matchers pick up, a count
 * line and a caution. Paths are the project-relative ones the results already carry.
 */
public final class ConsoleReport {

    /** Printed after every run: what the numbers are, and what they are not. */
    public static final String CAUTION = "Caution: a screening aid on linear models. Final designs need a qualified "
            + "engineer, commissioning measurements and the applicable local codes and standards.";

    /** Padding for the table's columns, appended in one piece rather than made anew per cell. */
    private static final String SPACES = " ".repeat(64);

    private static final String[] HEADINGS = {"file", "id", "status", "pass", "fail", "waived", "warning", "errors"};

    private ConsoleReport() {
    }

    public static List<ConsoleLine> lines(Results results) {
        return lines(results, false);
    }

    /**
     * As {@link #lines(Results)}; with a baseline in the results, a "what changed" block per spec
     * that moved, and each finding says whether it is new, carried over or fixed.
     *
     * @param carriedOverPasses the build lets failures carried over from the baseline pass (a
     *                          ratchet): they are then printed as warnings, not errors
     */
    public static List<ConsoleLine> lines(Results results, boolean carriedOverPasses) {
        List<ConsoleLine> lines = new ArrayList<>();
        if (!results.specs().isEmpty()) {
            for (String row : table(results)) {
                lines.add(new ConsoleLine(ConsoleLevel.INFO, row));
            }
        }
        results.baseline().ifPresent(c -> ComparisonConsole.block(c, lines));
        for (SpecResult spec : results.specs()) {
            for (ErrorEntry error : spec.errors()) {
                lines.add(new ConsoleLine(ConsoleLevel.ERROR,
                        error.location().display() + ": " + spec.id().orElse(spec.file()) + " " + error.message()));
            }
            for (CheckResult check : spec.checks()) {
                finding(spec, check, ComparisonConsole.transition(results.baseline(), spec, check),
                        carriedOverPasses, lines);
            }
        }
        lines.add(countLine(results, carriedOverPasses));
        lines.add(new ConsoleLine(ConsoleLevel.INFO, CAUTION));
        return List.copyOf(lines);
    }

    private static void finding(SpecResult spec, CheckResult check, Optional<Transition> transition,
                                boolean carriedOverPasses, List<ConsoleLine> lines) {
        // A criterion from a shared profile points at its definition there; the spec file it
        // was judged for is named too, since that is the file a reviewer looks at.
        String judged = check.location().file().equals(spec.file()) ? "" : " [" + spec.file() + "]";
        String head = check.location().display() + ": " + spec.id().orElse(spec.file()) + judged + " "
                + check.criterion() + " " + check.rule() + transition.map(ComparisonConsole::tag).orElse("") + ": ";
        boolean carried = transition.filter(t -> t == Transition.CARRIED_OVER).isPresent();
        switch (check.status()) {
            case PASS -> {
                // passing criteria are counted in the table, not listed, unless they just got fixed
                if (transition.filter(t -> t == Transition.FIXED).isPresent()) {
                    lines.add(new ConsoleLine(ConsoleLevel.INFO, head + "passes now: " + check.message()));
                }
            }
            // The engine's message already says "waived through DATE: reason" or "waiver expired
            // on DATE"; the console adds only the level.
            case FAIL -> lines.add(new ConsoleLine(carried && carriedOverPasses ? ConsoleLevel.WARNING
                    : ConsoleLevel.ERROR, head + check.message()));
            case WARNING -> lines.add(new ConsoleLine(ConsoleLevel.WARNING,
                    head + check.message() + " (severity warning: does not fail the spec)"));
            case WAIVED -> lines.add(new ConsoleLine(ConsoleLevel.WARNING, head + check.message()));
        }
    }

    /**
     * The table of specs. A large run lists only the specs {@link DetailedSpecs} picks (those that
     * need a look first), then a line saying how many are left out: ten thousand rows would push
     * the findings out of any terminal, and every row left out is a spec the count line totals and
     * the findings below (one line per failing criterion) already name when it broke.
     */
    private static List<String> table(Results results) {
        List<String[]> rows = new ArrayList<>();
        rows.add(HEADINGS);
        long[] n = new long[CheckStatus.values().length];
        List<SpecResult> specs = results.specs();
        Set<String> shown = specs.size() > DetailedSpecs.LIMIT ? DetailedSpecs.files(specs) : Set.of();
        for (SpecResult spec : specs) {
            if (!shown.isEmpty() && !shown.contains(spec.file())) {
                continue;
            }
            Arrays.fill(n, 0);
            for (CheckResult c : spec.checks()) {
                n[c.status().ordinal()]++;
            }
            rows.add(new String[] {spec.file(), spec.id().orElse("-"), spec.status().key(),
                Long.toString(n[CheckStatus.PASS.ordinal()]), Long.toString(n[CheckStatus.FAIL.ordinal()]),
                Long.toString(n[CheckStatus.WAIVED.ordinal()]), Long.toString(n[CheckStatus.WARNING.ordinal()]),
                Integer.toString(spec.errors().size())});
        }
        int[] widths = new int[HEADINGS.length];
        for (String[] row : rows) {
            for (int i = 0; i < row.length; i++) {
                widths[i] = Math.max(widths[i], row[i].codePointCount(0, row[i].length()));
            }
        }
        List<String> out = new ArrayList<>();
        StringBuilder line = new StringBuilder();
        for (String[] row : rows) {
            line.setLength(0);
            for (int i = 0; i < row.length; i++) {
                boolean numeric = i >= 3; // counts align right, text left
                String cell = row[i];
                int pad = widths[i] - cell.codePointCount(0, cell.length());
                if (!numeric) {
                    line.append(cell);
                }
                line.append(SPACES, 0, Math.min(pad, SPACES.length()));
                for (int k = SPACES.length(); k < pad; k++) {
                    line.append(' ');
                }
                if (numeric) {
                    line.append(cell);
                }
                if (i < row.length - 1) {
                    line.append("  ");
                }
            }
            out.add(line.toString().stripTrailing());
        }
        if (!shown.isEmpty()) {
            out.add("(" + (rows.size() - 1) + " of " + specs.size() + " specs listed: errors, failures, waivers and"
                    + " warnings first; the findings below and the count line cover every spec)");
        }
        return out;
    }

    /** The one-line count of specs and criteria by status, shared with the other short reports. */
    static ConsoleLine countLine(Results results, boolean carriedOverPasses) {
        int specs = results.specs().size();
        if (specs == 0) {
            return new ConsoleLine(ConsoleLevel.WARNING, "0 specs: nothing checked");
        }
        StringJoiner parts = new StringJoiner(", ");
        long pass = specCount(results, SpecStatus.PASS);
        long waived = specCount(results, SpecStatus.WAIVED);
        long fail = specCount(results, SpecStatus.FAIL);
        long error = specCount(results, SpecStatus.ERROR);
        parts.add(pass + " pass");
        if (waived > 0) {
            parts.add(waived + " waived");
        }
        parts.add(fail + " fail");
        parts.add(error + " error");
        long failed = checkCount(results, CheckStatus.FAIL);
        long waivedChecks = checkCount(results, CheckStatus.WAIVED);
        long warnings = checkCount(results, CheckStatus.WARNING);
        StringBuilder text = new StringBuilder()
                .append(specs).append(specs == 1 ? " spec: " : " specs: ").append(parts)
                .append("; ").append(failed).append(failed == 1 ? " criterion failed" : " criteria failed");
        if (waivedChecks > 0) {
            text.append(", ").append(waivedChecks).append(" waived");
        }
        if (warnings > 0) {
            text.append(", ").append(warnings).append(warnings == 1 ? " warning" : " warnings");
        }
        results.baseline().ifPresent(c -> {
            long[] n = new long[Transition.values().length];
            c.specs().forEach(s -> s.criteria().forEach(k -> n[k.transition().ordinal()]++));
            text.append("; since ").append(c.ref()).append(": ").append(n[Transition.NEW.ordinal()]).append(" new, ")
                    .append(n[Transition.CARRIED_OVER.ordinal()]).append(" carried over, ")
                    .append(n[Transition.FIXED.ordinal()]).append(" fixed");
        });
        // under the ratchet, failures all carried over from the baseline do not fail the build
        boolean letThrough = carriedOverPasses && error == 0 && results.specs().stream().allMatch(spec ->
                spec.checks().stream().filter(c -> c.status() == CheckStatus.FAIL).allMatch(c ->
                        ComparisonConsole.transition(results.baseline(), spec, c)
                                .filter(t -> t == Transition.CARRIED_OVER).isPresent()));
        ConsoleLevel level = fail + error > 0 && !letThrough ? ConsoleLevel.ERROR
                : fail + waivedChecks + warnings > 0 ? ConsoleLevel.WARNING : ConsoleLevel.INFO;
        return new ConsoleLine(level, text.toString());
    }

    private static long specCount(Results results, SpecStatus status) {
        return results.specs().stream().filter(s -> s.status() == status).count();
    }

    private static long checkCount(Results results, CheckStatus status) {
        return results.specs().stream().flatMap(s -> s.checks().stream()).filter(c -> c.status() == status).count();
    }
}
