package org.resonancegate.spec;

/** The three ways a single-mass spec may state its spring. */
public sealed interface Stiffness {

    /** The value as written (its location points at the key's value). */
    Quantity written();

    /** {@code "stiffness": "2.4 MN/m"}. */
    record Direct(Quantity written) implements Stiffness {
    }

    /** {@code "staticDeflection": "6 mm"}: k = m·gn/δ. */
    record FromStaticDeflection(Quantity written) implements Stiffness {
    }

    /** {@code "naturalFrequency": "6.4 Hz"}: k = m·(2πf)². */
    record FromNaturalFrequency(Quantity written) implements Stiffness {
    }
}
