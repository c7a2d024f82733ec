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

    @Test
    void anUnwritableFolderIsNoCacheNotAFailure() throws IOException {
        Path notAFolder = tmp.resolve("file");
        Files.writeString(notAFolder, "a file where the cache folder should be");
        assertEquals(false, CacheFile.write(notAFolder.resolve("entry.bin"), "kind", 1, out -> out.writeInt(1)));
    }
}
