package org.resonancegate.report;

/** User text made legal for an XML 1.0 document; the writer does the escaping of markup. */
final class XmlText {

    private XmlText() {
    }

    /**
     * Replaces what XML 1.0 cannot hold at all, even escaped (control characters other than tab,
     * line feed and carriage return, unpaired surrogates, U+FFFE and U+FFFF), with U+FFFD, the
     * replacement character: a reader sees that something was there, and the parse never fails.
     */
    static String legal(String text) {
        return clean(text, false);
    }

    /** For an attribute: also line breaks and tabs become spaces, which a parser would do anyway, unseen. */
    static String attribute(String text) {
        return clean(text, true);
    }

    /**
     * One pass over the text; the text itself is returned when nothing needs replacing, as for
     * nearly every string, so a large report copies no string twice.
     */
    private static String clean(String text, boolean attribute) {
        StringBuilder out = null;
        int n = text.length();
        for (int i = 0; i < n; i++) {
            char c = text.charAt(i);
            char replacement;
            int width = 1;
            if (c >= 0x20 && c <= 0xD7FF) {
                if (out != null) {
                    out.append(c);
                }
                continue;
            }
            if (Character.isHighSurrogate(c) && i + 1 < n && Character.isLowSurrogate(text.charAt(i + 1))) {
                replacement = 0;
                width = 2;
            } else if (c == 0x9 || c == 0xA || c == 0xD) {
                replacement = attribute ? ' ' : 0;
            } else {
                replacement = c >= 0xE000 && c <= 0xFFFD ? 0 : '\uFFFD';
            }
            if (replacement != 0 && out == null) {
                out = new StringBuilder(n).append(text, 0, i);
            }
            if (out != null) {
                if (replacement != 0) {
                    out.append(replacement);
                } else {
                    out.append(text, i, i + width);
                }
            }
            i += width - 1;
        }
        return out == null ? text : out.toString();
    }
}
