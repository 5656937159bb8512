package org.resonancegate.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;

import org.junit.jupiter.api.Test;

/** A console line stays one line, whatever text from a spec it carries. */
class ConsoleLineTest {

    @Test
    void lineBreaksAndControlCharactersInSpecTextAreShownNotObeyed() {
        // a spec id made to start lines of its own in a CI log: a workflow command and a forged verdict
        ConsoleLine line = new ConsoleLine(ConsoleLevel.ERROR,
                "src/a.json:3:9: INJ\n::error file=pom.xml::x\r\n[INFO] BUILD SUCCESS\u001B[0m\u2028end\tok");
        assertEquals("src/a.json:3:9: INJ\\n::error file=pom.xml::x\\r\\n[INFO] BUILD SUCCESS\\u001B[0m\\u2028end\\tok",
                line.text());
    }

    @Test
    void anOrdinaryLineIsKeptAsItIs() {
        String text = "src/vibration/cwp-2.json:14:7: CWP-2 SEP separation: 9.16 Hz µ · ² ok";
        assertSame(text, new ConsoleLine(ConsoleLevel.INFO, text).text());
    }
}
