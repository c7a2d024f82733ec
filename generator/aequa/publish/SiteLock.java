package aequa.publish;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.channels.FileChannel;
import java.nio.channels.FileLock;
import java.nio.channels.OverlappingFileLockException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.security.SecureRandom;
import java.time.Duration;
import java.util.HexFormat;
import java.util.Optional;
import java.util.Set;
import java.util.concurrent.ConcurrentHashMap;
import java.util.regex.Pattern;

/**
 * An exclusive lock on an output folder, held through a lock file beside it ({@code .NAME.lock} in the
 * same parent), so two publishes of the same output, in one process or in two, never interleave. The
 * output's real path names the lock ({@link OutputFolder#realPath}), so a publish through a link and one
 * through the real path exclude each other.
 *
 * <p>It is an operating-system lock ({@link FileChannel#tryLock()}): it is released when the process
 * ends, even by a crash, so a stale lock file never blocks later runs. The file itself is left in place and
 * holds the random id of the last run that held it ({@link #runId()}): the staging and retired folders
 * of that run carry the same id in a marker file, which is how a later run knows a leftover beside the
 * output is aequa's own ({@link StagingFolder#recover}).
 *
 * <p>Take the lock before the load step, so a second publish learns at once that the output is busy.
 */
public final class SiteLock implements AutoCloseable {

    private static final long POLL_MILLIS = 100;
    private static final SecureRandom RANDOM = new SecureRandom();
    private static final Pattern RUN_ID = Pattern.compile("[0-9a-f]{32}");

    /**
     * Lock files this process holds. Needed because POSIX record locks belong to the process, and closing
     * any descriptor of the file releases them all: a second attempt from this process must not even open
     * the file, or it would silently free the first holder's lock for other processes (observed on Linux
     * with JDK 17: after a second channel of the same file was closed, another process's tryLock succeeded).
     */
    private static final Set<Path> HELD_HERE = ConcurrentHashMap.newKeySet();

    private final Path outDir;
    private final Path lockFile;
    private final FileChannel channel;
    private final FileLock lock;
    private final Optional<String> previousRunId;
    private final String runId = HexFormat.of().formatHex(randomBytes());

    private SiteLock(Path outDir, Path lockFile, FileChannel channel, FileLock lock, Optional<String> previousRunId) {
        this.outDir = outDir;
        this.lockFile = lockFile;
        this.channel = channel;
        this.lock = lock;
        this.previousRunId = previousRunId;
    }

    private static byte[] randomBytes() {
        byte[] bytes = new byte[16];
        RANDOM.nextBytes(bytes);
        return bytes;
    }

    /** The lock file of the output folder {@code realOut} (already a real path). */
    static Path lockFileFor(Path realOut) {
        return realOut.resolveSibling("." + realOut.getFileName() + ".lock");
    }

    /**
     * Takes the lock on the real path of {@code outDir}, waiting up to {@code wait} for another holder to
     * let go.
     *
     * @throws SiteLockedException     when it is still held after {@code wait}
     * @throws PublishRefusedException when the output cannot have a lock (the root of a file system, a
     *                                 broken link); no file is created then
     */
    public static SiteLock acquire(Path outDir, Duration wait) throws IOException {
        Path out = OutputFolder.realPath(outDir);
        Path lockFile = lockFileFor(out);
        Files.createDirectories(out.getParent());
        long deadline = System.nanoTime() + wait.toNanos();
        while (true) {
            if (HELD_HERE.add(lockFile)) {
                SiteLock taken = tryTake(out, lockFile);
                if (taken != null) {
                    return taken;
                }
                HELD_HERE.remove(lockFile);
            }
            if (System.nanoTime() >= deadline) {
                String waited = wait.isZero() ? "" : " and did not finish within " + wait.toSeconds() + " s";
                throw new SiteLockedException(out, lockFile, waited);
            }
            try {
                Thread.sleep(POLL_MILLIS);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                throw new SiteLockedException(out, lockFile, " (interrupted while waiting)");
            }
        }
    }

    /** Takes the operating-system lock, or returns null when another process holds it. */
    private static SiteLock tryTake(Path out, Path lockFile) throws IOException {
        FileChannel channel = FileChannel.open(lockFile, StandardOpenOption.CREATE, StandardOpenOption.READ,
                StandardOpenOption.WRITE);
        try {
            FileLock lock = channel.tryLock();
            if (lock != null) {
                return new SiteLock(out, lockFile, channel, lock, readRunId(channel));
            }
        } catch (OverlappingFileLockException | IOException e) {
            channel.close();
            throw e instanceof IOException io ? io : new IOException("lock " + lockFile + " held twice in one process", e);
        }
        channel.close();
        return null;
    }

    private static Optional<String> readRunId(FileChannel channel) throws IOException {
        ByteBuffer buffer = ByteBuffer.allocate(64);
        channel.read(buffer, 0);
        String text = new String(buffer.array(), 0, buffer.position(), StandardCharsets.US_ASCII).strip();
        return RUN_ID.matcher(text).matches() ? Optional.of(text) : Optional.empty();
    }

    /** The real path of the locked output folder. */
    public Path outDir() {
        return outDir;
    }

    /** The id the lock file held when this run took it: the run whose leftovers may still lie beside the output. */
    Optional<String> previousRunId() {
        return previousRunId;
    }

    /** This run's random id (32 hex digits), written into the lock file by {@link #recordRun()}. */
    String runId() {
        return runId;
    }

    /** Writes this run's id into the lock file; call once the previous run's leftovers are tidied up. */
    void recordRun() throws IOException {
        channel.truncate(0);
        channel.write(ByteBuffer.wrap((runId + "\n").getBytes(StandardCharsets.US_ASCII)), 0);
        channel.force(false);
    }

    @Override
    public void close() throws IOException {
        try {
            lock.release();
            channel.close();
        } finally {
            HELD_HERE.remove(lockFile);
        }
    }
}
