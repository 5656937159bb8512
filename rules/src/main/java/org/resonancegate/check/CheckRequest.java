package org.resonancegate.check;

import java.nio.file.Path;
import java.time.Clock;
import java.util.List;

/**
 * What a front end asks the engine to judge.
 *
 * @param projectBase the project's base directory: paths in reports are relative to it, and no
 *                    profile may lie outside it
 * @param specFiles   the candidate spec files (profiles among them are recognised and skipped)
 * @param clock       the build's clock; waivers are judged against its local date
 * @param curves      whether to work out the response curves the HTML report plots (several
 *                    times the cost of judging); without them {@code curves} in the results is empty
 */
public record CheckRequest(Path projectBase, List<Path> specFiles, Clock clock, boolean curves) {

    public CheckRequest {
        specFiles = List.copyOf(specFiles);
    }

    /** A request with the response curves, for a run that writes every report. */
    public CheckRequest(Path projectBase, List<Path> specFiles, Clock clock) {
        this(projectBase, specFiles, clock, true);
    }
}
