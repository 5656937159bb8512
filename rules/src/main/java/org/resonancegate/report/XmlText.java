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
        StringBuilder out = null;
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            boolean ok;
            int width = 1;
            if (Character.isHighSurrogate(c) && i + 1 < text.length() && Character.isLowSurrogate(text.charAt(i + 1))) {
                ok = true;
                width = 2;
            } else {
                ok = c == 0x9 || c == 0xA || c == 0xD || (c >= 0x20 && c <= 0xD7FF) || (c >= 0xE000 && c <= 0xFFFD);
            }
            if (!ok && out == null) {
                out = new StringBuilder(text.length()).append(text, 0, i);
            }
            if (out != null) {
                if (ok) {
                    out.append(text, i, i + width);
                } else {
                    out.append('\uFFFD');
                }
            }
            i += width - 1;
        }
        return out == null ? text : out.toString();
    }

    /** For an attribute: also line breaks and tabs become spaces, which a parser would do anyway, unseen. */
    static String attribute(String text) {
        return legal(text).replace('\r', ' ').replace('\n', ' ').replace('\t', ' ');
    }
}
