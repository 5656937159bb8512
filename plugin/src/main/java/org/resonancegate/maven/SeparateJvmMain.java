package org.resonancegate.maven;

import java.io.BufferedWriter;
import java.io.IOException;
import java.io.OutputStreamWriter;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.resonancegate.report.AtomicWrite;

/**
 * The separate JVM's entry point (see {@link SeparateJvm}): reads the settings file named by the
 * one argument, runs the gate exactly as the goal would in Maven's JVM, and reports on standard
 * output in {@link SeparateJvmProtocol}'s records. Exit 0 after a verdict, 3 after a problem
 * the user can fix (the message says how), anything else for a fault.
 */
public final class SeparateJvmMain {

    private SeparateJvmMain() {
    }

    public static void main(String[] args) throws IOException {
        stopWhenMavenIsGone();
        PrintWriter out = new PrintWriter(new BufferedWriter(new OutputStreamWriter(System.out, StandardCharsets.UTF_8),
                1 << 16), false);
        SeparateJvmProtocol.Request request = SeparateJvmProtocol.readSettings(Path.of(args[0]));
        try {
            GateRun.Outcome outcome = GateRun.run(request.settings(),
                    line -> out.println(SeparateJvmProtocol.record(SeparateJvmProtocol.LINE, line.level().name(),
                            line.text())),
                    (target, part) -> handOver(request, part));
            Verdict v = outcome.verdict();
            out.println(SeparateJvmProtocol.record(SeparateJvmProtocol.VERDICT, v.nothingChecked().orElse(""),
                    v.violations().orElse(""), v.letThrough().orElse(""), outcome.report()));
            out.flush();
        } catch (GateException e) {
            out.println(SeparateJvmProtocol.record(SeparateJvmProtocol.PROBLEM, e.getMessage()));
            out.flush();
            System.exit(3);
        }
    }

    /**
     * Maven's JVM holds this JVM's standard input open while it waits for the result; when the
     * input ends, Maven's JVM is gone (stopped, killed), and so is the reason to go on.
     */
    private static void stopWhenMavenIsGone() {
        Thread watch = new Thread(() -> {
            try {
                while (System.in.read() != -1) {
                    // nothing is sent; reading only waits for the end
                }
            } catch (IOException e) {
                // a broken pipe means the same
            }
            Runtime.getRuntime().halt(130);
        }, "resonance-gate: stop when Maven is gone");
        watch.setDaemon(true);
        watch.start();
    }

    /** The summary part goes to Maven's JVM, which appends it under the lock its other modules share. */
    private static void handOver(SeparateJvmProtocol.Request request, byte[] part) throws GateException {
        Path to = request.summaryPart().orElseThrow(() -> new GateException("resonance-gate: no place to hand the summary over"));
        try {
            Files.createDirectories(to.getParent());
            AtomicWrite.write(to, part);
        } catch (IOException e) {
            throw new GateException("resonance-gate: cannot hand the summary over (" + to + "): " + e, e);
        }
    }
}
