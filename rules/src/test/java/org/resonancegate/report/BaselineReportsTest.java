package org.resonancegate.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.networknt.schema.InputFormat;
import com.networknt.schema.Schema;
import com.networknt.schema.SchemaRegistry;
import com.networknt.schema.SpecificationVersion;
import java.io.ByteArrayInputStream;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.time.Clock;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import javax.xml.XMLConstants;
import javax.xml.parsers.DocumentBuilderFactory;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.resonancegate.baseline.GitProject;
import org.resonancegate.report.html.HtmlReport;
import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.NodeList;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/**
 * Every report file with a real baseline: three one-mass specs committed to a JGit repository,
 * then edited, judged by the engine on both sides. The physics is f = √(k/m)/2π for one mass on
 * one spring (S. S. Rao, Mechanical Vibrations, chapter 2; from memory) against the running band
 * 900–1480 rpm, 15 to 24.67 Hz, with the 20 % separation margin of {@link GitProject#spec}:
 * <ul>
 * <li>P-1: 40 MN/m (31.83 Hz, 22.5 % above the band: passes) → 20 MN/m (22.51 Hz, inside: fails), new;</li>
 * <li>Q-1: 20 MN/m → 21 MN/m (23.06 Hz, still inside), carried over;</li>
 * <li>R-1: 20 MN/m → 40 MN/m, fixed.</li>
 * </ul>
 * P-1's title changes to text that means something in each format; it must come out as written.
 */
class BaselineReportsTest {

    private static final String HOSTILE = "</td><script>alert(1)</script> | **x** & ]]> \\u0007";
    private static final Clock NOW = Clock.fixed(Instant.parse("2026-12-01T09:00:00Z"), ZoneOffset.UTC);
    private static final JsonMapper JSON = JsonMapper.builder().build();
    private static Schema schema;

    @TempDir
    Path dir;

    @BeforeAll
    static void loadSchema() throws Exception {
        // the official SARIF 2.1.0 schema, validated with networknt as SarifReportTest does
        try (InputStream in = BaselineReportsTest.class.getResourceAsStream("/schema/sarif-schema-2.1.0.json")) {
            schema = SchemaRegistry.withDefaultDialect(SpecificationVersion.DRAFT_7).getSchema(in);
        }
    }

    static Results judged(Path dir) throws Exception {
        try (GitProject repo = new GitProject(dir, "")) {
            repo.write("src/vibration/p.json", GitProject.spec("P-1", "40 MN/m", ", \"title\": \"pump\""));
            repo.write("src/vibration/q.json", GitProject.spec("Q-1", "20 MN/m", ""));
            repo.write("src/vibration/r.json", GitProject.spec("R-1", "20 MN/m", ""));
            repo.commit("three pumps", Instant.parse("2026-11-02T09:00:00Z"));
            repo.write("src/vibration/p.json", GitProject.spec("P-1", "20 MN/m", ", \"title\": \"" + HOSTILE + "\""));
            repo.write("src/vibration/q.json", GitProject.spec("Q-1", "21 MN/m", ""));
            repo.write("src/vibration/r.json", GitProject.spec("R-1", "40 MN/m", ""));
            return repo.judge("HEAD", NOW);
        }
    }

    @Test
    void theMarkdownSummaryLeadsWithWhatTheChangeDid() throws Exception {
        Results r = judged(dir);
        String commit = r.baseline().orElseThrow().commit();
        String md = MarkdownSummary.render(r, "resonance-gate", Optional.of("report.html"));
        List<String> lines = md.lines().toList();
        assertEquals("**Against HEAD (`" + commit.substring(0, 10) + "`): 1 new failing, 1 carried over, 1 fixed; "
                + "3 specs changed**", lines.get(2), md);
        assertTrue(md.indexOf("Against HEAD") < md.indexOf("3 specs: "), "the change comes before the count line");
        assertTrue(md.contains("| P-1 | model.stiffness | \"40 MN/m\" | \"20 MN/m\" | src/vibration/p.json:4:"), md);
        // mode 1 of P-1: 31.83 Hz → 22.51 Hz, −29.29 % (√(20/40) − 1)
        assertTrue(md.contains("| P-1 | mode 1 | 31.83 Hz | 22.51 Hz (−29.29 %) |"), md);
        assertTrue(md.contains("| fail | new | P-1 | SEP | separation |"), md);
        assertTrue(md.contains("| fail | carried over | Q-1 | SEP | separation |"), md);
        assertTrue(md.contains("Fixed since HEAD: R-1 SEP separation."), md);
        // the hostile title is a changed input: escaped, one table row, no raw tag, no bell
        assertFalse(md.contains("<script>"), md);
        assertTrue(md.contains("\\<script\\>alert(1)\\</script\\> \\| \\*\\*x\\*\\* \\&"), md);
        assertFalse(md.contains("\u0007"));
    }

    @Test
    void sarifCarriesItsOwnBaselineStateAndStaysValid() throws Exception {
        Results r = judged(dir);
        String sarif = new String(SarifReport.toBytes(r), StandardCharsets.UTF_8);
        assertEquals(List.of(), schema.validate(sarif, InputFormat.JSON,
                context -> context.executionConfig(config -> config.formatAssertionsEnabled(true))));
        JsonNode run = JSON.readTree(sarif).get("runs").get(0);
        List<String> states = new ArrayList<>();
        for (JsonNode result : run.get("results")) {
            states.add(result.get("properties").get("specId").asString() + " " + result.get("baselineState").asString()
                    + " " + result.get("properties").get("transition").asString());
        }
        // Q-1's mode moved (22.51 Hz to 23.06 Hz) but stays inside the band, so its separation is 0 on both
        // sides: same status, value and limit, which SARIF calls unchanged
        assertEquals(List.of("P-1 new new", "Q-1 unchanged carried-over"), states);
        assertTrue(run.get("results").get(0).get("message").get("text").asString().contains("SEP separation (new):"));
        assertEquals("HEAD", run.get("properties").get("baselineRef").asString());
        assertEquals(r.baseline().orElseThrow().commit(), run.get("properties").get("baselineCommit").asString());
        assertEquals("R-1 SEP separation (src/vibration/r.json)",
                run.get("properties").get("fixedSinceBaseline").get(0).asString());
    }

    @Test
    void junitKeepsTestNamesAndSaysTheTransition() throws Exception {
        Results r = judged(dir);
        DocumentBuilderFactory factory = DocumentBuilderFactory.newInstance();
        factory.setFeature(XMLConstants.FEATURE_SECURE_PROCESSING, true);
        factory.setFeature("http://apache.org/xml/features/disallow-doctype-decl", true);
        Document doc = factory.newDocumentBuilder().parse(new ByteArrayInputStream(JunitReport.toBytes(r)));
        NodeList cases = doc.getElementsByTagName("testcase");
        List<String> seen = new ArrayList<>();
        for (int i = 0; i < cases.getLength(); i++) {
            Element c = (Element) cases.item(i);
            String transition = "";
            NodeList props = c.getElementsByTagName("property");
            for (int j = 0; j < props.getLength(); j++) {
                Element p = (Element) props.item(j);
                transition = p.getAttribute("name").equals("transition") ? p.getAttribute("value") : transition;
            }
            NodeList failures = c.getElementsByTagName("failure");
            String message = failures.getLength() == 0 ? "-" : ((Element) failures.item(0)).getAttribute("message");
            seen.add(c.getAttribute("classname") + " " + c.getAttribute("name") + " " + transition + " "
                    + (message.endsWith(" (new)") ? "(new)" : message.endsWith(" (carried over)") ? "(carried over)"
                    : message));
        }
        assertEquals(List.of("P-1 SEP separation new (new)", "Q-1 SEP separation carried-over (carried over)",
                "R-1 SEP separation fixed -"), seen);
    }

    @Test
    void theHtmlReportShowsWhatChangedWithBadgesAndEscapesTheInputs() throws Exception {
        Results r = judged(dir);
        String html = HtmlReport.render(r);
        int changes = html.indexOf("<h2>What changed since HEAD</h2>");
        assertTrue(changes > 0 && changes < html.indexOf("<h2>Overview</h2>"), "the change block comes first");
        assertTrue(html.contains(r.baseline().orElseThrow().commit()));
        assertTrue(html.contains("<p class=\"lead\">1 new failing, 1 carried over, 1 fixed; 3 specs changed, 0 unchanged</p>"),
                html);
        assertTrue(html.contains("<td>model.stiffness</td><td>\"40 MN/m\"</td><td><b>\"20 MN/m\"</b></td>"
                + "<td class=\"loc\">src/vibration/p.json:4:"), html);
        assertTrue(html.contains("<td class=\"num\">31.83 Hz</td><td class=\"num\"><b>22.51 Hz</b></td><td class=\"num\">−29.29 %</td>"), html);
        assertTrue(html.contains("<span class=\"tb new\">new</span>"));
        assertTrue(html.contains("<span class=\"tb carried-over\">carried over</span>"));
        assertTrue(html.contains("<span class=\"tb fixed\">fixed</span>"));
        assertFalse(html.contains("<script>"), "no spec text becomes markup");
        assertFalse(html.contains("</td><script>"));
        assertTrue(html.contains("&lt;/td&gt;&lt;script&gt;alert(1)&lt;/script&gt;"));
    }
}
