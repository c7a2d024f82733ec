package aequa.publish;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.Callable;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import aequa.atlas.Atlas;
import aequa.atlas.MapModel;

/** Two publishes of one output folder at the same time: one waits or fails clearly, the output stays whole. */
class ConcurrentPublishTest {

    @TempDir
    Path tmp;

    /** Artwork that holds the first drawing until the second publish has tried the lock. */
    private static final class SlowArtwork implements MapArtwork {
        private final FakeArtwork inner = new FakeArtwork();
        private final CountDownLatch started;
        private final CountDownLatch release;

        SlowArtwork(CountDownLatch started, CountDownLatch release) {
            this.started = started;
            this.release = release;
        }

        @Override
        public String webSvg(MapModel map) {
            started.countDown();
            try {
                release.await();
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
            return inner.webSvg(map);
        }

        @Override
        public byte[] printSvg(MapModel map) {
            return inner.printSvg(map);
        }

        @Override
        public byte[] pdf(MapModel map) {
            return inner.pdf(map);
        }

        @Override
        public byte[] png(MapModel map, int widthPx, int scale) {
            return inner.png(map, widthPx, scale);
        }
    }

    @Test
    void theSecondPublishFailsAtOnceWithAClearMessage() throws Exception {
        Path out = tmp.resolve("site");
        Atlas atlas = SiteFixtures.atlas(tmp.resolve("project"), SiteFixtures.Texts.plain(), 2, 8);
        CountDownLatch started = new CountDownLatch(1);
        CountDownLatch release = new CountDownLatch(1);
        ExecutorService pool = Executors.newSingleThreadExecutor();
        try {
            Future<PublishResult> first = pool.submit(() ->
                    SitePublisher.publish(atlas, new SlowArtwork(started, release), out, PublishOptions.defaults()));
            started.await();
            SiteLockedException locked = org.junit.jupiter.api.Assertions.assertThrows(SiteLockedException.class,
                    () -> SitePublisher.publish(atlas, new FakeArtwork(), out, PublishOptions.defaults()));
            assertTrue(locked.getMessage().contains("Another aequa publish is writing"), locked.getMessage());
            release.countDown();
            assertTrue(first.get().replaced());
        } finally {
            release.countDown();
            pool.shutdownNow();
        }
        assertOutputIsOneWholeEdition(out, atlas);
    }

    @Test
    void publishesThatWaitRunOneAfterTheOtherAndLeaveAWholeSite() throws Exception {
        Path out = tmp.resolve("site");
        List<Atlas> atlases = List.of(
                SiteFixtures.atlas(tmp.resolve("p"), SiteFixtures.Texts.plain(), List.of(
                        SiteFixtures.map("map-a", SiteFixtures.Texts.plain(), 10, 0))),
                SiteFixtures.atlas(tmp.resolve("p"), SiteFixtures.Texts.plain(), List.of(
                        SiteFixtures.map("map-a", SiteFixtures.Texts.plain(), 10, 7))));
        ExecutorService pool = Executors.newFixedThreadPool(4);
        List<Callable<PublishResult>> jobs = new ArrayList<>();
        for (int i = 0; i < 8; i++) {
            Atlas atlas = atlases.get(i % 2);
            jobs.add(() -> SitePublisher.publish(atlas, new FakeArtwork(), out,
                    PublishOptions.defaults().withLockWait(Duration.ofSeconds(60))));
        }
        try {
            for (Future<PublishResult> f : pool.invokeAll(jobs)) {
                f.get(); // none may fail
            }
        } finally {
            pool.shutdownNow();
        }
        // the folder now equals a clean publish of whichever edition came last
        com.fasterxml.jackson.databind.JsonNode report = new com.fasterxml.jackson.databind.ObjectMapper()
                .readTree(out.resolve("report.json").toFile());
        double k005 = report.at("/maps/0/regions/5/value").asDouble();
        assertOutputIsOneWholeEdition(out, atlases.get(k005 == 50.0 ? 0 : 1));
    }

    private void assertOutputIsOneWholeEdition(Path out, Atlas atlas) throws IOException {
        Path clean = tmp.resolve("clean-" + System.identityHashCode(atlas));
        SitePublisher.publish(atlas, new FakeArtwork(), clean, PublishOptions.defaults());
        Map<String, byte[]> expected = PublishTestSupport.files(clean);
        Map<String, byte[]> actual = PublishTestSupport.files(out);
        // report.json's changes section, the changes page and the manifest (which records their hashes)
        // depend on the edition before; every other file must be byte-identical to a clean publish
        for (String history : List.of("report.json", "changes.html", ".aequa-manifest.json")) {
            expected.remove(history);
            actual.remove(history);
        }
        assertEquals(expected.keySet(), actual.keySet());
        expected.forEach((path, bytes) -> assertArrayEquals(bytes, actual.get(path), path));
    }
}
