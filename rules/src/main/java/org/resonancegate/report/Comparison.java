package org.resonancegate.report;

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Optional;

/**
 * The current run compared with the specs as they were at a Git revision.
 *
 * @param ref         the revision as the user named it ({@code origin/main}, {@code HEAD~1})
 * @param commit      the commit it resolved to, in full
 * @param judgedOn    the date the baseline's waivers were judged on: the commit's own date, so a
 *                    waiver that held then and has expired since makes its failure new
 * @param notes       remarks on the baseline as a whole ("no spec directory at the baseline")
 * @param specs       one entry per spec on either side, ordered by file
 */
public record Comparison(String ref, String commit, LocalDate judgedOn, List<String> notes, List<SpecChange> specs) {

    private static final Comparator<SpecChange> BY_FILE = Comparator.comparing(SpecChange::file);

    /** Sorts {@code specs} by file (a stable sort: already sorted, as the comparer makes them, they stay as they are). */
    public Comparison {
        notes = List.copyOf(notes);
        List<SpecChange> sorted = new ArrayList<>(specs);
        sorted.sort(BY_FILE);
        specs = List.copyOf(sorted);
    }

    /** The criterion change for a spec file and criterion id, if the comparison judged it. */
    public Optional<CriterionChange> criterion(String currentFile, String criterionId) {
        for (SpecChange s : current(currentFile)) {
            for (CriterionChange c : s.criteria()) {
                if (c.criterion().equals(criterionId) && c.currentStatus().isPresent()) {
                    return Optional.of(c);
                }
            }
        }
        return Optional.empty();
    }

    /**
     * The entries whose current file is {@code currentFile}, in order (one, in practice). Found by
     * a binary search on the file order: every report asks this for every criterion of every
     * spec, and a scan of the whole list each time made a large run with a baseline quadratic.
     */
    public List<SpecChange> current(String currentFile) {
        // an entry's file() is its current file where it has one, so all matches share file() = currentFile
        int lo = 0;
        int hi = specs.size();
        while (lo < hi) {
            int mid = (lo + hi) >>> 1;
            if (specs.get(mid).file().compareTo(currentFile) < 0) {
                lo = mid + 1;
            } else {
                hi = mid;
            }
        }
        List<SpecChange> out = new ArrayList<>(1);
        for (int i = lo; i < specs.size() && specs.get(i).file().equals(currentFile); i++) {
            if (specs.get(i).currentFile().filter(currentFile::equals).isPresent()) {
                out.add(specs.get(i));
            }
        }
        return out;
    }
}
