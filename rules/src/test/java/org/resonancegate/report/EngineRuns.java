package org.resonancegate.report;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.List;
import org.resonancegate.check.CheckRequest;
import org.resonancegate.check.CheckRun;

/**
 * Results from real engine runs on small single-mass spec files, for the report tests: the
 * statuses then follow from the physics, not from numbers typed into a fixture.
 *
 * <p>The verdicts rest on the closed form f_n = √(k/m)/(2π) (Thomson, Theory of Vibration with
 * Applications, ch. 2): 500 kg on 11.4 MN/m gives 24.03 Hz, inside the 23.3-25 Hz running band
 * of 1400-1500 rpm, so a 20 % separation margin fails; 500 kg on 2 MN/m gives 10.07 Hz, far
 * below it, so the margin holds. The unbalance force m·e·ω² of 500 g·mm at 1400 rpm is already
 * 10.7 N (from memory), and below √2·f_n the mounts pass more than all of it, so a 1 N
 * transmitted-force limit breaks.
 */
final class EngineRuns {

    /** Characters a hostile spec uses in its id, criterion id and waiver: markup, quotes, pipes, backticks, non-ASCII, controls. */
    static final String HOSTILE = "<script>alert(\"x\")</script> | `tick` 'q' & *em* [a](javascript:x) Ünï ✓ 水 😀"
            + " \\u0001\\u0007\\u001b[31m\\u000b\\u007f\\u202e end";

    /** The same text as the Java string the reader turns it into (the JSON escapes above resolved). */
    static final String HOSTILE_READ = "<script>alert(\"x\")</script> | `tick` 'q' & *em* [a](javascript:x) Ünï ✓ 水 😀"
            + " \u0001\u0007\u001b[31m\u000b\u007f\u202e end";

    /** A 10,000-character id (the reader's longest string), built from a repeating phrase. */
    static final String LONG_ID = "LONG-".repeat(2000);

    private static final String MODEL_IN_BAND = "{\"kind\": \"single\", \"mass\": \"500 kg\", \"stiffness\": \"11.4 MN/m\", \"damping\": {\"ratio\": 0.05}}";
    private static final String MODEL_CLEAR = "{\"kind\": \"single\", \"mass\": \"500 kg\", \"stiffness\": \"2 MN/m\", \"damping\": {\"ratio\": 0.05}}";
    private static final String REST = """
              "operation": {"speed": {"min": "1400 rpm", "max": "1500 rpm"}},
              "excitations": [{"name": "rotor", "kind": "unbalance", "unbalance": "500 g·mm"}],
            """;

    private EngineRuns() {
    }

    /**
     * Five specs: one that passes, one that fails separation and warns on force, one whose
     * failure is waived, one with a misspelt key (an error) and one whose profile criterion fails.
     */
    static Results mixed(Path base) {
        List<Path> files = new ArrayList<>();
        files.add(write(base, "src/vibration/a-pump.json", spec("\"P-1\"", MODEL_CLEAR, """
                [{"id": "SEP", "rule": "separation", "margin": "20 %"}]""", "")));
        files.add(write(base, "src/vibration/b-fan.json", spec("\"F-2\"", MODEL_IN_BAND, """
                [{"id": "SEP", "rule": "separation", "margin": "20 %"},
                   {"id": "FORCE", "rule": "transmitted-force", "max": "1 N", "severity": "warning"}]""", "")));
        files.add(write(base, "src/vibration/c-fan.json", spec("\"F-3\"", MODEL_IN_BAND, """
                [{"id": "SEP", "rule": "separation", "margin": "20 %"}]""", """
                ,
                  "waivers": [{"criterion": "SEP", "reason": "runs below 1400 rpm in service; design review 3", "expires": "2999-12-31"}]""")));
        files.add(write(base, "src/vibration/d-broken.json", """
                {
                  "format": "resonance-gate/1",
                  "id": "B-4",
                  "model": {"kind": "single", "mas": "500 kg", "stiffness": "2 MN/m", "damping": {"ratio": 0.05}},
                """ + REST + """
                  "criteria": [{"id": "SEP", "rule": "separation", "margin": "20 %"}]
                }
                """));
        files.add(write(base, "src/vibration/profiles/plant.json", """
                {
                  "format": "resonance-gate-profile/1",
                  "title": "shared",
                  "criteria": [
                    {"id": "PSEP", "rule": "separation", "margin": "20 %"}
                  ]
                }
                """));
        files.add(write(base, "src/vibration/e-fan.json", """
                {
                  "format": "resonance-gate/1",
                  "id": "F-5",
                  "profiles": ["profiles/plant.json"],
                  "model": %s,
                %s  "criteria": []
                }
                """.formatted(MODEL_IN_BAND, REST)));
        return run(base, files);
    }

    /** One failing spec whose id, criterion id and waiver reason are {@link #HOSTILE}, one with a 10,000-character id, and a misspelt key made of markup. */
    static Results hostile(Path base) {
        List<Path> files = new ArrayList<>();
        String hostile = "\"" + HOSTILE.replace("\"", "\\\"") + "\"";
        files.add(write(base, "src/vibration/h <&>'\"|`.json", spec(hostile, MODEL_IN_BAND, """
                [{"id": %1$s, "rule": "separation", "margin": "20 %%"},
                   {"id": "W", "rule": "separation", "margin": "20 %%"}]""".formatted(hostile), """
                ,
                  "waivers": [{"criterion": "W", "reason": %s, "expires": "2999-12-31"}]""".formatted(hostile))));
        files.add(write(base, "src/vibration/long.json", spec("\"" + LONG_ID + "\"", MODEL_IN_BAND, """
                [{"id": "SEP", "rule": "separation", "margin": "20 %"}]""", "")));
        files.add(write(base, "src/vibration/markup-key.json", """
                {
                  "format": "resonance-gate/1",
                  "id": "K-1",
                  "<img src=x onerror=alert(1)>": "|`x`|",
                """ + REST + """
                  "model": %s,
                  "criteria": [{"id": "SEP", "rule": "separation", "margin": "20 %%"}]
                }
                """.formatted(MODEL_CLEAR)));
        return run(base, files);
    }

    /** One spec with the given criteria, its mode inside the running band ({@code inBand}) or well below it. */
    static Results single(Path base, String criteria, boolean inBand) {
        return run(base, List.of(write(base, "src/vibration/one.json",
                spec("\"S-1\"", inBand ? MODEL_IN_BAND : MODEL_CLEAR, criteria, ""))));
    }

    /** One spec, its mode inside the running band, with the given criteria. */
    static Results single(Path base, String criteria) {
        return single(base, criteria, true);
    }

    private static String spec(String id, String model, String criteria, String extra) {
        return """
                {
                  "format": "resonance-gate/1",
                  "id": %s,
                  "model": %s,
                %s  "criteria": %s%s
                }
                """.formatted(id, model, REST, criteria, extra);
    }

    private static Results run(Path base, List<Path> files) {
        // a fixed build date, so the waivers' verdicts do not depend on the day the tests run
        Clock clock = Clock.fixed(Instant.parse("2027-03-31T10:00:00Z"), ZoneOffset.UTC);
        return CheckRun.run(new CheckRequest(base, files, clock));
    }

    private static Path write(Path base, String relative, String content) {
        try {
            Path file = base.resolve(relative);
            Files.createDirectories(file.getParent());
            Files.writeString(file, content, StandardCharsets.UTF_8);
            return file;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
