package org.resonancegate.maven;

import org.apache.maven.plugins.annotations.LifecyclePhase;
import org.apache.maven.plugins.annotations.Mojo;
import org.apache.maven.plugins.annotations.ResolutionScope;

/**
 * Writes the same reports as {@code check} and never fails the build on what they say: failing
 * criteria, unreadable specs and an empty spec directory are warnings. For overviews such as a
 * nightly build. Broken configuration (an unknown format, a spec directory that is a file) and a
 * report that cannot be written still stop the build, since then there is no report to read.
 */
@Mojo(name = "report", defaultPhase = LifecyclePhase.VERIFY, threadSafe = true,
        requiresDependencyResolution = ResolutionScope.NONE)
public class ReportMojo extends AbstractGateMojo {

    @Override
    String goal() {
        return "report";
    }

    @Override
    void conclude(Verdict verdict, String report) {
        verdict.nothingChecked().ifPresent(nothing -> getLog().warn("resonance-gate: " + nothing
                + "; nothing was checked (the report goal does not fail the build)"));
        verdict.violations().ifPresent(violations -> getLog().warn("resonance-gate: " + violations
                + "; see " + report + " (the report goal does not fail the build)"));
    }
}
