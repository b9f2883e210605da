package org.lodestep.cli;

import java.io.IOException;
import java.io.InputStream;
import java.util.Properties;

import picocli.CommandLine;

/** Reads the version Maven filtered into {@code version.properties}. */
final class VersionProvider implements CommandLine.IVersionProvider {

    /** The tool version recorded in captures, QA records and reports. */
    static String version() {
        try (InputStream in = VersionProvider.class.getResourceAsStream("version.properties")) {
            if (in == null) {
                return "dev";
            }
            Properties p = new Properties();
            p.load(in);
            return p.getProperty("version", "dev");
        } catch (IOException e) {
            return "dev";
        }
    }

    @Override
    public String[] getVersion() {
        return new String[] {"lodestep " + version(), "Java " + System.getProperty("java.version")};
    }
}
