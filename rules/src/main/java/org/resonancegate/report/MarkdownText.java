package org.resonancegate.report;

/**
 * User text (spec ids, messages, file names) made inert for a Markdown summary: it renders as the
 * same characters and cannot open a tag, a link, emphasis, a code span or a new table cell.
 */
final class MarkdownText {

    /** Characters with an inline meaning in CommonMark or GitHub's extensions ({@code ~} strike, {@code $} math). */
    private static final String INLINE_MARKUP = "\\`*_[]<>!&|~$#";

    private MarkdownText() {
    }

    /**
     * Each character that means something inline gets a backslash, which CommonMark defines as
     * "this character, literally" (and GitHub's tables read {@code \|} as a pipe inside a cell):
     * markup, links, code spans, emphasis, strike-through, entities, math and cell borders.
     * Punctuation that means something only at the start of a block ({@code - + .}) is left alone,
     * since this text never starts one. Line breaks and other control characters become a space,
     * as one would end the table row; the bidirectional overrides are dropped, since they can make
     * a cell read differently from what it says.
     */
    static String escape(String text) {
        StringBuilder out = new StringBuilder(text.length() + 16);
        text.codePoints().forEach(c -> {
            if (Character.getType(c) == Character.CONTROL || c == 0x2028 || c == 0x2029) {
                out.append(' ');
            } else if ((c >= 0x202A && c <= 0x202E) || (c >= 0x2066 && c <= 0x2069)) {
                // dropped
            } else if (c < 128 && INLINE_MARKUP.indexOf(c) >= 0) {
                out.append('\\').append((char) c);
            } else {
                out.appendCodePoint(c);
            }
        });
        return out.toString();
    }

    /** At most {@code max} code points, the cut marked with an ellipsis; cut before escaping so no escape is split. */
    static String shorten(String text, int max) {
        if (text.codePointCount(0, text.length()) <= max) {
            return text;
        }
        return text.substring(0, text.offsetByCodePoints(0, max - 1)) + "…";
    }

}
