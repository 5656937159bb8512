package org.resonancegate.spec;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.util.List;

import com.networknt.schema.Error;
import com.networknt.schema.Schema;
import com.networknt.schema.SchemaRegistry;
import com.networknt.schema.SpecificationVersion;

import tools.jackson.core.JacksonException;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.ObjectMapper;

/**
 * The shipped JSON Schemas, run by a general-purpose validator (networknt), so tests can ask
 * what an editor validating against them would say about a file.
 */
final class SchemaCheck {

    static final String SPEC = "/org/resonancegate/schema/spec-1.schema.json";
    static final String PROFILE = "/org/resonancegate/schema/profile-1.schema.json";

    private static final ObjectMapper MAPPER = new ObjectMapper();
    private static final SchemaRegistry REGISTRY = SchemaRegistry.withDefaultDialect(SpecificationVersion.DRAFT_2020_12);

    private final Schema schema;

    private SchemaCheck(String resource) {
        try (InputStream in = SchemaCheck.class.getResourceAsStream(resource)) {
            if (in == null) {
                throw new IllegalStateException("schema not on the class path: " + resource);
            }
            this.schema = REGISTRY.getSchema(in);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    static SchemaCheck spec() {
        return new SchemaCheck(SPEC);
    }

    static SchemaCheck profile() {
        return new SchemaCheck(PROFILE);
    }

    static JsonNode tree(String resource) {
        try (InputStream in = SchemaCheck.class.getResourceAsStream(resource)) {
            return MAPPER.readTree(in);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /**
     * What the validator objects to in {@code bytes}: its errors, or one line saying the text is
     * not JSON at all (an editor refuses that too). Empty when the file is valid.
     */
    List<String> problems(byte[] bytes) {
        JsonNode node;
        try {
            node = MAPPER.readTree(bytes);
        } catch (JacksonException e) {
            return List.of("not JSON: " + e.getOriginalMessage());
        }
        if (node == null || node.isMissingNode()) {
            return List.of("not JSON: empty");
        }
        return schema.validate(node).stream().map(Error::toString).toList();
    }
}
