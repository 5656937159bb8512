package org.resonancegate.report;

import tools.jackson.core.JsonGenerator;

/** The reader-facing part of a spec in {@code results.json}: its inputs and the data of its plots. */
final class ResultsJsonDetails {

    private ResultsJsonDetails() {
    }

    static void write(JsonGenerator g, SpecDetails details) {
        g.writeArrayPropertyStart("inputs");
        for (InputValue input : details.inputs()) {
            g.writeStartObject();
            g.writeStringProperty("group", input.group());
            g.writeStringProperty("label", input.label());
            g.writeStringProperty("text", input.text());
            ResultsJson.writeLocation(g, input.location());
            g.writeEndObject();
        }
        g.writeEndArray();
        g.writeName("interference");
        if (details.interference().isPresent()) {
            interference(g, details.interference().get());
        } else {
            g.writeNull();
        }
        g.writeArrayPropertyStart("curves");
        for (ResponseCurve curve : details.curves()) {
            curve(g, curve);
        }
        g.writeEndArray();
    }

    private static void interference(JsonGenerator g, Interference d) {
        g.writeStartObject();
        g.writeStringProperty("basis", d.basis());
        ResultsJson.writeNumber(g, "margin", d.margin());
        ResultsJson.writeString(g, "marginCriterion", d.marginCriterion());
        ResultsJson.writeNumber(g, "minSpeedRpm", d.minSpeedRpm());
        ResultsJson.writeNumber(g, "maxSpeedRpm", d.maxSpeedRpm());
        g.writeArrayPropertyStart("modes");
        for (Interference.ModeLine m : d.modes()) {
            g.writeStartObject();
            g.writeNumberProperty("index", m.index());
            ResultsJson.writeNumber(g, "frequencyHz", m.frequencyHz());
            g.writeEndObject();
        }
        g.writeEndArray();
        g.writeArrayPropertyStart("excitations");
        for (Interference.ExcitationLine e : d.excitations()) {
            g.writeStartObject();
            g.writeStringProperty("name", e.name());
            ResultsJson.writeNumber(g, "order", e.order());
            ResultsJson.writeNumber(g, "frequencyHz", e.frequencyHz());
            g.writeEndObject();
        }
        g.writeEndArray();
        g.writeEndObject();
    }

    private static void curve(JsonGenerator g, ResponseCurve c) {
        g.writeStartObject();
        g.writeStringProperty("criterion", c.criterion());
        g.writeStringProperty("basis", c.basis());
        g.writeStringProperty("quantity", c.quantity());
        g.writeStringProperty("unit", c.unit());
        ResultsJson.writeNumber(g, "limit", c.limit());
        g.writeStringProperty("displayUnit", c.displayUnit());
        ResultsJson.writeNumber(g, "displayFactor", c.displayFactor());
        // two parallel arrays rather than one object per point: a fifth of the lines
        g.writeArrayPropertyStart("speedRpm");
        for (ResponseCurve.Point p : c.points()) {
            ResultsJson.writeNumber(g, p.speedRpm());
        }
        g.writeEndArray();
        g.writeArrayPropertyStart("value");
        for (ResponseCurve.Point p : c.points()) {
            ResultsJson.writeNumber(g, p.value());
        }
        g.writeEndArray();
        g.writeEndObject();
    }
}
