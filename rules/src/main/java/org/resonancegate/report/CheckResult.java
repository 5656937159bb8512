package org.resonancegate.report;

import java.util.Optional;
import java.util.OptionalDouble;
import org.resonancegate.spec.Severity;
import org.resonancegate.spec.SourceLocation;

/**
 * One criterion judged over the speed range (and tolerance cases).
 *
 * @param value         the governing (worst) value in SI; {@code unit} says which
 * @param limit         the bound it is held against (the nearer one when there are two)
 * @param speedRpm      where the value occurs; empty where it does not depend on speed
 * @param frequencyHz   the excitation frequency where it occurs; empty where it does not apply
 * @param location      where the criterion is written (spec or profile file)
 * @param governingCase the tolerance case that governs ("nominal", "k-15% m-5%", ...), empty without tolerances
 * @param waiver        the waiver that applies (valid or expired), if any
 */
public record CheckResult(String criterion, String rule, Severity severity, CheckStatus status, double value,
                          double limit, String unit, OptionalDouble speedRpm, OptionalDouble frequencyHz,
                          String message, SourceLocation location, Optional<String> governingCase,
                          Optional<WaiverNote> waiver) {

    /** The waiver named for this criterion: its reason, expiry and whether it still held on the build date. */
    public record WaiverNote(String reason, java.time.LocalDate expires, boolean valid, SourceLocation location) {
    }
}
