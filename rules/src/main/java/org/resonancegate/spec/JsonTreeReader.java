package org.resonancegate.spec;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.CharBuffer;
import java.nio.charset.CharsetDecoder;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import tools.jackson.core.JacksonException;
import tools.jackson.core.JsonParser;
import tools.jackson.core.JsonToken;
import tools.jackson.core.ObjectReadContext;
import tools.jackson.core.StreamReadConstraints;
import tools.jackson.core.TokenStreamLocation;
import tools.jackson.core.exc.StreamConstraintsException;
import tools.jackson.core.json.JsonFactory;

/**
 * Streams a JSON file with Jackson into a {@link JsonNode} tree that keeps locations. Duplicate
 * keys and the format's size limits are checked here, as diagnostics, because Jackson would
 * either accept them silently or stop with a message that does not say how to fix the file.
 */
final class JsonTreeReader {

    static final long MAX_FILE_BYTES = 4L * 1024 * 1024;
    static final int MAX_DEPTH = 32;
    static final int MAX_STRING_CODE_POINTS = 10_000;
    static final int MAX_LIST_ITEMS = 1_000;

    /**
     * Jackson's own constraints are a backstop, set looser than ours so that our clearer
     * diagnostics come first: no string in a file within the size limit can reach Jackson's.
     */
    private static final JsonFactory FACTORY = JsonFactory.builder()
            .streamReadConstraints(StreamReadConstraints.builder()
                    .maxNestingDepth(MAX_DEPTH + 8)
                    .maxDocumentLength(MAX_FILE_BYTES)
                    .maxStringLength((int) MAX_FILE_BYTES)
                    .maxNameLength((int) MAX_FILE_BYTES)
                    .maxNumberLength(400)
                    .maxTokenCount(MAX_FILE_BYTES)
                    .build())
            .build();

    /** The tree, when the file could be read as JSON; diagnostics found on the way in any case. */
    record Result(Optional<JsonNode> root, List<Diagnostic> diagnostics) {
        Result {
            diagnostics = List.copyOf(diagnostics);
        }
    }

    /** Stops the walk at a problem after which the rest of the file cannot be trusted. */
    private static final class Abort extends RuntimeException {
        private static final long serialVersionUID = 1L;
        private final transient SourceLocation location;

        Abort(SourceLocation location, String message) {
            super(message, null, false, false);
            this.location = location;
        }
    }

    private final String file;
    private final List<Diagnostic> diagnostics = new ArrayList<>();

    private JsonTreeReader(String file) {
        this.file = file;
    }

    /** Reads {@code path} from {@code files}; {@code file} is its project-relative name for locations. */
    static Result read(SpecFiles files, Path path, String file) {
        return new JsonTreeReader(file).readFile(files, path);
    }

    private Result readFile(SpecFiles files, Path path) {
        SourceLocation start = new SourceLocation(file, 1, 1);
        byte[] bytes;
        try {
            long size = files.size(path);
            if (size > MAX_FILE_BYTES) {
                return failed(start, "the file is " + size + " bytes, over the limit of 4 MiB ("
                        + MAX_FILE_BYTES + " bytes) for a spec or profile; split it into smaller files");
            }
            bytes = files.read(path);
        } catch (IOException | RuntimeException e) {
            return failed(start, "cannot read the file: " + describe(e));
        }
        if (bytes.length > MAX_FILE_BYTES) {
            return failed(start, "the file is over the limit of 4 MiB (" + MAX_FILE_BYTES + " bytes)");
        }
        Optional<String> text = decodeUtf8(bytes);
        if (text.isEmpty()) {
            return new Result(Optional.empty(), diagnostics);
        }
        return parse(text.get());
    }

    private static String describe(Exception e) {
        String kind = e.getClass().getSimpleName();
        return e.getMessage() == null ? kind : kind + ": " + e.getMessage();
    }

    private Result failed(SourceLocation at, String message) {
        diagnostics.add(new Diagnostic(at, message));
        return new Result(Optional.empty(), diagnostics);
    }

    /** Strict UTF-8: a malformed byte is a diagnostic at its line and column, never a silent U+FFFD. */
    private Optional<String> decodeUtf8(byte[] bytes) {
        CharsetDecoder decoder = StandardCharsets.UTF_8.newDecoder()
                .onMalformedInput(CodingErrorAction.REPORT)
                .onUnmappableCharacter(CodingErrorAction.REPORT);
        ByteBuffer in = ByteBuffer.wrap(bytes);
        CharBuffer out = CharBuffer.allocate(bytes.length + 1);
        var result = decoder.decode(in, out, true);
        if (result.isError()) {
            int offset = in.position();
            String before = new String(bytes, 0, offset, StandardCharsets.UTF_8);
            int line = 1;
            int column = 1;
            for (int i = 0; i < before.length(); i++) {
                if (before.charAt(i) == '\n') {
                    line++;
                    column = 1;
                } else {
                    column++;
                }
            }
            diagnostics.add(new Diagnostic(new SourceLocation(file, line, column),
                    "the file is not valid UTF-8 (bad byte 0x" + String.format("%02X", bytes[offset] & 0xFF)
                            + " at byte offset " + offset + "); save it as UTF-8"));
            return Optional.empty();
        }
        decoder.flush(out);
        out.flip();
        return Optional.of(out.toString());
    }

    private Result parse(String raw) {
        // A byte-order mark is accepted: some editors on some systems write one.
        String text = raw.startsWith("\uFEFF") ? raw.substring(1) : raw;
        JsonParser parser;
        try {
            parser = FACTORY.createParser(ObjectReadContext.empty(), text);
        } catch (JacksonException e) {
            return failed(new SourceLocation(file, 1, 1), "cannot start reading JSON: " + clean(e.getOriginalMessage()));
        }
        try (parser) {
            JsonToken first = parser.nextToken();
            if (first == null) {
                return failed(new SourceLocation(file, 1, 1),
                        "the file is empty; a spec is one JSON object, such as {\"format\": \"resonance-gate/1\", ...}");
            }
            JsonNode root = readValue(parser, 1);
            JsonToken after = parser.nextToken();
            if (after != null) {
                diagnostics.add(new Diagnostic(at(parser.currentTokenLocation()),
                        "unexpected content after the end of the top-level value; a file holds exactly one JSON object"));
                return new Result(Optional.empty(), diagnostics);
            }
            return new Result(Optional.of(root), diagnostics);
        } catch (Abort a) {
            return failed(a.location, a.getMessage());
        } catch (StreamConstraintsException e) {
            // These carry no location of their own; the parser still knows where it stopped.
            TokenStreamLocation where = e.getLocation() != null && e.getLocation() != TokenStreamLocation.NA
                    ? e.getLocation() : parser.currentTokenLocation();
            String message = e.getOriginalMessage() == null ? "" : e.getOriginalMessage()
                    .replaceAll(",?\\s*from `[^`]*`", "").replace("()", "").strip();
            return failed(at(where), "the file exceeds a reading limit: " + message);
        } catch (JacksonException e) {
            return failed(at(e.getLocation()), "invalid JSON: " + clean(e.getOriginalMessage()));
        }
    }

    /**
     * Jackson's messages name the parser's input source and its own feature switches; ours name
     * the file through the location and say what JSON allows instead.
     */
    static String clean(String message) {
        if (message == null) {
            return "unreadable input";
        }
        Optional<String> ours = inOurWords(message);
        if (ours.isPresent()) {
            return ours.get();
        }
        String m = message.replaceAll("\\s*\\(start marker at \\[[^\\]]*\\]\\)", "")
                .replaceAll("\\[Source: [^;\\]]*;\\s*", "[")
                .replace("\n", " ")
                .strip();
        if (m.contains("ALLOW_COMMENTS")) {
            return m.replaceAll("\\s*\\(not recognized as one since Feature[^)]*\\)", "")
                    + "; JSON has no comments, remove it";
        }
        if (m.contains("ALLOW_NON_NUMERIC_NUMBERS")) {
            return m.replaceAll(":?\\s*enable `JsonReadFeature[^`]*` to allow", "")
                    + "; JSON has no NaN or Infinity, write a finite number";
        }
        if (m.contains("ALLOW_")) {
            m = m.replaceAll("\\s*\\([^)]*ALLOW_[^)]*\\)", "").replaceAll(":?\\s*enable `[^`]*` to allow", "");
        }
        if (m.startsWith("Unexpected end-of-input")) {
            return m + "; the file ends before its closing brackets: check that every { and [ is closed";
        }
        return m + "; check for a missing or extra comma, quote or bracket here";
    }

    private static final Pattern FOUND = Pattern.compile("Unexpected character \\('(.+?)' \\(code \\d+\\)\\)");
    private static final Pattern TOKEN = Pattern.compile("Unrecognized token '([^']*)'");

    /** The parser's common complaints, said in the words of someone fixing a file by hand. */
    private static Optional<String> inOurWords(String message) {
        Matcher found = FOUND.matcher(message);
        String what = found.find() ? found.group(1) : "";
        if (message.startsWith("Unexpected end-of-input")) {
            return Optional.of(message.contains("closing quote")
                    ? "the file ends inside a string; close the string with a double quote, then check that every { and [ is closed"
                    : "the file ends too early; check that every { and [ is closed");
        }
        if (what.equals("'")) {
            return Optional.of("JSON writes keys and strings in double quotes, not single quotes; replace ' with \"");
        }
        if (message.contains("comment")) {
            return Optional.of("JSON has no comments; remove the comment that starts here");
        }
        if (what.equals("]") && message.contains("expected a valid value")) {
            return Optional.of("a comma before a closing ] is not allowed in JSON; remove the comma after the last item");
        }
        String shown = what.isEmpty() ? "something else" : "'" + what + "'";
        if (message.contains("was expecting comma to separate Object entries")) {
            return Optional.of("a comma is missing between two entries of an object (found " + shown
                    + " where ',' or '}' belongs); put a comma after the entry before this point");
        }
        if (message.contains("was expecting comma to separate Array entries")) {
            return Optional.of("a comma is missing between two items of a list (found " + shown
                    + " where ',' or ']' belongs); put a comma after the item before this point");
        }
        if (message.contains("was expecting double-quote to start property name")
                || message.contains("was expecting double-quote to start field name")) {
            return Optional.of(what.equals("}")
                    ? "a comma before a closing } is not allowed in JSON; remove the comma after the last entry"
                    : "a key in double quotes belongs here (found " + shown + "); write keys as \"name\": value");
        }
        Matcher token = TOKEN.matcher(message);
        if (token.find()) {
            return Optional.of("'" + token.group(1) + "' is not a JSON value; write text in double quotes (\""
                    + token.group(1) + "\"), while numbers, true, false and null stand without quotes");
        }
        return Optional.empty();
    }

    private SourceLocation at(TokenStreamLocation location) {
        if (location == null || location == TokenStreamLocation.NA || location.getLineNr() < 1) {
            return new SourceLocation(file, 1, 1);
        }
        return new SourceLocation(file, location.getLineNr(), Math.max(1, location.getColumnNr()));
    }

    private JsonNode readValue(JsonParser parser, int depth) {
        JsonToken token = parser.currentToken();
        SourceLocation location = at(parser.currentTokenLocation());
        return switch (token) {
            case START_OBJECT -> readObject(parser, depth, location);
            case START_ARRAY -> readArray(parser, depth, location);
            case VALUE_STRING -> {
                String s = parser.getString();
                checkLength(s, location, "string");
                yield new JsonNode.JsonString(s, location);
            }
            case VALUE_NUMBER_INT, VALUE_NUMBER_FLOAT ->
                    new JsonNode.JsonNumber(parser.getDoubleValue(), parser.getString(), location);
            case VALUE_TRUE -> new JsonNode.JsonBoolean(true, location);
            case VALUE_FALSE -> new JsonNode.JsonBoolean(false, location);
            case VALUE_NULL -> new JsonNode.JsonNull(location);
            default -> throw new Abort(location, "unexpected JSON token " + token);
        };
    }

    private void checkDepth(int depth, SourceLocation location) {
        if (depth > MAX_DEPTH) {
            throw new Abort(location, "nesting deeper than " + MAX_DEPTH
                    + " levels (the top-level object is level 1); a spec never needs that many, flatten it");
        }
    }

    private void checkLength(String s, SourceLocation location, String what) {
        int codePoints = s.codePointCount(0, s.length());
        if (codePoints > MAX_STRING_CODE_POINTS) {
            diagnostics.add(new Diagnostic(location, "a " + what + " of " + codePoints
                    + " characters, over the limit of " + MAX_STRING_CODE_POINTS + "; shorten it"));
        }
    }

    private JsonNode readObject(JsonParser parser, int depth, SourceLocation location) {
        checkDepth(depth, location);
        List<JsonNode.Member> members = new ArrayList<>();
        Map<String, SourceLocation> seen = new HashMap<>();
        while (parser.nextToken() == JsonToken.PROPERTY_NAME) {
            String key = parser.currentName();
            SourceLocation keyLocation = at(parser.currentTokenLocation());
            checkLength(key, keyLocation, "key");
            parser.nextToken();
            JsonNode value = readValue(parser, depth + 1);
            SourceLocation first = seen.putIfAbsent(key, keyLocation);
            if (first != null) {
                diagnostics.add(new Diagnostic(keyLocation, "duplicate key \"" + key + "\": it already appears at line "
                        + first.line() + ", column " + first.column() + "; a key may appear only once in an object, remove one"));
            } else {
                members.add(new JsonNode.Member(key, keyLocation, value));
            }
        }
        return new JsonNode.JsonObject(members, location);
    }

    private JsonNode readArray(JsonParser parser, int depth, SourceLocation location) {
        checkDepth(depth, location);
        List<JsonNode> items = new ArrayList<>();
        int count = 0;
        while (parser.nextToken() != JsonToken.END_ARRAY) {
            JsonNode item = readValue(parser, depth + 1);
            count++;
            if (count <= MAX_LIST_ITEMS) {
                items.add(item);
            }
        }
        if (count > MAX_LIST_ITEMS) {
            diagnostics.add(new Diagnostic(location, "a list of " + count + " elements, over the limit of "
                    + MAX_LIST_ITEMS + "; split the item into smaller specs"));
        }
        return new JsonNode.JsonArray(items, location);
    }
}
