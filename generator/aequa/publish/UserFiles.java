package aequa.publish;

import java.io.IOException;
import java.nio.file.FileVisitResult;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.SimpleFileVisitor;
import java.nio.file.attribute.BasicFileAttributes;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.stream.Stream;

/**
 * What an output folder holds that aequa did not write: every file, link and empty folder not listed in
 * the previous edition's manifest ({@code CNAME}, {@code keep.txt}, a whole {@code .git} folder...). A new
 * edition carries all of them over unchanged (hard links, or copies keeping their time stamps); when one
 * stands where the new edition writes a file or needs a folder, the publish is refused with their names
 * before anything is touched.
 *
 * <p>Links are carried over as links (never followed); the walk does not leave the output folder.
 */
final class UserFiles {

    /** How many conflicting names a refusal lists before "and N more". */
    private static final int NAMES_SHOWN = 10;

    /**
     * @param path   relative to the output folder
     * @param folder true for an empty folder (other folders come along as parents of their files)
     */
    record Entry(Path path, boolean folder) {
        String name() {
            return path.toString().replace('\\', '/');
        }
    }

    private final List<Entry> entries;

    private UserFiles(List<Entry> entries) {
        this.entries = List.copyOf(entries);
    }

    /**
     * Finds what {@code out} holds beyond {@code aequaPaths} (the previous manifest's '/'-separated paths),
     * the manifest itself and the run marker.
     */
    static UserFiles scan(Path out, Set<String> aequaPaths) throws IOException {
        List<Entry> found = new ArrayList<>();
        if (!Files.isDirectory(out)) {
            return new UserFiles(found);
        }
        Files.walkFileTree(out, new SimpleFileVisitor<>() {
            @Override
            public FileVisitResult preVisitDirectory(Path dir, BasicFileAttributes attrs) throws IOException {
                if (!dir.equals(out) && isEmpty(dir)) {
                    found.add(new Entry(out.relativize(dir), true));
                }
                return FileVisitResult.CONTINUE;
            }

            @Override
            public FileVisitResult visitFile(Path file, BasicFileAttributes attrs) {
                String name = out.relativize(file).toString().replace('\\', '/');
                boolean aequas = aequaPaths.contains(name) || name.equals(OutputManifest.FILE_NAME)
                        || name.equals(StagingFolder.RUN_MARKER);
                if (!aequas) {
                    found.add(new Entry(out.relativize(file), false));
                }
                return FileVisitResult.CONTINUE;
            }
        });
        return new UserFiles(found);
    }

    private static boolean isEmpty(Path dir) throws IOException {
        try (Stream<Path> children = Files.list(dir)) {
            return children.findAny().isEmpty();
        }
    }

    int count() {
        return entries.size();
    }

    /**
     * Refuses when a user's file or folder stands at a path the new edition writes ({@code newPaths}), above
     * one (a file where a folder is needed) or below one (inside a folder where a file is needed).
     */
    void refuseConflicts(Path out, Set<String> newPaths) throws PublishRefusedException {
        List<String> clashes = entries.stream().map(Entry::name)
                .filter(name -> newPaths.stream().anyMatch(p -> p.equals(name) || p.startsWith(name + "/")
                        || name.startsWith(p + "/")))
                .sorted().toList();
        if (clashes.isEmpty()) {
            return;
        }
        String shown = String.join(", ", clashes.subList(0, Math.min(NAMES_SHOWN, clashes.size())))
                + (clashes.size() > NAMES_SHOWN ? " and " + (clashes.size() - NAMES_SHOWN) + " more" : "");
        throw new PublishRefusedException("Refusing to publish into " + out + ": " + shown
                + (clashes.size() == 1 ? " was" : " were") + " not written by aequa, and the new edition needs"
                + (clashes.size() == 1 ? " that name" : " those names") + ". Nothing was changed."
                + " Move or rename them, then publish again.");
    }

    /** Puts every entry into the staging folder, unchanged. */
    void carryInto(StagingFolder staging) throws IOException {
        for (Entry entry : entries) {
            staging.carryUserEntry(entry.path(), entry.folder());
        }
    }
}
