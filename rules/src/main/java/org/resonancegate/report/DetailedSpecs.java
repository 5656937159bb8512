package org.resonancegate.report;

import java.util.Arrays;
import java.util.Comparator;
import java.util.HashSet;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;

/**
 * Which specs a run shows in full (a section with plots in the HTML report, response curves in
 * the results). A run of a few specs shows every one; a large one shows {@value #LIMIT}, the ones
 * a reviewer must look at first: errors, then failures, waived failures and warnings, then
 * passes, each group in file order. The rest stay in the overview and in every other report: a
 * page of ten thousand sections with plots helps nobody and would not fit a build's memory.
 */
public final class DetailedSpecs {

    /** Specs shown in full at most. */
    public static final int LIMIT = 100;

    private DetailedSpecs() {
    }

    /** The files of the specs shown in full, in the order of {@code specs}. */
    public static Set<String> files(List<SpecResult> specs) {
        if (specs.size() <= LIMIT) {
            Set<String> all = new LinkedHashSet<>();
            specs.forEach(s -> all.add(s.file()));
            return all;
        }
        // each spec's urgency worked out once, not again in every comparison of the sort
        int[] urgency = new int[specs.size()];
        Integer[] order = new Integer[specs.size()];
        for (int i = 0; i < urgency.length; i++) {
            urgency[i] = urgency(specs.get(i));
            order[i] = i;
        }
        Arrays.sort(order, Comparator.<Integer>comparingInt(i -> urgency[i]).thenComparing(i -> specs.get(i).file()));
        Set<String> chosen = new HashSet<>();
        for (int i = 0; i < LIMIT; i++) {
            chosen.add(specs.get(order[i]).file());
        }
        // in the order given (results are in file order), whatever the order of choosing
        Set<String> ordered = new LinkedHashSet<>();
        for (SpecResult spec : specs) {
            if (chosen.contains(spec.file())) {
                ordered.add(spec.file());
            }
        }
        return ordered;
    }

    private static int urgency(SpecResult spec) {
        return switch (spec.status()) {
            case ERROR -> 0;
            case FAIL -> 1;
            case WAIVED -> 2;
            case PASS -> warns(spec) ? 3 : 4;
        };
    }

    private static boolean warns(SpecResult spec) {
        for (CheckResult c : spec.checks()) {
            if (c.status() == CheckStatus.WARNING) {
                return true;
            }
        }
        return false;
    }
}
