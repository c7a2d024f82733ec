package aequa.drawing;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.w3c.dom.Element;

import aequa.atlas.MapModel;
import aequa.project.ClassMethod;
import aequa.wording.Wording;

/** The legend's counts and the area scale, read back from the drawn SVG. */
class LegendAndScaleTest {

    private static final MapModel MODEL = MapFixtures.choropleth(14, 12);
    private static final Theme NEWSPRINT = Themes.bundled("newsprint");

    @Test
    void legendCountsMatchTheClassification() {
        SvgDoc svg = SvgDoc.parse(MapDrawings.printSvg(MODEL, NEWSPRINT, PrintSize.of(PrintPreset.TWO_COLUMNS)).bytes());
        List<Integer> shown = new ArrayList<>();
        for (String text : SvgDoc.texts(svg.byId("legend"))) {
            if (text.matches("\\(\\d+\\)")) {
                shown.add(Integer.parseInt(text.substring(1, text.length() - 1)));
            }
        }
        int classes = MODEL.classification().classCount();
        assertEquals(MODEL.classification().counts(), shown.subList(0, classes));
        // then one entry each for no data, withheld, not applicable (one region each) and unreliable (two)
        assertEquals(List.of(1, 1, 1, 2), shown.subList(classes, shown.size()));
    }

    @Test
    void smallMultiplesShareOneLegendWithPooledCounts() {
        MapModel multiples = MapFixtures.build(12, 10, List.of("2021", "2022", "2023"), "choropleth", ClassMethod.QUANTILE, 5, 3);
        SvgDoc svg = SvgDoc.parse(MapDrawings.webSvg(multiples, Themes.bundled("daylight"), WebSize.STANDARD).bytes());
        for (String period : multiples.periods()) {
            Element regions = svg.byId("regions-" + period);
            assertNotNull(regions, "one panel per period");
            assertEquals(multiples.regions().size(), SvgDoc.children(regions).size());
        }
        assertNotNull(svg.byId("legend"));
        int sum = multiples.classification().counts().stream().mapToInt(Integer::intValue).sum();
        assertEquals(3 * (multiples.regions().size() - 3), sum, "fixture sanity: pooled counts over three periods");
        assertTrue(svg.byId("legend").getTextContent().contains("(regions, all 3 periods)"),
                "the shared legend says its counts pool the panels");
    }

    /**
     * The area-scale square must cover, at the map's scale, exactly the ground area it states: its page side
     * squared over the scale squared is the area (equal-area map at one uniform scale, see AreaScale).
     * Checked three ways: the record, the drawn rectangle, and against a region of known area (an exact
     * 100 km square in projected metres) measured from its drawn path.
     */
    @Test
    void areaScaleSquareEqualsTheStatedAreaWithinOneThousandth() {
        for (PrintPreset preset : PrintPreset.values()) {
            DrawnMap map = MapDrawings.printSvg(MODEL, NEWSPRINT, PrintSize.of(preset));
            AreaScale scale = map.areaScale();
            double areaKm2 = Math.pow(scale.sideU() / map.scaleUnitsPerM(), 2) / 1e6;
            assertEquals(1.0, areaKm2 / scale.areaKm2(), 1e-3);

            SvgDoc svg = SvgDoc.parse(map.bytes());
            Element rect = SvgDoc.elements(svg.byId("area-scale"), "rect").get(0);
            double widthMm = Double.parseDouble(rect.getAttribute("width"));
            double heightMm = Double.parseDouble(rect.getAttribute("height"));
            double drawnKm2 = widthMm * heightMm / Math.pow(map.scaleUnitsPerM(), 2) / 1e6;
            assertEquals(1.0, drawnKm2 / scale.areaKm2(), 1e-3, preset + ": drawn square " + drawnKm2 + " km2");
            assertTrue(SvgDoc.texts(svg.byId("area-scale")).contains(scale.label(Wording.english().numbers())));

            Element square = svg.byId(Ids.of("r", MapFixtures.SQUARE_KEY));
            double squarePathMm2 = SvgDoc.pathArea(SvgDoc.elements(square, "path").get(0).getAttribute("d"));
            // the 10,000 km2 region compared with the stated square through page areas alone
            assertEquals(10_000 / scale.areaKm2(), squarePathMm2 / (widthMm * heightMm), 10_000 / scale.areaKm2() * 1e-3);
        }
    }

    @Test
    void areaScaleChoosesRoundAreasNoLargerThanTheTarget() {
        // 1 mm per km: a 10 mm target side holds at most 100 km2, which is round already
        AreaScale exact = AreaScale.choose(1e-3, 10);
        assertEquals(100, exact.areaKm2(), 1e-9);
        assertEquals(10, exact.sideU(), 1e-9);
        AreaScale rounded = AreaScale.choose(1e-3, 9);   // 81 km2 -> 50 km2
        assertEquals(50, rounded.areaKm2(), 1e-9);
        assertEquals("50 km\u00b2", rounded.label(Wording.english().numbers())); // CLDR English: "{0} km²"
        AreaScale big = AreaScale.choose(1e-6, 8);      // 64,000,000 km2 -> 50,000,000 km2
        assertEquals("50,000,000 km\u00b2", big.label(Wording.english().numbers()));
    }
}
