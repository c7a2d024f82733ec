package aequa.inputs;

import java.nio.file.Path;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.ConcurrentHashMap;

/**
 * The SHA-256 of files this process already read, by path, size and modification time, so that two steps
 * stamping the same input in one run (the no-change check, then the geometry cache) read and hash it once: a
 * 2.2 MB GeoJSON was hashed twice in every full publish. Only settled stamps are kept and given back
 * ({@link FileStamp#SETTLE_MILLIS}): the same trust {@link FileStamp#of} gives a previous stamp, no more.
 * Thread-safe; bounded (a project has a few dozen inputs, and the memo is emptied when it reaches
 * {@value #MAX_FILES}).
 */
final class SettledHashes {

    static final int MAX_FILES = 1024;

    private record Key(Path file, long sizeBytes, long modifiedNanos) {
    }

    private static final Map<Key, String> BY_FILE = new ConcurrentHashMap<>();

    private SettledHashes() {
    }

    /** The hash kept for {@code file} at this size and time, if any. */
    static Optional<String> find(Path file, long sizeBytes, long modifiedNanos) {
        return Optional.ofNullable(BY_FILE.get(new Key(file.toAbsolutePath().normalize(), sizeBytes, modifiedNanos)));
    }

    /** Keeps the hash of a settled file. */
    static void keep(Path file, long sizeBytes, long modifiedNanos, String sha256) {
        if (BY_FILE.size() >= MAX_FILES) {
            BY_FILE.clear();
        }
        BY_FILE.put(new Key(file.toAbsolutePath().normalize(), sizeBytes, modifiedNanos), sha256);
    }
}
