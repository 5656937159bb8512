package org.resonancegate.report;

import java.util.List;
import java.util.Optional;

/**
 * One spec compared with its baseline, matched by {@code id} (by file where a side has no id).
 *
 * @param baselineFile   the file at the baseline; empty for an added spec
 * @param currentFile    the file now; empty for a removed spec
 * @param inputs         the inputs of the spec file that differ (a profile's changes show in the criteria)
 * @param modes          every nominal mode paired by index, moved or not (the baseline's frequencies
 *                       are what a chart overlays)
 * @param criteria       every criterion judged on either side, current order first, then those gone
 * @param baselineErrors the baseline spec's diagnostics when it could not be read or judged there
 */
public record SpecChange(Kind kind, Optional<String> id, Optional<String> baselineFile, Optional<String> currentFile,
                         Optional<SpecStatus> baselineStatus, Optional<SpecStatus> currentStatus,
                         List<InputChange> inputs, List<ModeChange> modes, List<CriterionChange> criteria,
                         List<ErrorEntry> baselineErrors) {

    /** What happened to the spec as a whole. A renamed spec may also have changed inputs. */
    public enum Kind {
        ADDED("added"), REMOVED("removed"), RENAMED("renamed"), CHANGED("changed"), UNCHANGED("unchanged");

        private final String key;

        Kind(String key) {
            this.key = key;
        }

        public String key() {
            return key;
        }
    }

    public SpecChange {
        if (baselineFile.isEmpty() && currentFile.isEmpty()) {
            throw new IllegalArgumentException("a spec change has a file on at least one side");
        }
        inputs = List.copyOf(inputs);
        modes = List.copyOf(modes);
        criteria = List.copyOf(criteria);
        baselineErrors = List.copyOf(baselineErrors);
    }

    /** The file as it is named now, or at the baseline for a removed spec. */
    public String file() {
        return currentFile.or(() -> baselineFile).orElseThrow();
    }
}
