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
 */
public record CheckRequest(Path projectBase, List<Path> specFiles, Clock clock) {

    public CheckRequest {
        specFiles = List.copyOf(specFiles);
    }
}
