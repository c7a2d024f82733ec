package aequa.inputs;

import java.io.BufferedInputStream;
import java.io.BufferedOutputStream;
import java.io.DataInputStream;
import java.io.DataOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.Optional;
import java.util.zip.CRC32C;
import java.util.zip.CheckedOutputStream;

/**
 * One file of the {@link CacheFolder}: a header naming its kind and format version, a payload, and a
 * trailer holding the CRC-32C (Castagnoli polynomial, as RFC 3720 defines it for iSCSI) of everything before
 * it, four bytes, most significant first.
 *
 * <p>The trailer guards against damage only (a truncated write, a flipped bit, a file from elsewhere), not
 * against a forged file: whoever can write the cache folder can write the project's inputs too. A CRC finds
 * every burst error up to 32 bits and misses other damage with a probability of 2^-32; the JVM computes it
 * with the processor's CRC instructions, so checking a cache of several megabytes costs about a millisecond,
 * where SHA-256 cost about a hundred at the launcher's first-tier compilation. Keys that must not collide
 * (what an entry was made from) are named by SHA-256 elsewhere ({@code aequa.atlas.GeometryCache}).
 *
 * <p>Guarantees: a file is written to a temporary name and renamed into place, so a reader sees a whole
 * file or the previous one; {@link #read} returns a payload only when the checksum matches and the kind and
 * version are the expected ones, and returns empty (never throws) for a missing, truncated, corrupt, foreign
 * or older file, so a damaged cache is made again rather than trusted or fatal. {@link #write} returns false
 * instead of failing when the folder cannot be written. The checksum is read in a first pass, before the
 * payload is parsed, so a corrupt length can never make the parser allocate nonsense.
 */
public final class CacheFile {

    /** Writes a payload to a stream. */
    public interface PayloadWriter {
        void write(DataOutputStream out) throws IOException;
    }

    /** Reads a payload back; may throw on malformed data, which then counts as no cache. */
    public interface PayloadReader<T> {
        T read(DataInputStream in) throws IOException;
    }

    private static final int TRAILER_BYTES = 4;
    private static final String MAGIC = "aequa-cache";

    private CacheFile() {
    }

    /** Writes {@code file} atomically; false when it could not be written (the cache is then simply absent). */
    public static boolean write(Path file, String kind, int version, PayloadWriter payload) {
        Path temp = null;
        try {
            Files.createDirectories(file.getParent());
            temp = Files.createTempFile(file.getParent(), file.getFileName() + ".", ".tmp");
            CRC32C crc = new CRC32C();
            try (OutputStream raw = Files.newOutputStream(temp);
                 BufferedOutputStream buffered = new BufferedOutputStream(raw, 1 << 16)) {
                DataOutputStream out = new DataOutputStream(new BufferedOutputStream(new CheckedOutputStream(buffered, crc), 1 << 16));
                out.writeUTF(MAGIC);
                out.writeUTF(kind);
                out.writeInt(version);
                payload.write(out);
                out.flush();
                new DataOutputStream(buffered).writeInt((int) crc.getValue());
            }
            Files.move(temp, file, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            return true;
        } catch (IOException | UnsupportedOperationException | java.io.UncheckedIOException unwritable) {
            deleteQuietly(temp);
            return false;
        }
    }

    /** The payload of {@code file}, or empty when it is missing, damaged or of another kind or version. */
    public static <T> Optional<T> read(Path file, String kind, int version, PayloadReader<T> payload) {
        try {
            long size = Files.size(file);
            if (size < TRAILER_BYTES || !checksumMatches(file, size)) {
                return Optional.empty();
            }
            try (InputStream raw = Files.newInputStream(file)) {
                DataInputStream in = new DataInputStream(new BufferedInputStream(raw, 1 << 16));
                if (!MAGIC.equals(in.readUTF()) || !kind.equals(in.readUTF()) || in.readInt() != version) {
                    return Optional.empty();
                }
                return Optional.of(payload.read(in));
            }
        } catch (IOException | RuntimeException unusable) {
            return Optional.empty(); // missing, unreadable or malformed: made again
        }
    }

    /** Text of any length (DataOutput's writeUTF stops at 64 KiB). */
    public static void writeText(DataOutputStream out, String text) throws IOException {
        byte[] bytes = text.getBytes(StandardCharsets.UTF_8);
        out.writeInt(bytes.length);
        out.write(bytes);
    }

    public static String readText(DataInputStream in) throws IOException {
        int length = in.readInt();
        if (length < 0) {
            throw new IOException("negative text length");
        }
        return new String(in.readNBytes(length), StandardCharsets.UTF_8);
    }

    private static boolean checksumMatches(Path file, long size) throws IOException {
        CRC32C crc = new CRC32C();
        try (InputStream in = Files.newInputStream(file)) {
            byte[] buffer = new byte[1 << 20];
            long left = size - TRAILER_BYTES;
            while (left > 0) {
                int n = in.read(buffer, 0, (int) Math.min(buffer.length, left));
                if (n < 0) {
                    return false;
                }
                crc.update(buffer, 0, n);
                left -= n;
            }
            DataInputStream trailer = new DataInputStream(in);
            return trailer.readInt() == (int) crc.getValue();
        }
    }

    private static void deleteQuietly(Path temp) {
        if (temp == null) {
            return;
        }
        try {
            Files.deleteIfExists(temp);
        } catch (IOException ignored) {
            // a stray temporary file in a folder that is safe to delete
        }
    }
}
