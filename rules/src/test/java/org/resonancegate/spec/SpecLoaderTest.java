package org.resonancegate.spec;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.Optional;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The entry point over several files: ordering, ids across files, isolation of broken files. */
class SpecLoaderTest {

    @TempDir
    Path base;

    @Test
    void twoSpecsWithTheSameIdEachNameTheOther() {
        TestProject project = new TestProject(base);
        project.write("src/vibration/b/pump.json", TestProject.VALID);
        project.write("src/vibration/a/pump.json", TestProject.VALID);
        List<LoadedSpec> all = project.loadAll();
        assertEquals(List.of("src/vibration/a/pump.json", "src/vibration/b/pump.json"),
                all.stream().map(LoadedSpec::file).toList());
        SourceLocation id = TestProject.at("x", TestProject.VALID, "\"CHW-P-02\"");
        Diagnostic a = TestProject.assertOnlyDiagnostic(all.get(0), id.line(), id.column(),
                "id \"CHW-P-02\" is also used by src/vibration/b/pump.json");
        assertEquals("src/vibration/a/pump.json", a.location().file());
        TestProject.assertOnlyDiagnostic(all.get(1), id.line(), id.column(),
                "id \"CHW-P-02\" is also used by src/vibration/a/pump.json");
        assertEquals(Optional.of("CHW-P-02"), all.get(0).id());
    }

    @Test
    void aBrokenSpecDoesNotStopTheOthersAndResultsAreSortedByPath() {
        TestProject project = new TestProject(base);
        project.write("src/vibration/z.json", TestProject.VALID.replace("CHW-P-02", "Z-1"));
        project.write("src/vibration/m.json", "{ not json");
        project.write("src/vibration/a.json", TestProject.VALID.replace("CHW-P-02", "A-1").replace("\"1850 kg\"", "\"1850\""));
        List<LoadedSpec> all = project.loadAll();
        assertEquals(List.of("src/vibration/a.json", "src/vibration/m.json", "src/vibration/z.json"),
                all.stream().map(LoadedSpec::file).toList());
        assertTrue(all.get(0).spec().isEmpty());
        assertEquals(Optional.of("A-1"), all.get(0).id());
        assertTrue(all.get(1).spec().isEmpty());
        assertEquals(Optional.empty(), all.get(1).id());
        assertEquals("Z-1", TestProject.spec(all.get(2)).id());
    }

    @Test
    void relativeFilesAreTakenRelativeToTheProjectBase() {
        TestProject project = new TestProject(base);
        project.write("src/vibration/p.json", TestProject.VALID);
        List<LoadedSpec> all = SpecLoader.load(base, List.of(Path.of("src/vibration/p.json")));
        assertEquals("src/vibration/p.json", TestProject.spec(all.get(0)).file());
    }

    @Test
    void theSameFileListedTwiceIsReadOnce() {
        TestProject project = new TestProject(base);
        Path p = project.write("src/vibration/p.json", TestProject.VALID);
        List<LoadedSpec> all = SpecLoader.load(base, List.of(p, base.resolve("src/./vibration/p.json")));
        assertEquals(1, all.size());
        TestProject.spec(all.get(0));
    }
}
