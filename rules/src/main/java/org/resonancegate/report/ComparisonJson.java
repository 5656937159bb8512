package org.resonancegate.report;

import tools.jackson.core.JsonGenerator;

/** The {@code baseline} section of {@code results.json}: what moved since a Git revision (SPEC-FORMAT.md). */
final class ComparisonJson {

    private ComparisonJson() {
    }

    static void write(JsonGenerator g, Comparison comparison) {
        g.writeStartObject();
        g.writeStringProperty("ref", comparison.ref());
        g.writeStringProperty("commit", comparison.commit());
        g.writeStringProperty("judgedOn", comparison.judgedOn().toString());
        g.writeArrayPropertyStart("notes");
        for (String note : comparison.notes()) {
            g.writeString(note);
        }
        g.writeEndArray();
        g.writeArrayPropertyStart("specs");
        for (SpecChange spec : comparison.specs()) {
            writeSpec(g, spec);
        }
        g.writeEndArray();
        g.writeEndObject();
    }

    private static void writeSpec(JsonGenerator g, SpecChange spec) {
        g.writeStartObject();
        g.writeStringProperty("change", spec.kind().key());
        ResultsJson.writeString(g, "id", spec.id());
        ResultsJson.writeString(g, "file", spec.currentFile());
        ResultsJson.writeString(g, "baselineFile", spec.baselineFile());
        ResultsJson.writeString(g, "status", spec.currentStatus().map(SpecStatus::key));
        ResultsJson.writeString(g, "baselineStatus", spec.baselineStatus().map(SpecStatus::key));
        g.writeArrayPropertyStart("inputs");
        for (InputChange input : spec.inputs()) {
            g.writeStartObject();
            g.writeStringProperty("path", input.path());
            ResultsJson.writeString(g, "before", input.before());
            ResultsJson.writeString(g, "after", input.after());
            g.writeName("at");
            if (input.location().isPresent()) {
                g.writeStartObject();
                ResultsJson.writeLocation(g, input.location().get());
                g.writeEndObject();
            } else {
                g.writeNull();
            }
            g.writeEndObject();
        }
        g.writeEndArray();
        g.writeArrayPropertyStart("modes");
        for (ModeChange mode : spec.modes()) {
            g.writeStartObject();
            g.writeNumberProperty("index", mode.index());
            ResultsJson.writeNumber(g, "baselineHz", mode.baselineHz());
            ResultsJson.writeNumber(g, "frequencyHz", mode.currentHz());
            g.writeEndObject();
        }
        g.writeEndArray();
        g.writeArrayPropertyStart("criteria");
        for (CriterionChange c : spec.criteria()) {
            writeCriterion(g, c);
        }
        g.writeEndArray();
        ResultsJson.writeErrors(g, "baselineErrors", spec.baselineErrors());
        g.writeEndObject();
    }

    private static void writeCriterion(JsonGenerator g, CriterionChange c) {
        g.writeStartObject();
        g.writeStringProperty("criterion", c.criterion());
        g.writeStringProperty("rule", c.rule());
        g.writeStringProperty("transition", c.transition().key());
        ResultsJson.writeString(g, "status", c.currentStatus().map(CheckStatus::key));
        ResultsJson.writeString(g, "baselineStatus", c.baselineStatus().map(CheckStatus::key));
        ResultsJson.writeNumber(g, "value", c.currentValue());
        ResultsJson.writeNumber(g, "baselineValue", c.baselineValue());
        ResultsJson.writeNumber(g, "limit", c.currentLimit());
        ResultsJson.writeNumber(g, "baselineLimit", c.baselineLimit());
        g.writeStringProperty("unit", c.unit());
        ResultsJson.writeNumber(g, "margin", c.currentMargin());
        ResultsJson.writeNumber(g, "baselineMargin", c.baselineMargin());
        ResultsJson.writeLocation(g, c.location());
        g.writeEndObject();
    }
}
