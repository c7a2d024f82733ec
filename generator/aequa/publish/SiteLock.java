package aequa.publish;

import java.io.IOException;
import java.nio.channels.FileChannel;
import java.nio.channels.FileLock;
import java.nio.channels.OverlappingFileLockException;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.time.Duration;
import java.util.Set;
import java.util.concurrent.ConcurrentHashMap;

/**
 * An exclusive lock on an output folder, held through a lock file beside it ({@code .NAME.lock} in the
 * same parent), so two publishes of the same output, in one process or in two, never interleave.
 *
 * <p>It is an operating-system lock ({@link FileChannel#tryLock()}): it is released when the process
 * ends, even by a crash, so a stale lock file never blocks later runs. The file itself is left in place.
 */
final class SiteLock implements AutoCloseable {

    private static final long POLL_MILLIS = 100;

    /**
     * Lock files this process holds. Needed because POSIX record locks belong to the process, and closing
     * any descriptor of the file releases them all: a second attempt from this process must not even open
     * the file, or it would silently free the first holder's lock for other processes (observed on Linux
     * with JDK 17: after a second channel of the same file was closed, another process's tryLock succeeded).
     */
    private static final Set<Path> HELD_HERE = ConcurrentHashMap.newKeySet();

    private final Path lockFile;

    private final FileChannel channel;
    private final FileLock lock;

    private SiteLock(Path lockFile, FileChannel channel, FileLock lock) {
        this.lockFile = lockFile;
        this.channel = channel;
        this.lock = lock;
    }

    static Path lockFileFor(Path outDir) {
        Path out = outDir.toAbsolutePath().normalize();
        return out.resolveSibling("." + out.getFileName() + ".lock");
    }

    /**
     * Takes the lock, waiting up to {@code wait} for another holder to let go.
     *
     * @throws SiteLockedException when it is still held after {@code wait}
     */
    static SiteLock acquire(Path outDir, Duration wait) throws IOException {
        Path lockFile = lockFileFor(outDir);
        long deadline = System.nanoTime() + wait.toNanos();
        while (true) {
            if (HELD_HERE.add(lockFile)) {
                SiteLock taken = tryTake(lockFile);
                if (taken != null) {
                    return taken;
                }
                HELD_HERE.remove(lockFile);
            }
            if (System.nanoTime() >= deadline) {
                String waited = wait.isZero() ? "" : " and did not finish within " + wait.toSeconds() + " s";
                throw new SiteLockedException(outDir, lockFile, waited);
            }
            try {
                Thread.sleep(POLL_MILLIS);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                throw new SiteLockedException(outDir, lockFile, " (interrupted while waiting)");
            }
        }
    }

    /** Takes the operating-system lock, or returns null when another process holds it. */
    private static SiteLock tryTake(Path lockFile) throws IOException {
        FileChannel channel = FileChannel.open(lockFile, StandardOpenOption.CREATE, StandardOpenOption.WRITE);
        try {
            FileLock lock = channel.tryLock();
            if (lock != null) {
                return new SiteLock(lockFile, channel, lock);
            }
        } catch (OverlappingFileLockException | IOException e) {
            channel.close();
            throw e instanceof IOException io ? io : new IOException("lock " + lockFile + " held twice in one process", e);
        }
        channel.close();
        return null;
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
