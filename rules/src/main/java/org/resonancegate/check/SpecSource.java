package org.resonancegate.check;

import java.nio.file.Path;
import java.util.List;
import org.resonancegate.spec.LoadedSpec;

/** Reads candidate spec files into loaded specs (the spec reader, or a stand-in in tests). */
@FunctionalInterface
public interface SpecSource {

    List<LoadedSpec> load(Path projectBase, List<Path> files);
}
