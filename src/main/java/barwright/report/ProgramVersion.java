package barwright.report;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.util.Properties;

/** The program's version, as the build wrote it into {@code barwright/version.properties} from pom.xml. */
public final class ProgramVersion {
    private static final String RESOURCE = "/barwright/version.properties";

    private ProgramVersion() {
    }

    /** @return e.g. "0.1.0-SNAPSHOT"; "unknown" only where the classes run without the build's resources */
    public static String number() {
        try (InputStream in = ProgramVersion.class.getResourceAsStream(RESOURCE)) {
            if (in == null) {
                return "unknown";
            }
            Properties properties = new Properties();
            properties.load(in);
            String version = properties.getProperty("version", "unknown").strip();
            // an unfiltered copy (run from an IDE without Maven's resource step) says so rather than "${...}"
            return version.startsWith("${") ? "unknown" : version;
        } catch (IOException unreadable) {
            throw new UncheckedIOException(unreadable);
        }
    }

    /** @return the line printed by {@code --version} and shown in About, e.g. "Barwright 0.1.0-SNAPSHOT" */
    public static String line() {
        return "Barwright " + number();
    }
}
