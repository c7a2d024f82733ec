package aequa.inputs;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.Optional;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** A cache file is read back only when whole, of the expected kind and version, and unaltered. */
class CacheFileTest {

    @TempDir
    Path tmp;

    private Optional<String> read(Path f, String kind, int version) {
        return CacheFile.read(f, kind, version, CacheFile::readText);
    }

    @Test
    void whatIsWrittenIsReadBack() {
        Path f = tmp.resolve("entry.bin");
        String text = "x".repeat(100_000) + " é"; // longer than DataOutput.writeUTF allows
        assertTrue(CacheFile.write(f, "kind", 3, out -> CacheFile.writeText(out, text)));
        assertEquals(Optional.of(text), read(f, "kind", 3));
    }

    @Test
    void anyDamageOrMismatchReadsAsNoEntry() throws IOException {
        Path f = tmp.resolve("entry.bin");
        assertEquals(Optional.empty(), read(f, "kind", 1), "missing");
        assertTrue(CacheFile.write(f, "kind", 1, out -> CacheFile.writeText(out, "payload")));
        assertEquals(Optional.empty(), read(f, "other", 1), "another kind");
        assertEquals(Optional.empty(), read(f, "kind", 2), "another format version");
        byte[] whole = Files.readAllBytes(f);
        for (int i = 0; i < whole.length; i++) {
            byte[] flipped = whole.clone();
            flipped[i] ^= 0x01;
            Files.write(f, flipped);
            assertEquals(Optional.empty(), read(f, "kind", 1), "bit flipped at byte " + i);
        }
        for (int length = 0; length < whole.length; length++) {
            Files.write(f, Arrays.copyOf(whole, length));
            assertEquals(Optional.empty(), read(f, "kind", 1), "truncated to " + length + " bytes");
        }
    }

    /**
     * The trailer is the CRC-32C of every byte before it, most significant byte first. The CRC is computed
     * here bit by bit from its definition (reflected polynomial 0x82F63B78, initial value and final XOR
     * 0xFFFFFFFF), which is first checked against the worked examples of RFC 3720, appendix B.4 (32 bytes of
     * zeros, of ones, of 0 to 31), and the check value of "123456789", 0xE3069283 (from memory; the CRC
     * catalogues list it for CRC-32/ISCSI).
     */
    @Test
    void theTrailerIsTheCrc32cOfEverythingBeforeIt() throws IOException {
        byte[] ones = new byte[32];
        Arrays.fill(ones, (byte) 0xff);
        byte[] ascending = new byte[32];
        for (int i = 0; i < 32; i++) {
            ascending[i] = (byte) i;
        }
        assertEquals(0x8a9136aa, crc32c(new byte[32], 32), "RFC 3720 B.4, 32 bytes of zeros (sent as aa 36 91 8a)");
        assertEquals(0x62a8ab43, crc32c(ones, 32), "RFC 3720 B.4, 32 bytes of ones (sent as 43 ab a8 62)");
        assertEquals(0x46dd794e, crc32c(ascending, 32), "RFC 3720 B.4, bytes 0 to 31 (sent as 4e 79 dd 46)");
        assertEquals(0xe3069283, crc32c("123456789".getBytes(java.nio.charset.StandardCharsets.US_ASCII), 9));

        Path f = tmp.resolve("entry.bin");
        assertTrue(CacheFile.write(f, "kind", 7, out -> CacheFile.writeText(out, "payload ".repeat(20_000))));
        byte[] whole = Files.readAllBytes(f);
        int body = whole.length - 4;
        int trailer = java.nio.ByteBuffer.wrap(whole, body, 4).getInt();
        assertEquals(crc32c(whole, body), trailer);
    }

    private static int crc32c(byte[] bytes, int length) {
        int crc = 0xffffffff;
        for (int i = 0; i < length; i++) {
            crc ^= bytes[i] & 0xff;
            for (int bit = 0; bit < 8; bit++) {
                crc = (crc & 1) != 0 ? (crc >>> 1) ^ 0x82f63b78 : crc >>> 1;
            }
        }
        return ~crc;
    }

    @Test
    void anUnwritableFolderIsNoCacheNotAFailure() throws IOException {
        Path notAFolder = tmp.resolve("file");
        Files.writeString(notAFolder, "a file where the cache folder should be");
        assertEquals(false, CacheFile.write(notAFolder.resolve("entry.bin"), "kind", 1, out -> out.writeInt(1)));
    }
}
