package org.resonancegate.spec;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Problems at the JSON level: syntax, duplicate keys, encoding and the format's size limits. */
class JsonReadingTest {

    @TempDir
    Path base;

    private LoadedSpec load(String text) {
        return new TestProject(base).loadOne("src/vibration/p.json", text);
    }

    @Test
    void truncatedFileIsReportedWhereItEnds() {
        String text = "{\n  \"format\": \"resonance-gate/1\",\n  \"id\": \"P-101\"";
        LoadedSpec loaded = load(text);
        // Line 3 is `  "id": "P-101"` (15 characters): the input ends at column 16.
        Diagnostic d = TestProject.assertOnlyDiagnostic(loaded, 3, 16, "invalid JSON", "ends too early", "closed");
        assertEquals("src/vibration/p.json", d.location().file());
    }

    @Test
    void invalidCharacterIsReportedAtIt() {
        String text = "{\n  \"format\": \"resonance-gate/1\",\n  \"id\": 'P-101'\n}";
        TestProject.assertOnlyDiagnostic(load(text), 3, 9, "invalid JSON", "double quotes, not single quotes");
    }

    /** The slips people make in JSON by hand, each said in words that name the fix, at the place it is. */
    @Test
    void commonSlipsAreNamed() {
        TestProject.assertOnlyDiagnostic(load("{\n  \"format\": \"resonance-gate/1\",\n}"), 3, 1,
                "comma before a closing } is not allowed");
        TestProject.assertOnlyDiagnostic(load("{\n  \"format\": \"resonance-gate/1\",\n  \"x\": [1, 2,]\n}"), 3, 14,
                "comma before a closing ] is not allowed");
        TestProject.assertOnlyDiagnostic(load("{\n  \"format\": \"resonance-gate/1\",\n  \"x\": [1 2]\n}"), 3, 11,
                "comma is missing between two items of a list", "found '2'");
        TestProject.assertOnlyDiagnostic(load("{\n  \"format\": resonance\n}"), 2, 13,
                "'resonance' is not a JSON value", "\"resonance\"");
        TestProject.assertOnlyDiagnostic(load("{\n  \"id\": \"P-1"), 2, 13, "ends inside a string");
    }

    @Test
    void commentsAreExplained() {
        String text = "{\n  \"format\": \"resonance-gate/1\", // pump\n  \"id\": \"P-101\"\n}";
        SourceLocation slash = TestProject.at("src/vibration/p.json", text, "//");
        TestProject.assertOnlyDiagnostic(load(text), slash.line(), slash.column(), "JSON has no comments");
        assertEquals(33, slash.column());
    }

    @Test
    void contentAfterTheTopLevelObjectIsRefused() {
        // VALID is eight lines and a final line feed: the extra object starts line 9.
        TestProject.assertOnlyDiagnostic(load(TestProject.VALID + "{}"), 9, 1, "after the end of the top-level value");
    }

    @Test
    void emptyFileAndNonObjectRootAreRefused() {
        TestProject.assertOnlyDiagnostic(load(""), 1, 1, "the file is empty");
        TestProject.assertOnlyDiagnostic(new TestProject(base).loadOne("list.json", "\n  [1, 2]"), 2, 3,
                "one JSON object", "found a list");
    }

    @Test
    void duplicateKeyIsReportedAtTheSecondNamingTheFirstsLine() {
        String text = TestProject.VALID.replace("\"id\": \"CHW-P-02\",", "\"id\": \"CHW-P-02\",\n  \"id\": \"CHW-P-03\",");
        LoadedSpec loaded = load(text);
        TestProject.assertOnlyDiagnostic(loaded, 4, 3, "duplicate key \"id\"", "line 3", "remove one");
    }

    @Test
    void duplicateKeyInsideANestedObjectToo() {
        String text = TestProject.VALID.replace("\"mass\": \"1850 kg\",", "\"mass\": \"1850 kg\", \"mass\": \"1900 kg\",");
        SourceLocation second = TestProject.at("src/vibration/p.json", text, "\"mass\": \"1900 kg\"");
        TestProject.assertOnlyDiagnostic(load(text), second.line(), second.column(), "duplicate key \"mass\"", "line 4");
    }

    @Test
    void invalidUtf8IsReportedWithItsPosition() {
        byte[] good = TestProject.VALID.replace("CHW-P-02", "CHW-P-0X").getBytes(StandardCharsets.UTF_8);
        int index = TestProject.VALID.indexOf("CHW-P-02") + 7;
        good[index] = (byte) 0xFF;
        TestProject project = new TestProject(base);
        project.writeBytes("bad.json", good);
        LoadedSpec loaded = project.loadAll().get(0);
        SourceLocation where = TestProject.at("bad.json", TestProject.VALID, "2\",\n  \"model\"");
        TestProject.assertOnlyDiagnostic(loaded, where.line(), where.column(), "not valid UTF-8", "0xFF");
    }

    /** The format's limit: nesting deeper than 32, the top-level object being level 1. */
    @Test
    void nestingDeeperThan32IsRefusedAt32Accepted() {
        // "$schema" (whose value the engine ignores) holds 31 nested lists: levels 2..32, accepted.
        String ok = TestProject.VALID.replace("\"format\"", "\"$schema\": " + "[".repeat(31) + "]".repeat(31) + ",\n  \"format\"");
        TestProject.spec(load(ok));

        String deep = TestProject.VALID.replace("\"format\"", "\"$schema\": " + "[".repeat(32) + "]".repeat(32) + ",\n  \"format\"");
        // The 32nd list (level 33) opens at column 14 + 31.
        TestProject.assertOnlyDiagnostic(load(deep), 2, 14 + 31, "nesting deeper than 32");
    }

    /** Strings are limited to 10,000 characters, counted in Unicode code points (not UTF-16 units). */
    @Test
    void stringOver10000CodePointsIsRefused() {
        String emoji = new String(Character.toChars(0x1F6E0)); // two UTF-16 units, one code point
        String fine = TestProject.VALID.replace("\"id\": \"CHW-P-02\",", "\"id\": \"CHW-P-02\", \"title\": \"" + emoji.repeat(10_000) + "\",");
        TestProject.spec(load(fine));
        String tooLong = TestProject.VALID.replace("\"id\": \"CHW-P-02\",", "\"id\": \"CHW-P-02\", \"title\": \"" + "é".repeat(10_001) + "\",");
        TestProject.assertOnlyDiagnostic(load(tooLong), 3, 30, "10001 characters", "limit of 10000");
    }

    @Test
    void listOfMoreThan1000ElementsIsRefused() {
        String one = "{\"name\": \"n%d\", \"kind\": \"order\", \"order\": 1}";
        StringBuilder many = new StringBuilder();
        for (int i = 0; i < 1001; i++) {
            many.append(i == 0 ? "" : ",").append(String.format(one, i));
        }
        String text = TestProject.VALID.replace("[{\"name\": \"impeller\", \"kind\": \"unbalance\", \"unbalance\": \"120 g·mm\"}]",
                "[" + many + "]");
        TestProject.assertOnlyDiagnostic(load(text), 6, 18, "1001 elements", "limit of 1000");
    }

    /** Jackson's own read constraints stay in place as a backstop (here: the length of a number). */
    @Test
    void overlongNumberHitsTheParsersBackstop() {
        String text = TestProject.VALID.replace("{\"ratio\": 0.05}", "{\"ratio\": 0." + "5".repeat(500) + "}");
        SourceLocation at = TestProject.at("src/vibration/p.json", text, "0.555");
        LoadedSpec loaded = load(text);
        assertEquals(1, loaded.diagnostics().size(), TestProject.describe(loaded.diagnostics()));
        Diagnostic d = loaded.diagnostics().get(0);
        assertTrue(d.message().contains("exceeds a reading limit"), d.message());
        assertEquals(at.line(), d.location().line());
    }

    @Test
    void fileOver4MiBIsRefusedBeforeReading() {
        byte[] big = new byte[4 * 1024 * 1024 + 1];
        java.util.Arrays.fill(big, (byte) ' ');
        byte[] text = TestProject.VALID.getBytes(StandardCharsets.UTF_8);
        System.arraycopy(text, 0, big, 0, text.length);
        TestProject project = new TestProject(base);
        project.writeBytes("big.json", big);
        TestProject.assertOnlyDiagnostic(project.loadAll().get(0), 1, 1, "4194305 bytes", "4 MiB");

        byte[] justUnder = java.util.Arrays.copyOf(big, 4 * 1024 * 1024);
        project.writeBytes("big.json", justUnder);
        TestProject.spec(project.loadAll().get(0));
    }

    @Test
    void aFileThatCannotBeReadIsADiagnosticNotAnException() {
        List<LoadedSpec> loaded = SpecLoader.load(base, List.of(base.resolve("src/vibration/missing.json")));
        assertEquals(1, loaded.size());
        assertFalse(loaded.get(0).spec().isPresent());
        TestProject.assertOnlyDiagnostic(loaded.get(0), 1, 1, "cannot read the file");
        assertEquals("src/vibration/missing.json", loaded.get(0).file());
    }
}
