package org.resonancegate.report;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import javax.xml.XMLConstants;
import javax.xml.parsers.DocumentBuilderFactory;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.NodeList;

/**
 * JUnit XML read back with the JDK's DOM parser (a conforming XML 1.0 parser, independent of the
 * streaming writer), its counts compared with the statuses in the results.
 */
class JunitReportTest {

    @TempDir
    Path dir;

    private static Document parse(byte[] xml) throws Exception {
        DocumentBuilderFactory factory = DocumentBuilderFactory.newInstance();
        factory.setFeature(XMLConstants.FEATURE_SECURE_PROCESSING, true);
        factory.setFeature("http://apache.org/xml/features/disallow-doctype-decl", true);
        return factory.newDocumentBuilder().parse(new ByteArrayInputStream(xml));
    }

    private static List<Element> children(Element parent, String name) {
        List<Element> out = new ArrayList<>();
        NodeList list = parent.getChildNodes();
        for (int i = 0; i < list.getLength(); i++) {
            if (list.item(i) instanceof Element e && e.getTagName().equals(name)) {
                out.add(e);
            }
        }
        return out;
    }

    private static int count(SpecResult spec, CheckStatus status) {
        return (int) spec.checks().stream().filter(c -> c.status() == status).count();
    }

    @Test
    void countsOnEverySuiteAndTheRootMatchTheResults() throws Exception {
        Results results = EngineRuns.mixed(dir);
        Element root = parse(JunitReport.toBytes(results)).getDocumentElement();
        assertEquals("testsuites", root.getTagName());
        List<Element> suites = children(root, "testsuite");
        assertEquals(results.specs().size(), suites.size());
        int tests = 0;
        int failures = 0;
        int errors = 0;
        int skipped = 0;
        for (int i = 0; i < suites.size(); i++) {
            SpecResult spec = results.specs().get(i);
            Element suite = suites.get(i);
            assertEquals(spec.file(), suite.getAttribute("name"));
            int specTests = spec.checks().size() + spec.errors().size();
            List<Element> cases = children(suite, "testcase");
            assertEquals(specTests, cases.size());
            assertEquals(specTests, Integer.parseInt(suite.getAttribute("tests")));
            assertEquals(count(spec, CheckStatus.FAIL), Integer.parseInt(suite.getAttribute("failures")));
            assertEquals(spec.errors().size(), Integer.parseInt(suite.getAttribute("errors")));
            assertEquals(count(spec, CheckStatus.WAIVED), Integer.parseInt(suite.getAttribute("skipped")));
            // the attributes agree with the elements a CI server would count instead
            assertEquals(count(spec, CheckStatus.FAIL), cases.stream().mapToInt(c -> children(c, "failure").size()).sum());
            assertEquals(spec.errors().size(), cases.stream().mapToInt(c -> children(c, "error").size()).sum());
            assertEquals(count(spec, CheckStatus.WAIVED), cases.stream().mapToInt(c -> children(c, "skipped").size()).sum());
            tests += specTests;
            failures += count(spec, CheckStatus.FAIL);
            errors += spec.errors().size();
            skipped += count(spec, CheckStatus.WAIVED);
        }
        assertEquals(List.of(6, 2, 1, 1), List.of(tests, failures, errors, skipped), "EngineRuns: 5 specs");
        assertEquals(tests, Integer.parseInt(root.getAttribute("tests")));
        assertEquals(failures, Integer.parseInt(root.getAttribute("failures")));
        assertEquals(errors, Integer.parseInt(root.getAttribute("errors")));
        assertEquals(skipped, Integer.parseInt(root.getAttribute("skipped")));
    }

    @Test
    void casesAreNamedForTestTabsAndCarryTheLocatedMessage() throws Exception {
        Results results = EngineRuns.mixed(dir);
        Element root = parse(JunitReport.toBytes(results)).getDocumentElement();
        Element fan = children(root, "testsuite").get(1);
        Element sep = children(fan, "testcase").get(0);
        assertEquals("F-2", sep.getAttribute("classname"));
        assertEquals("SEP separation", sep.getAttribute("name"));
        Element failure = children(sep, "failure").get(0);
        CheckResult check = results.specs().get(1).checks().get(0);
        assertEquals(check.message(), failure.getAttribute("message"));
        assertEquals(check.location().display() + ": " + check.message(), failure.getTextContent());
        Element force = children(fan, "testcase").get(1);
        assertEquals(List.of(), children(force, "failure"), "a warning does not fail");
        assertTrue(children(force, "system-out").get(0).getTextContent().startsWith("warning"));
        Element waived = children(children(root, "testsuite").get(2), "testcase").get(0);
        assertEquals("waived through 2999-12-31: runs below 1400 rpm in service; design review 3",
                children(waived, "skipped").get(0).getAttribute("message"));
    }

    @Test
    void hostileTextParsesAndComesBackWithOnlyTheIllegalCharactersReplaced() throws Exception {
        Results results = EngineRuns.hostile(dir);
        Element root = parse(JunitReport.toBytes(results)).getDocumentElement();
        Element suite = children(root, "testsuite").get(0);
        assertEquals("src/vibration/h <&>'\"|`.json", suite.getAttribute("name"));
        String className = children(suite, "testcase").get(0).getAttribute("classname");
        // XML 1.0 production [2] Char: tab, LF, CR, U+0020-U+D7FF, U+E000-U+FFFD, U+10000 up; the rest became U+FFFD
        StringBuilder expected = new StringBuilder();
        EngineRuns.HOSTILE_READ.codePoints().forEach(c -> {
            boolean legal = c == 0x9 || c == 0xA || c == 0xD || c >= 0x20 && c <= 0xD7FF || c >= 0xE000 && c <= 0xFFFD
                    || c >= 0x10000;
            expected.appendCodePoint(legal ? c : 0xFFFD);
        });
        assertEquals(expected.toString(), className);
        assertTrue(className.contains("<script>alert(\"x\")</script>"), "markup is text, not elements");
        assertEquals(List.of(), children(suite, "script"));
        assertEquals(EngineRuns.LONG_ID, children(children(root, "testsuite").get(1), "testcase").get(0)
                .getAttribute("classname"), "10,000 characters, whole");
        Element keyError = children(children(children(root, "testsuite").get(2), "testcase").get(0), "error").get(0);
        assertTrue(keyError.getAttribute("message").startsWith("unknown key \"<img src=x onerror=alert(1)>\""));
    }

    @Test
    void charactersXmlCannotHoldAreReplacedAndEverythingElseKept() {
        assertEquals("a\uFFFDb\uFFFDc\uFFFDd\uFFFD", XmlText.legal("a\u0000b\uD800c\uFFFEd\u001b"));
        assertEquals("tab\tline\nemoji 😀 水", XmlText.legal("tab\tline\nemoji 😀 水"));
        assertEquals("two lines", XmlText.attribute("two\nlines"));
    }

    @Test
    void sameResultsGiveTheSameBytes() {
        assertArrayEquals(JunitReport.toBytes(EngineRuns.mixed(dir.resolve("one"))),
                JunitReport.toBytes(EngineRuns.mixed(dir.resolve("two"))));
    }
}
