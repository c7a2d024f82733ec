package aequa.publish;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** An output reached through a link is published where the link leads, under one lock with its real path. */
class OutputLinksTest {

    @TempDir
    Path tmp;

    @Test
    void anOutputThatIsALinkStaysALink() throws IOException {
        Path real = Files.createDirectory(tmp.resolve("real-site"));
        Path link = Files.createSymbolicLink(tmp.resolve("site"), real);
        SitePublisher.publish(SiteFixtures.atlas(tmp.resolve("p"), SiteFixtures.Texts.plain(), 1, 12),
                new FakeArtwork(), link, PublishOptions.defaults());
        SitePublisher.publish(SiteFixtures.atlas(tmp.resolve("p"), SiteFixtures.Texts.plain(), 2, 12),
                new FakeArtwork(), link, PublishOptions.defaults());
        assertTrue(Files.isSymbolicLink(link), "the link was replaced by a folder");
        assertTrue(Files.isRegularFile(real.resolve("maps/map-b/index.html")));
    }

    @Test
    void aLinkAndTheRealPathShareOneLock() throws IOException {
        Path real = Files.createDirectory(tmp.resolve("real-site"));
        Path link = Files.createSymbolicLink(tmp.resolve("alias"), real);
        try (SiteLock held = SiteLock.acquire(link, Duration.ZERO)) {
            assertEquals(real.toRealPath(), held.outDir());
            assertThrows(SiteLockedException.class, () -> SiteLock.acquire(real, Duration.ZERO));
        }
    }

    @Test
    void theRootOfTheFileSystemIsRefusedWithoutLeavingALockFile() {
        Path stray = Path.of(".null.lock").toAbsolutePath();
        boolean strayBefore = Files.exists(stray);
        PublishRefusedException refused = assertThrows(PublishRefusedException.class,
                () -> SitePublisher.publish(SiteFixtures.atlas(tmp.resolve("p"), SiteFixtures.Texts.plain(), 1, 12),
                        new FakeArtwork(), Path.of("/"), PublishOptions.defaults()));
        assertTrue(refused.getMessage().contains("root of a file system"), refused.getMessage());
        assertEquals(strayBefore, Files.exists(stray), "a lock file was left in the current folder");
        assertFalse(strayBefore, "a stray .null.lock from an earlier run lies in " + stray.getParent());
    }
}
