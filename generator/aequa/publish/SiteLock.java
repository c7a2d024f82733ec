package aequa.publish;

import java.io.IOException;
import java.nio.channels.FileChannel;
import java.nio.channels.FileLock;
import java.nio.channels.OverlappingFileLockException;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.time.Duration;

/**
 * An exclusive lock on an output folder, held through a lock file beside it ({@code .NAME.lock} in the
 * same parent), so two publishes of the same output, in one process or in two, never interleave.
 *
 * <p>It is an operating-system lock ({@link FileChannel#tryLock()}): it is released when the process
 * ends, even by a crash, so a stale lock file never blocks later runs. The file itself is left in place.
 */
final class SiteLock implements AutoCloseable {

    private static final long POLL_MILLIS = 100;

    private final FileChannel channel;
    private final FileLock lock;

    private SiteLock(FileChannel channel, FileLock lock) {
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
            FileChannel channel = FileChannel.open(lockFile, StandardOpenOption.CREATE, StandardOpenOption.WRITE);
            FileLock lock = null;
            try {
                lock = channel.tryLock();
            } catch (OverlappingFileLockException heldInThisProcess) {
                lock = null;
            }
            if (lock != null) {
                return new SiteLock(channel, lock);
            }
            channel.close();
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

    @Override
    public void close() throws IOException {
        try {
            lock.release();
        } finally {
            channel.close();
        }
    }
}
