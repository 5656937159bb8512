package org.resonancegate.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.resonancegate.fixtures.Specs.order;
import static org.resonancegate.fixtures.Specs.orderOnly;
import static org.resonancegate.fixtures.Specs.range;
import static org.resonancegate.fixtures.Specs.separation;
import static org.resonancegate.fixtures.Specs.single;
import static org.resonancegate.fixtures.Specs.spec;
import static org.resonancegate.fixtures.Specs.unbalance;
import static org.resonancegate.fixtures.Specs.velocity;

import java.time.LocalDate;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.resonancegate.check.SpecEvaluator;
import org.resonancegate.spec.Criterion;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/**
 * The reader-facing keys of results.json (SPEC-FORMAT.md, "results.json"), read back with
 * Jackson's general-purpose tree parser.
 */
class ResultsJsonDetailsTest {

    @Test
    void inputsInterferenceAndCurvesHaveTheDocumentedShape() {
        SpecResult r = SpecEvaluator.evaluate(spec(single(400, 4.0e6, 0.05), range(600, 1200),
                List.of(unbalance("rotor", 1, 2000), orderOnly("vane pass", 5)),
                List.of(separation("SEP", 0.2), velocity("VEL", 4.5, Criterion.VelocityMeasure.RMS))),
                LocalDate.of(2026, 6, 1));
        JsonNode spec = JsonMapper.builder().build().readTree(ResultsJson.toJson(new Results(List.of(r))))
                .get("specs").get(0);
        assertEquals("test item", spec.get("title").asString());
        assertTrue(spec.get("revision").isNull());
        JsonNode inputs = spec.get("inputs");
        assertEquals("model", inputs.get(0).get("group").asString());
        assertTrue(inputs.findValuesAsString("label").contains("running speed"));
        JsonNode interference = spec.get("interference");
        assertEquals(0.2, interference.get("margin").asDouble());
        assertEquals("SEP", interference.get("marginCriterion").asString());
        assertEquals(600, interference.get("minSpeedRpm").asDouble(), 1e-9);
        assertEquals(1200, interference.get("maxSpeedRpm").asDouble(), 1e-9);
        // from memory: f_n = √(k/m)/2π for a single mass
        assertEquals(Math.sqrt(4.0e6 / 400) / (2 * Math.PI),
                interference.get("modes").get(0).get("frequencyHz").asDouble(), 1e-9);
        assertEquals(5, interference.get("excitations").get(1).get("order").asDouble());
        assertTrue(interference.get("excitations").get(1).get("frequencyHz").isNull());
        JsonNode curves = spec.get("curves");
        assertEquals(1, curves.size(), "separation has no curve; velocity has one");
        JsonNode curve = curves.get(0);
        assertEquals("VEL", curve.get("criterion").asString());
        assertEquals("nominal", curve.get("basis").asString());
        assertEquals("mm/s", curve.get("displayUnit").asString());
        assertEquals(curve.get("speedRpm").size(), curve.get("value").size());
        assertTrue(curve.get("speedRpm").size() > 100);
    }

    @Test
    void aSpecThatCouldNotBeJudgedHasNoDetails() {
        String json = ResultsJson.toJson(Fixtures.small());
        JsonNode broken = JsonMapper.builder().build().readTree(json).get("specs").get(1);
        assertTrue(broken.get("interference").isNull());
        assertEquals(0, broken.get("curves").size());
        assertEquals(0, broken.get("inputs").size());
    }
}
