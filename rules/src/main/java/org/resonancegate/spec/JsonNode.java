package org.resonancegate.spec;

import java.util.List;
import java.util.Optional;

/**
 * Our own small immutable JSON tree: every value knows where it was written, and object members
 * keep their order, so every diagnostic can point at the offending value or key.
 */
sealed interface JsonNode {

    SourceLocation location();

    /** How the value's type is named in messages ("a string", "a list", ...). */
    String typeName();

    record Member(String key, SourceLocation keyLocation, JsonNode value) {
    }

    /** An object; duplicate keys were reported while reading and only the first is kept. */
    record JsonObject(List<Member> members, SourceLocation location) implements JsonNode {
        public JsonObject {
            members = List.copyOf(members);
        }

        Optional<Member> member(String key) {
            // a plain loop: every key of every spec is looked up here, and objects are small
            for (Member m : members) {
                if (m.key().equals(key)) {
                    return Optional.of(m);
                }
            }
            return Optional.empty();
        }

        Optional<JsonNode> get(String key) {
            return member(key).map(Member::value);
        }

        boolean has(String key) {
            return member(key).isPresent();
        }

        @Override
        public String typeName() {
            return "an object";
        }
    }

    record JsonArray(List<JsonNode> items, SourceLocation location) implements JsonNode {
        public JsonArray {
            items = List.copyOf(items);
        }

        @Override
        public String typeName() {
            return "a list";
        }
    }

    record JsonString(String value, SourceLocation location) implements JsonNode {
        @Override
        public String typeName() {
            return "a string";
        }
    }

    /** A number; {@code text} is the literal as written (for examples in messages). */
    record JsonNumber(double value, String text, SourceLocation location) implements JsonNode {
        @Override
        public String typeName() {
            return "a number";
        }
    }

    record JsonBoolean(boolean value, SourceLocation location) implements JsonNode {
        @Override
        public String typeName() {
            return "true/false";
        }
    }

    record JsonNull(SourceLocation location) implements JsonNode {
        @Override
        public String typeName() {
            return "null";
        }
    }
}
