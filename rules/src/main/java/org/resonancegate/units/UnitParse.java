package org.resonancegate.units;

/** The outcome of reading a {@code "<number> <unit>"} text: a value in SI, or why it was refused. */
public sealed interface UnitParse {

    /** The text read: {@code si} is the value in SI, {@code unit} the unit it was written in. */
    record Value(double si, Unit unit) implements UnitParse {
    }

    /** The text was refused; {@code message} says what was found and what would be accepted. */
    record Problem(String message) implements UnitParse {
    }
}
