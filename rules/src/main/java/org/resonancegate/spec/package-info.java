/**
 * Reading and validating spec files into immutable records.
 *
 * <p>The one entry point is {@link org.resonancegate.spec.SpecLoader#load}: it reads every file
 * (with Jackson's streaming parser into a small tree that keeps line and column), validates it
 * against format 1 ({@code spec-format.md}), resolves its profiles, and returns one
 * {@link org.resonancegate.spec.LoadedSpec} per spec file: a {@link org.resonancegate.spec.Spec}
 * in SI, or the diagnostics that say what to fix and where. Everything else in the package is
 * package-private: the tree, the readers of each part, and the diagnostic collector.
 *
 * <p>The three model kinds are read by {@code ModelReader} ({@code single}), {@code LumpedReader}
 * and {@code RigidBodyReader} (with {@code RigidBodyChecks} for the inertia tensor and the mount
 * layout). Where an excitation acts is read against the model by {@code PlacementReader}; criteria
 * are read without the model (a profile serves many specs) and then fitted to each spec's model by
 * {@code CriterionFit}.
 */
package org.resonancegate.spec;
