package aequa.publish;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import aequa.atlas.MapModel;

/** What readers of a first edition read: no build findings on the map page, plain words elsewhere. */
class ReaderWordingTest {

    @TempDir
    static Path tmp;

    /** The first edition of a one-map choropleth site, published once for the tests that read it. */
    private static Map<String, byte[]> choroplethSite;

    @BeforeAll
    static void publishChoropleth() throws IOException {
        choroplethSite = publish(tmp.resolve("choropleth"), SiteFixtures.map("map-a", SiteFixtures.Texts.plain(), 12, 0.0));
    }

    private static Map<String, byte[]> publish(Path dir, MapModel map) throws IOException {
        Path out = dir.resolve("site");
        SitePublisher.publish(SiteFixtures.atlas(dir.resolve("project"), SiteFixtures.Texts.plain(), List.of(map)),
                new FakeArtwork(), out, PublishOptions.defaults());
        return PublishTestSupport.files(out);
    }

    private static String page(Map<String, byte[]> site, String name) {
        return new String(site.get(name), StandardCharsets.UTF_8);
    }

    /**
     * The checks' findings about a map (here the fixture's "One region has no figure.") are for the author:
     * the method page lists them, the map's own page does not; the author's notes stay on the map page.
     */
    @Test
    void findingsGoToTheMethodPageNotTheMapPage() {
        String mapPage = page(choroplethSite, "maps/map-a/index.html");
        String method = page(choroplethSite, "method.html");
        assertFalse(mapPage.contains("One region has no figure."), mapPage);
        assertTrue(mapPage.contains("Figures are invented."), "the author's notes stay with the map");
        assertTrue(method.contains("<li>One region has no figure.</li>"), method);
    }

    @Test
    void firstEditionSaysSoAndTheSummaryNamesWhatColoursShow() {
        String changes = page(choroplethSite, "changes.html");
        assertFalse(changes.contains("No map changed"), "a first edition has nothing to compare with: " + changes);
        String mapPage = page(choroplethSite, "maps/map-a/index.html");
        assertTrue(mapPage.contains(">Downloads</h2>"), mapPage);
        assertTrue(mapPage.contains("the colour of each region shows the figure (clinics per 1,000 people)"), mapPage);
        assertFalse(mapPage.contains("coloured by per"), mapPage);
    }

    /** A circle map's key speaks of circle areas, never of colours, and names what the largest circle stands for. */
    @Test
    void circleMapsHaveACircleKeyNotAColourKey() throws IOException {
        MapModel circles = SiteFixtures.map("map-a", SiteFixtures.Texts.plain(), 12, 0.0, "circles");
        String mapPage = page(publish(tmp.resolve("circles"), circles), "maps/map-a/index.html");
        assertFalse(mapPage.contains("Colour key"), mapPage);
        assertFalse(mapPage.contains("key-swatch"), mapPage);
        // the fixture's largest figure is 110 (region 11: 10 x 11), the unit "clinics per 1,000 people"
        assertTrue(mapPage.contains("The largest circle stands for 110 clinics per 1,000 people, in Region 11."), mapPage);
        assertTrue(mapPage.contains("the area of each circle shows the figure"), mapPage);
    }
}
