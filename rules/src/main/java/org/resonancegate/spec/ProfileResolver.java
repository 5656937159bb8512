package org.resonancegate.spec;

import java.io.IOException;
import java.nio.file.InvalidPathException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;

/**
 * Resolves {@code profiles} lists into the criteria they put in force. A file's own criterion
 * replaces one of the same id from a profile it lists; the same id from two profiles listed side
 * by side is ambiguous, a diagnostic; a profile reached along two paths counts once. Profiles are
 * read once per loader and shared by every spec that lists them.
 */
final class ProfileResolver {

    /** The criteria from profiles, and whether every profile could be read (else the set is partial). */
    record Resolution(List<Criterion> criteria, boolean complete) {
    }

    /** A profile file as read: its own criteria, the profiles it lists, its own diagnostics. */
    private record ProfileFile(String file, List<Criterion> own, List<ProfileRef> refs, List<Diagnostic> diagnostics) {
    }

    /** A criterion and the real path of the file that defines it. */
    private record Sourced(Criterion criterion, Path origin) {
    }

    private final ProjectPaths paths;
    // concurrent: the specs of one run are read in parallel and share their profiles
    private final Map<Path, ProfileFile> cache = new java.util.concurrent.ConcurrentHashMap<>();

    ProfileResolver(ProjectPaths paths) {
        this.paths = paths;
    }

    /**
     * @param fromDir    the directory of the file that lists {@code refs}
     * @param overridden ids the listing file defines itself (they replace the profiles')
     */
    Resolution resolve(List<ProfileRef> refs, Path fromDir, Set<String> overridden, Problems problems) {
        boolean[] complete = {true};
        List<Sourced> merged = merge(refs, fromDir, overridden, new ArrayList<>(), new HashSet<>(), problems, complete);
        return new Resolution(merged.stream().map(Sourced::criterion).toList(), complete[0]);
    }

    private List<Sourced> merge(List<ProfileRef> refs, Path fromDir, Set<String> overridden, List<Path> chain,
                                Set<Path> reported, Problems problems, boolean[] complete) {
        Map<String, Sourced> out = new LinkedHashMap<>();
        for (ProfileRef ref : refs) {
            Optional<Path> located = locate(ref, fromDir, problems);
            if (located.isEmpty()) {
                complete[0] = false;
                continue;
            }
            Path real = located.get();
            if (chain.contains(real)) {
                List<String> names = new ArrayList<>();
                for (Path p : chain.subList(chain.indexOf(real), chain.size())) {
                    names.add(paths.display(p));
                }
                names.add(paths.display(real));
                problems.add(ref.location(), "profile cycle: " + String.join(" → ", names)
                        + "; a profile may not list itself, directly or through others");
                complete[0] = false;
                continue;
            }
            ProfileFile profile = cache.computeIfAbsent(real, this::readProfile);
            if (reported.add(real)) {
                problems.addAll(profile.diagnostics());
            }
            if (!profile.diagnostics().isEmpty()) {
                complete[0] = false;
            }
            List<Sourced> contributed = new ArrayList<>();
            Set<String> ownIds = new HashSet<>();
            for (Criterion c : profile.own()) {
                contributed.add(new Sourced(c, real));
                ownIds.add(c.id());
            }
            chain.add(real);
            contributed.addAll(merge(profile.refs(), real.getParent(), ownIds, chain, reported, problems, complete));
            chain.remove(chain.size() - 1);
            for (Sourced s : contributed) {
                String id = s.criterion().id();
                if (overridden.contains(id)) {
                    continue;
                }
                Sourced existing = out.get(id);
                if (existing == null) {
                    out.put(id, s);
                } else if (!existing.origin().equals(s.origin())) {
                    problems.add(ref.location(), "criterion \"" + id + "\" comes from two profiles listed here: "
                            + existing.criterion().location().display() + " and " + s.criterion().location().display()
                            + "; define \"" + id + "\" in this file to choose, or remove it from one profile");
                    complete[0] = false;
                }
                // The same origin reached along two paths counts once.
            }
        }
        return new ArrayList<>(out.values());
    }

    /** The real path of a profile entry, once it is known to be a file inside the project. */
    private Optional<Path> locate(ProfileRef ref, Path fromDir, Problems problems) {
        String written = ref.path();
        Path candidate;
        try {
            Path given = Path.of(written);
            if (written.isBlank() || given.isAbsolute()) {
                problems.add(ref.location(), "profile \"" + written + "\" must be a path relative to this file,"
                        + " such as \"../profiles/pumps.json\"");
                return Optional.empty();
            }
            candidate = fromDir.resolve(given).normalize();
        } catch (InvalidPathException e) {
            problems.add(ref.location(), "profile \"" + written + "\" is not a valid path: " + e.getReason());
            return Optional.empty();
        }
        if (!paths.inside(candidate)) {
            // said before looking: whether a file exists outside the project is none of its business
            problems.add(ref.location(), "profile \"" + written + "\" lies outside the project; profiles must"
                    + " stay inside the project's base directory, symbolic links resolved");
            return Optional.empty();
        }
        if (!paths.files().exists(candidate)) {
            problems.add(ref.location(), "profile \"" + written + "\" not found: no file at "
                    + paths.display(candidate) + " (paths are relative to the file that lists them)");
            return Optional.empty();
        }
        Path real;
        try {
            real = paths.files().realPath(candidate);
        } catch (IOException | RuntimeException e) {
            problems.add(ref.location(), "profile \"" + written + "\" cannot be opened: " + e.getMessage());
            return Optional.empty();
        }
        if (!paths.inside(real)) {
            problems.add(ref.location(), "profile \"" + written + "\" lies outside the project (it resolves to "
                    + real + "); profiles must stay inside the project's base directory, symbolic links resolved");
            return Optional.empty();
        }
        if (!paths.files().isRegularFile(real)) {
            problems.add(ref.location(), "profile \"" + written + "\" is not a file");
            return Optional.empty();
        }
        return Optional.of(real);
    }

    private ProfileFile readProfile(Path real) {
        String file = paths.display(real);
        Problems problems = new Problems();
        JsonTreeReader.Result json = JsonTreeReader.read(paths.files(), real, file);
        problems.addAll(json.diagnostics());
        if (json.root().isEmpty()) {
            return new ProfileFile(file, List.of(), List.of(), problems.all());
        }
        JsonNode root = json.root().get();
        if (!(root instanceof JsonNode.JsonObject object)) {
            problems.add(root.location(), "a profile file holds one JSON object, such as {\"format\": \""
                    + SpecReader.PROFILE_FORMAT + "\", \"criteria\": [...]}; found " + root.typeName());
            return new ProfileFile(file, List.of(), List.of(), problems.all());
        }
        Optional<JsonNode> formatNode = Fields.required(object, "format", "the profile",
                "\"format\": \"" + SpecReader.PROFILE_FORMAT + "\"", problems);
        Optional<String> format = formatNode.flatMap(n ->
                Fields.string(n, "format", "\"" + SpecReader.PROFILE_FORMAT + "\"", problems));
        if (format.isPresent() && !format.get().equals(SpecReader.PROFILE_FORMAT)) {
            String what = format.get().equals(SpecReader.SPEC_FORMAT)
                    ? "this file is a spec, not a profile; \"profiles\" lists only files of format \""
                    + SpecReader.PROFILE_FORMAT + "\""
                    : "unsupported profile format \"" + format.get() + "\"; this version reads \""
                    + SpecReader.PROFILE_FORMAT + "\"";
            problems.add(formatNode.get().location(), what);
            return new ProfileFile(file, List.of(), List.of(), problems.all());
        }
        Fields.checkKeys(object, "a profile", List.of("format", "title", "criteria", "profiles"), problems);
        object.get("title").ifPresent(n -> Fields.string(n, "title", "\"Pump criteria\"", problems));
        List<Criterion> own = object.get("criteria").flatMap(n -> CriterionReader.read(n, problems)).orElse(List.of());
        List<ProfileRef> refs = object.get("profiles").flatMap(n -> ProfileRef.readList(n, problems)).orElse(List.of());
        return new ProfileFile(file, own, refs, problems.all());
    }
}
