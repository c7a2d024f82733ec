package aequa.publish;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.util.Map;
import java.util.TreeMap;
import java.util.stream.Stream;

/** Snapshots of output folders for comparing builds. */
final class PublishTestSupport {

    private PublishTestSupport() {
    }

    /** Every regular file under {@code root}, by '/'-separated relative path, with its bytes. */
    static Map<String, byte[]> files(Path root) throws IOException {
        Map<String, byte[]> out = new TreeMap<>();
        try (Stream<Path> walk = Files.walk(root)) {
            for (Path p : walk.filter(Files::isRegularFile).toList()) {
                out.put(root.relativize(p).toString().replace('\\', '/'), Files.readAllBytes(p));
            }
        }
        return out;
    }

    static Map<String, FileTime> mtimes(Path root) throws IOException {
        Map<String, FileTime> out = new TreeMap<>();
        try (Stream<Path> walk = Files.walk(root)) {
            for (Path p : walk.filter(Files::isRegularFile).toList()) {
                out.put(root.relativize(p).toString().replace('\\', '/'), Files.getLastModifiedTime(p));
            }
        }
        return out;
    }

    /** Sets every file's mtime to a fixed old instant, so a rewrite is visible whatever the clock's resolution. */
    static void ageAll(Path root) throws IOException {
        FileTime old = FileTime.fromMillis(1_000_000_000_000L);
        try (Stream<Path> walk = Files.walk(root)) {
            for (Path p : walk.filter(Files::isRegularFile).toList()) {
                Files.setLastModifiedTime(p, old);
            }
        }
    }
}
