package org.resonancegate.spec;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/** One entry of a {@code profiles} list: the path as written and where it was written. */
record ProfileRef(String path, SourceLocation location) {

    private static final String EXAMPLE = "[\"../profiles/pumps.json\"]";

    /** Reads a {@code profiles} list of relative paths. */
    static Optional<List<ProfileRef>> readList(JsonNode node, Problems problems) {
        Optional<JsonNode.JsonArray> array = Fields.array(node, "profiles", EXAMPLE, problems);
        if (array.isEmpty()) {
            return Optional.empty();
        }
        int before = problems.count();
        List<ProfileRef> refs = new ArrayList<>();
        for (JsonNode item : array.get().items()) {
            Fields.text(item, "profiles", "\"../profiles/pumps.json\" (a path relative to this file)", problems)
                    .ifPresent(p -> refs.add(new ProfileRef(p, item.location())));
        }
        return problems.count() == before ? Optional.of(refs) : Optional.empty();
    }
}
