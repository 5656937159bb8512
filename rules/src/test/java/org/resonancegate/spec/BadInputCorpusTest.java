package org.resonancegate.spec;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.io.IOException;
import java.net.URISyntaxException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestFactory;
import org.junit.jupiter.api.io.TempDir;

import tools.jackson.databind.JsonNode;

/**
 * Walks the bad-input corpus (rules/src/test/resources/bad-input, indexed by expected.json):
 * each case must give a diagnostic at its line and column holding the words a user needs, and,
 * unless the index says "reader only", the JSON Schema must refuse the file as well. A few
 * cases are generated here at run time because git should not hold them (10 MB of whitespace,
 * deep nesting) or cannot hold them portably (symbolic links).
 */
class BadInputCorpusTest {

    private static final String CORPUS = "/bad-input";

    @TempDir
    static Path temp;

    static Path project;
    static Path corpus;
    static SchemaCheck schema;

    @BeforeAll
    static void copyCorpusIntoAProject() throws IOException, URISyntaxException {
        project = Files.createDirectories(temp.resolve("project"));
        corpus = Files.createDirectories(project.resolve("bad-input"));
        Path source = Paths.get(BadInputCorpusTest.class.getResource(CORPUS).toURI());
        try (Stream<Path> files = Files.walk(source)) {
            for (Path f : files.filter(Files::isRegularFile).toList()) {
                Path to = corpus.resolve(source.relativize(f).toString());
                Files.createDirectories(to.getParent());
                Files.copy(f, to);
            }
        }
        // A valid profile outside the project: reaching it by path or through a link is the error.
        Path outside = temp.resolve("outside.json");
        Files.writeString(outside, "{\"format\": \"resonance-gate-profile/1\", \"criteria\": []}\n");
        Files.createSymbolicLink(corpus.resolve("profiles/link-out.json"), outside);
        schema = SchemaCheck.spec();
    }

    @TestFactory
    Stream<DynamicTest> everyCaseGivesItsDiagnosticAndTheSchemaAgrees() {
        JsonNode index = SchemaCheck.tree(CORPUS + "/expected.json");
        List<DynamicTest> tests = new ArrayList<>();
        for (JsonNode c : index.get("cases")) {
            if (c.has("generated")) {
                continue; // written and checked by the test method the entry names
            }
            String file = c.get("file").asString();
            tests.add(DynamicTest.dynamicTest(file + ": " + c.get("about").asString(), () -> check(c)));
        }
        assertTrue(tests.size() >= 30, "the corpus holds " + tests.size() + " cases");
        return tests.stream();
    }

    private static void check(JsonNode c) throws IOException {
        String file = c.get("file").asString();
        Path path = corpus.resolve(file);
        LoadedSpec loaded = load(path);
        String name = "bad-input/" + file;
        List<String> words = new ArrayList<>();
        c.get("words").forEach(w -> words.add(w.asString()));
        JsonNode key = c.get("key");
        if (key != null && !key.isNull()) {
            words.add("\"" + key.asString() + "\"");
        }
        assertTrue(loaded.spec().isEmpty(), () -> file + " was accepted");
        Diagnostic match = null;
        for (Diagnostic d : loaded.diagnostics()) {
            boolean at = !c.has("line") || (d.location().line() == c.get("line").asInt()
                    && d.location().column() == c.get("column").asInt());
            if (at && words.stream().allMatch(d.message()::contains)) {
                match = d;
            }
            assertFalse(d.message().contains("internal error"), d::toString);
        }
        if (match == null) {
            fail(file + ": no diagnostic" + (c.has("line") ? " at " + c.get("line") + ":" + c.get("column") : "")
                    + " holding " + words + "; got:\n" + TestProject.describe(loaded.diagnostics()));
        }
        if (!c.has("line")) {
            // Cases that point into another file (a profile) still name a real place in it.
            assertTrue(match.location().line() >= 1 && match.location().column() >= 1, match::toString);
        } else {
            assertEquals(name, match.location().file());
        }
        String verdict = c.get("schema").asString();
        List<String> schemaProblems = schema.problems(Files.readAllBytes(path));
        if (verdict.equals("refuses")) {
            assertFalse(schemaProblems.isEmpty(), () -> file + ": the schema accepts what the reader refuses");
        } else {
            assertTrue(verdict.startsWith("reader only: ") && verdict.length() > 30, () -> file + ": " + verdict);
        }
    }

    private static LoadedSpec load(Path path) {
        List<LoadedSpec> all = SpecLoader.load(project, List.of(path));
        assertEquals(1, all.size());
        return all.get(0);
    }

    // --- generated at run time ---------------------------------------------------------------

    @Test
    void tenMegabytesOfWhitespaceIsRefusedBeforeParsing() throws IOException {
        Path file = corpus.resolve("generated-whitespace.json");
        byte[] pad = new byte[10 * 1024 * 1024];
        java.util.Arrays.fill(pad, (byte) ' ');
        Files.write(file, pad);
        Files.write(file, TestProject.VALID.getBytes(StandardCharsets.UTF_8), java.nio.file.StandardOpenOption.APPEND);
        LoadedSpec loaded = load(file);
        TestProject.assertOnlyDiagnostic(loaded, 1, 1, "over the limit of 4 MiB", "split it");
        // reader only: the schema sees the parsed object, not the size of the file it came from
    }

    @Test
    void tenThousandDeepNestingIsRefusedByBoth() throws IOException {
        String deep = "[".repeat(10_000) + "]".repeat(10_000);
        String text = TestProject.VALID.replace("\"id\": \"CHW-P-02\",", "\"id\": \"CHW-P-02\",\n  \"title\": " + deep + ",");
        Path file = corpus.resolve("generated-deep.json");
        Files.writeString(file, text);
        LoadedSpec loaded = load(file);
        // level 1 is the top object, level 2 the title's list: the 32nd list opens at column 12 + 31
        SourceLocation at = TestProject.at("x", text, deep);
        TestProject.assertOnlyDiagnostic(loaded, at.line(), at.column() + 31, "nesting deeper than 32", "flatten");
        assertFalse(schema.problems(text.getBytes(StandardCharsets.UTF_8)).isEmpty());
    }

    @Test
    void aStringOverTenThousandCharactersIsRefusedByBoth() throws IOException {
        String text = TestProject.VALID.replace("\"id\": \"CHW-P-02\",",
                "\"id\": \"CHW-P-02\",\n  \"title\": \"" + "é".repeat(10_001) + "\",");
        Path file = corpus.resolve("generated-long-string.json");
        Files.writeString(file, text);
        SourceLocation at = TestProject.at("x", text, "\"é");
        TestProject.assertOnlyDiagnostic(load(file), at.line(), at.column(), "10001 characters", "over the limit of 10000");
        assertFalse(schema.problems(text.getBytes(StandardCharsets.UTF_8)).isEmpty());
    }

    @Test
    void moreThanAThousandExcitationsAreRefusedByBoth() throws IOException {
        String one = "{\"name\": \"impeller\", \"kind\": \"unbalance\", \"unbalance\": \"120 g·mm\"}";
        String many = String.join(",\n    ", java.util.Collections.nCopies(1001, one));
        String text = TestProject.VALID.replace(one, many);
        Path file = corpus.resolve("generated-many.json");
        Files.writeString(file, text);
        SourceLocation at = TestProject.at("x", text, "[{\"name\": \"impeller\"");
        TestProject.assertDiagnostic(load(file), at.line(), at.column(), "1001 elements", "over the limit of 1000");
        assertFalse(schema.problems(text.getBytes(StandardCharsets.UTF_8)).isEmpty());
    }

    @Test
    void aSpecFileThatIsALinkLeavingTheProjectIsRefused() throws IOException {
        Path target = temp.resolve("elsewhere.json");
        Files.writeString(target, TestProject.VALID);
        Path link = corpus.resolve("generated-link.json");
        Files.createSymbolicLink(link, target);
        // reader only: where a link leads is a property of the file system
        TestProject.assertOnlyDiagnostic(load(link), 1, 1, "outside the project", "symbolic link");
    }

    @Test
    void aByteOrderMarkIsAcceptedByBoth() throws IOException {
        byte[] body = TestProject.VALID.getBytes(StandardCharsets.UTF_8);
        byte[] withBom = new byte[body.length + 3];
        withBom[0] = (byte) 0xEF;
        withBom[1] = (byte) 0xBB;
        withBom[2] = (byte) 0xBF;
        System.arraycopy(body, 0, withBom, 3, body.length);
        Path file = corpus.resolve("generated-bom.json");
        Files.write(file, withBom);
        Spec spec = TestProject.spec(load(file));
        assertEquals("CHW-P-02", spec.id());
        assertEquals(List.of(), schema.problems(withBom));
    }
}
