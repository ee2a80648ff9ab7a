package dev.plumb.app;

import java.io.IOException;
import java.io.InputStream;
import java.util.Properties;
import picocli.CommandLine;

/**
 * What `plumb --version` prints: the version, the commit the build was made from, and the Java
 * that runs it. Maven writes the first two into {@code build-info.properties} when it builds the
 * jar (server/pom.xml); a build outside a git checkout or without the git program, or a resource
 * that was never filled in, says "unknown" rather than failing.
 */
final class BuildInfo implements CommandLine.IVersionProvider {
    static final String UNKNOWN = "unknown";

    private final String version;
    private final String commit;
    private final boolean dirty;

    private BuildInfo(String version, String commit, boolean dirty) {
        this.version = version;
        this.commit = commit;
        this.dirty = dirty;
    }

    /** Reads the resource the build filled in; a missing resource gives "unknown" throughout. */
    static BuildInfo load() {
        Properties props = new Properties();
        try (InputStream in = BuildInfo.class.getResourceAsStream("build-info.properties")) {
            if (in != null) {
                props.load(in);
            }
        } catch (IOException e) {
            // An unreadable resource tells as little as a missing one.
        }
        return of(props);
    }

    /** The build information in {@code props}; a value Maven did not fill in counts as unknown. */
    static BuildInfo of(Properties props) {
        String commit = known(props.getProperty("commit"));
        boolean dirty = !commit.equals(UNKNOWN) && "true".equals(props.getProperty("dirty"));
        return new BuildInfo(known(props.getProperty("version")), commit, dirty);
    }

    private static String known(String value) {
        if (value == null || value.isBlank() || value.contains("${")) {
            return UNKNOWN;
        }
        return value.strip();
    }

    String version() {
        return version;
    }

    String commit() {
        return commit;
    }

    @Override
    public String[] getVersion() {
        String built = commit.equals(UNKNOWN)
            ? "commit unknown (not built from a git checkout, or without git)"
            : "commit " + commit + (dirty ? " with local changes" : "");
        String vendor = System.getProperty("java.vendor", "");
        return new String[] {
            "plumb " + version,
            built,
            "Java " + System.getProperty("java.version", UNKNOWN) + (vendor.isEmpty() ? "" : " (" + vendor + ")")
                + ", " + System.getProperty("java.home", UNKNOWN),
        };
    }
}
