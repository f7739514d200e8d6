package org.qfleet.app;

import java.io.IOException;
import java.io.InputStream;
import java.util.Properties;
import picocli.CommandLine.IVersionProvider;

/** The version recorded by the build in the jar, plus the Java runtime it runs on. */
final class VersionProvider implements IVersionProvider {

    private static final String POM_PROPERTIES = "/META-INF/maven/org.qfleet/qfleet-service/pom.properties";

    @Override
    public String[] getVersion() {
        return new String[] {
            "qfleet " + projectVersion(),
            "Java " + System.getProperty("java.version") + " (" + System.getProperty("java.vendor") + ")"
        };
    }

    static String projectVersion() {
        try (InputStream in = VersionProvider.class.getResourceAsStream(POM_PROPERTIES)) {
            if (in == null) {
                return "(development build)";
            }
            Properties properties = new Properties();
            properties.load(in);
            return properties.getProperty("version", "(unknown version)");
        } catch (IOException e) {
            return "(unknown version)";
        }
    }
}
