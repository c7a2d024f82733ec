package aequa.publish;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.Map;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import aequa.atlas.Atlas;

/**
 * The tidy-up after a killed run touches only the folders that run marked; a user's folders whose names
 * look like leftovers ({@code site.retired-2023}, {@code site.staging-notes}) are never deleted or moved.
 */
class LeftoverFoldersTest {

    @TempDir
    Path tmp;

    private Atlas atlas(double shift) {
        SiteFixtures.Texts texts = SiteFixtures.Texts.plain();
        return SiteFixtures.atlas(tmp.resolve("project"), texts, java.util.List.of(SiteFixtures.map("map-a", texts, 12, shift)));
    }

    private static Path userFolder(Path at) throws IOException {
        Files.createDirectories(at);
        Files.writeString(at.resolve("notes.txt"), "mine");
        return at;
    }

    @Test
    void foldersNamedLikeLeftoversAreNeverDeleted() throws IOException {
        Path out = tmp.resolve("site");
        Path retired = userFolder(tmp.resolve("site.retired-2023"));
        Path staging = userFolder(tmp.resolve("site.staging-notes"));
        SitePublisher.publish(atlas(0), new FakeArtwork(), out, PublishOptions.defaults());
        SitePublisher.publish(atlas(5), new FakeArtwork(), out, PublishOptions.defaults());
        assertEquals("mine", Files.readString(retired.resolve("notes.txt")));
        assertEquals("mine", Files.readString(staging.resolve("notes.txt")));
    }

    @Test
    void aUsersRetiredFolderIsNeverMovedIntoPlaceOfAMissingOutput() throws IOException {
        Path out = tmp.resolve("site");
        Path retired = userFolder(tmp.resolve("site.retired-2023"));
        SitePublisher.publish(atlas(0), new FakeArtwork(), out, PublishOptions.defaults());
        assertEquals("mine", Files.readString(retired.resolve("notes.txt")));
        assertFalse(Files.exists(out.resolve("notes.txt")), "the user's folder was swapped in as the output");
        assertTrue(Files.isRegularFile(out.resolve("maps/map-a/index.html")));
    }

    @Test
    void theMarkedFoldersOfAKilledRunAreTidiedUpAndAMissingOutputIsRestored() throws IOException {
        Path out = tmp.resolve("site");
        SitePublisher.publish(atlas(0), new FakeArtwork(), out, PublishOptions.defaults());
        Map<String, byte[]> before = PublishTestSupport.files(out);
        // what a run killed between the two renames of its swap leaves: its id in the lock file, the old
        // output moved aside under the run's marker, and its staging folder
        String runId;
        try (SiteLock lock = SiteLock.acquire(out, Duration.ZERO)) {
            lock.recordRun();
            runId = lock.runId();
        }
        Path staging = Files.createDirectory(tmp.resolve("site.staging-" + runId));
        Files.writeString(staging.resolve(StagingFolder.RUN_MARKER), runId);
        Files.writeString(out.resolve(StagingFolder.RUN_MARKER), runId);
        Files.move(out, tmp.resolve("site.retired-" + runId));

        PublishResult result = SitePublisher.publish(atlas(0), new FakeArtwork(), out, PublishOptions.defaults());

        assertFalse(result.replaced(), "the restored edition was already up to date");
        Map<String, byte[]> after = PublishTestSupport.files(out);
        assertEquals(before.keySet(), after.keySet());
        before.forEach((path, bytes) -> assertArrayEquals(bytes, after.get(path), path));
        assertFalse(Files.exists(staging));
        assertFalse(Files.exists(tmp.resolve("site.retired-" + runId)));
    }

    @Test
    void aFolderWithTheRunsNameButWithoutItsMarkerIsLeftAlone() throws IOException {
        Path out = tmp.resolve("site");
        String runId;
        try (SiteLock lock = SiteLock.acquire(out, Duration.ZERO)) {
            lock.recordRun();
            runId = lock.runId();
        }
        Path lookalike = userFolder(tmp.resolve("site.staging-" + runId));
        SitePublisher.publish(atlas(0), new FakeArtwork(), out, PublishOptions.defaults());
        assertEquals("mine", Files.readString(lookalike.resolve("notes.txt")));
    }
}
