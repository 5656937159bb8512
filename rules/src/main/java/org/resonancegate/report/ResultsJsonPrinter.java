package org.resonancegate.report;

import tools.jackson.core.JsonGenerator;
import tools.jackson.core.ObjectWriteContext;
import tools.jackson.core.PrettyPrinter;
import tools.jackson.core.SerializableString;
import tools.jackson.core.io.CharacterEscapes;
import tools.jackson.core.io.SerializedString;

/**
 * Two-space indentation, {@code "\n"} line ends whatever the platform, {@code "key": value} and
 * {@code []} / {@code {}} for empty containers. Written by hand rather than configured from the
 * library's default printer so the bytes cannot drift with a library default or the platform's
 * line separator. One instance per document: it counts nesting.
 */
final class ResultsJsonPrinter implements PrettyPrinter {

    private int depth;

    @Override
    public void writeRootValueSeparator(JsonGenerator g) {
        // one root value per file: nothing to separate
    }

    @Override
    public void writeStartObject(JsonGenerator g) {
        g.writeRaw('{');
        depth++;
    }

    @Override
    public void beforeObjectEntries(JsonGenerator g) {
        newline(g);
    }

    @Override
    public void writeObjectNameValueSeparator(JsonGenerator g) {
        g.writeRaw(": ");
    }

    @Override
    public void writeObjectEntrySeparator(JsonGenerator g) {
        separator(g);
    }

    @Override
    public void writeEndObject(JsonGenerator g, int entries) {
        depth--;
        if (entries > 0) {
            newline(g);
        }
        g.writeRaw('}');
    }

    @Override
    public void writeStartArray(JsonGenerator g) {
        g.writeRaw('[');
        depth++;
    }

    @Override
    public void beforeArrayValues(JsonGenerator g) {
        newline(g);
    }

    @Override
    public void writeArrayValueSeparator(JsonGenerator g) {
        separator(g);
    }

    @Override
    public void writeEndArray(JsonGenerator g, int values) {
        depth--;
        if (values > 0) {
            newline(g);
        }
        g.writeRaw(']');
    }

    private void newline(JsonGenerator g) {
        g.writeRaw(depth < INDENTS.length ? INDENTS[depth] : indent("", depth));
    }

    /** A comma, the line end and the indentation, in one write. */
    private void separator(JsonGenerator g) {
        g.writeRaw(depth < SEPARATORS.length ? SEPARATORS[depth] : indent(",", depth));
    }

    /**
     * A line end and the indentation of each depth (with and without the comma before it),
     * encoded once: the printer writes one per value, millions in a large run, and one copy of
     * ready bytes is far cheaper than a raw write per level.
     */
    private static final SerializableString[] INDENTS = new SerializableString[24];
    private static final SerializableString[] SEPARATORS = new SerializableString[INDENTS.length];

    static {
        for (int i = 0; i < INDENTS.length; i++) {
            INDENTS[i] = indent("", i);
            SEPARATORS[i] = indent(",", i);
        }
    }

    private static SerializableString indent(String before, int depth) {
        return new SerializedString(before + "\n" + "  ".repeat(depth));
    }

    /**
     * What a generator asks for its document: a fresh printer of ours (it counts nesting), and
     * the character escapes, {@code null} for Jackson's standard ones; nothing else differs from
     * the defaults.
     */
    static final class Context extends ObjectWriteContext.Base {
        private final PrettyPrinter printer = new ResultsJsonPrinter();
        private final CharacterEscapes escapes;

        Context(CharacterEscapes escapes) {
            this.escapes = escapes;
        }

        @Override
        public PrettyPrinter getPrettyPrinter() {
            return printer;
        }

        @Override
        public boolean hasPrettyPrinter() {
            return true;
        }

        @Override
        public CharacterEscapes getCharacterEscapes() {
            return escapes;
        }
    }
}
