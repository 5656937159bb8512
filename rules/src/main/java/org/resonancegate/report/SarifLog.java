package org.resonancegate.report;

import com.fasterxml.jackson.annotation.JsonInclude;
import com.fasterxml.jackson.annotation.JsonProperty;
import com.fasterxml.jackson.annotation.JsonPropertyOrder;
import java.util.List;
import java.util.Optional;
import java.util.SortedMap;

/**
 * The part of the SARIF 2.1.0 object model ({@code sarifLog} and below) that our reports use,
 * as records for Jackson to write. Property names are the standard's; empty optionals are left
 * out. Each record fixes its property order, so the bytes never depend on reflection order.
 */
@JsonPropertyOrder({"$schema", "version", "runs"})
record SarifLog(@JsonProperty("$schema") String schema, String version, List<Run> runs) {

    /** {@code properties}: the baseline the {@code baselineState}s were computed against, when there was one. */
    @JsonInclude(JsonInclude.Include.NON_ABSENT)
    @JsonPropertyOrder({"tool", "originalUriBaseIds", "columnKind", "results", "properties"})
    record Run(Tool tool, SortedMap<String, UriBase> originalUriBaseIds, String columnKind, List<Result> results,
               Optional<SortedMap<String, Object>> properties) {
    }

    record Tool(Driver driver) {
    }

    @JsonPropertyOrder({"name", "version", "rules"})
    record Driver(String name, String version, List<Descriptor> rules) {
    }

    /** A {@code reportingDescriptor}: one kind of finding. */
    @JsonPropertyOrder({"id", "name", "shortDescription", "fullDescription", "defaultConfiguration"})
    record Descriptor(String id, String name, Message shortDescription, Message fullDescription,
                Configuration defaultConfiguration) {
    }

    record Configuration(String level) {
    }

    /**
     * An {@code artifactLocation} naming a base: without a {@code uri} the consumer supplies the
     * directory; with one, relative to another base ({@code uriBaseId}).
     */
    @JsonInclude(JsonInclude.Include.NON_ABSENT)
    @JsonPropertyOrder({"uri", "uriBaseId", "description"})
    record UriBase(Optional<String> uri, Optional<String> uriBaseId, Message description) {
    }

    @JsonInclude(JsonInclude.Include.NON_ABSENT)
    @JsonPropertyOrder({"ruleId", "ruleIndex", "level", "message", "locations", "suppressions", "baselineState",
        "partialFingerprints", "properties"})
    record Result(String ruleId, int ruleIndex, String level, Message message, List<Location> locations,
                  Optional<List<Suppression>> suppressions, Optional<String> baselineState,
                  SortedMap<String, String> partialFingerprints, SortedMap<String, String> properties) {
    }

    record Message(String text) {
    }

    record Location(PhysicalLocation physicalLocation) {
    }

    @JsonPropertyOrder({"artifactLocation", "region"})
    record PhysicalLocation(ArtifactLocation artifactLocation, Region region) {
    }

    @JsonPropertyOrder({"uri", "uriBaseId"})
    record ArtifactLocation(String uri, String uriBaseId) {
    }

    @JsonPropertyOrder({"startLine", "startColumn"})
    record Region(int startLine, int startColumn) {
    }

    @JsonPropertyOrder({"kind", "status", "justification", "location"})
    record Suppression(String kind, String status, String justification, Location location) {
    }
}
