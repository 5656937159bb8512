package org.resonancegate.report;

import java.io.BufferedWriter;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.io.OutputStreamWriter;
import java.io.UncheckedIOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import javax.xml.stream.XMLOutputFactory;
import javax.xml.stream.XMLStreamException;
import javax.xml.stream.XMLStreamWriter;

/**
 * Writes {@link Results} in the JUnit XML shape CI servers show in their test tabs: a
 * {@code <testsuites>} root, one {@code <testsuite>} per spec (named by its file), one
 * {@code <testcase>} per criterion (class name: the spec's id, test name: the criterion's id and
 * rule), and the counts {@code tests}, {@code failures}, {@code errors} and {@code skipped} on
 * every suite and on the root.
 *
 * <ul>
 * <li>{@code fail}: a {@code <failure>} with the short message as its attribute and the located
 *     line ({@code path:line:col: message}) as its text.</li>
 * <li>{@code waived}: {@code <skipped>} with the waiver's reason. Test tabs show skipped tests
 *     apart, neither green nor red, which is what a failure accepted for a while is; a failure
 *     would turn the build red (or "unstable") against the spec's own verdict.</li>
 * <li>{@code warning}: a passing test case with the finding in {@code <system-out>}, since a
 *     warning-severity criterion does not fail its spec, and CI servers count any
 *     {@code <failure>} as one.</li>
 * <li>A spec in {@code error}: one test case per diagnostic, each with an {@code <error>}.</li>
 * <li>With a baseline, each criterion's test case has a {@code <properties>} block with its
 *     {@code transition} ({@code new}, {@code carried-over}, {@code fixed}, {@code pass}), and a
 *     failure's message ends with it in brackets. Test names stay as they are, so a CI server
 *     keeps tracking the same test across builds.</li>
 * </ul>
 * Written with the JDK's streaming XML writer, so markup in user text is escaped; characters XML
 * cannot hold are replaced ({@link XmlText}). No {@code time} or {@code timestamp} attributes:
 * the file is the same bytes for the same results.
 */
public final class JunitReport {

    /** The file name the plugin writes inside its output directory. */
    public static final String FILE_NAME = "junit.xml";

    private static final XMLOutputFactory FACTORY = XMLOutputFactory.newFactory();

    private JunitReport() {
    }

    public static byte[] toBytes(Results results) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        try {
            writeTo(results, out);
        } catch (IOException e) {
            throw new UncheckedIOException(e); // a byte array does not fail
        }
        return out.toByteArray();
    }

    /** Writes the report to {@code target}, creating its directory; atomic ({@link AtomicWrite}). */
    public static void write(Results results, Path target) throws IOException {
        AtomicWrite.write(target, out -> writeTo(results, out));
    }

    /**
     * Streams the report to {@code out}, encoded by a buffered UTF-8 writer: given a byte stream
     * the JDK's XML writer encodes itself, one {@code write} call per byte. Every character here
     * can be encoded (the text was made legal first), so the bytes are the same either way.
     */
    private static void writeTo(Results results, OutputStream target) throws IOException {
        Writer out = new BufferedWriter(new OutputStreamWriter(target, StandardCharsets.UTF_8), 1 << 14);
        try {
            XMLStreamWriter x = FACTORY.createXMLStreamWriter(out);
            x.writeStartDocument("UTF-8", "1.0");
            x.writeCharacters("\n");
            x.writeComment(" " + ConsoleReport.CAUTION + " ");
            x.writeCharacters("\n");
            x.writeStartElement("testsuites");
            x.writeAttribute("name", EngineInfo.NAME);
            counts(x, Counts.of(results));
            for (SpecResult spec : results.specs()) {
                suite(x, spec, results);
            }
            x.writeCharacters("\n");
            x.writeEndElement();
            x.writeCharacters("\n");
            x.writeEndDocument();
            x.close();
        } catch (XMLStreamException e) {
            if (e.getNestedException() instanceof IOException io) {
                throw io;
            }
            // only a fault in this class can reach here: the text was made legal before writing
            throw new IllegalStateException("cannot write the JUnit XML report: " + e.getMessage(), e);
        }
        out.flush();
    }

    private static void suite(XMLStreamWriter x, SpecResult spec, Results results) throws XMLStreamException {
        String className = spec.id().orElse(spec.file());
        x.writeCharacters("\n  ");
        x.writeStartElement("testsuite");
        x.writeAttribute("name", XmlText.attribute(spec.file()));
        counts(x, Counts.of(spec));
        x.writeCharacters("\n    ");
        x.writeStartElement("properties");
        property(x, "file", spec.file());
        spec.id().ifPresent(id -> property(x, "id", id));
        property(x, "status", spec.status().key());
        property(x, "caution", ConsoleReport.CAUTION);
        x.writeCharacters("\n    ");
        x.writeEndElement();
        for (ErrorEntry error : spec.errors()) {
            testCase(x, className, "spec error at " + error.location().display(), spec.file());
            outcome(x, "error", error.message(), SarifReport.SPEC_ERROR,
                    error.location().display() + ": " + error.message());
            x.writeCharacters("\n    ");
            x.writeEndElement();
        }
        for (CheckResult check : spec.checks()) {
            testCase(x, className, check.criterion() + " " + check.rule(), spec.file());
            java.util.Optional<Transition> transition = ChangeWords.transition(results.baseline(), spec, check);
            if (transition.isPresent()) {
                x.writeCharacters("\n      ");
                x.writeStartElement("properties");
                property(x, "transition", transition.get().key());
                x.writeCharacters("\n      ");
                x.writeEndElement();
            }
            String tag = transition.filter(t -> t != Transition.PASS).map(ComparisonConsole::tag).orElse("");
            String located = check.location().display() + ": " + check.message();
            switch (check.status()) {
                case PASS -> {
                    // a passing test case has no outcome element
                }
                case FAIL -> outcome(x, "failure", check.message() + tag, check.rule(), located + tag);
                case WAIVED -> {
                    x.writeCharacters("\n      ");
                    x.writeStartElement("skipped");
                    x.writeAttribute("message", XmlText.attribute(check.waiver()
                            .map(w -> "waived through " + w.expires() + ": " + w.reason()).orElse(check.message())));
                    x.writeCharacters(XmlText.legal(located));
                    x.writeEndElement();
                }
                case WARNING -> {
                    x.writeCharacters("\n      ");
                    x.writeStartElement("system-out");
                    x.writeCharacters(XmlText.legal("warning (does not fail the spec): " + located + tag));
                    x.writeEndElement();
                }
            }
            x.writeCharacters(check.status() == CheckStatus.PASS && transition.isEmpty() ? "" : "\n    ");
            x.writeEndElement();
        }
        x.writeCharacters("\n  ");
        x.writeEndElement();
    }

    private static void testCase(XMLStreamWriter x, String className, String name, String file)
            throws XMLStreamException {
        x.writeCharacters("\n    ");
        x.writeStartElement("testcase");
        x.writeAttribute("classname", XmlText.attribute(className));
        x.writeAttribute("name", XmlText.attribute(name));
        x.writeAttribute("file", XmlText.attribute(file));
    }

    private static void outcome(XMLStreamWriter x, String element, String message, String type, String text)
            throws XMLStreamException {
        x.writeCharacters("\n      ");
        x.writeStartElement(element);
        x.writeAttribute("message", XmlText.attribute(message));
        x.writeAttribute("type", XmlText.attribute(type));
        x.writeCharacters(XmlText.legal(text));
        x.writeEndElement();
    }

    private static void property(XMLStreamWriter x, String name, String value) {
        try {
            x.writeCharacters("\n      ");
            x.writeEmptyElement("property");
            x.writeAttribute("name", name);
            x.writeAttribute("value", XmlText.attribute(value));
        } catch (XMLStreamException e) {
            throw new IllegalStateException("cannot write the JUnit XML report: " + e.getMessage(), e);
        }
    }

    private static void counts(XMLStreamWriter x, Counts c) throws XMLStreamException {
        x.writeAttribute("tests", Integer.toString(c.tests));
        x.writeAttribute("failures", Integer.toString(c.failures));
        x.writeAttribute("errors", Integer.toString(c.errors));
        x.writeAttribute("skipped", Integer.toString(c.skipped));
    }

    /** What CI servers read off a suite: every test case, and how many failed, broke or were skipped. */
    private record Counts(int tests, int failures, int errors, int skipped) {

        static Counts of(SpecResult spec) {
            int failures = 0;
            int skipped = 0;
            for (CheckResult check : spec.checks()) {
                failures += check.status() == CheckStatus.FAIL ? 1 : 0;
                skipped += check.status() == CheckStatus.WAIVED ? 1 : 0;
            }
            int errors = spec.errors().size();
            return new Counts(spec.checks().size() + errors, failures, errors, skipped);
        }

        static Counts of(Results results) {
            Counts sum = new Counts(0, 0, 0, 0);
            for (SpecResult spec : results.specs()) {
                Counts c = of(spec);
                sum = new Counts(sum.tests + c.tests, sum.failures + c.failures, sum.errors + c.errors,
                        sum.skipped + c.skipped);
            }
            return sum;
        }
    }
}
