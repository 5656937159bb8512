package org.resonancegate.report;

import java.time.LocalDate;
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

    public Comparison {
        notes = List.copyOf(notes);
        specs = List.copyOf(specs);
    }

    /** The criterion change for a spec file and criterion id, if the comparison judged it. */
    public Optional<CriterionChange> criterion(String currentFile, String criterionId) {
        return specs.stream()
                .filter(s -> s.currentFile().filter(currentFile::equals).isPresent())
                .flatMap(s -> s.criteria().stream())
                .filter(c -> c.criterion().equals(criterionId) && c.currentStatus().isPresent())
                .findFirst();
    }
}
