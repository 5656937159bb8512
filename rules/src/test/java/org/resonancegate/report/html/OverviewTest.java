package org.resonancegate.report.html;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.jsoup.Jsoup;
import org.jsoup.nodes.Document;
import org.jsoup.nodes.Element;
import org.jsoup.nodes.Node;
import org.jsoup.nodes.TextNode;
import org.junit.jupiter.api.Test;
import org.resonancegate.report.Results;
import org.resonancegate.report.SpecResult;

/**
 * The overview and criteria tables of the sample plant under its proposed change, read back with
 * an independent parser (jsoup): what broke is listed failures first, paths break only after a
 * slash, and a severity never reads like a status.
 */
class OverviewTest {

    private static final List<String> ORDER = List.of("error", "fail", "warning", "waived");

    private final Results results = SamplePlant.proposed();
    private final Document doc = Jsoup.parse(HtmlReport.render(results));

    @Test
    void whatBrokeListsFailuresBeforeWarnings() {
        boolean mixed = false;
        for (Element row : doc.select("table.overview tbody tr")) {
            List<String> seen = row.select("td.headline .broke").stream()
                    .map(e -> e.classNames().stream().filter(ORDER::contains).findFirst().orElseThrow()).toList();
            for (int i = 1; i < seen.size(); i++) {
                assertTrue(ORDER.indexOf(seen.get(i - 1)) <= ORDER.indexOf(seen.get(i)), "order " + seen + " in " + row.text());
            }
            mixed |= seen.contains("fail") && seen.contains("warning");
            // each entry is styled by its own status: a warning's text says warning, a failure's says fail
            for (Element e : row.select("td.headline .broke")) {
                assertTrue(e.text().contains(" " + e.classNames().stream().filter(ORDER::contains).findFirst().orElseThrow())
                        || e.hasClass("error"), e.text());
            }
        }
        assertTrue(mixed, "the sample has a spec that both fails and warns, or this test proves nothing");
    }

    @Test
    void aPathBreaksOnlyAfterASlash() {
        List<Element> cells = doc.select("table.overview td.path");
        assertEquals(results.specs().size(), cells.size());
        for (int i = 0; i < cells.size(); i++) {
            Element cell = cells.get(i);
            assertEquals(results.specs().get(i).file(), cell.text());
            for (Element w : cell.select("wbr")) {
                Node before = w.previousSibling();
                String t = before instanceof Element e ? e.text() : before instanceof TextNode n ? n.text() : "";
                assertTrue(t.endsWith("/") || w.nextSibling() == null, "a break offered after '" + t + "'");
            }
            assertFalse(cell.select("wbr").isEmpty() && !results.specs().get(i).file().contains("/"));
        }
    }

    @Test
    void severityIsNamedAsSuchAndOnlyForWarnings() {
        long warnings = 0;
        for (SpecResult s : results.specs()) {
            warnings += s.checks().stream().filter(c -> c.severity().key().equals("warning")).count();
        }
        List<String> rules = doc.select("table.checks td:first-child span.msg").eachText();
        assertTrue(rules.stream().noneMatch(t -> t.endsWith(", error") || t.endsWith(", warning")), rules.toString());
        assertEquals(warnings, rules.stream().filter(t -> t.endsWith("severity: warning")).count());
        assertTrue(warnings > 0, "the sample has a warning-severity criterion, or this test proves nothing");
    }
}
