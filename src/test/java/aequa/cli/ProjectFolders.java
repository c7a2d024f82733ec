package aequa.cli;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.util.Map;
import java.util.TreeMap;
import java.util.stream.Stream;

/** Folder helpers for the rebuild tests: settling time stamps, copying projects, reading whole sites. */
final class ProjectFolders {

    private ProjectFolders() {
    }

    /** Dates every file of {@code project} an hour back, so its time stamps are settled (FileStamp.SETTLE_MILLIS). */
    static void settle(Path project) throws IOException {
        FileTime anHourAgo = FileTime.fromMillis(System.currentTimeMillis() - 3_600_000);
        try (Stream<Path> files = Files.walk(project)) {
            for (Path f : files.filter(Files::isRegularFile).toList()) {
                Files.setLastModifiedTime(f, anHourAgo);
            }
        }
    }

    /** Copies a project without its cache folder, as a fresh clone would have it. */
    static Path copyWithoutCache(Path from, Path to) throws IOException {
        try (Stream<Path> walk = Files.walk(from)) {
            for (Path p : walk.filter(p -> !p.toString().contains(".aequa-cache")).toList()) {
                Path target = to.resolve(from.relativize(p).toString());
                if (Files.isDirectory(p)) {
                    Files.createDirectories(target);
                } else {
                    Files.copy(p, target);
                }
            }
        }
        return to;
    }

    /** Every file of a site by relative path, with its exact bytes (as ISO 8859-1 text, one char per byte). */
    static Map<String, String> contents(Path site) throws IOException {
        Map<String, String> files = new TreeMap<>();
        try (Stream<Path> walk = Files.walk(site)) {
            for (Path p : walk.filter(Files::isRegularFile).toList()) {
                files.put(site.relativize(p).toString(), new String(Files.readAllBytes(p), StandardCharsets.ISO_8859_1));
            }
        }
        return files;
    }
}
