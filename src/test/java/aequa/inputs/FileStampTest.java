package aequa.inputs;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.time.Instant;
import java.util.Optional;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * File stamps, their hash checked against the SHA-256 examples of FIPS 180-2, appendix B.1 ("abc") and B.2
 * (the 448-bit message), and the per-process memo of settled files' hashes.
 */
class FileStampTest {

    private static final String ABC = "ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad";
    private static final String TWO_BLOCKS = "248d6a61d20638b8e5c026930c3e6039a33ce45964ff2167f6ecedd419db06c1";
    private static final String TWO_BLOCKS_TEXT = "abcdbcdecdefdefgefghfghighijhijkijkljklmklmnlmnomnopnopq";

    @TempDir
    Path folder;

    private Path write(String name, String text, Instant modified) throws IOException {
        Path file = Files.writeString(folder.resolve(name), text, StandardCharsets.US_ASCII);
        Files.setLastModifiedTime(file, FileTime.from(modified));
        return file;
    }

    @Test
    void hashesAsTheStandardsExamples() throws IOException {
        Path file = write("abc.txt", "abc", Instant.now().minusSeconds(3600));
        FileStamp stamp = FileStamp.of(file, "abc.txt", Optional.empty());
        assertEquals(ABC, stamp.sha256());
        assertEquals(3, stamp.sizeBytes());
        assertTrue(stamp.settled());
        assertEquals(TWO_BLOCKS, FileStamp.sha256(write("two.txt", TWO_BLOCKS_TEXT, Instant.now())));
    }

    @Test
    void aSettledFileStampedAgainGivesTheSameHashAndANewFileItsOwn() throws IOException {
        Instant hourAgo = Instant.now().minusSeconds(3600);
        Path file = write("regions.txt", "abc", hourAgo);
        FileStamp first = FileStamp.of(file, "regions.txt", Optional.empty());
        FileStamp second = FileStamp.of(file, "regions.txt", Optional.empty());
        assertEquals(first, second);
        // rewritten later (a new time): read again
        write("regions.txt", TWO_BLOCKS_TEXT, hourAgo.plusSeconds(60));
        FileStamp rewritten = FileStamp.of(file, "regions.txt", Optional.empty());
        assertEquals(TWO_BLOCKS, rewritten.sha256());
        assertFalse(rewritten.sameContent(first));
    }

    /** A file changed within the settling time keeps being read: the memo never vouches for it. */
    @Test
    void aFreshFileIsReadEveryTimeEvenAtTheSameSizeAndTime() throws IOException {
        Instant now = Instant.now();
        Path file = write("figures.txt", "abc", now);
        FileStamp first = FileStamp.of(file, "figures.txt", Optional.empty());
        assertFalse(first.settled());
        assertEquals(ABC, first.sha256());
        write("figures.txt", "abd", now); // same size, same time: the racy case
        FileStamp second = FileStamp.of(file, "figures.txt", Optional.of(first));
        assertEquals(first.sizeBytes(), second.sizeBytes());
        assertEquals(first.modifiedNanos(), second.modifiedNanos());
        assertFalse(second.sameContent(first), "the bytes changed, so must the hash");
    }
}
