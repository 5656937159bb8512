package org.resonancegate.maven;

import org.apache.maven.plugin.MojoFailureException;
import org.apache.maven.plugins.annotations.LifecyclePhase;
import org.apache.maven.plugins.annotations.Mojo;
import org.apache.maven.plugins.annotations.Parameter;
import org.apache.maven.plugins.annotations.ResolutionScope;

/**
 * Recomputes the dynamics of every equipment spec in the project and fails the build when one
 * breaks a criterion or cannot be read. Writes the chosen reports ({@code results.json}, the
 * record the others are drawn from, a Markdown summary, SARIF, JUnit XML) and prints one
 * {@code path:line:col:} line per finding.
 */
@Mojo(name = "check", defaultPhase = LifecyclePhase.VERIFY, threadSafe = true,
        requiresDependencyResolution = ResolutionScope.NONE)
public class CheckMojo extends AbstractGateMojo {

    /** Fail the build when a spec fails or has errors; {@code false} reports the same findings and passes. */
    @Parameter(property = "resonance-gate.failOnViolation", defaultValue = "true")
    private boolean failOnViolation;

    /**
     * Fail when there is no spec to check (no spec directory, or no file matching the patterns):
     * a mistyped path must not switch the gate off unnoticed. {@code false} for a module that
     * declares the plugin but has no specs (yet): then it only warns.
     */
    @Parameter(property = "resonance-gate.requireSpecs", defaultValue = "true")
    private boolean requireSpecs;

    @Override
    String goal() {
        return "check";
    }

    @Override
    void conclude(Verdict verdict, String report) throws MojoFailureException {
        if (verdict.nothingChecked().isPresent()) {
            String nothing = verdict.nothingChecked().get();
            if (requireSpecs) {
                throw new MojoFailureException("resonance-gate: " + nothing + "; nothing was checked. Point"
                        + " resonance-gate.specDirectory (or includes) at the specs, or set"
                        + " resonance-gate.requireSpecs=false for a module that has none");
            }
            getLog().warn("resonance-gate: " + nothing + "; nothing to check (requireSpecs=false)");
        }
        if (verdict.violations().isEmpty()) {
            return;
        }
        String violations = verdict.violations().get();
        if (failOnViolation) {
            throw new MojoFailureException("resonance-gate: " + violations + "; see the lines above or " + report);
        }
        getLog().warn("resonance-gate: " + violations + "; failOnViolation=false, not failing the build");
    }
}
