package aequa.publish;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TimeZone;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import aequa.atlas.Atlas;
import aequa.atlas.MapModel;

/** Determinism, incremental rebuilds, atomic failure and the output-folder guard. */
class SitePublisherTest {

    @TempDir
    Path tmp;

    private Atlas atlas(int maps) {
        return SiteFixtures.atlas(tmp.resolve("project"), SiteFixtures.Texts.plain(), maps, 12);
    }

    @Test
    void twoBuildsAreByteIdenticalWhateverTheTimeZoneAndLocale() throws IOException {
        SitePublisher.publish(atlas(3), new FakeArtwork(), tmp.resolve("one"), PublishOptions.defaults());
        TimeZone zone = TimeZone.getDefault();
        Locale locale = Locale.getDefault();
        try {
            // a comma decimal mark and a far-off zone would leak into any locale- or clock-dependent output
            TimeZone.setDefault(TimeZone.getTimeZone("Pacific/Kiritimati"));
            Locale.setDefault(Locale.forLanguageTag("de-DE"));
            SitePublisher.publish(atlas(3), new FakeArtwork(), tmp.resolve("two"), PublishOptions.defaults());
        } finally {
            TimeZone.setDefault(zone);
            Locale.setDefault(locale);
        }
        Map<String, byte[]> one = PublishTestSupport.files(tmp.resolve("one"));
        Map<String, byte[]> two = PublishTestSupport.files(tmp.resolve("two"));
        assertEquals(one.keySet(), two.keySet());
        one.forEach((path, bytes) -> assertArrayEquals(bytes, two.get(path), path));
        assertTrue(one.containsKey("maps/map-a/index.html") && one.containsKey("report.json")
                && one.containsKey(".aequa-manifest.json"), one.keySet().toString());
    }

    @Test
    void rebuildWithNothingChangedDrawsNothingAndTouchesNothing() throws IOException {
        Path out = tmp.resolve("site");
        SitePublisher.publish(atlas(3), new FakeArtwork(), out, PublishOptions.defaults());
        PublishTestSupport.ageAll(out);
        Map<String, FileTime> before = PublishTestSupport.mtimes(out);
        FakeArtwork artwork = new FakeArtwork();
        PublishResult again = SitePublisher.publish(atlas(3), artwork, out, PublishOptions.defaults());
        assertEquals(0, artwork.webCalls());
        assertFalse(again.replaced());
        assertEquals(0, again.filesWritten());
        assertEquals(before, PublishTestSupport.mtimes(out));
    }

    @Test
    void rebuildRewritesOnlyTheMapThatChanged() throws IOException {
        Path out = tmp.resolve("site");
        Path project = tmp.resolve("project");
        SiteFixtures.Texts texts = SiteFixtures.Texts.plain();
        List<MapModel> maps = List.of(SiteFixtures.map("map-a", texts, 12, 0), SiteFixtures.map("map-b", texts, 12, 0));
        SitePublisher.publish(SiteFixtures.atlas(project, texts, maps), new FakeArtwork(), out, PublishOptions.defaults());
        PublishTestSupport.ageAll(out);
        Map<String, FileTime> before = PublishTestSupport.mtimes(out);

        List<MapModel> changed = List.of(maps.get(0), SiteFixtures.map("map-b", texts, 12, 55.0));
        FakeArtwork artwork = new FakeArtwork();
        PublishResult result = SitePublisher.publish(SiteFixtures.atlas(project, texts, changed), artwork, out,
                PublishOptions.defaults());
        assertEquals(1, artwork.webCalls());
        assertEquals(List.of("map-b"), result.mapsDrawn());
        Map<String, FileTime> after = PublishTestSupport.mtimes(out);
        for (String path : before.keySet()) {
            boolean mustChange = path.startsWith("maps/map-b/") && !path.endsWith(".png") && !path.endsWith(".svg")
                    || path.equals("report.json") || path.equals("changes.html") || path.equals("method.html")
                    || path.equals(".aequa-manifest.json");
            if (path.startsWith("maps/map-a/") || path.startsWith("assets/")) {
                assertEquals(before.get(path), after.get(path), "unchanged file rewritten: " + path);
            } else if (mustChange) {
                assertFalse(before.get(path).equals(after.get(path)), "changed file not rewritten: " + path);
            }
        }
    }

    @Test
    void aFailureMidPublishLeavesThePreviousSiteIntact() throws IOException {
        Path out = tmp.resolve("site");
        SitePublisher.publish(atlas(3), new FakeArtwork(), out, PublishOptions.defaults());
        Map<String, byte[]> before = PublishTestSupport.files(out);
        Atlas changed = SiteFixtures.atlas(tmp.resolve("project"), SiteFixtures.Texts.plain(), List.of(
                SiteFixtures.map("map-a", SiteFixtures.Texts.plain(), 12, 1),
                SiteFixtures.map("map-b", SiteFixtures.Texts.plain(), 12, 1),
                SiteFixtures.map("map-c", SiteFixtures.Texts.plain(), 12, 1)));
        IllegalStateException failure = assertThrows(IllegalStateException.class,
                () -> SitePublisher.publish(changed, new FakeArtwork(2), out, PublishOptions.defaults()));
        assertTrue(failure.getMessage().contains("injected"));
        Map<String, byte[]> after = PublishTestSupport.files(out);
        assertEquals(before.keySet(), after.keySet());
        before.forEach((path, bytes) -> assertArrayEquals(bytes, after.get(path), path));
        try (Stream<Path> siblings = Files.list(tmp)) {
            assertTrue(siblings.noneMatch(p -> p.getFileName().toString().contains(".staging-")), "staging folder left behind");
        }
    }

    @Test
    void refusesToReplaceAFolderAequaDidNotWrite() throws IOException {
        Path out = tmp.resolve("someone-elses");
        Files.createDirectories(out);
        Files.writeString(out.resolve("thesis.txt"), "precious");
        assertThrows(PublishRefusedException.class,
                () -> SitePublisher.publish(atlas(1), new FakeArtwork(), out, PublishOptions.defaults()));
        assertEquals("precious", Files.readString(out.resolve("thesis.txt")));
    }

    @Test
    void aDeletedOutputFileIsRestoredOnTheNextPublish() throws IOException {
        Path out = tmp.resolve("site");
        SitePublisher.publish(atlas(2), new FakeArtwork(), out, PublishOptions.defaults());
        byte[] png = Files.readAllBytes(out.resolve("maps/map-a/map-a.png"));
        Files.delete(out.resolve("maps/map-a/map-a.png"));
        FakeArtwork artwork = new FakeArtwork();
        PublishResult result = SitePublisher.publish(atlas(2), artwork, out, PublishOptions.defaults());
        assertTrue(result.replaced());
        assertEquals(List.of("map-a"), result.mapsDrawn());
        assertArrayEquals(png, Files.readAllBytes(out.resolve("maps/map-a/map-a.png")));
    }

    @Test
    void progressReachesEveryStageAndIsQuietWithoutATerminal() throws IOException {
        List<PublishProgress.Stage> finished = new java.util.ArrayList<>();
        PublishOptions options = PublishOptions.defaults()
                .withProgress((stage, done, total) -> {
                    if (done == total) {
                        finished.add(stage);
                    }
                });
        SitePublisher.publish(atlas(2), new FakeArtwork(), tmp.resolve("site"), options);
        assertEquals(List.of(PublishProgress.Stage.values()), finished.stream().distinct().toList());

        java.io.StringWriter terminal = new java.io.StringWriter();
        // surefire runs tests without a console, like cron: the terminal progress must print nothing
        assertEquals(null, System.console());
        SitePublisher.publish(atlas(2), new FakeArtwork(), tmp.resolve("other"),
                PublishOptions.defaults().withProgress(PublishProgress.forTerminal(new java.io.PrintWriter(terminal))));
        assertEquals("", terminal.toString());
    }
}
