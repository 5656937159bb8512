package org.resonancegate.report.html;

import gg.jte.ContentType;
import gg.jte.TemplateEngine;
import gg.jte.output.StringOutput;
import gg.jte.output.WriterOutput;
import java.io.BufferedWriter;
import java.io.IOException;
import java.io.OutputStreamWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import org.resonancegate.report.AtomicWrite;
import org.resonancegate.report.Results;

/**
 * The HTML report: one self-contained page (styles inline, plots as inline SVG, no script, nothing
 * fetched) drawn from {@link Results} alone. The templates under {@code src/main/jte} are compiled
 * to Java at build time; the engine escapes every value by its HTML context, so no text from a
 * spec can become markup. The same results give the same bytes.
 */
public final class HtmlReport {

    /** The file name front ends write inside their output directory. */
    public static final String FILE_NAME = "report.html";

    private static final String PACKAGE = "org.resonancegate.report.html.templates";

    private static final TemplateEngine ENGINE = TemplateEngine.createPrecompiled(null, ContentType.Html,
            HtmlReport.class.getClassLoader(), PACKAGE);

    private HtmlReport() {
    }

    /** The page as text. */
    public static String render(Results results) {
        StringOutput out = new StringOutput();
        ENGINE.render("report.jte", Pages.of(results), out);
        return out.toString();
    }

    /** Writes the page (UTF-8) to {@code target}, atomically, creating its directory. */
    public static void write(Results results, Path target) throws IOException {
        Page page = Pages.of(results);
        // streamed as it is rendered: the same characters, encoded as String.getBytes would
        AtomicWrite.write(target, out -> {
            Writer w = new BufferedWriter(new OutputStreamWriter(out, StandardCharsets.UTF_8), 1 << 14);
            ENGINE.render("report.jte", page, new WriterOutput(w));
            w.flush();
        });
    }
}
