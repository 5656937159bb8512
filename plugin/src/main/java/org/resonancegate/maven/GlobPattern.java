package org.resonancegate.maven;

import java.util.regex.Pattern;

/**
 * One include or exclude pattern, matched against a path relative to the spec directory with
 * {@code /} separators, in the sense Maven users know from resource and source filters:
 * {@code *} and {@code ?} stay within one directory level, a {@code **} segment spans any number
 * of levels (none included, so {@code **}{@code /*.json} matches {@code a.json}), and a pattern
 * ending in {@code /} means everything below. {@link java.nio.file.PathMatcher}'s glob differs on
 * the zero-levels case, which is why this is written out.
 */
final class GlobPattern {

    private final String text;
    private final Pattern regex;

    private GlobPattern(String text, Pattern regex) {
        this.text = text;
        this.regex = regex;
    }

    static GlobPattern of(String pattern) {
        String p = pattern.trim().replace('\\', '/');
        while (p.startsWith("./")) {
            p = p.substring(2);
        }
        if (p.endsWith("/")) {
            p = p + "**";
        }
        String[] segments = p.split("/", -1);
        StringBuilder re = new StringBuilder();
        for (int i = 0; i < segments.length; i++) {
            boolean last = i == segments.length - 1;
            String segment = segments[i];
            if (segment.equals("**")) {
                re.append(last ? ".*" : "(?:[^/]*/)*");
                continue;
            }
            for (int j = 0; j < segment.length(); j++) {
                char c = segment.charAt(j);
                if (c == '*') {
                    re.append("[^/]*");
                } else if (c == '?') {
                    re.append("[^/]");
                } else {
                    re.append(Pattern.quote(String.valueOf(c)));
                }
            }
            if (!last) {
                re.append('/');
            }
        }
        return new GlobPattern(pattern, Pattern.compile(re.toString()));
    }

    /** @param relativePath a path below the spec directory, {@code /}-separated, without a leading {@code /} */
    boolean matches(String relativePath) {
        return regex.matcher(relativePath).matches();
    }

    @Override
    public String toString() {
        return text;
    }
}
