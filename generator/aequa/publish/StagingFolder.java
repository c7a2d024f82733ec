package aequa.publish;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.FileVisitResult;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.nio.file.SimpleFileVisitor;
import java.nio.file.StandardCopyOption;
import java.nio.file.attribute.BasicFileAttributes;
import java.util.Optional;

/**
 * A folder beside the output where a new edition is built, then swapped in.
 *
 * <p>The staging folder is created in the output's parent ({@code NAME.staging-ID}, ID being the run's
 * random id from {@link SiteLock#runId()}), so the swap is two renames on one file system: the old output
 * moves aside to {@code NAME.retired-ID}, the staging folder takes its name, and the retired folder is
 * deleted. Readers see either the old or the new site, never a mixture; the only gap is the instant between
 * the two renames, where the output name is absent (Java offers no atomic exchange of two folders). If the
 * second rename fails the old site is moved back. Until {@link #commit} the output is never touched;
 * {@link #close} deletes an uncommitted staging folder.
 *
 * <p>Both folders carry a marker file {@value #RUN_MARKER} holding the run's id before they get their
 * names, and the lock file records the id: after a killed run, {@link #recover} touches only the two
 * folders whose name and marker both carry the id the lock file recorded. A user's {@code NAME.retired-2023}
 * or {@code NAME.staging-notes} beside the output is never deleted or moved.
 *
 * <p>The staging folder is made like any other folder (mode 0777 less the umask, so 0755 under the usual
 * umask 022), not as a private temporary folder: it becomes the output's top folder, which a web server
 * running as another user must be able to read.
 *
 * <p>Files reused from the previous edition are hard-linked (same bytes, same modification time, nothing
 * rewritten), with a copy that keeps the time stamps where the file system has no hard links.
 */
final class StagingFolder implements AutoCloseable {

    /** The marker file of a staging or retired folder; never part of a published edition. */
    static final String RUN_MARKER = ".aequa-run";

    private final Path outDir;
    private final Path root;
    private final String runId;
    private boolean committed;

    private StagingFolder(Path outDir, Path root, String runId) {
        this.outDir = outDir;
        this.root = root;
        this.runId = runId;
    }

    /** Creates {@code NAME.staging-RUNID} beside the real output folder {@code out}, with its marker. */
    static StagingFolder create(Path out, String runId) throws IOException {
        Files.createDirectories(out.getParent());
        Path root = Files.createDirectory(sibling(out, ".staging-", runId));
        Files.writeString(root.resolve(RUN_MARKER), runId, StandardCharsets.US_ASCII);
        return new StagingFolder(out, root, runId);
    }

    private static Path sibling(Path out, String kind, String runId) {
        return out.resolveSibling(out.getFileName() + kind + runId);
    }

    /**
     * Tidies up after a run that was killed: deletes the staging folder of run {@code lastRunId} and, if the
     * output is missing because the kill fell between the two renames of a swap, moves that run's retired
     * edition back (otherwise deletes it). A folder is aequa's only when its name ends with the id and its
     * marker file holds it. Call only while holding the output's lock, before {@link SiteLock#recordRun()}.
     */
    static void recover(Path out, Optional<String> lastRunId) throws IOException {
        if (lastRunId.isEmpty()) {
            return;
        }
        String id = lastRunId.get();
        Path staging = sibling(out, ".staging-", id);
        if (isMarked(staging, id)) {
            deleteTree(staging);
        }
        Path retired = sibling(out, ".retired-", id);
        if (isMarked(retired, id)) {
            if (Files.exists(out, LinkOption.NOFOLLOW_LINKS)) {
                deleteTree(retired);
            } else {
                Files.move(retired, out, StandardCopyOption.ATOMIC_MOVE);
                Files.deleteIfExists(out.resolve(RUN_MARKER));
            }
        }
    }

    private static boolean isMarked(Path folder, String runId) throws IOException {
        Path marker = folder.resolve(RUN_MARKER);
        return Files.isDirectory(folder, LinkOption.NOFOLLOW_LINKS)
                && Files.isRegularFile(marker, LinkOption.NOFOLLOW_LINKS)
                && Files.size(marker) == runId.length()
                && Files.readString(marker, StandardCharsets.US_ASCII).equals(runId);
    }

    void write(String relative, byte[] bytes) throws IOException {
        Path target = SafePaths.inside(root, relative);
        Files.createDirectories(target.getParent());
        Files.write(target, bytes);
    }

    /** Puts the previous edition's {@code relative} file in place unchanged. */
    void reuse(String relative) throws IOException {
        Path source = SafePaths.inside(outDir, relative);
        Path target = SafePaths.inside(root, relative);
        Files.createDirectories(target.getParent());
        try {
            Files.createLink(target, source);
        } catch (UnsupportedOperationException | IOException noHardLinks) {
            Files.copy(source, target, StandardCopyOption.COPY_ATTRIBUTES, StandardCopyOption.REPLACE_EXISTING);
        }
    }

    /**
     * Carries a user's entry of the current output over unchanged: an empty folder is made again, a link is
     * made again with the same target (never followed), anything else is hard-linked or copied.
     *
     * @param relative a path relative to the output folder, as found by walking it
     */
    void carryUserEntry(Path relative, boolean folder) throws IOException {
        Path source = outDir.resolve(relative);
        Path target = root.resolve(relative);
        if (folder) {
            Files.createDirectories(target);
            return;
        }
        Files.createDirectories(target.getParent());
        if (Files.isSymbolicLink(source)) {
            Files.createSymbolicLink(target, Files.readSymbolicLink(source));
            return;
        }
        try {
            Files.createLink(target, source);
        } catch (UnsupportedOperationException | IOException noHardLinks) {
            Files.copy(source, target, StandardCopyOption.COPY_ATTRIBUTES, LinkOption.NOFOLLOW_LINKS);
        }
    }

    /**
     * Swaps the staging folder in as the output. The old output is marked with this run's id before it
     * moves aside, so a kill at any instant leaves only folders {@link #recover} recognises; the marker
     * the new output carries in from staging is removed once it is in place.
     */
    void commit() throws IOException {
        if (Files.exists(outDir, LinkOption.NOFOLLOW_LINKS)) {
            Path retired = sibling(outDir, ".retired-", runId);
            Files.writeString(outDir.resolve(RUN_MARKER), runId, StandardCharsets.US_ASCII);
            Files.move(outDir, retired, StandardCopyOption.ATOMIC_MOVE);
            try {
                Files.move(root, outDir, StandardCopyOption.ATOMIC_MOVE);
            } catch (IOException e) {
                Files.move(retired, outDir, StandardCopyOption.ATOMIC_MOVE);
                Files.deleteIfExists(outDir.resolve(RUN_MARKER));
                throw e;
            }
            committed = true;
            Files.deleteIfExists(outDir.resolve(RUN_MARKER));
            deleteTree(retired);
        } else {
            Files.move(root, outDir, StandardCopyOption.ATOMIC_MOVE);
            committed = true;
            Files.deleteIfExists(outDir.resolve(RUN_MARKER));
        }
    }

    @Override
    public void close() throws IOException {
        if (!committed) {
            deleteTree(root);
        }
    }

    static void deleteTree(Path top) throws IOException {
        if (!Files.exists(top)) {
            return;
        }
        Files.walkFileTree(top, new SimpleFileVisitor<>() {
            @Override
            public FileVisitResult visitFile(Path file, BasicFileAttributes attrs) throws IOException {
                Files.delete(file);
                return FileVisitResult.CONTINUE;
            }

            @Override
            public FileVisitResult postVisitDirectory(Path dir, IOException failure) throws IOException {
                if (failure != null) {
                    throw failure;
                }
                Files.delete(dir);
                return FileVisitResult.CONTINUE;
            }
        });
    }
}
