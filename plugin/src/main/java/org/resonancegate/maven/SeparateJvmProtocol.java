package org.resonancegate.maven;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * What Maven's JVM and the separate one say to each other: the settings go in a small UTF-8 file
 * (one {@code key=value} per line), the console lines and the verdict come back on the child's
 * standard output, one record per line, fields split by tabs. Text is escaped so that a tab, a
 * line break or a backslash in a spec's title cannot break a record.
 */
final class SeparateJvmProtocol {

    static final String LINE = "L";
    static final String VERDICT = "V";
    static final String PROBLEM = "X";

    private SeparateJvmProtocol() {
    }

    static String escape(String text) {
        StringBuilder b = new StringBuilder(text.length() + 8);
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            switch (c) {
                case '\\' -> b.append("\\\\");
                case '\t' -> b.append("\\t");
                case '\n' -> b.append("\\n");
                case '\r' -> b.append("\\r");
                default -> b.append(c);
            }
        }
        return b.toString();
    }

    static String unescape(String text) {
        StringBuilder b = new StringBuilder(text.length());
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            if (c == '\\' && i + 1 < text.length()) {
                char n = text.charAt(++i);
                b.append(switch (n) {
                    case 't' -> '\t';
                    case 'n' -> '\n';
                    case 'r' -> '\r';
                    default -> n;
                });
            } else {
                b.append(c);
            }
        }
        return b.toString();
    }

    /** One record: its kind, then its fields, each escaped. */
    static String record(String kind, String... fields) {
        StringBuilder b = new StringBuilder(kind);
        for (String f : fields) {
            b.append('\t').append(escape(f));
        }
        return b.toString();
    }

    /** The fields of a record line, unescaped, the kind first. */
    static List<String> fields(String line) {
        List<String> out = new ArrayList<>();
        int start = 0;
        for (int i = 0; i <= line.length(); i++) {
            if (i == line.length() || line.charAt(i) == '\t') {
                out.add(unescape(line.substring(start, i)));
                start = i + 1;
            }
        }
        return out;
    }

    static void writeSettings(GateSettings s, Path file, Optional<Path> summaryPart) throws IOException {
        List<String> lines = new ArrayList<>();
        lines.add("base=" + escape(s.base().toString()));
        lines.add("specs=" + escape(s.specs().toString()));
        lines.add("output=" + escape(s.output().toString()));
        s.includes().forEach(p -> lines.add("include=" + escape(p)));
        s.excludes().forEach(p -> lines.add("exclude=" + escape(p)));
        s.formats().forEach(f -> lines.add("format=" + escape(f)));
        s.summaryFile().ifPresent(f -> lines.add("summaryFile=" + escape(f.toString())));
        summaryPart.ifPresent(f -> lines.add("summaryPart=" + escape(f.toString())));
        s.baseline().ifPresent(b -> lines.add("baseline=" + escape(b)));
        lines.add("failOn=" + escape(s.failOn()));
        lines.add("artifactId=" + escape(s.artifactId()));
        Files.write(file, lines, StandardCharsets.UTF_8);
    }

    /** The settings, and where the summary part goes when there is a summary file. */
    record Request(GateSettings settings, Optional<Path> summaryPart) {
    }

    static Request readSettings(Path file) throws IOException {
        Path base = null;
        Path specs = null;
        Path output = null;
        List<String> includes = new ArrayList<>();
        List<String> excludes = new ArrayList<>();
        List<String> formats = new ArrayList<>();
        Optional<Path> summaryFile = Optional.empty();
        Optional<Path> summaryPart = Optional.empty();
        Optional<String> baseline = Optional.empty();
        String failOn = "";
        String artifactId = "";
        for (String line : Files.readAllLines(file, StandardCharsets.UTF_8)) {
            int eq = line.indexOf('=');
            if (eq < 0) {
                throw new IOException("malformed settings line: " + line);
            }
            String value = unescape(line.substring(eq + 1));
            switch (line.substring(0, eq)) {
                case "base" -> base = Path.of(value);
                case "specs" -> specs = Path.of(value);
                case "output" -> output = Path.of(value);
                case "include" -> includes.add(value);
                case "exclude" -> excludes.add(value);
                case "format" -> formats.add(value);
                case "summaryFile" -> summaryFile = Optional.of(Path.of(value));
                case "summaryPart" -> summaryPart = Optional.of(Path.of(value));
                case "baseline" -> baseline = Optional.of(value);
                case "failOn" -> failOn = value;
                case "artifactId" -> artifactId = value;
                default -> throw new IOException("unknown settings key: " + line);
            }
        }
        if (base == null || specs == null || output == null) {
            throw new IOException("the settings file lacks base, specs or output");
        }
        return new Request(new GateSettings(base, specs, output, includes, excludes, formats, summaryFile, baseline,
                failOn, artifactId), summaryPart);
    }
}
