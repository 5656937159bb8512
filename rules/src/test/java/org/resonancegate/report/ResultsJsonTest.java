package org.resonancegate.report;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.resonancegate.spec.Severity;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/**
 * results.json against its contract, spec-format.md "Results file" (key names, order, nulls), and
 * against JSON itself (RFC 8259): every document is read back with Jackson's general-purpose
 * tree parser, which does not share code with the hand-written generator calls.
 */
class ResultsJsonTest {

    private static final JsonMapper READER = JsonMapper.builder().build();

    @Test
    void writesTheDocumentedShapeExactly() {
        String expected = """
                {
                  "format": "resonance-gate-results/1",
                  "caution": "Caution: a screening aid on linear models. Final designs need a qualified engineer, commissioning measurements and the applicable local codes and standards.",
                  "specs": [
                    {
                      "file": "src/vibration/p1.json",
                      "id": "P-1",
                      "title": null,
                      "revision": null,
                      "status": "fail",
                      "modes": [
                        {
                          "index": 1,
                          "frequencyHz": 10.07,
                          "dampingRatio": 0.05,
                          "shares": []
                        }
                      ],
                      "checks": [
                        {
                          "criterion": "SEP",
                          "rule": "separation",
                          "status": "fail",
                          "value": 0.1,
                          "limit": 0.2,
                          "unit": "1",
                          "speedRpm": 1480,
                          "frequencyHz": 24.67,
                          "message": "mode 1 too close to 1x",
                          "severity": "error",
                          "file": "src/vibration/p1.json",
                          "line": 9,
                          "column": 5,
                          "governingCase": null,
                          "waiver": null
                        }
                      ],
                      "errors": [],
                      "inputs": [],
                      "interference": null,
                      "curves": []
                    },
                    {
                      "file": "src/vibration/p2.json",
                      "id": null,
                      "title": null,
                      "revision": null,
                      "status": "error",
                      "modes": [],
                      "checks": [],
                      "errors": [
                        {
                          "file": "src/vibration/p2.json",
                          "line": 3,
                          "column": 7,
                          "message": "unknown key \\"mas\\"; did you mean \\"mass\\"?"
                        }
                      ],
                      "inputs": [],
                      "interference": null,
                      "curves": []
                    }
                  ]
                }
                """;
        assertEquals(expected, ResultsJson.toJson(Fixtures.small()));
    }

    @Test
    void sameResultsGiveTheSameBytes() {
        byte[] first = ResultsJson.toBytes(Fixtures.small());
        byte[] second = ResultsJson.toBytes(Fixtures.small());
        assertArrayEquals(first, second);
        String text = new String(first, StandardCharsets.UTF_8);
        assertFalse(text.contains("\r"), "line ends are \\n on every platform");
        assertTrue(text.endsWith("}\n"), "one trailing newline");
        assertFalse(text.endsWith("\n\n"));
    }

    @Test
    void emptyResultsAreAValidDocument() {
        assertEquals("{\n  \"format\": \"resonance-gate-results/1\",\n  \"caution\": \"" + ConsoleReport.CAUTION
                + "\",\n  \"specs\": []\n}\n",
                ResultsJson.toJson(new Results(List.of())));
    }

    @Test
    void emptyOptionalsAndNonFiniteNumbersAreNull() {
        CheckResult speedFree = new CheckResult("SD", "static-deflection", Severity.WARNING, CheckStatus.WARNING,
                Double.POSITIVE_INFINITY, 0.005, "m", OptionalDouble.empty(), OptionalDouble.empty(), "too soft",
                Fixtures.at("src/vibration/p1.json", 12, 9), Optional.of("k-15% m+5%"), Optional.empty());
        SpecResult spec = new SpecResult("src/vibration/p1.json", Optional.of("P-1"), SpecStatus.PASS,
                List.of(new ModeResult(1, 0.0, OptionalDouble.empty()), new ModeResult(2, Double.NaN,
                        OptionalDouble.of(0.02))),
                List.of(speedFree), List.of());
        JsonNode root = READER.readTree(ResultsJson.toJson(new Results(List.of(spec))));
        JsonNode s = root.get("specs").get(0);
        assertTrue(s.get("modes").get(0).get("dampingRatio").isNull());
        assertEquals(0, s.get("modes").get(0).get("frequencyHz").asInt());
        assertTrue(s.get("modes").get(1).get("frequencyHz").isNull(), "NaN has no JSON form");
        JsonNode c = s.get("checks").get(0);
        assertTrue(c.get("value").isNull(), "infinity has no JSON form");
        assertEquals(0.005, c.get("limit").asDouble());
        assertTrue(c.get("speedRpm").isNull());
        assertTrue(c.get("frequencyHz").isNull());
        assertEquals("warning", c.get("severity").asString());
        assertEquals("warning", c.get("status").asString());
        assertEquals("k-15% m+5%", c.get("governingCase").asString());
        assertTrue(c.get("waiver").isNull());
    }

    @Test
    void waiverIsAnObjectWithReasonExpiryAndValidity() {
        CheckResult waived = new CheckResult("SEP", "separation", Severity.ERROR, CheckStatus.WAIVED, 0.12, 0.2, "1",
                OptionalDouble.of(1400), OptionalDouble.of(23.333333333333332), "mode 2 near 1x",
                Fixtures.at("src/vibration/p1.json", 9, 5), Optional.of("nominal"),
                Optional.of(Fixtures.waiver("crossed during start-up only", "2027-03-31", true)));
        String text = ResultsJson.toJson(new Results(List.of(new SpecResult("src/vibration/p1.json",
                Optional.of("P-1"), SpecStatus.WAIVED, List.of(), List.of(waived), List.of()))));
        assertTrue(text.contains("""
                          "governingCase": "nominal",
                          "waiver": {
                            "reason": "crossed during start-up only",
                            "expires": "2027-03-31",
                            "valid": true
                          }
                """), text);
        // shortest round-trip form of the double, not a rounded one
        assertTrue(text.contains("\"frequencyHz\": 23.333333333333332,"), text);
        assertTrue(text.contains("\"speedRpm\": 1400,"), text);
    }

    @Test
    void modeSharesAreListedInTheirOrder() {
        ModeResult rocking = new ModeResult(2, 7.5, OptionalDouble.of(0.04),
                List.of(new ModeResult.Share("rx", 0.75), new ModeResult.Share("y", 0.25)));
        String text = ResultsJson.toJson(new Results(List.of(new SpecResult("src/vibration/fan.json",
                Optional.of("FAN"), SpecStatus.PASS, List.of(rocking), List.of(), List.of()))));
        assertTrue(text.contains("""
                        {
                          "index": 2,
                          "frequencyHz": 7.5,
                          "dampingRatio": 0.04,
                          "shares": [
                            {
                              "motion": "rx",
                              "fraction": 0.75
                            },
                            {
                              "motion": "y",
                              "fraction": 0.25
                            }
                          ]
                        }
                """), text);
    }

    @Test
    void everyDoubleReadsBackExactly() {
        // RFC 8259 numbers read by Jackson's parser must give back the same double bit for bit
        java.util.Random random = new java.util.Random(7);
        List<ModeResult> modes = new java.util.ArrayList<>();
        for (int i = 0; i < 500; i++) {
            double magnitude = Math.pow(10, random.nextInt(30) - 15);
            modes.add(new ModeResult(i + 1, random.nextDouble() * magnitude, OptionalDouble.of(random.nextDouble())));
        }
        modes.add(new ModeResult(501, Double.MIN_VALUE, OptionalDouble.of(Double.MAX_VALUE)));
        modes.add(new ModeResult(502, 1e15, OptionalDouble.of(-1e15 + 0.5)));
        JsonNode written = READER.readTree(ResultsJson.toJson(new Results(List.of(new SpecResult("a.json",
                Optional.empty(), SpecStatus.PASS, modes, List.of(), List.of()))))).get("specs").get(0).get("modes");
        for (int i = 0; i < modes.size(); i++) {
            assertEquals(modes.get(i).frequencyHz(), written.get(i).get("frequencyHz").asDouble(), 0.0, "mode " + i);
            assertEquals(modes.get(i).dampingRatio().getAsDouble(), written.get(i).get("dampingRatio").asDouble(), 0.0);
        }
    }

    @Test
    void escapesQuotesMarkupAndNonAscii() {
        String nasty = "say \"hi\" \\ </script><script>alert(1)</script> & 5 µm ≥ 2 \uD83D\uDE00\ttab\nline";
        CheckResult c = Fixtures.check("SEP", "separation", CheckStatus.FAIL, nasty, 9);
        byte[] bytes = ResultsJson.toBytes(new Results(List.of(new SpecResult("src/vibration/é.json",
                Optional.of("P-\u00e9"), SpecStatus.FAIL, List.of(), List.of(c), List.of()))));
        for (byte b : bytes) {
            assertTrue(b >= 0, "all ASCII");
        }
        String text = new String(bytes, StandardCharsets.US_ASCII);
        assertTrue(text.contains("\"message\": \"say \\\"hi\\\" \\\\ \\u003C/script\\u003E\\u003Cscript\\u003Ealert(1)"
                + "\\u003C/script\\u003E \\u0026 5 \\u00B5m \\u2265 2 \\uD83D\\uDE00\\ttab\\nline\","), text);
        assertFalse(text.contains("<"));
        assertTrue(text.contains("\"file\": \"src/vibration/\\u00E9.json\""), text);
        // RFC 8259 reader gets the original strings back
        JsonNode root = READER.readTree(text);
        assertEquals(nasty, root.get("specs").get(0).get("checks").get(0).get("message").asString());
        assertEquals("P-\u00e9", root.get("specs").get(0).get("id").asString());
    }

    @Test
    void writeCreatesTheDirectoryReplacesAtomicallyAndLeavesNoTemporaryFile(@TempDir Path dir) throws IOException {
        Path target = dir.resolve("target/resonance-gate").resolve(ResultsJson.FILE_NAME);
        Files.createDirectories(target.getParent());
        Files.writeString(target, "stale content from an earlier run, longer than nothing");
        ResultsJson.write(new Results(List.of()), target);
        assertArrayEquals(ResultsJson.toBytes(new Results(List.of())), Files.readAllBytes(target));
        ResultsJson.write(Fixtures.small(), target);
        assertArrayEquals(ResultsJson.toBytes(Fixtures.small()), Files.readAllBytes(target));
        try (Stream<Path> files = Files.list(target.getParent())) {
            assertEquals(List.of(target), files.toList());
        }
        Path fresh = dir.resolve("not/yet/there/results.json");
        ResultsJson.write(Fixtures.small(), fresh);
        assertTrue(Files.isRegularFile(fresh));
    }

    /**
     * No object in the document names a key twice (RFC 8259 leaves such a document's meaning to
     * the reader), checked by Jackson's own duplicate detection while parsing: the writer names
     * its keys in code, so a run through every branch (diagnostics, waivers, curves, a baseline
     * with its changes) covers what any run can write.
     */
    @Test
    void noObjectNamesAKeyTwice(@TempDir Path dir) throws Exception {
        JsonMapper strict = JsonMapper.builder().enable(tools.jackson.core.StreamReadFeature.STRICT_DUPLICATE_DETECTION)
                .build();
        for (Results results : List.of(EngineRuns.mixed(dir.resolve("mixed")), EngineRuns.hostile(dir.resolve("hostile")),
                BaselineReportsTest.judged(dir.resolve("baseline")))) {
            assertTrue(strict.readTree(ResultsJson.toBytes(results)).get("specs").size() > 0);
        }
    }
}
