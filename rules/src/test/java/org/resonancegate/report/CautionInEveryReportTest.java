package org.resonancegate.report;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.resonancegate.report.html.HtmlReport;

/** Every file a run writes carries the caution, whoever reads only that one file. */
class CautionInEveryReportTest {

    @TempDir
    Path base;

    @Test
    void eachFormatHoldsTheCautionText() {
        Results results = EngineRuns.mixed(base);
        String caution = ConsoleReport.CAUTION;
        assertTrue(text(ResultsJson.toBytes(results)).contains(caution), "results.json");
        assertTrue(HtmlReport.render(results).contains(caution), "report.html");
        assertTrue(MarkdownSummary.render(results, "t", Optional.empty()).contains(caution), "summary.md");
        assertTrue(text(SarifReport.toBytes(results)).contains(caution), "results.sarif");
        assertTrue(text(JunitReport.toBytes(results)).contains(caution), "junit.xml");
        assertTrue(ConsoleReport.lines(results).stream().anyMatch(l -> l.text().equals(caution)), "console");
    }

    private static String text(byte[] bytes) {
        return new String(bytes, StandardCharsets.UTF_8);
    }
}
