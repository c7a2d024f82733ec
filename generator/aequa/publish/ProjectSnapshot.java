package aequa.publish;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import java.util.TreeMap;
import java.util.stream.Stream;

import aequa.inputs.CacheFolder;

/**
 * Size and modification time of every file in a project folder, to notice edits by polling (portable and
 * recursive, unlike the JDK's WatchService, which watches one folder at a time and on some systems polls
 * anyway). The output folder and its staging siblings are left out when they lie inside the project, and so
 * is the project's cache folder, which every build writes.
 */
record ProjectSnapshot(Map<String, String> files) {

    static ProjectSnapshot of(Path projectDir, Path outDir) {
        Map<String, String> files = new TreeMap<>();
        Path out = outDir.toAbsolutePath().normalize();
        String outName = out.getFileName().toString();
        Path cache = CacheFolder.of(projectDir.toAbsolutePath().normalize());
        try (Stream<Path> walk = Files.walk(projectDir.toAbsolutePath().normalize())) {
            walk.filter(Files::isRegularFile)
                    .filter(p -> !p.startsWith(out) && !isStagingOf(p, out, outName) && !p.startsWith(cache))
                    .forEach(p -> files.put(p.toString(), stamp(p)));
        } catch (IOException | UncheckedIOException e) {
            files.put("", "unreadable: " + e.getMessage()); // changes when it becomes readable again
        }
        return new ProjectSnapshot(files);
    }

    /** True for files of the publisher's own making beside the output: staging, retired, lock. */
    private static boolean isStagingOf(Path p, Path out, String outName) {
        Path parent = out.getParent();
        if (parent == null || !p.startsWith(parent) || p.equals(parent)) {
            return false;
        }
        String first = parent.relativize(p).getName(0).toString();
        return first.startsWith(outName + ".") || first.equals("." + outName + ".lock");
    }

    private static String stamp(Path p) {
        try {
            return Files.size(p) + "@" + Files.getLastModifiedTime(p).toMillis();
        } catch (IOException vanished) {
            return "gone";
        }
    }
}
