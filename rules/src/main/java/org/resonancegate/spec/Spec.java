package org.resonancegate.spec;

import java.util.List;
import java.util.Optional;

/**
 * A spec that read without a single diagnostic, ready to evaluate. {@code criteria} is the set in
 * force: the spec's own merged over its profiles' (a spec criterion replaces a profile's of the
 * same id), in a stable order: the spec's own in listing order, then the profiles' in theirs.
 *
 * @param file project-relative path with {@code /}
 */
public record Spec(String file, String id, Optional<String> title, Optional<String> revision, Model model,
                   Operation operation, List<Excitation> excitations, List<Criterion> criteria,
                   Tolerances tolerances, List<Waiver> waivers) {

    public Spec {
        excitations = List.copyOf(excitations);
        criteria = List.copyOf(criteria);
        waivers = List.copyOf(waivers);
    }
}
