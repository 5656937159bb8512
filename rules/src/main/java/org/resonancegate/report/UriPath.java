package org.resonancegate.report;

import java.nio.charset.StandardCharsets;

/** A relative, {@code /}-separated path as an RFC 3986 relative reference, for links and SARIF locations. */
final class UriPath {

    private static final char[] HEX = "0123456789ABCDEF".toCharArray();

    private UriPath() {
    }

    /**
     * Keeps the unreserved characters and {@code /}; every other byte of the UTF-8 form becomes
     * {@code %XX}. Stricter than needed ({@code :} in a first segment, spaces, {@code #}, non-ASCII
     * all become escapes), so the result is never read as a scheme, a fragment or two paths.
     */
    static String encode(String path) {
        StringBuilder out = new StringBuilder(path.length());
        for (byte b : path.getBytes(StandardCharsets.UTF_8)) {
            int c = b & 0xFF;
            if ((c >= 'a' && c <= 'z') || (c >= 'A' && c <= 'Z') || (c >= '0' && c <= '9')
                    || c == '-' || c == '.' || c == '_' || c == '~' || c == '/') {
                out.append((char) c);
            } else {
                out.append('%').append(HEX[c >> 4]).append(HEX[c & 0xF]);
            }
        }
        return out.toString();
    }
}
