package org.resonancegate.report;

import java.util.List;

/**
 * One amplitude criterion's quantity against running speed, computed by the engine during the
 * check on the tolerance case that governs the criterion.
 *
 * @param criterion     the criterion's id
 * @param basis         the tolerance case the curve is computed on ("nominal" without tolerances)
 * @param quantity      what is drawn ("velocity rms", "transmissibility")
 * @param unit          SI unit of the values and the limit
 * @param limit         the bound in the same quantity (a minimum isolation efficiency η is drawn as T ≤ 1 − η)
 * @param displayUnit   the unit the limit was written in ("mm/s"), or the SI unit
 * @param displayFactor SI per display unit
 * @param points        ascending in speed
 */
public record ResponseCurve(String criterion, String basis, String quantity, String unit, double limit,
                            String displayUnit, double displayFactor, List<Point> points) {

    public ResponseCurve {
        points = List.copyOf(points);
    }

    /** Running speed (rpm) and the value there (SI). */
    public record Point(double speedRpm, double value) {
    }
}
