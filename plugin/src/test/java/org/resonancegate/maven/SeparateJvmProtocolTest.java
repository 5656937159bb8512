package org.resonancegate.maven;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** What crosses between Maven's JVM and the separate one arrives as it left. */
class SeparateJvmProtocolTest {

    @Test
    void aRecordKeepsTabsLineBreaksAndBackslashesInItsFields() {
        String awkward = "title\twith tab\nnew line\r\\n not a break \\ end";
        String line = SeparateJvmProtocol.record(SeparateJvmProtocol.LINE, "ERROR", awkward, "");
        assertEquals(-1, line.indexOf('\n'));
        assertEquals(List.of("L", "ERROR", awkward, ""), SeparateJvmProtocol.fields(line));
    }

    @Test
    void settingsComeBackTheSame(@TempDir Path dir) throws Exception {
        GateSettings settings = new GateSettings(dir.resolve("plant room"), dir.resolve("plant room/src/vib=ration"),
                dir.resolve("out"), List.of("**/*.json", "pumps/p\t1.json"), List.of("draft/**"), List.of("json", "sarif"),
                Optional.of(dir.resolve("ci/summary.md")), Optional.of("origin/main"), "new-violation", "plant");
        Path file = dir.resolve("settings.txt");
        SeparateJvmProtocol.writeSettings(settings, file, Optional.of(dir.resolve("part.md")));
        SeparateJvmProtocol.Request back = SeparateJvmProtocol.readSettings(file);
        assertEquals(settings, back.settings());
        assertEquals(Optional.of(dir.resolve("part.md")), back.summaryPart());
    }

    @Test
    void absentOptionalSettingsStayAbsent(@TempDir Path dir) throws Exception {
        GateSettings settings = new GateSettings(dir, dir.resolve("src"), dir.resolve("out"), List.of("**/*.json"),
                List.of(), List.of(), Optional.empty(), Optional.empty(), "", "");
        Path file = dir.resolve("settings.txt");
        SeparateJvmProtocol.writeSettings(settings, file, Optional.empty());
        SeparateJvmProtocol.Request back = SeparateJvmProtocol.readSettings(file);
        assertEquals(settings, back.settings());
        assertEquals(Optional.empty(), back.summaryPart());
    }
}
