package org.resonancegate.report;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.util.Properties;

/** The engine's name and version as reports state them (the version comes from the build). */
public final class EngineInfo {

    /** The tool name written into machine-readable reports. */
    public static final String NAME = "resonance-gate";

    private static final String VERSION = load();

    private EngineInfo() {
    }

    /** The engine's Maven version, e.g. {@code 0.1.0-SNAPSHOT}. */
    public static String version() {
        return VERSION;
    }

    private static String load() {
        try (InputStream in = EngineInfo.class.getResourceAsStream("engine.properties")) {
            if (in == null) {
                throw new IllegalStateException("engine.properties is missing from the rules jar; rebuild it");
            }
            Properties p = new Properties();
            p.load(in);
            String v = p.getProperty("version", "");
            if (v.isBlank() || v.startsWith("${")) {
                throw new IllegalStateException("engine.properties was not filtered by the build; rebuild the rules jar");
            }
            return v;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
