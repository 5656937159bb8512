/**
 * Reading and validating spec files into immutable records.
 *
 * <p>The one entry point is {@link org.resonancegate.spec.SpecLoader#load}: it reads every file
 * (with Jackson's streaming parser into a small tree that keeps line and column), validates it
 * against format 1 ({@code spec-format.md}), resolves its profiles, and returns one
 * {@link org.resonancegate.spec.LoadedSpec} per spec file: a {@link org.resonancegate.spec.Spec}
 * in SI, or the diagnostics that say what to fix and where. Everything else in the package is
 * package-private: the tree, the readers of each part, and the diagnostic collector.
 */
package org.resonancegate.spec;
