package org.resonancegate.hardening;

import java.util.Map;
import java.util.Set;

import tools.jackson.databind.JsonNode;
import tools.jackson.databind.ObjectMapper;

/**
 * Whether a results.json text holds a non-finite number: a bare token anywhere, or, under a key
 * that holds a number, the string a JSON writer may put in its place ("NaN", "Infinity"). Text a
 * user wrote (an id, a message quoting it) may say those words.
 */
final class FiniteJson {

    private static final ObjectMapper MAPPER = new ObjectMapper();
    private static final Set<String> NUMBER_KEYS = Set.of("value", "limit", "speedRpm", "frequencyHz", "dampingRatio",
            "fraction", "index", "line", "column");

    private FiniteJson() {
    }

    static boolean allFinite(String json) {
        return allFinite(null, MAPPER.readTree(json));
    }

    private static boolean allFinite(String key, JsonNode node) {
        if (node.isNumber()) {
            return Double.isFinite(node.doubleValue());
        }
        if (node.isString()) {
            return key == null || !NUMBER_KEYS.contains(key);
        }
        if (node.isObject()) {
            for (Map.Entry<String, JsonNode> e : node.properties()) {
                if (!allFinite(e.getKey(), e.getValue())) {
                    return false;
                }
            }
            return true;
        }
        for (JsonNode child : node) {
            if (!allFinite(null, child)) {
                return false;
            }
        }
        return true;
    }
}
