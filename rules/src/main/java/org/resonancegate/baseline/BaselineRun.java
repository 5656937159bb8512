package org.resonancegate.baseline;

import java.io.IOException;
import java.nio.file.Path;
import java.time.Clock;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import org.resonancegate.check.CheckRequest;
import org.resonancegate.check.CheckRunner;
import org.resonancegate.report.Comparison;
import org.resonancegate.report.Results;
import org.resonancegate.spec.SpecLoader;

/**
 * Judges the specs as they were at a Git revision with the same engine as the current run, and
 * attaches the comparison to the current results. The baseline's waivers are judged on the
 * commit's own date: a waiver that held then and has expired since makes its failure new, so a
 * ratchet cannot outlive the waivers it started from.
 */
public final class BaselineRun {

    private BaselineRun() {
    }

    /**
     * @param current        the request the current results came from (project base, clock)
     * @param currentResults the current run
     * @return {@code currentResults} with the comparison attached
     * @throws BaselineException when the revision cannot be read at all (the message says what to do)
     */
    public static Results compare(CheckRequest current, Results currentResults, BaselineRequest baseline)
            throws BaselineException {
        Path base = current.projectBase().toAbsolutePath().normalize();
        Path specDirectory = base.resolve(baseline.specDirectory()).normalize();
        try (GitSnapshot snapshot = GitSnapshot.open(base, baseline.ref())) {
            List<String> notes = new ArrayList<>();
            List<Path> files;
            try {
                files = snapshot.files(specDirectory, baseline.selected());
            } catch (IOException | RuntimeException e) {
                throw new BaselineException("cannot list the spec files of " + baseline.ref() + " ("
                        + snapshot.commitId() + "): " + e.getMessage(), e);
            }
            String where = display(base, specDirectory);
            if (!snapshot.isDirectory(specDirectory)) {
                notes.add("no spec directory " + where + " at " + baseline.ref() + ": every spec counts as added");
            } else if (files.isEmpty()) {
                notes.add("no file in " + where + " at " + baseline.ref() + " matches the includes: every spec"
                        + " counts as added");
            }
            Clock then = Clock.fixed(snapshot.commitTime(), current.clock().getZone());
            Results old = CheckRunner.run(new CheckRequest(base, files, then),
                    (b, f) -> SpecLoader.load(b, f, snapshot));
            Comparison comparison = new Comparison(baseline.ref(), snapshot.commitId(), LocalDate.now(then), notes,
                    SpecComparer.compare(base, old, currentResults, snapshot));
            return currentResults.withBaseline(comparison);
        }
    }

    private static String display(Path base, Path path) {
        Path shown = path.startsWith(base) ? base.relativize(path) : path;
        String text = shown.toString().replace(shown.getFileSystem().getSeparator(), "/");
        return text.isEmpty() ? "." : text;
    }
}
