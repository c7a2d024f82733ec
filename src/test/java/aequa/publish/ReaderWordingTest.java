package aequa.publish;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;

import aequa.atlas.MapModel;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** What readers of a first edition read: no build findings on the map page, plain words elsewhere. */
class ReaderWordingTest {

    /**
     * The checks' findings about a map (here the fixture's "One region has no figure.") are for the author:
     * the method page lists them, the map's own page does not; the author's notes stay on the map page.
     */
    @Test
    void findingsGoToTheMethodPageNotTheMapPage(@TempDir Path tmp) throws IOException {
        Path out = tmp.resolve("site");
        SitePublisher.publish(SiteFixtures.atlas(tmp.resolve("project"), SiteFixtures.Texts.plain(), 1, 12),
                new FakeArtwork(), out, PublishOptions.defaults());
        Map<String, byte[]> site = PublishTestSupport.files(out);
        String mapPage = new String(site.get("maps/map-a/index.html"), StandardCharsets.UTF_8);
        String method = new String(site.get("method.html"), StandardCharsets.UTF_8);
        assertFalse(mapPage.contains("One region has no figure."), mapPage);
        assertTrue(mapPage.contains("Figures are invented."), "the author's notes stay with the map");
        assertTrue(method.contains("<li>One region has no figure.</li>"), method);
    }

    @Test
    void firstEditionSaysSoAndTheSummaryNamesWhatColoursShow(@TempDir Path tmp) throws IOException {
        Path out = tmp.resolve("site");
        SitePublisher.publish(SiteFixtures.atlas(tmp.resolve("project"), SiteFixtures.Texts.plain(), 1, 12),
                new FakeArtwork(), out, PublishOptions.defaults());
        Map<String, byte[]> site = PublishTestSupport.files(out);
        String changes = new String(site.get("changes.html"), StandardCharsets.UTF_8);
        assertFalse(changes.contains("No map changed"), "a first edition has nothing to compare with: " + changes);
        String mapPage = new String(site.get("maps/map-a/index.html"), StandardCharsets.UTF_8);
        assertTrue(mapPage.contains(">Downloads</h2>"), mapPage);
        assertTrue(mapPage.contains("the colour of each region shows the figure (clinics per 1,000 people)"), mapPage);
        assertFalse(mapPage.contains("coloured by per"), mapPage);
    }

    /** A circle map's key speaks of circle areas, never of colours, and names what the largest circle stands for. */
    @Test
    void circleMapsHaveACircleKeyNotAColourKey(@TempDir Path tmp) throws IOException {
        Path out = tmp.resolve("site");
        MapModel circles = SiteFixtures.map("map-a", SiteFixtures.Texts.plain(), 12, 0.0, "circles");
        SitePublisher.publish(SiteFixtures.atlas(tmp.resolve("project"), SiteFixtures.Texts.plain(), List.of(circles)),
                new FakeArtwork(), out, PublishOptions.defaults());
        String mapPage = new String(PublishTestSupport.files(out).get("maps/map-a/index.html"), StandardCharsets.UTF_8);
        assertFalse(mapPage.contains("Colour key"), mapPage);
        assertFalse(mapPage.contains("key-swatch"), mapPage);
        // the fixture's largest figure is 110 (region 11: 10 x 11), the unit "clinics per 1,000 people"
        assertTrue(mapPage.contains("The largest circle stands for 110 clinics per 1,000 people, in Region 11."), mapPage);
        assertTrue(mapPage.contains("the area of each circle shows the figure"), mapPage);
    }
}
