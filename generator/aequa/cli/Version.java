package aequa.cli;

import java.io.IOException;
import java.io.InputStream;
import java.util.Properties;

import picocli.CommandLine.IVersionProvider;

/** Reads the version Maven wrote into aequa/version.properties at build time. */
final class Version implements IVersionProvider {

    @Override
    public String[] getVersion() throws IOException {
        Properties properties = new Properties();
        try (InputStream in = Version.class.getResourceAsStream("/aequa/version.properties")) {
            if (in != null) {
                properties.load(in);
            }
        }
        return new String[] {"aequa " + properties.getProperty("version", "(development build)"),
                "Java " + System.getProperty("java.version")};
    }
}
