package org.resonancegate.spec;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;

import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestFactory;

import tools.jackson.databind.JsonNode;

/**
 * The schema accepts every spec and profile the reader accepts: the sample plant, its proposed
 * changes, the plugin's end-to-end projects and the tests' own valid spec.
 */
class SchemaAgreementTest {

    /** Surefire runs in rules/; the sample and the plugin's projects sit beside it. */
    private static final List<Path> FOLDERS = List.of(Path.of("../sample-project/src"), Path.of("../plugin/src/it"));

    private static List<Path> jsonFiles() throws IOException {
        List<Path> out = new ArrayList<>();
        for (Path folder : FOLDERS) {
            try (Stream<Path> walk = Files.walk(folder)) {
                walk.filter(p -> p.toString().endsWith(".json") && p.toString().contains("vibration")
                                || p.toString().endsWith(".json") && p.toString().contains("proposed"))
                        .sorted().forEach(out::add);
            }
        }
        return out;
    }

    @TestFactory
    Stream<DynamicTest> everyFileTheReaderAcceptsTheSchemaAcceptsToo() throws IOException {
        SchemaCheck specs = SchemaCheck.spec();
        SchemaCheck profiles = SchemaCheck.profile();
        List<Path> files = jsonFiles();
        assertTrue(files.size() >= 10, () -> "found only " + files);
        Path base = Path.of("..").toAbsolutePath().normalize();
        return files.stream().map(f -> DynamicTest.dynamicTest(f.toString(), () -> {
            byte[] bytes = Files.readAllBytes(f);
            boolean profile = new String(bytes, StandardCharsets.UTF_8).contains("\"resonance-gate-profile/1\"");
            if (profile) {
                assertEquals(List.of(), profiles.problems(bytes), f::toString);
                return;
            }
            List<LoadedSpec> loaded = SpecLoader.load(base, List.of(f.toAbsolutePath()));
            if (loaded.get(0).spec().isPresent()) {
                assertEquals(List.of(), specs.problems(bytes), f::toString);
            }
        }));
    }

    @Test
    void theSampleSpecsAllReadSoTheWalkAboveIsNotEmpty() throws IOException {
        Path base = Path.of("..").toAbsolutePath().normalize();
        List<Path> sample = jsonFiles().stream().filter(p -> p.toString().contains("sample-project")
                && !p.toString().contains("profiles")).toList();
        assertTrue(sample.size() >= 8, sample::toString);
        // one at a time: a proposed change reuses the id of the spec it replaces
        for (Path f : sample) {
            LoadedSpec l = SpecLoader.load(base, List.of(f.toAbsolutePath())).get(0);
            assertTrue(l.spec().isPresent(), () -> l.file() + ": " + TestProject.describe(l.diagnostics()));
        }
    }

    @Test
    void theTestsValidSpecIsValidUnderTheSchema() {
        assertEquals(List.of(), SchemaCheck.spec().problems(TestProject.VALID.getBytes(StandardCharsets.UTF_8)));
    }

    @Test
    void theProfileSchemaCarriesTheSpecSchemasCriteriaUnchanged() {
        JsonNode spec = SchemaCheck.tree(SchemaCheck.SPEC).get("$defs");
        JsonNode profile = SchemaCheck.tree(SchemaCheck.PROFILE).get("$defs");
        List<String> names = new ArrayList<>();
        profile.propertyNames().forEach(names::add);
        assertTrue(names.contains("criterion"), names::toString);
        for (String name : names) {
            assertEquals(spec.get(name), profile.get(name), () -> "$defs/" + name + " differs between the two schemas");
        }
    }
}
