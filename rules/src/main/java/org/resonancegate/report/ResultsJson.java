package org.resonancegate.report;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import org.resonancegate.spec.SourceLocation;
import tools.jackson.core.JsonEncoding;
import tools.jackson.core.JsonGenerator;
import tools.jackson.core.SerializableString;
import tools.jackson.core.StreamWriteFeature;
import tools.jackson.core.io.CharacterEscapes;
import tools.jackson.core.json.JsonFactory;

/**
 * Writes {@link Results} as {@code results.json} in the shape of spec-format.md, "Results file".
 *
 * <p>Deterministic to the byte: keys in a fixed order, two-space indentation, {@code "\n"} line
 * ends, a trailing newline, no timestamps. The output is pure ASCII: non-ASCII characters and
 * {@code < > &} are written as {@code \\uXXXX} escapes, so the file is the same on every platform
 * and can be pasted into an HTML page or a CI log without a second escaping step.
 *
 * <p>Numbers: a value with no fractional part (below 1e15) is written as an integer
 * ({@code 1480}, not {@code 1480.0}); others in the shortest form that reads back to the same
 * double, by the library's writer rather than the JDK's, so the digits are the same on every JDK. JSON has no NaN or infinity, so a non-finite value is written as {@code null}, which
 * a reader must treat as "not a number", never as zero.
 */
public final class ResultsJson {

    /** The value of the top-level {@code format} key. */
    public static final String FORMAT = "resonance-gate-results/1";

    /** The file name the plugin writes inside its output directory. */
    public static final String FILE_NAME = "results.json";

    private static final CharacterEscapes ESCAPES = new HtmlSafeEscapes();

    // The library's own shortest-form double writer, so the digits do not depend on the JDK's
    // Double.toString (which changed in Java 19). Every key is named in code here, so duplicate
    // keys are ruled out by a test (ResultsJsonTest) rather than looked up at every object of
    // every run, which cost a sixth of the writing time.
    private static final JsonFactory FACTORY = JsonFactory.builder()
            .enable(StreamWriteFeature.USE_FAST_DOUBLE_WRITER)
            .highestNonEscapedChar(127)
            .characterEscapes(ESCAPES)
            .build();

    private ResultsJson() {
    }

    /** The document as UTF-8 bytes (all ASCII, see the class comment). */
    public static byte[] toBytes(Results results) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        writeTo(results, out);
        return out.toByteArray();
    }

    /** Streams the document to {@code out} (closed when done), so a large run is never held whole in memory. */
    static void writeTo(Results results, OutputStream out) {
        try (JsonGenerator g = FACTORY.createGenerator(new ResultsJsonPrinter.Context(ESCAPES), out, JsonEncoding.UTF8)) {
            writeResults(g, results);
            g.writeRaw('\n');
        }
    }

    /** The document as text. */
    public static String toJson(Results results) {
        return new String(toBytes(results), StandardCharsets.UTF_8);
    }

    /** Writes the document to {@code target}, creating its directory; atomic ({@link AtomicWrite}). */
    public static void write(Results results, Path target) throws IOException {
        AtomicWrite.write(target, out -> writeTo(results, out));
    }

    private static void writeResults(JsonGenerator g, Results results) {
        g.writeStartObject();
        g.writeStringProperty("format", FORMAT);
        g.writeStringProperty("caution", ConsoleReport.CAUTION);
        g.writeArrayPropertyStart("specs");
        for (SpecResult spec : results.specs()) {
            writeSpec(g, spec);
        }
        g.writeEndArray();
        if (results.baseline().isPresent()) {
            g.writeName("baseline");
            ComparisonJson.write(g, results.baseline().get());
        }
        g.writeEndObject();
    }

    private static void writeSpec(JsonGenerator g, SpecResult spec) {
        g.writeStartObject();
        g.writeStringProperty("file", spec.file());
        writeString(g, "id", spec.id());
        writeString(g, "title", spec.details().title());
        writeString(g, "revision", spec.details().revision());
        g.writeStringProperty("status", spec.status().key());
        g.writeArrayPropertyStart("modes");
        for (ModeResult mode : spec.modes()) {
            g.writeStartObject();
            g.writeNumberProperty("index", mode.index());
            writeNumber(g, "frequencyHz", mode.frequencyHz());
            writeNumber(g, "dampingRatio", mode.dampingRatio());
            g.writeArrayPropertyStart("shares");
            for (ModeResult.Share share : mode.shares()) {
                g.writeStartObject();
                g.writeStringProperty("motion", share.motion());
                writeNumber(g, "fraction", share.fraction());
                g.writeEndObject();
            }
            g.writeEndArray();
            g.writeEndObject();
        }
        g.writeEndArray();
        g.writeArrayPropertyStart("checks");
        for (CheckResult check : spec.checks()) {
            writeCheck(g, check);
        }
        g.writeEndArray();
        writeErrors(g, "errors", spec.errors());
        ResultsJsonDetails.write(g, spec.details());
        g.writeEndObject();
    }

    static void writeErrors(JsonGenerator g, String name, List<ErrorEntry> errors) {
        g.writeArrayPropertyStart(name);
        for (ErrorEntry error : errors) {
            g.writeStartObject();
            writeLocation(g, error.location());
            g.writeStringProperty("message", error.message());
            g.writeEndObject();
        }
        g.writeEndArray();
    }

    private static void writeCheck(JsonGenerator g, CheckResult check) {
        g.writeStartObject();
        g.writeStringProperty("criterion", check.criterion());
        g.writeStringProperty("rule", check.rule());
        g.writeStringProperty("status", check.status().key());
        writeNumber(g, "value", check.value());
        writeNumber(g, "limit", check.limit());
        g.writeStringProperty("unit", check.unit());
        writeNumber(g, "speedRpm", check.speedRpm());
        writeNumber(g, "frequencyHz", check.frequencyHz());
        g.writeStringProperty("message", check.message());
        g.writeStringProperty("severity", check.severity().key());
        writeLocation(g, check.location());
        writeString(g, "governingCase", check.governingCase());
        g.writeName("waiver");
        if (check.waiver().isPresent()) {
            CheckResult.WaiverNote waiver = check.waiver().get();
            g.writeStartObject();
            g.writeStringProperty("reason", waiver.reason());
            g.writeStringProperty("expires", waiver.expires().toString());
            g.writeBooleanProperty("valid", waiver.valid());
            g.writeEndObject();
        } else {
            g.writeNull();
        }
        g.writeEndObject();
    }

    static void writeLocation(JsonGenerator g, SourceLocation location) {
        g.writeStringProperty("file", location.file());
        g.writeNumberProperty("line", location.line());
        g.writeNumberProperty("column", location.column());
    }

    static void writeString(JsonGenerator g, String name, Optional<String> value) {
        if (value.isPresent()) {
            g.writeStringProperty(name, value.get());
        } else {
            g.writeNullProperty(name);
        }
    }

    static void writeNumber(JsonGenerator g, String name, OptionalDouble value) {
        if (value.isPresent()) {
            writeNumber(g, name, value.getAsDouble());
        } else {
            g.writeNullProperty(name);
        }
    }

    static void writeNumber(JsonGenerator g, String name, double value) {
        g.writeName(name);
        writeNumber(g, value);
    }

    /** A number as an array element; the same rules as a property's. */
    static void writeNumber(JsonGenerator g, double value) {
        if (!Double.isFinite(value)) {
            g.writeNull();
        } else if (value == Math.rint(value) && Math.abs(value) < 1e15) {
            g.writeNumber((long) value); // also folds -0.0 into 0
        } else {
            g.writeNumber(value);
        }
    }

    /** The standard JSON escapes plus {@code < > &}, so {@code </script>} cannot close an HTML script block. */
    private static final class HtmlSafeEscapes extends CharacterEscapes {
        private static final long serialVersionUID = 1L;
        private final int[] ascii;

        HtmlSafeEscapes() {
            ascii = CharacterEscapes.standardAsciiEscapesForJSON();
            ascii['<'] = CharacterEscapes.ESCAPE_STANDARD;
            ascii['>'] = CharacterEscapes.ESCAPE_STANDARD;
            ascii['&'] = CharacterEscapes.ESCAPE_STANDARD;
        }

        @Override
        public int[] getEscapeCodesForAscii() {
            return ascii.clone();
        }

        @Override
        public SerializableString getEscapeSequence(int ch) {
            return null; // only standard escapes are used
        }
    }
}
