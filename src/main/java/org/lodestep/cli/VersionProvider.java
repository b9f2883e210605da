package org.lodestep.cli;

import java.io.IOException;
import java.io.InputStream;
import java.util.Properties;

import picocli.CommandLine;

/**
 * The tool's version: the jar manifest's {@code Implementation-Version}, else (classes run from the build folder, as
 * in tests) what Maven filtered into {@code version.properties}.
 */
final class VersionProvider implements CommandLine.IVersionProvider {

    /** The tool version recorded in captures, QA records and reports. */
    static String version() {
        // The manifest first: the class-data archive keeps the jar's manifest, so reading it opens no file, where the
        // resource makes the class loader open and index the whole jar (about 13 ms).
        String manifest = VersionProvider.class.getPackage().getImplementationVersion();
        if (manifest != null) {
            return manifest;
        }
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
