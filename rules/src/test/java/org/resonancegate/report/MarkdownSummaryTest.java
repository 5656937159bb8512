package org.resonancegate.report;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.commonmark.ext.gfm.tables.TableBlock;
import org.commonmark.ext.gfm.tables.TableBody;
import org.commonmark.ext.gfm.tables.TableCell;
import org.commonmark.ext.gfm.tables.TableRow;
import org.commonmark.ext.gfm.tables.TablesExtension;
import org.commonmark.node.AbstractVisitor;
import org.commonmark.node.Code;
import org.commonmark.node.Emphasis;
import org.commonmark.node.HtmlBlock;
import org.commonmark.node.HtmlInline;
import org.commonmark.node.Image;
import org.commonmark.node.Link;
import org.commonmark.node.Node;
import org.commonmark.node.StrongEmphasis;
import org.commonmark.node.Text;
import org.commonmark.parser.Parser;
import org.commonmark.renderer.html.HtmlRenderer;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The Markdown summary read back by an independent CommonMark parser with GitHub's table
 * extension (commonmark-java), as a pull-request page or CI job page would read it.
 */
class MarkdownSummaryTest {

    private static final List<org.commonmark.Extension> EXTENSIONS = List.of(TablesExtension.create());
    private static final Parser PARSER = Parser.builder().extensions(EXTENSIONS).build();
    private static final HtmlRenderer HTML = HtmlRenderer.builder().extensions(EXTENSIONS).build();

    @TempDir
    Path dir;

    @Test
    void listsWhatNeedsALookMostSeriousFirstWithCountsLinkAndCaution() {
        Results results = EngineRuns.mixed(dir);
        String md = MarkdownSummary.render(results, "resonance-gate", Optional.of("report.html"));
        Node doc = PARSER.parse(md);
        List<List<String>> rows = bodyRows(doc);
        // the engine's verdicts on the five specs (EngineRuns): 1 diagnostic (the misspelt "mas" is one
        // line, not also a missing "mass"), 2 failures, 1 warning, 1 waiver
        assertEquals(List.of("error", "fail", "fail", "warning", "waived"),
                rows.stream().map(r -> r.get(0)).toList(), md);
        for (List<String> row : rows) {
            assertEquals(6, row.size(), row.toString());
        }
        List<String> profileRow = rows.get(2);
        assertEquals(List.of("fail", "F-5", "PSEP", "separation"), profileRow.subList(0, 4));
        assertEquals("src/vibration/profiles/plant.json:5:5 (for src/vibration/e-fan.json)", profileRow.get(4));
        assertEquals("src/vibration/d-broken.json:4:31", rows.get(0).get(4));
        assertTrue(md.contains("**" + ConsoleReport.countLine(results, false).text() + "**"), md);
        List<Link> links = nodes(doc, Link.class);
        assertEquals(1, links.size());
        assertEquals("report.html", links.get(0).getDestination());
        assertTrue(md.contains(ConsoleReport.CAUTION), "the caution, word for word");
    }

    @Test
    void withoutAFullReportThereIsNoLink() {
        String md = MarkdownSummary.render(EngineRuns.mixed(dir), "resonance-gate", Optional.empty());
        assertTrue(nodes(PARSER.parse(md), Link.class).isEmpty(), md);
        assertFalse(md.contains("Full report"), md);
    }

    @Test
    void hostileTextRendersAsItselfAndInjectsNothing() {
        Results results = EngineRuns.hostile(dir);
        String md = MarkdownSummary.render(results, "module <b>|`x`", Optional.of("report.html"));
        Node doc = PARSER.parse(md);
        // no markup of any kind came from user text: the only link is ours, the only strong text the count line
        assertTrue(nodes(doc, HtmlInline.class).isEmpty() && nodes(doc, HtmlBlock.class).isEmpty(), md);
        assertTrue(nodes(doc, Code.class).isEmpty() && nodes(doc, Image.class).isEmpty(), md);
        assertEquals(1, nodes(doc, Link.class).size(), md);
        assertEquals(1, nodes(doc, StrongEmphasis.class).size(), md);
        assertEquals(1, nodes(doc, Emphasis.class).size(), "only the caution is in italics");
        String html = HTML.render(doc);
        assertFalse(html.contains("<script") || html.contains("<img") || html.contains("<b>"), html);
        assertFalse(html.contains("javascript:x\""), "no href from user text");

        List<List<String>> rows = bodyRows(doc);
        assertEquals(4, rows.size(), md);
        for (List<String> row : rows) {
            assertEquals(6, row.size(), "a pipe in user text does not open a cell: " + row);
        }
        // The hostile id comes back as its own characters (cut to the column's width), controls as spaces.
        String idCell = rows.stream().filter(r -> r.get(2).equals("W")).findFirst().orElseThrow().get(1);
        assertTrue(idCell.startsWith("<script>alert(\"x\")</script> | `tick` 'q"), idCell);
        String fileCell = rows.get(1).get(4);
        assertTrue(fileCell.startsWith("src/vibration/h <&>'\"|`.json:"), fileCell);
        String keyCell = rows.get(0).get(5);
        assertTrue(keyCell.startsWith("unknown key \"<img src=x onerror=alert(1)>\""), keyCell);
        // the 10,000-character id is cut, so the summary stays a screen wide
        assertTrue(md.lines().allMatch(l -> l.length() < 1200), "no line runs off the screen");
        assertTrue(md.length() < 6000, "one screen: " + md.length() + " characters");
    }

    @Test
    void controlCharactersAndBidiOverridesNeverReachTheFile() {
        String md = MarkdownSummary.render(EngineRuns.hostile(dir), "resonance-gate", Optional.empty());
        for (char c : md.toCharArray()) {
            boolean control = c < 0x20 && c != '\n' || c == 0x7F || c >= 0x80 && c < 0xA0;
            assertFalse(control, "control character U+" + Integer.toHexString(c));
            assertFalse(c == '\u202E', "right-to-left override");
        }
    }

    @Test
    void manyFindingsAreCountedNotListed() {
        StringBuilder criteria = new StringBuilder("[");
        for (int i = 1; i <= 25; i++) {
            criteria.append(i == 1 ? "" : ",").append("{\"id\": \"SEP").append(i)
                    .append("\", \"rule\": \"separation\", \"margin\": \"").append(i).append(" %\"}");
        }
        Results results = EngineRuns.single(dir, criteria.append(']').toString());
        // 24.03 Hz lies inside the 23.3-25 Hz running band, so every margin fails (EngineRuns)
        assertEquals(25, results.specs().get(0).checks().stream().filter(c -> c.status() == CheckStatus.FAIL).count());
        String md = MarkdownSummary.render(results, "resonance-gate", Optional.of("report.html"));
        assertEquals(MarkdownSummary.MAX_ROWS, bodyRows(PARSER.parse(md)).size());
        assertTrue(md.contains("…and 5 more rows in the full report."), md);
        String unlinked = MarkdownSummary.render(results, "resonance-gate", Optional.empty());
        assertTrue(unlinked.contains("…and 5 more rows, not listed here."), "no full report to point to");
    }

    @Test
    void sameResultsGiveTheSameBytesAndAPassingRunSaysSo() {
        Results first = EngineRuns.mixed(dir.resolve("one"));
        Results second = EngineRuns.mixed(dir.resolve("two"));
        assertArrayEquals(MarkdownSummary.toBytes(first, "t", Optional.of("report.html")),
                MarkdownSummary.toBytes(second, "t", Optional.of("report.html")), "two runs in two folders");
        assertFalse(MarkdownSummary.render(first, "t", Optional.empty()).contains("\r"));
        String passing = MarkdownSummary.render(EngineRuns.single(dir.resolve("three"),
                "[{\"id\": \"SEP\", \"rule\": \"separation\", \"margin\": \"2 %\"}]", false), "t", Optional.empty());
        assertTrue(passing.contains("Every criterion passes."), passing);
        assertTrue(bodyRows(PARSER.parse(passing)).isEmpty());
    }

    private static List<List<String>> bodyRows(Node doc) {
        List<List<String>> rows = new ArrayList<>();
        for (TableBlock table : nodes(doc, TableBlock.class)) {
            for (TableBody body : nodes(table, TableBody.class)) {
                for (TableRow row : nodes(body, TableRow.class)) {
                    rows.add(nodes(row, TableCell.class).stream().map(MarkdownSummaryTest::text).toList());
                }
            }
        }
        return rows;
    }

    private static String text(Node node) {
        StringBuilder out = new StringBuilder();
        node.accept(new AbstractVisitor() {
            @Override
            public void visit(Text text) {
                out.append(text.getLiteral());
            }
        });
        return out.toString();
    }

    private static <T extends Node> List<T> nodes(Node root, Class<T> type) {
        List<T> found = new ArrayList<>();
        collect(root, type, found);
        return found;
    }

    private static <T extends Node> void collect(Node node, Class<T> type, List<T> found) {
        for (Node child = node.getFirstChild(); child != null; child = child.getNext()) {
            if (type.isInstance(child)) {
                found.add(type.cast(child));
            }
            collect(child, type, found);
        }
    }
}
