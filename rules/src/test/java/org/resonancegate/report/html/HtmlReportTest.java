package org.resonancegate.report.html;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.resonancegate.fixtures.Specs.AT;
import static org.resonancegate.fixtures.Specs.force;
import static org.resonancegate.fixtures.Specs.maxTransmissibility;
import static org.resonancegate.fixtures.Specs.order;
import static org.resonancegate.fixtures.Specs.range;
import static org.resonancegate.fixtures.Specs.single;
import static org.resonancegate.fixtures.Specs.tolerances;
import static org.resonancegate.fixtures.Specs.unbalance;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import java.util.stream.Stream;
import org.jsoup.Jsoup;
import org.jsoup.nodes.Attribute;
import org.jsoup.nodes.Document;
import org.jsoup.nodes.Element;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.resonancegate.check.SpecEvaluator;
import org.resonancegate.report.ErrorEntry;
import org.resonancegate.report.Results;
import org.resonancegate.report.SpecResult;
import org.resonancegate.report.SpecStatus;
import org.resonancegate.spec.Criterion;
import org.resonancegate.spec.Dimensionless;
import org.resonancegate.spec.Severity;
import org.resonancegate.spec.SourceLocation;
import org.resonancegate.spec.Spec;
import org.resonancegate.spec.Waiver;

/**
 * The HTML report read back with an independent parser (jsoup): hostile spec text stays text,
 * the same results give the same bytes, a write is all or nothing.
 */
class HtmlReportTest {

    /** Markup, quotes, an entity, a comment closer, non-ASCII and a bidi override, in one string. */
    private static final String HOSTILE = "<script>alert(1)</script>\" onmouseover=\"alert(2)' <img src=x onerror=alert(3)>"
            + " &amp; &lt; --> ]]> Kältepumpe Nº 3 — 冷却塔 \u202Eevil";
    private static final String LONG = "Ü".repeat(3000) + "<b>";

    private static final Set<String> ELEMENTS = Set.of("html", "head", "meta", "title", "style", "body", "header",
            "h1", "h2", "h3", "div", "span", "main", "p", "table", "thead", "tbody", "tr", "th", "td", "a", "b", "br",
            "section", "figure", "figcaption", "ul", "li", "svg", "defs", "clippath", "rect", "line", "polyline",
            "circle", "text", "footer", "wbr", "#root");
    private static final Set<String> ATTRIBUTES = Set.of("lang", "charset", "name", "content", "class", "href", "id",
            "viewbox", "role", "aria-label", "aria-hidden", "x", "y", "width", "height", "x1", "y1", "x2", "y2",
            "points", "clip-path", "cx", "cy", "r", "text-anchor", "transform", "colspan");

    @TempDir
    Path dir;

    static Results hostile() {
        SourceLocation at = new SourceLocation("src/vibration/" + HOSTILE + ".json", 4, 2);
        Criterion.Isolation iso = new Criterion.Isolation(HOSTILE, Severity.ERROR,
                new Criterion.IsolationLimit.MaxTransmissibility(new Dimensionless(0.05, "0.05", at)), at);
        Criterion.Separation sep = new Criterion.Separation(LONG, Severity.WARNING,
                new Dimensionless(0.2, "20 %", at), at);
        Spec spec = new Spec(at.file(), HOSTILE, Optional.of(LONG + HOSTILE), Optional.of(HOSTILE),
                single(400, 4.0e6, 0.05), range(600, 1200),
                List.of(unbalance(HOSTILE, 1, 2000), force(LONG, order(2), 300, 30)), List.of(iso, sep),
                tolerances(0.1, null), List.of(new Waiver(HOSTILE, HOSTILE, LocalDate.of(2027, 1, 31), at)));
        SpecResult judged = SpecEvaluator.evaluate(spec, LocalDate.of(2026, 6, 1));
        SpecResult broken = new SpecResult(at.file(), Optional.of(HOSTILE), SpecStatus.ERROR, List.of(), List.of(),
                List.of(new ErrorEntry(AT, HOSTILE + LONG)));
        return new Results(List.of(judged, broken));
    }

    @Test
    void hostileTextStaysTextEverywhere() {
        Results results = hostile();
        assertFalse(results.specs().get(0).details().curves().isEmpty(), "the hostile spec has plots to escape");
        String html = HtmlReport.render(results);
        Document doc = Jsoup.parse(html);
        for (Element e : doc.getAllElements()) {
            assertTrue(ELEMENTS.contains(e.normalName()), "unexpected element <" + e.normalName() + ">");
            for (Attribute a : e.attributes()) {
                assertTrue(ATTRIBUTES.contains(a.getKey().toLowerCase(java.util.Locale.ROOT)),
                        "unexpected attribute " + a.getKey() + " on <" + e.normalName() + ">");
            }
        }
        assertTrue(doc.select("script, img").isEmpty());
        assertEquals(2, doc.select("style").size() + doc.select("head > title").size(), "one style block, one title");
        // the text reads back whole wherever it was shown: headings, table cells, SVG labels and tooltips
        String text = doc.text();
        assertTrue(text.contains(HOSTILE), "spec id shown as text");
        assertTrue(doc.select("section.spec h2").first().text().contains(HOSTILE));
        assertTrue(doc.select("figure.interference li").text().contains("running speed: " + HOSTILE));
        assertTrue(doc.select("table.waivers td").eachText().contains(HOSTILE));
        assertTrue(doc.select("table.checks b").eachText().contains(LONG));
        assertTrue(doc.select("table.errors td").eachText().contains(HOSTILE + LONG));
        assertTrue(doc.select("svg.chart").attr("aria-label").startsWith("interference diagram"));
    }

    @Test
    void sameResultsSameBytesAndNoClock() {
        String first = HtmlReport.render(hostile());
        String second = HtmlReport.render(hostile());
        assertEquals(first, second);
        assertFalse(first.contains(LocalDate.now().toString()), "no build date in the page");
        assertFalse(first.contains("\r"));
    }

    @Test
    void writeReplacesTheFileWholeAndLeavesNoTemporaryFile() throws IOException {
        Path target = dir.resolve("out").resolve(HtmlReport.FILE_NAME);
        Files.createDirectories(target.getParent());
        Files.writeString(target, "old");
        HtmlReport.write(hostile(), target);
        assertArrayEquals(HtmlReport.render(hostile()).getBytes(StandardCharsets.UTF_8), Files.readAllBytes(target));
        try (Stream<Path> files = Files.list(target.getParent())) {
            assertEquals(List.of(target), files.toList());
        }
    }

    @Test
    void aFailedWriteLeavesNeitherHalfAFileNorATemporaryOne() throws IOException {
        // a non-empty directory where the file should go: the final move must fail
        Path target = dir.resolve(HtmlReport.FILE_NAME);
        Files.createDirectories(target);
        Files.writeString(target.resolve("keep.txt"), "kept");
        assertThrows(IOException.class, () -> HtmlReport.write(hostile(), target));
        try (Stream<Path> files = Files.list(dir)) {
            assertEquals(List.of(target), files.toList());
        }
        assertEquals("kept", Files.readString(target.resolve("keep.txt")));
    }
}
