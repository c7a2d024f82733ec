package aequa.publish;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;

import aequa.atlas.MapModel;
import aequa.atlas.MapRegion;

/** report.json's changes section and the changes page, across editions of one output folder. */
class EditionChangesTest {

    @TempDir
    Path tmp;

    private final SiteFixtures.Texts texts = SiteFixtures.Texts.plain();

    private JsonNode publish(Path out, List<MapModel> maps) throws IOException {
        SitePublisher.publish(SiteFixtures.atlas(tmp.resolve("p"), texts, maps), new FakeArtwork(), out,
                PublishOptions.defaults());
        return new ObjectMapper().readTree(out.resolve("report.json").toFile());
    }

    @Test
    void firstEditionSaysSo() throws IOException {
        JsonNode report = publish(tmp.resolve("site"), List.of(SiteFixtures.map("a", texts, 10, 0)));
        assertTrue(report.at("/changes/comparedWith").isNull());
        assertTrue(Files.readString(tmp.resolve("site/changes.html")).contains("first edition"));
    }

    @Test
    void classMovesAddedAndRemovedRegionsBreaksAndMapsAreListed() throws IOException {
        Path out = tmp.resolve("site");
        MapModel before = SiteFixtures.map("a", texts, 12, 0);
        publish(out, List.of(before, SiteFixtures.map("gone", texts, 6, 0)));

        // new figures: every value +40 (limits move, some regions change class); region K011 removed, K012 added
        MapModel shifted = SiteFixtures.map("a", texts, 13, 40);
        List<MapRegion> regions = new ArrayList<>(shifted.regions());
        regions.remove(11);
        MapModel after = new MapModel(shifted.spec(), shifted.periods(), shifted.projection(), regions,
                shifted.classification(), shifted.ramp(), shifted.areaAudit(), shifted.notices());
        JsonNode report = publish(out, List.of(after, SiteFixtures.map("new", texts, 6, 0)));
        JsonNode changes = report.get("changes");

        assertFalse(changes.get("comparedWith").isNull());
        JsonNode a = changes.at("/maps/0");
        assertEquals("a", a.get("id").asText());
        assertEquals("changed", a.get("state").asText());
        assertEquals("[\"K012\"]", a.get("regionsAdded").toString());
        assertEquals("[\"K011\"]", a.get("regionsRemoved").toString());
        assertEquals(before.classification().limits().toString().replace(" ", ""),
                a.at("/breaks/from").toString());
        // region K004 reports zero in both editions, so it is in class 1 both times and must not be listed;
        // expected moves recomputed from the fixture's own classes, region by region
        List<String> expectedMoves = new ArrayList<>();
        for (MapRegion r : after.regions()) {
            before.regions().stream().filter(b -> b.key().equals(r.key())).findFirst().ifPresent(b -> {
                if (b.values().get(0).classIndex() != r.values().get(0).classIndex()) {
                    expectedMoves.add(r.key());
                }
            });
        }
        List<String> listed = new ArrayList<>();
        a.get("classChanged").forEach(c -> listed.add(c.get("key").asText()));
        assertEquals(expectedMoves, listed);
        assertFalse(listed.isEmpty(), "the fixture must move at least one region");
        assertEquals("added", changes.at("/maps/1/state").asText());
        assertEquals("new", changes.at("/maps/1/id").asText());
        assertEquals("removed", changes.at("/maps/2/state").asText());
        assertEquals("gone", changes.at("/maps/2/id").asText());

        String page = Files.readString(out.resolve("changes.html"));
        assertTrue(page.contains("Regions added: K012") && page.contains("Regions removed: K011")
                && page.contains("Class limits moved"), page);
    }

    @Test
    void republishingTheSameFiguresKeepsTheLastComparison() throws IOException {
        Path out = tmp.resolve("site");
        publish(out, List.of(SiteFixtures.map("a", texts, 10, 0)));
        JsonNode changed = publish(out, List.of(SiteFixtures.map("a", texts, 10, 25)));
        JsonNode again = publish(out, List.of(SiteFixtures.map("a", texts, 10, 25)));
        assertEquals(changed.get("changes"), again.get("changes"));
        assertFalse(again.at("/changes/maps").isEmpty());
    }

    @Test
    void aProjectionChangeIsReported() throws IOException {
        Path out = tmp.resolve("site");
        MapModel map = SiteFixtures.map("a", texts, 10, 0);
        publish(out, List.of(map));
        MapModel moved = new MapModel(map.spec(), map.periods(), new aequa.projection.ProjectionChoice(
                aequa.projection.Projections.lambertAzimuthal(11, 52), 1, 1, 0, 0, List.of(), SiteFixtures.AUTOMATIC_ROUND),
                map.regions(), map.classification(), map.ramp(), map.areaAudit(), map.notices());
        JsonNode report = publish(out, List.of(moved));
        assertEquals(10.0, SiteReportTest.parameter(report.at("/changes/maps/0/projection/from/parameters"), "centre-lon"));
        assertEquals(11.0, SiteReportTest.parameter(report.at("/changes/maps/0/projection/to/parameters"), "centre-lon"));
    }

    /** An edited figure shows on the changes page even when its region keeps its class (and colour). */
    @Test
    void figuresEditedWithinTheirClassAreListed() throws IOException {
        Path out = tmp.resolve("site");
        publish(out, List.of(SiteFixtures.map("a", texts, 12, 0)));
        JsonNode report = publish(out, List.of(SiteFixtures.map("a", texts, 12, 0.5)));
        JsonNode edited = report.at("/changes/maps/0/valueChanged");
        assertTrue(edited.size() > 0, report.at("/changes").toString());
        JsonNode k005 = null;
        for (JsonNode e : edited) {
            if (e.path("key").asText().equals("K005")) {
                k005 = e;
            }
        }
        assertEquals(50.0, k005.path("from").asDouble()); // the fixture's region 5 reports 10 x 5 + shift
        assertEquals(50.5, k005.path("to").asDouble());
        assertEquals(0, report.at("/changes/maps/0/classChanged").size(), "the shift keeps every class");
        String page = Files.readString(out.resolve("changes.html"));
        assertTrue(page.contains("Figures that changed within their class"), page);
        assertTrue(page.contains("<td class=\"num\">50</td><td class=\"num\">50.5</td>"), page);
    }

    /**
     * A part whose family stayed the same but whose parameters moved is said to keep its projection with other
     * parameters (naming them), never "re-projected (A -> A)"; a part with other regions says how many.
     */
    @Test
    void aFramedPartAddedOrGivenOtherParametersIsSaidInPlainWords() throws IOException {
        Path out = tmp.resolve("site");
        MapModel map = SiteFixtures.map("a", texts, 10, 0);
        List<String> keys = map.regions().stream().map(aequa.atlas.MapRegion::key).toList();
        MapModel oneIsland = withParts(map, part("main", "Main map", keys.subList(1, keys.size()), laea(10), 1),
                part("part-1", "Isles", keys.subList(0, 1), laea(20), 1));
        publish(out, List.of(oneIsland));
        MapModel twoIslands = withParts(map, part("main", "Main map", keys.subList(2, keys.size()), laea(10), 1),
                part("part-1", "Isles", keys.subList(0, 1), laea(25), 1), part("part-2", "Reef", keys.subList(1, 2), laea(30), 1));
        JsonNode report = publish(out, List.of(twoIslands));
        JsonNode parts = report.at("/changes/maps/0/parts");
        assertEquals(3, parts.size(), parts.toString());
        assertEquals("Main map", parts.at("/0/name").asText());
        assertEquals(keys.size() - 1, parts.at("/0/regions/from").asInt());
        assertEquals(keys.size() - 2, parts.at("/0/regions/to").asInt());
        assertTrue(parts.at("/0/family").isMissingNode() && parts.at("/0/parameters").isMissingNode(), parts.toString());
        assertEquals("lambert-azimuthal", parts.at("/1/family").asText());
        assertEquals("centre-lon", parts.at("/1/parameters/0/key").asText());
        assertEquals(20.0, parts.at("/1/parameters/0/from").asDouble());
        assertEquals(25.0, parts.at("/1/parameters/0/to").asDouble());
        assertEquals(1, parts.at("/1/parameters").size(), "only the centre's longitude moved");
        assertEquals("added", parts.at("/2/change").asText());

        String page = Files.readString(out.resolve("changes.html"));
        assertTrue(page.contains("Part Main map: now " + (keys.size() - 2) + " regions (before: " + (keys.size() - 1) + ")."), page);
        assertTrue(page.contains("Part Isles: same projection (Lambert azimuthal equal-area), other parameters: "
                + "Longitude of natural origin 20° → 25°."), page);
        assertTrue(page.contains("Part added: Reef."), page);
        assertFalse(page.contains("equal-area → Lambert"), page);
    }

    /** A part drawn on another family, with another largest omega, says both, the families by their names. */
    @Test
    void aFramedPartOnAnotherFamilySaysWhichAndItsDistortion() throws IOException {
        Path out = tmp.resolve("site");
        MapModel map = SiteFixtures.map("a", texts, 10, 0);
        List<String> keys = map.regions().stream().map(aequa.atlas.MapRegion::key).toList();
        aequa.projection.EqualAreaProjection albers = aequa.projection.Projections.create(aequa.projection.ProjectionFamily.ALBERS_CONIC,
                java.util.Map.of("centre-lon", 20.0, "centre-lat", 52.0, "standard-parallel-1", 50.0, "standard-parallel-2", 54.0));
        publish(out, List.of(withParts(map, part("main", "Main map", keys.subList(1, keys.size()), laea(10), 1),
                part("part-1", "Isles", keys.subList(0, 1), laea(20), 0.8))));
        JsonNode report = publish(out, List.of(withParts(map, part("main", "Main map", keys.subList(1, keys.size()), laea(10), 1),
                part("part-1", "Isles", keys.subList(0, 1), albers, 0.25))));
        JsonNode isles = report.at("/changes/maps/0/parts/0");
        assertEquals("Isles", isles.path("name").asText(), report.at("/changes").toString());
        assertEquals("lambert-azimuthal", isles.at("/family/from").asText());
        assertEquals("albers-conic", isles.at("/family/to").asText());
        assertEquals(0.25, isles.at("/omegaMaxDeg/to").asDouble());
        String page = Files.readString(out.resolve("changes.html"));
        assertTrue(page.contains("Part Isles: now drawn on the Albers equal-area conic projection instead of the Lambert "
                + "azimuthal equal-area projection and angular distortion now up to 0.25° (before: 0.8°)."), page);
    }

    private static aequa.projection.EqualAreaProjection laea(double centreLonDeg) {
        return aequa.projection.Projections.lambertAzimuthal(centreLonDeg, 52);
    }

    private static MapModel withParts(MapModel map, aequa.atlas.MapPart... parts) {
        return new MapModel(map.spec(), map.periods(), parts[0].projection(), map.regions(), map.classification(),
                map.ramp(), map.areaAudit(), map.notices(), List.of(parts));
    }

    private static aequa.atlas.MapPart part(String id, String name, List<String> keys,
                                            aequa.projection.EqualAreaProjection projection, double omegaMaxDeg) {
        var choice = new aequa.projection.ProjectionChoice(projection, omegaMaxDeg, omegaMaxDeg / 2, 0, 0, List.of(), SiteFixtures.AUTOMATIC_ROUND);
        return new aequa.atlas.MapPart(id, name, keys, id.equals("main"), 1, choice,
                new aequa.planar.AreaAudit(1e-9, "", 1e-4), 100, 0, new aequa.atlas.MapPart.Frame(0, 0, 1, 1), 0, 0, 0,
                new aequa.atlas.MapPart.PrintPlace(0, 0, new aequa.atlas.MapPart.Frame(0, 0, 1, 1), 0, 0, 0));
    }
}
