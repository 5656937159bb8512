package org.resonancegate.report;

import java.util.Objects;

/**
 * One line for a console, without a level prefix: the front end adds its own ({@code [ERROR]}).
 * It is one line whatever a spec holds: line breaks and other control characters in a title, an id
 * or a name are shown as escapes (a backslash, then n, r, t or u and four hex digits), so a spec cannot start a line of
 * its own in a build log (where a CI system might take it for a command, or a forged verdict).
 */
public record ConsoleLine(ConsoleLevel level, String text) {

    public ConsoleLine {
        Objects.requireNonNull(level, "level");
        text = oneLine(Objects.requireNonNull(text, "text"));
    }

    private static boolean control(char c) {
        return c < 0x20 || c == 0x7F || (c >= 0x80 && c <= 0x9F) || c == '\u2028' || c == '\u2029';
    }

    static String oneLine(String text) {
        int i = 0;
        while (i < text.length() && !control(text.charAt(i))) {
            i++;
        }
        if (i == text.length()) {
            return text;
        }
        StringBuilder b = new StringBuilder(text.length() + 16).append(text, 0, i);
        for (; i < text.length(); i++) {
            char c = text.charAt(i);
            if (!control(c)) {
                b.append(c);
            } else if (c == '\n') {
                b.append("\\n");
            } else if (c == '\r') {
                b.append("\\r");
            } else if (c == '\t') {
                b.append("\\t");
            } else {
                b.append(String.format(java.util.Locale.ROOT, "\\u%04X", (int) c));
            }
        }
        return b.toString();
    }
}
