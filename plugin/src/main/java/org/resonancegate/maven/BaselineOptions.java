package org.resonancegate.maven;

import java.nio.file.Path;
import java.time.Clock;
import java.util.List;
import java.util.Optional;
import org.resonancegate.baseline.BaselineException;
import org.resonancegate.baseline.BaselineRequest;
import org.resonancegate.baseline.BaselineRun;
import org.resonancegate.baseline.FailOn;
import org.resonancegate.baseline.Ratchet;
import org.resonancegate.check.CheckRequest;
import org.resonancegate.report.Results;

/**
 * The goal's {@code baseline} and {@code failOn} parameters, checked together: which Git revision
 * to compare with, and whether old failures still fail the build. Kept apart from the mojo so any
 * goal can take the same two parameters.
 */
final class BaselineOptions {

    private final Optional<String> ref;
    private final FailOn failOn;

    private BaselineOptions(Optional<String> ref, FailOn failOn) {
        this.ref = ref;
        this.failOn = failOn;
    }

    /** @throws GateException for a failOn that is not known, or new-violation without a baseline */
    static BaselineOptions of(String baseline, String failOn) throws GateException {
        Optional<String> ref = Optional.ofNullable(baseline).map(String::trim).filter(s -> !s.isEmpty());
        String text = failOn == null || failOn.isBlank() ? FailOn.VIOLATION.key() : failOn;
        FailOn mode = FailOn.parse(text).orElseThrow(() -> new GateException("resonance-gate: failOn is \""
                + text + "\"; use violation (the default: every failing criterion fails the build) or new-violation"
                + " (only criteria that broke since the baseline do)"));
        if (mode == FailOn.NEW_VIOLATION && ref.isEmpty()) {
            throw new GateException("resonance-gate: failOn=new-violation fails only on criteria that broke"
                    + " since a baseline, but no baseline is set; add -Dresonance-gate.baseline=origin/main (or a"
                    + " tag, a commit, HEAD), or drop failOn to fail on every violation");
        }
        return new BaselineOptions(ref, mode);
    }

    /**
     * The current results compared with the baseline, if one is set; the baseline's spec files are
     * those the same directory and patterns select at that revision.
     */
    Results compare(Path base, Clock clock, Results results, Path specDirectory, SpecFileScanner selection)
            throws GateException {
        if (ref.isEmpty()) {
            return results;
        }
        try {
            return BaselineRun.compare(new CheckRequest(base, List.of(), clock), results,
                    new BaselineRequest(ref.get(), specDirectory, selection::selected));
        } catch (BaselineException e) {
            throw new GateException("resonance-gate: " + e.getMessage(), e);
        }
    }

    /** Whether failures carried over from the baseline let the build pass (then they print as warnings). */
    boolean carriedOverPasses() {
        return failOn == FailOn.NEW_VIOLATION;
    }

    Ratchet.Verdict verdict(Results results) {
        return Ratchet.judge(results, failOn);
    }
}
