package org.feedernote;

import java.io.IOException;
import java.io.InputStream;
import java.util.Properties;

/** The engine version, from the build. */
public final class Version {
    private Version() {}

    public static String engine() {
        try (InputStream in = Version.class.getResourceAsStream("/org/feedernote/version.properties")) {
            if (in == null) return "development";
            Properties p = new Properties();
            p.load(in);
            return p.getProperty("version", "development");
        } catch (IOException e) {
            return "development";
        }
    }
}
