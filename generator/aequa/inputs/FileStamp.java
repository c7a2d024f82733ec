package aequa.inputs;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.nio.file.attribute.BasicFileAttributes;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;
import java.util.Optional;
import java.util.concurrent.TimeUnit;

/**
 * How an input file is recognised again without reading it: its size and modification time, backed by the
 * SHA-256 (FIPS 180-4) of its bytes. A file whose size and time are unchanged is taken as unchanged, as
 * make and git do; when either changed, the content decides, so a file that was only touched or restored
 * from a copy counts as the same file.
 *
 * <p>Limit (the "racy" case git documents): a file rewritten with the same size within the resolution of
 * the file system's clock keeps its time. A stamp whose time lies less than {@link #SETTLE_MILLIS} before
 * the moment it was taken is therefore not {@code settled}, and the next comparison reads the content.
 *
 * @param name          the file as the project names it
 * @param sizeBytes     its size, or -1 when it is missing
 * @param modifiedNanos its modification time, nanoseconds since the epoch
 * @param sha256        the SHA-256 of its bytes, lower-case hex ("" when missing)
 * @param settled       true when the time stamp alone can vouch for the content next time
 */
public record FileStamp(String name, long sizeBytes, long modifiedNanos, String sha256, boolean settled) {

    /**
     * Two seconds: more than the coarsest modification-time resolution of the file systems aequa meets
     * (FAT has 2 s, ext4 and NTFS far finer); a judgement, not a measured constant.
     */
    public static final long SETTLE_MILLIS = 2_000;

    /**
     * Stamps {@code file} now. When {@code previous} has the same size and time and was settled, its hash is
     * reused and the file is not read; otherwise the file is read and hashed, once per process for a settled
     * file of unchanged size and time ({@link SettledHashes}).
     */
    public static FileStamp of(Path file, String name, Optional<FileStamp> previous) throws IOException {
        long nowMillis = System.currentTimeMillis();
        BasicFileAttributes attributes;
        try {
            attributes = Files.readAttributes(file, BasicFileAttributes.class);
        } catch (NoSuchFileException missing) {
            return new FileStamp(name, -1, 0, "", true);
        }
        long size = attributes.size();
        long modifiedNanos = attributes.lastModifiedTime().to(TimeUnit.NANOSECONDS);
        boolean settled = TimeUnit.NANOSECONDS.toMillis(modifiedNanos) < nowMillis - SETTLE_MILLIS;
        if (previous.isPresent() && previous.get().settled() && previous.get().sizeBytes() == size
                && previous.get().modifiedNanos() == modifiedNanos) {
            return new FileStamp(name, size, modifiedNanos, previous.get().sha256(), settled);
        }
        if (!settled) {
            return new FileStamp(name, size, modifiedNanos, sha256(file), false);
        }
        Optional<String> known = SettledHashes.find(file, size, modifiedNanos);
        String hash = known.isPresent() ? known.get() : sha256(file);
        if (known.isEmpty()) {
            SettledHashes.keep(file, size, modifiedNanos, hash);
        }
        return new FileStamp(name, size, modifiedNanos, hash, true);
    }

    /** True when both stamps describe the same bytes under the same name. */
    public boolean sameContent(FileStamp other) {
        return name.equals(other.name) && sizeBytes == other.sizeBytes && sha256.equals(other.sha256);
    }

    /** The SHA-256 of a file's bytes, read in 1 MiB blocks. */
    public static String sha256(Path file) throws IOException {
        MessageDigest digest;
        try {
            digest = MessageDigest.getInstance("SHA-256"); // every Java SE platform must provide it
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("this Java has no SHA-256", e);
        }
        byte[] buffer = new byte[1 << 20];
        try (InputStream in = Files.newInputStream(file)) {
            for (int n = in.read(buffer); n >= 0; n = in.read(buffer)) {
                digest.update(buffer, 0, n);
            }
        }
        return HexFormat.of().formatHex(digest.digest());
    }
}
