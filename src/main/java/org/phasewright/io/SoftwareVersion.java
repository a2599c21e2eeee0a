package org.phasewright.io;

import java.io.IOException;
import java.io.InputStream;
import java.util.Properties;

/**
 * The version of Phasewright, as Maven wrote it into {@code phasewright-version.properties} at
 * build time (resource filtering); "unknown" when run from classes built without Maven.
 */
public final class SoftwareVersion {

    private static final String VERSION = load();

    private SoftwareVersion() {
    }

    public static String get() {
        return VERSION;
    }

    private static String load() {
        try (InputStream in = SoftwareVersion.class.getResourceAsStream("/org/phasewright/io/phasewright-version.properties")) {
            if (in == null) {
                return "unknown";
            }
            Properties p = new Properties();
            p.load(in);
            String v = p.getProperty("version", "unknown");
            return v.startsWith("${") ? "unknown" : v;
        } catch (IOException e) {
            return "unknown";
        }
    }
}
