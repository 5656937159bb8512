package org.resonancegate.report;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.EnumSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class ReportFormatTest {

    @TempDir
    Path dir;

    @Test
    void anEmptyListOrAllMeansEveryFormat() {
        Set<ReportFormat> every = EnumSet.allOf(ReportFormat.class);
        assertEquals(every, ReportFormat.parse(List.of()));
        assertEquals(every, ReportFormat.parse(Arrays.asList(" ", null)));
        assertEquals(every, ReportFormat.parse(List.of("ALL")));
    }

    @Test
    void namesAreReadWithoutCaseOrSpacesAndKeptInWritingOrder() {
        assertEquals(List.of(ReportFormat.JSON, ReportFormat.SARIF, ReportFormat.JUNIT),
                List.copyOf(ReportFormat.parse(List.of(" JUnit", "sarif ", "json", "sarif"))));
    }

    @Test
    void anUnknownNameIsAClearErrorWithASuggestion() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> ReportFormat.parse(List.of("json", "sarf")));
        assertEquals("unknown report format 'sarf'; did you mean 'sarif'? Known formats: "
                + String.join(", ", Stream.concat(Arrays.stream(ReportFormat.values()).map(ReportFormat::key),
                        Stream.of("all")).toList()), e.getMessage());
        IllegalArgumentException far = assertThrows(IllegalArgumentException.class,
                () -> ReportFormat.parse(List.of("pdf")));
        assertTrue(far.getMessage().startsWith("unknown report format 'pdf'. Known formats: "), far.getMessage());
    }

    @Test
    void fileNamesAreDistinct() {
        assertEquals(ReportFormat.values().length,
                Arrays.stream(ReportFormat.values()).map(ReportFormat::fileName).distinct().count());
    }

    @Test
    void everyFormatWritesItsFileAtomicallyFromTheSameResults() throws IOException {
        Results results = EngineRuns.mixed(dir.resolve("project"));
        Path out = dir.resolve("out/resonance-gate");
        Set<ReportFormat> all = EnumSet.allOf(ReportFormat.class);
        for (ReportFormat format : all) {
            Path file = format.write(results, out, all);
            assertEquals(out.resolve(format.fileName()), file);
        }
        try (Stream<Path> files = Files.list(out)) {
            assertEquals(all.stream().map(f -> out.resolve(f.fileName())).sorted().toList(), files.sorted().toList(),
                    "the files and nothing else: no temporary file left behind");
        }
        assertArrayEquals(ResultsJson.toBytes(results), Files.readAllBytes(out.resolve("results.json")));
        assertArrayEquals(SarifReport.toBytes(results), Files.readAllBytes(out.resolve("results.sarif")));
        assertArrayEquals(JunitReport.toBytes(results), Files.readAllBytes(out.resolve("junit.xml")));
        // the summary links to a fuller report only when one is written beside it
        assertArrayEquals(MarkdownSummary.toBytes(results, EngineInfo.NAME,
                        ReportFormat.fullReport(all).map(ReportFormat::fileName)),
                Files.readAllBytes(out.resolve("summary.md")));
    }

    @Test
    void theConsolePointsAtTheFileAPersonReadsFirst() {
        assertEquals(Optional.of(ReportFormat.MARKDOWN),
                ReportFormat.forReaders(EnumSet.of(ReportFormat.JUNIT, ReportFormat.MARKDOWN, ReportFormat.JSON)));
        assertEquals(Optional.of(ReportFormat.JSON),
                ReportFormat.forReaders(EnumSet.of(ReportFormat.SARIF, ReportFormat.JSON)));
        assertFalse(ReportFormat.fullReport(EnumSet.of(ReportFormat.MARKDOWN, ReportFormat.JSON)).isPresent(),
                "JSON is no place to send a reader of the summary");
    }

    @Test
    void aReportIsReadableByOtherUsersLikeAnyNewFile() throws IOException {
        Path target = dir.resolve("report.txt");
        AtomicWrite.write(target, new byte[] {1});
        org.junit.jupiter.api.Assumptions.assumeTrue(Files.getFileStore(target)
                .supportsFileAttributeView(java.nio.file.attribute.PosixFileAttributeView.class), "POSIX permissions");
        // common practice, no source: CI publishers and web servers read reports as other users
        assertEquals("rw-r--r--", java.nio.file.attribute.PosixFilePermissions.toString(
                Files.getPosixFilePermissions(target)));
    }

    @Test
    void aFailedWriteLeavesNoTemporaryFileAndTheOldFileWhole() throws IOException {
        Path target = dir.resolve("busy");
        Files.createDirectories(target.resolve("inside")); // a non-empty directory cannot be replaced by a file
        assertThrows(IOException.class, () -> AtomicWrite.write(target, new byte[] {1, 2, 3}));
        try (Stream<Path> files = Files.list(dir)) {
            assertEquals(List.of(target), files.toList());
        }
        assertTrue(Files.isDirectory(target.resolve("inside")));
    }
}
