package aequa.publish;

import java.io.IOException;
import java.nio.file.FileVisitResult;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.SimpleFileVisitor;
import java.nio.file.StandardCopyOption;
import java.nio.file.attribute.BasicFileAttributes;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.stream.Stream;

/**
 * A folder beside the output where a new edition is built, then swapped in.
 *
 * <p>The staging folder is created in the output's parent ({@code NAME.staging-RANDOM}), so the swap is
 * two renames on one file system: the old output moves aside to {@code NAME.retired-RANDOM}, the staging
 * folder takes its name, and the retired folder is deleted. Readers see either the old or the new site,
 * never a mixture; the only gap is the instant between the two renames, where the output name is absent
 * (Java offers no atomic exchange of two folders). If the second rename fails the old site is moved back.
 * Until {@link #commit} the output is never touched; {@link #close} deletes an uncommitted staging folder.
 *
 * <p>Files reused from the previous edition are hard-linked (same bytes, same modification time, nothing
 * rewritten), with a copy that keeps the time stamps where the file system has no hard links.
 */
final class StagingFolder implements AutoCloseable {

    private final Path outDir;
    private final Path root;
    private boolean committed;

    private StagingFolder(Path outDir, Path root) {
        this.outDir = outDir;
        this.root = root;
    }

    static StagingFolder create(Path outDir) throws IOException {
        Path out = outDir.toAbsolutePath().normalize();
        Files.createDirectories(out.getParent());
        return new StagingFolder(out, Files.createTempDirectory(out.getParent(), out.getFileName() + ".staging-"));
    }

    /**
     * Tidies up after a run that was killed: deletes leftover staging folders of this output and, if the
     * output is missing because the kill fell between the two renames of a swap, moves the newest retired
     * edition back. Call only while holding the output's lock.
     */
    static void recover(Path outDir) throws IOException {
        Path out = outDir.toAbsolutePath().normalize();
        Path parent = out.getParent();
        if (parent == null || !Files.isDirectory(parent)) {
            return;
        }
        String name = out.getFileName().toString();
        List<Path> retired = new ArrayList<>();
        try (Stream<Path> siblings = Files.list(parent)) {
            for (Path sibling : siblings.sorted().toList()) {
                String other = sibling.getFileName().toString();
                if (other.startsWith(name + ".staging-")) {
                    deleteTree(sibling);
                } else if (other.startsWith(name + ".retired-")) {
                    retired.add(sibling);
                }
            }
        }
        if (!Files.exists(out) && !retired.isEmpty()) {
            retired.sort(Comparator.comparing(StagingFolder::modifiedMillis));
            Files.move(retired.remove(retired.size() - 1), out, StandardCopyOption.ATOMIC_MOVE);
        }
        for (Path old : retired) {
            deleteTree(old);
        }
    }

    private static long modifiedMillis(Path path) {
        try {
            return Files.getLastModifiedTime(path).toMillis();
        } catch (IOException e) {
            return Long.MIN_VALUE;
        }
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

    /** Swaps the staging folder in as the output. */
    void commit() throws IOException {
        String suffix = root.getFileName().toString().substring(outDir.getFileName().toString().length() + ".staging-".length());
        if (Files.exists(outDir)) {
            Path retired = outDir.resolveSibling(outDir.getFileName() + ".retired-" + suffix);
            Files.move(outDir, retired, StandardCopyOption.ATOMIC_MOVE);
            try {
                Files.move(root, outDir, StandardCopyOption.ATOMIC_MOVE);
            } catch (IOException e) {
                Files.move(retired, outDir, StandardCopyOption.ATOMIC_MOVE);
                throw e;
            }
            committed = true;
            deleteTree(retired);
        } else {
            Files.move(root, outDir, StandardCopyOption.ATOMIC_MOVE);
            committed = true;
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
