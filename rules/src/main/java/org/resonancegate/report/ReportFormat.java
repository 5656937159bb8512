package org.resonancegate.report;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collection;
import java.util.Comparator;
import java.util.EnumSet;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.Set;
import org.resonancegate.report.html.HtmlReport;
import org.resonancegate.units.Suggestions;

/**
 * The files a run can write, each drawn from the same {@link Results}: the name a user picks it
 * by, the file name in the output directory, and how it is written. Each writer only reads the
 * results (immutable throughout) and writes its own file, so a front end may run them side by
 * side; declaration order, {@code results.json} (the record the others are drawn from) first, is
 * the order a front end names failures in.
 */
public enum ReportFormat {
    JSON("json", ResultsJson.FILE_NAME, 3, (results, file, chosen, place) -> ResultsJson.write(results, file)),
    HTML("html", HtmlReport.FILE_NAME, 1, (results, file, chosen, place) -> HtmlReport.write(results, file)),
    MARKDOWN("markdown", MarkdownSummary.FILE_NAME, 2, (results, file, chosen, place) -> MarkdownSummary.write(results,
            EngineInfo.NAME, ReportFormat.fullReport(chosen).map(ReportFormat::fileName), file)),
    SARIF("sarif", SarifReport.FILE_NAME, 4, (results, file, chosen, place) -> SarifReport.write(results, file, place)),
    JUNIT("junit", JunitReport.FILE_NAME, 5, (results, file, chosen, place) -> JunitReport.write(results, file));

    /** Writes one format's file; {@code chosen} lets a summary link to the other files written beside it. */
    @FunctionalInterface
    interface Writer {
        void write(Results results, Path file, Set<ReportFormat> chosen, Optional<String> place) throws IOException;
    }

    private final String key;
    private final String fileName;
    private final int readingOrder;
    private final Writer writer;

    /**
     * @param readingOrder which file a person opens first when several are written (lowest first);
     *                     the console points at that one
     */
    ReportFormat(String key, String fileName, int readingOrder, Writer writer) {
        this.key = key;
        this.fileName = fileName;
        this.readingOrder = readingOrder;
        this.writer = writer;
    }

    /** The name a user writes to choose it. */
    public String key() {
        return key;
    }

    /** Its file name inside the output directory. */
    public String fileName() {
        return fileName;
    }

    /**
     * Writes this format's file into {@code directory} (created if missing), atomically.
     *
     * @param chosen every format written in this run, this one included
     * @return the file written
     */
    public Path write(Results results, Path directory, Set<ReportFormat> chosen) throws IOException {
        return write(results, directory, chosen, Optional.empty());
    }

    /**
     * As {@link #write(Results, Path, Set)}, for a project that sits in a sub-folder of its Git
     * work tree: {@code projectInRepository} is that folder with a trailing {@code /}, so SARIF
     * can name paths a code-review tool resolves from the checkout.
     */
    public Path write(Results results, Path directory, Set<ReportFormat> chosen, Optional<String> projectInRepository)
            throws IOException {
        Path file = directory.resolve(fileName);
        writer.write(results, file, chosen, projectInRepository);
        return file;
    }

    /** The file of {@code chosen} a person should open first (the fullest human-readable one). */
    public static Optional<ReportFormat> forReaders(Collection<ReportFormat> chosen) {
        return chosen.stream().min(Comparator.comparingInt(f -> f.readingOrder));
    }

    /** A chosen report fuller than the Markdown summary, for the summary to link to. */
    public static Optional<ReportFormat> fullReport(Collection<ReportFormat> chosen) {
        return forReaders(chosen).filter(f -> f.readingOrder < MARKDOWN.readingOrder);
    }

    /**
     * Reads a user's list of format names: case and surrounding spaces do not matter, repeats
     * count once, {@code all} stands for every format, and an empty list means all of them.
     *
     * @return the formats in writing order
     * @throws IllegalArgumentException naming the unknown entry, the closest known name if one is
     *                                  near, and the full list
     */
    public static Set<ReportFormat> parse(Collection<String> names) {
        EnumSet<ReportFormat> chosen = EnumSet.noneOf(ReportFormat.class);
        List<String> known = new ArrayList<>(Arrays.stream(values()).map(ReportFormat::key).toList());
        known.add("all");
        boolean any = false;
        for (String raw : names) {
            String name = raw == null ? "" : raw.strip().toLowerCase(Locale.ROOT);
            if (name.isEmpty()) {
                continue;
            }
            any = true;
            if (name.equals("all")) {
                chosen.addAll(EnumSet.allOf(ReportFormat.class));
                continue;
            }
            ReportFormat match = Arrays.stream(values()).filter(f -> f.key.equals(name)).findFirst()
                    .orElseThrow(() -> new IllegalArgumentException("unknown report format '" + raw.strip() + "'"
                            + Suggestions.closest(name, known).map(s -> "; did you mean '" + s + "'?").orElse(".")
                            + " Known formats: " + String.join(", ", known)));
            chosen.add(match);
        }
        return any ? chosen : EnumSet.allOf(ReportFormat.class);
    }
}
