package org.resonancegate.spec;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Pattern;

/**
 * A spec file's inputs as written, one entry per value: its JSON path
 * ({@code model.mounts[2].stiffness.z}), its text as written ({@code "135 kN/m"} with the quotes,
 * a number's literal, {@code true}, {@code null}; an empty list or object as {@code []} or
 * {@code {}}) and where it stands. Two revisions of a file compare entry by entry, whatever the
 * model, which is how a comparison says which inputs moved.
 */
public final class SpecInputs {

    /** One value of the file. */
    public record Input(String path, String text, SourceLocation location) {
    }

    private static final Pattern PLAIN_KEY = Pattern.compile("[A-Za-z_$][A-Za-z0-9_$-]*");

    private SpecInputs() {
    }

    /**
     * @return the values in the order they are written; empty when the file cannot be read as
     *         JSON (the spec reader reports why)
     */
    public static List<Input> read(Path projectBase, Path file, SpecFiles contents) {
        ProjectPaths paths = new ProjectPaths(projectBase, contents);
        Path absolute = paths.absolute(file);
        JsonTreeReader.Result json = JsonTreeReader.read(contents, absolute, paths.display(absolute));
        List<Input> out = new ArrayList<>();
        json.root().ifPresent(root -> flatten(root, "", out));
        return List.copyOf(out);
    }

    private static void flatten(JsonNode node, String path, List<Input> out) {
        if (node instanceof JsonNode.JsonObject o) {
            if (o.members().isEmpty()) {
                out.add(new Input(path, "{}", o.location()));
            }
            for (JsonNode.Member m : o.members()) {
                String key = PLAIN_KEY.matcher(m.key()).matches() ? m.key() : "[" + quote(m.key()) + "]";
                String child = path.isEmpty() || key.startsWith("[") ? path + key : path + "." + key;
                flatten(m.value(), child, out);
            }
        } else if (node instanceof JsonNode.JsonArray a) {
            if (a.items().isEmpty()) {
                out.add(new Input(path, "[]", a.location()));
            }
            for (int i = 0; i < a.items().size(); i++) {
                flatten(a.items().get(i), path + "[" + i + "]", out);
            }
        } else {
            out.add(new Input(path, scalar(node), node.location()));
        }
    }

    private static String scalar(JsonNode node) {
        if (node instanceof JsonNode.JsonString s) {
            return quote(s.value());
        } else if (node instanceof JsonNode.JsonNumber n) {
            return n.text();
        } else if (node instanceof JsonNode.JsonBoolean b) {
            return Boolean.toString(b.value());
        }
        return "null";
    }

    /** A JSON string literal: quotes, backslashes and control characters escaped, the rest as written. */
    private static String quote(String s) {
        StringBuilder b = new StringBuilder("\"");
        s.codePoints().forEach(c -> {
            switch (c) {
                case '"' -> b.append("\\\"");
                case '\\' -> b.append("\\\\");
                case '\n' -> b.append("\\n");
                case '\t' -> b.append("\\t");
                case '\r' -> b.append("\\r");
                default -> {
                    if (c < 0x20) {
                        b.append(String.format("\\u%04x", c));
                    } else {
                        b.appendCodePoint(c);
                    }
                }
            }
        });
        return b.append('"').toString();
    }
}
