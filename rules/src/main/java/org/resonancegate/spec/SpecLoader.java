package org.resonancegate.spec;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;

/**
 * Reads spec files into {@link LoadedSpec}s: one per spec file, sorted by project-relative path.
 * Bad input of any kind, I/O errors included, becomes diagnostics; one broken file never stops
 * the others. Files whose {@code format} is the profile format are profiles, not specs, and are
 * left out of the result.
 */
public final class SpecLoader {

    /** One file's outcome before the cross-file check on ids. */
    private record Read(String file, Optional<String> id, Optional<SourceLocation> idLocation, Optional<Spec> spec,
                        List<Diagnostic> diagnostics) {
    }

    private SpecLoader() {
    }

    /**
     * @param projectBase the project's base directory: locations are relative to it, profiles stay inside it
     * @param files       candidate spec files, absolute or relative to {@code projectBase}
     */
    public static List<LoadedSpec> load(Path projectBase, List<Path> files) {
        return load(projectBase, files, SpecFiles.disk());
    }

    /**
     * As {@link #load(Path, List)}, with the contents taken from {@code contents} (a Git commit,
     * say) instead of the disk; names, diagnostics and profile resolution are the same.
     */
    public static List<LoadedSpec> load(Path projectBase, List<Path> files, SpecFiles contents) {
        ProjectPaths paths = new ProjectPaths(projectBase, contents);
        ProfileResolver resolver = new ProfileResolver(paths);
        Set<Path> unique = new LinkedHashSet<>();
        for (Path f : files) {
            unique.add(paths.absolute(f));
        }
        // Each file is read on its own (profiles are shared through the resolver's concurrent
        // cache); the list keeps the input order whichever thread finishes first.
        // a list splits evenly between threads; a set's iterator hands out ever larger batches,
        // which can leave one thread reading the last few thousand files alone
        List<Path> ordered = new ArrayList<>(unique);
        List<Read> reads = (contents.concurrent() ? ordered.parallelStream() : ordered.stream())
                .map(file -> readOne(file, paths, resolver)).flatMap(Optional::stream).toList();
        List<LoadedSpec> loaded = markDuplicateIds(reads);
        loaded.sort(Comparator.comparing(LoadedSpec::file));
        return List.copyOf(loaded);
    }

    /** Empty when the file is a profile. */
    private static Optional<Read> readOne(Path file, ProjectPaths paths, ProfileResolver resolver) {
        String name = paths.display(file);
        Problems problems = new Problems();
        try {
            Optional<String> leaves = paths.linkLeavingTheProject(file);
            if (leaves.isPresent()) {
                problems.add(new SourceLocation(name, 1, 1), "this spec file is a symbolic link to " + leaves.get()
                        + ", outside the project; the engine reads only files inside the project, so copy the spec"
                        + " into the project instead of linking to it");
                return Optional.of(new Read(name, Optional.empty(), Optional.empty(), Optional.empty(), problems.all()));
            }
            JsonTreeReader.Result json = JsonTreeReader.read(paths.files(), file, name);
            Optional<JsonNode> root = json.root();
            if (root.isPresent() && isProfile(root.get())) {
                return Optional.empty();
            }
            problems.addAll(json.diagnostics());
            if (root.isEmpty()) {
                return Optional.of(new Read(name, Optional.empty(), Optional.empty(), Optional.empty(), problems.all()));
            }
            if (!(root.get() instanceof JsonNode.JsonObject object)) {
                problems.add(root.get().location(), "a spec file holds one JSON object, such as {\"format\": \""
                        + SpecReader.SPEC_FORMAT + "\", \"id\": \"CHW-P-02\", ...}; found " + root.get().typeName());
                return Optional.of(new Read(name, Optional.empty(), Optional.empty(), Optional.empty(), problems.all()));
            }
            SpecReader.Outcome outcome = SpecReader.read(object, name, file, resolver, problems);
            return Optional.of(new Read(name, outcome.id(), outcome.idLocation(),
                    problems.isEmpty() ? outcome.spec() : Optional.empty(), problems.all()));
        } catch (RuntimeException e) {
            // A reader bug must not take the whole build's other specs down with it; it is still an error.
            problems.add(new SourceLocation(name, 1, 1), "internal error while reading this file ("
                    + e.getClass().getSimpleName() + ": " + e.getMessage() + "); please report it");
            return Optional.of(new Read(name, Optional.empty(), Optional.empty(), Optional.empty(), problems.all()));
        }
    }

    private static boolean isProfile(JsonNode root) {
        return root instanceof JsonNode.JsonObject o
                && o.get("format").filter(f -> f instanceof JsonNode.JsonString s
                && s.value().equals(SpecReader.PROFILE_FORMAT)).isPresent();
    }

    /** Ids are unique in the spec folder: each file sharing an id gets a diagnostic naming the others. */
    private static List<LoadedSpec> markDuplicateIds(List<Read> unsorted) {
        List<Read> reads = new ArrayList<>(unsorted);
        reads.sort(Comparator.comparing(Read::file)); // "listed under the first spec" must mean the same on every run
        // A fault in a shared profile is listed in full under the first spec that uses it; the
        // others point there, so one typo in a profile is not repeated for every spec.
        Map<Diagnostic, String> listedUnder = new HashMap<>();
        Map<String, List<Read>> byId = new LinkedHashMap<>();
        for (Read r : reads) {
            r.id().ifPresent(id -> byId.computeIfAbsent(id, k -> new ArrayList<>()).add(r));
        }
        List<LoadedSpec> out = new ArrayList<>();
        for (Read r : reads) {
            boolean shared = r.id().isPresent() && byId.get(r.id().get()).size() > 1;
            if (!shared && r.diagnostics().isEmpty() && r.spec().isPresent()) {
                out.add(new LoadedSpec(r.file(), r.id(), r.spec(), List.of())); // the usual case, nothing to sort
                continue;
            }
            List<Diagnostic> diagnostics = new ArrayList<>(r.diagnostics());
            if (shared) {
                List<String> others = byId.get(r.id().get()).stream()
                        .filter(o -> o != r).map(Read::file).sorted().toList();
                diagnostics.add(new Diagnostic(r.idLocation().orElse(new SourceLocation(r.file(), 1, 1)),
                        "id \"" + r.id().get() + "\" is also used by " + String.join(", ", others)
                                + "; each item needs its own id in the spec folder"));
            }
            if (diagnostics.isEmpty() && r.spec().isEmpty()) {
                diagnostics.add(new Diagnostic(new SourceLocation(r.file(), 1, 1),
                        "internal error: the file gave neither a spec nor a diagnostic; please report it"));
            }
            diagnostics = pointToEarlierListing(r, diagnostics, listedUnder);
            // The file's own problems first, then its profiles', each in reading order by position.
            List<Diagnostic> distinct = new LinkedHashSet<>(diagnostics).stream()
                    .sorted(Comparator.comparing((Diagnostic d) -> !d.location().file().equals(r.file()))
                            .thenComparing(d -> d.location().file())
                            .thenComparingInt(d -> d.location().line())
                            .thenComparingInt(d -> d.location().column()))
                    .toList();
            out.add(new LoadedSpec(r.file(), r.id(), distinct.isEmpty() ? r.spec() : Optional.empty(), distinct));
        }
        return out;
    }

    /**
     * {@code diagnostics} with those in profile files already listed under an earlier spec
     * replaced by one line per profile file, at the top of this spec, naming where they are listed.
     */
    private static List<Diagnostic> pointToEarlierListing(Read r, List<Diagnostic> diagnostics,
                                                          Map<Diagnostic, String> listedUnder) {
        List<Diagnostic> kept = new ArrayList<>();
        Map<String, List<String>> elsewhere = new LinkedHashMap<>(); // profile file -> specs listing its faults
        Map<String, Integer> counts = new LinkedHashMap<>();
        for (Diagnostic d : diagnostics) {
            String where = d.location().file();
            if (where.equals(r.file())) {
                kept.add(d);
                continue;
            }
            String first = listedUnder.putIfAbsent(d, r.file());
            if (first == null) {
                kept.add(d);
            } else {
                List<String> under = elsewhere.computeIfAbsent(where, k -> new ArrayList<>());
                if (!under.contains(first)) {
                    under.add(first);
                }
                counts.merge(where, 1, Integer::sum);
            }
        }
        for (Map.Entry<String, List<String>> e : elsewhere.entrySet()) {
            int n = counts.get(e.getKey());
            kept.add(new Diagnostic(new SourceLocation(r.file(), 1, 1), "this spec uses " + e.getKey() + ", which has "
                    + n + (n == 1 ? " error" : " errors") + ", listed under " + String.join(", ", e.getValue())
                    + "; fix the profile and this spec is read again"));
        }
        return kept;
    }
}
