package org.resonancegate.report;

import java.util.List;
import java.util.Map;
import java.util.Optional;
import tools.jackson.core.JsonGenerator;

/**
 * Writes a {@link SarifLog} with Jackson's streaming generator: the property names of SARIF
 * 2.1.0 in a fixed order, an empty optional left out, sorted maps in key order. Walking the
 * records by hand rather than through the object mapper spares every build the mapper's
 * introspection of a dozen record types on a cold JVM (about as long as writing the log of
 * ten thousand specs).
 */
final class SarifJson {

    private SarifJson() {
    }

    static void write(JsonGenerator g, SarifLog log) {
        g.writeStartObject();
        g.writeStringProperty("$schema", log.schema());
        g.writeStringProperty("version", log.version());
        g.writeArrayPropertyStart("runs");
        for (SarifLog.Run run : log.runs()) {
            run(g, run);
        }
        g.writeEndArray();
        g.writeEndObject();
    }

    private static void run(JsonGenerator g, SarifLog.Run run) {
        g.writeStartObject();
        g.writeObjectPropertyStart("tool");
        SarifLog.Driver driver = run.tool().driver();
        g.writeObjectPropertyStart("driver");
        g.writeStringProperty("name", driver.name());
        g.writeStringProperty("version", driver.version());
        g.writeArrayPropertyStart("rules");
        for (SarifLog.Descriptor d : driver.rules()) {
            g.writeStartObject();
            g.writeStringProperty("id", d.id());
            g.writeStringProperty("name", d.name());
            message(g, "shortDescription", d.shortDescription());
            message(g, "fullDescription", d.fullDescription());
            g.writeObjectPropertyStart("defaultConfiguration");
            g.writeStringProperty("level", d.defaultConfiguration().level());
            g.writeEndObject();
            g.writeEndObject();
        }
        g.writeEndArray();
        g.writeEndObject();
        g.writeEndObject();
        g.writeObjectPropertyStart("originalUriBaseIds");
        for (Map.Entry<String, SarifLog.UriBase> base : run.originalUriBaseIds().entrySet()) {
            g.writeObjectPropertyStart(base.getKey());
            optional(g, "uri", base.getValue().uri());
            optional(g, "uriBaseId", base.getValue().uriBaseId());
            message(g, "description", base.getValue().description());
            g.writeEndObject();
        }
        g.writeEndObject();
        g.writeStringProperty("columnKind", run.columnKind());
        g.writeArrayPropertyStart("results");
        for (SarifLog.Result result : run.results()) {
            result(g, result);
        }
        g.writeEndArray();
        if (run.properties().isPresent()) {
            g.writeObjectPropertyStart("properties");
            for (Map.Entry<String, Object> p : run.properties().get().entrySet()) {
                g.writeName(p.getKey());
                if (p.getValue() instanceof List<?> list) {
                    g.writeStartArray();
                    for (Object item : list) {
                        g.writeString(String.valueOf(item));
                    }
                    g.writeEndArray();
                } else {
                    g.writeString(String.valueOf(p.getValue()));
                }
            }
            g.writeEndObject();
        }
        g.writeEndObject();
    }

    private static void result(JsonGenerator g, SarifLog.Result r) {
        g.writeStartObject();
        g.writeStringProperty("ruleId", r.ruleId());
        g.writeNumberProperty("ruleIndex", r.ruleIndex());
        g.writeStringProperty("level", r.level());
        message(g, "message", r.message());
        g.writeArrayPropertyStart("locations");
        for (SarifLog.Location at : r.locations()) {
            location(g, at);
        }
        g.writeEndArray();
        if (r.suppressions().isPresent()) {
            g.writeArrayPropertyStart("suppressions");
            for (SarifLog.Suppression s : r.suppressions().get()) {
                g.writeStartObject();
                g.writeStringProperty("kind", s.kind());
                g.writeStringProperty("status", s.status());
                g.writeStringProperty("justification", s.justification());
                g.writeName("location");
                location(g, s.location());
                g.writeEndObject();
            }
            g.writeEndArray();
        }
        optional(g, "baselineState", r.baselineState());
        strings(g, "partialFingerprints", r.partialFingerprints());
        strings(g, "properties", r.properties());
        g.writeEndObject();
    }

    private static void location(JsonGenerator g, SarifLog.Location at) {
        SarifLog.PhysicalLocation p = at.physicalLocation();
        g.writeStartObject();
        g.writeObjectPropertyStart("physicalLocation");
        g.writeObjectPropertyStart("artifactLocation");
        g.writeStringProperty("uri", p.artifactLocation().uri());
        g.writeStringProperty("uriBaseId", p.artifactLocation().uriBaseId());
        g.writeEndObject();
        g.writeObjectPropertyStart("region");
        g.writeNumberProperty("startLine", p.region().startLine());
        g.writeNumberProperty("startColumn", p.region().startColumn());
        g.writeEndObject();
        g.writeEndObject();
        g.writeEndObject();
    }

    private static void message(JsonGenerator g, String name, SarifLog.Message m) {
        g.writeObjectPropertyStart(name);
        g.writeStringProperty("text", m.text());
        g.writeEndObject();
    }

    private static void optional(JsonGenerator g, String name, Optional<String> value) {
        if (value.isPresent()) {
            g.writeStringProperty(name, value.get());
        }
    }

    private static void strings(JsonGenerator g, String name, Map<String, String> map) {
        g.writeObjectPropertyStart(name);
        for (Map.Entry<String, String> e : map.entrySet()) {
            g.writeStringProperty(e.getKey(), e.getValue());
        }
        g.writeEndObject();
    }
}
