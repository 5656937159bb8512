package org.resonancegate.report;

import java.util.List;
import java.util.Optional;
import java.util.SortedMap;

/**
 * The part of the SARIF 2.1.0 object model ({@code sarifLog} and below) that our reports use,
 * as records, written by {@link SarifJson}. Component names are the standard's property names, in
 * the order written; {@code $schema} is {@code schema} here. Empty optionals are left out.
 */
record SarifLog(String schema, String version, List<Run> runs) {

    /** {@code properties}: the baseline the {@code baselineState}s were computed against, when there was one. */
    record Run(Tool tool, SortedMap<String, UriBase> originalUriBaseIds, String columnKind, List<Result> results,
               Optional<SortedMap<String, Object>> properties) {
    }

    record Tool(Driver driver) {
    }

    record Driver(String name, String version, List<Descriptor> rules) {
    }

    /** A {@code reportingDescriptor}: one kind of finding. */
    record Descriptor(String id, String name, Message shortDescription, Message fullDescription,
                Configuration defaultConfiguration) {
    }

    record Configuration(String level) {
    }

    /**
     * An {@code artifactLocation} naming a base: without a {@code uri} the consumer supplies the
     * directory; with one, relative to another base ({@code uriBaseId}).
     */
    record UriBase(Optional<String> uri, Optional<String> uriBaseId, Message description) {
    }

    record Result(String ruleId, int ruleIndex, String level, Message message, List<Location> locations,
                  Optional<List<Suppression>> suppressions, Optional<String> baselineState,
                  SortedMap<String, String> partialFingerprints, SortedMap<String, String> properties) {
    }

    record Message(String text) {
    }

    record Location(PhysicalLocation physicalLocation) {
    }

    record PhysicalLocation(ArtifactLocation artifactLocation, Region region) {
    }

    record ArtifactLocation(String uri, String uriBaseId) {
    }

    record Region(int startLine, int startColumn) {
    }

    record Suppression(String kind, String status, String justification, Location location) {
    }
}
