package org.resonancegate.spec;

/** The mechanical model of a spec. Further kinds (lumped chains, rigid bodies) join this family. */
public sealed interface Model permits Model.Single {

    SourceLocation location();

    /**
     * One mass on one resultant vertical spring.
     *
     * @param mass      the suspended mass
     * @param stiffness the spring, in one of its three written forms
     * @param damping   the damping, in one of its five written forms
     */
    record Single(Quantity mass, Stiffness stiffness, Damping damping, SourceLocation location)
            implements Model {
    }
}
