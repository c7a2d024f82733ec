package aequa.projection;

import java.util.logging.Level;
import java.util.logging.Logger;

/**
 * Keeps Apache SIS quiet: without its optional EPSG database SIS logs one warning ("SIS_DATA is not set")
 * on the first WKT it formats, and aequa needs no database. Library code must not write to the console, so
 * the "org.apache.sis" logger is raised to SEVERE before any SIS call (observed with SIS 1.7: the warning
 * comes once per JVM, from the first WKT formatted without SIS_DATA). The
 * logger is held strongly here, since java.util.logging keeps loggers only weakly.
 */
final class SisLogging {

    private static final Logger SIS_LOG = Logger.getLogger("org.apache.sis");

    static {
        SIS_LOG.setLevel(Level.SEVERE);
    }

    private SisLogging() {
    }

    /** Loads this class (and so silences SIS); call from the static initialiser of every class that uses SIS. */
    static void silence() {
        // the work is done once, by the static initialiser above
    }
}
