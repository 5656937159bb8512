package org.resonancegate.spec;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** A file's values flattened to JSON paths and literals as written, which is what a comparison diffs. */
class SpecInputsTest {

    @Test
    void everyValueHasItsPathItsTextAsWrittenAndItsPlace(@TempDir Path dir) {
        TestProject project = new TestProject(dir);
        Path file = project.write("src/vibration/a.json", """
                {"id": "F-1", "model": {"mounts": [{"stiffness": {"z": "135 kN/m"}}, {"free": true}]},
                 "waivers": [], "a.b": 1.50, "q": "say \\"hi\\"", "n": null}
                """);
        List<SpecInputs.Input> inputs = SpecInputs.read(dir, file, SpecFiles.disk());
        assertEquals(List.of("id", "model.mounts[0].stiffness.z", "model.mounts[1].free", "waivers", "[\"a.b\"]",
                "q", "n"), inputs.stream().map(SpecInputs.Input::path).toList());
        assertEquals(List.of("\"F-1\"", "\"135 kN/m\"", "true", "[]", "1.50", "\"say \\\"hi\\\"\"", "null"),
                inputs.stream().map(SpecInputs.Input::text).toList());
        // column of the opening quote of "135 kN/m", counted by hand: 55 characters precede it
        assertEquals("src/vibration/a.json:1:56", inputs.get(1).location().display());
    }

    @Test
    void aFileThatIsNotJsonHasNoInputs(@TempDir Path dir) {
        TestProject project = new TestProject(dir);
        Path file = project.write("src/vibration/a.json", "{\"id\": ");
        assertEquals(List.of(), SpecInputs.read(dir, file, SpecFiles.disk()));
    }
}
