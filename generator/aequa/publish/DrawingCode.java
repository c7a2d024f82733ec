package aequa.publish;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.net.URISyntaxException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Enumeration;
import java.util.Map;
import java.util.TreeMap;
import java.util.jar.JarEntry;
import java.util.jar.JarFile;
import java.util.stream.Stream;

import aequa.drawing.MapDrawings;

/**
 * A hash of the drawing stage's compiled classes (the package of {@link MapDrawings}, read from the jar or
 * class folder it was loaded from). Part of the artwork's fingerprint, so maps are redrawn when the
 * drawing code changed even if the version string did not: a team that builds aequa from a newer checkout
 * gets new drawings, not the previous build's files carried over. Computed once per run.
 */
final class DrawingCode {

    private static final String PACKAGE_PATH = MapDrawings.class.getPackageName().replace('.', '/') + "/";

    private DrawingCode() {
    }

    /** The fingerprint of the drawing classes this aequa runs. */
    static String fingerprint() {
        try {
            return fingerprint(Path.of(MapDrawings.class.getProtectionDomain().getCodeSource().getLocation().toURI()));
        } catch (URISyntaxException e) {
            throw new IllegalStateException("aequa was loaded from an unusual place", e);
        }
    }

    /**
     * SHA-256 over the drawing package's class files under {@code location} (a class folder or a jar), by
     * name in sorted order: a folder and a jar of the same classes give the same hash.
     */
    static String fingerprint(Path location) {
        Map<String, byte[]> classes = new TreeMap<>();
        try {
            if (Files.isDirectory(location)) {
                try (Stream<Path> files = Files.walk(location.resolve(PACKAGE_PATH))) {
                    for (Path file : (Iterable<Path>) files.filter(f -> f.toString().endsWith(".class"))::iterator) {
                        classes.put(location.relativize(file).toString().replace('\\', '/'), Files.readAllBytes(file));
                    }
                }
            } else {
                try (JarFile jar = new JarFile(location.toFile())) {
                    for (Enumeration<JarEntry> entries = jar.entries(); entries.hasMoreElements(); ) {
                        JarEntry entry = entries.nextElement();
                        if (entry.getName().startsWith(PACKAGE_PATH) && entry.getName().endsWith(".class")) {
                            try (InputStream in = jar.getInputStream(entry)) {
                                classes.put(entry.getName(), in.readAllBytes());
                            }
                        }
                    }
                }
            }
        } catch (IOException e) {
            throw new UncheckedIOException("could not read aequa's own drawing classes in " + location, e);
        }
        if (classes.isEmpty()) {
            throw new IllegalStateException("found none of aequa's drawing classes under " + PACKAGE_PATH);
        }
        Sha256 hash = new Sha256();
        classes.forEach((name, bytes) -> hash.add(name).add(bytes));
        return hash.hex();
    }
}
