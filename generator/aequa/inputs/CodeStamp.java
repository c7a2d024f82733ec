package aequa.inputs;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.net.URISyntaxException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.BasicFileAttributes;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;

/**
 * Identifies the aequa that is running, cheaply: the path, size and modification time of the jar it was
 * loaded from (or of every file of its class folder, when run from a build tree), and the Java runtime's
 * version. Stored beside cached results, so a rebuilt or upgraded aequa, or another Java, never trusts
 * results made by a different one. Reads no file contents: a jar rebuilt by Maven gets a new time stamp.
 */
public final class CodeStamp {

    private static volatile String current;

    private CodeStamp() {
    }

    /** The stamp of the running aequa, computed once per process. */
    public static String current() {
        String stamp = current;
        if (stamp == null) {
            try {
                stamp = of(Path.of(CodeStamp.class.getProtectionDomain().getCodeSource().getLocation().toURI()));
            } catch (URISyntaxException e) {
                throw new IllegalStateException("aequa was loaded from an unusual place", e);
            }
            current = stamp;
        }
        return stamp;
    }

    /** The stamp of the code at {@code location}, a jar or a class folder. */
    static String of(Path location) {
        StringBuilder stamp = new StringBuilder("java ").append(Runtime.version()).append('\n');
        try {
            if (Files.isDirectory(location)) {
                try (Stream<Path> files = Files.walk(location)) {
                    for (Path file : (Iterable<Path>) files.filter(Files::isRegularFile).sorted()::iterator) {
                        append(stamp, location.relativize(file).toString(), file);
                    }
                }
            } else {
                append(stamp, location.toAbsolutePath().toString(), location);
            }
        } catch (IOException e) {
            throw new UncheckedIOException("could not look at aequa's own code in " + location, e);
        }
        return stamp.toString();
    }

    private static void append(StringBuilder stamp, String name, Path file) throws IOException {
        BasicFileAttributes attributes = Files.readAttributes(file, BasicFileAttributes.class);
        stamp.append(name).append(' ').append(attributes.size()).append(' ')
                .append(attributes.lastModifiedTime().to(TimeUnit.NANOSECONDS)).append('\n');
    }
}
