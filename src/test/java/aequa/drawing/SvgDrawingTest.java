package aequa.drawing;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;

import org.junit.jupiter.api.Test;
import org.w3c.dom.Element;

import aequa.atlas.MapModel;
import aequa.atlas.MapRegion;
import aequa.atlas.RegionValue;
import aequa.colour.Rgb;

/** Structure of the web and print SVGs, checked with a real XML parser (javax.xml). */
class SvgDrawingTest {

    private static final MapModel MODEL = MapFixtures.choropleth(14, 12);
    private static final Theme DAYLIGHT = Themes.bundled("daylight");
    private static final Theme NEWSPRINT = Themes.bundled("newsprint");

    @Test
    void webSvgHasEveryRegionOnceWithDataAttributesAndTitle() {
        SvgDoc svg = SvgDoc.parse(MapDrawings.webSvg(MODEL, DAYLIGHT, WebSize.STANDARD).bytes());
        Element regions = svg.byId("regions");
        assertNotNull(regions);
        List<Element> groups = SvgDoc.children(regions);
        assertEquals(MODEL.regions().size(), groups.size(), "one group per region");
        Set<String> keys = new HashSet<>();
        int classed = 0;
        int unclassed = 0;
        for (int i = 0; i < groups.size(); i++) {
            Element g = groups.get(i);
            MapRegion region = MODEL.regions().get(i);
            assertEquals(Ids.of("r", region.key()), g.getAttribute("id"));
            assertEquals(region.key(), g.getAttribute("data-key"));
            assertEquals(region.name(), g.getAttribute("data-name"));
            assertFalse(g.getAttribute("data-class").isEmpty());
            // the value readers hover over: the figure itself for a classed region, nothing for no data,
            // withheld or not applicable ones (the fixture has each: MapFixtures, special statuses)
            RegionValue value = region.values().get(0);
            String dataValue = g.getAttribute("data-value");
            if (RegionFills.classed(value)) {
                assertEquals(value.normalisedValue(), Double.parseDouble(dataValue),
                        1e-6 * Math.max(1, Math.abs(value.normalisedValue())), region.key());
                classed++;
            } else {
                assertEquals("", dataValue, region.key());
                unclassed++;
            }
            assertEquals(1, SvgDoc.elements(g, "title").size(), "a title for hover and screen readers");
            assertTrue(keys.add(g.getAttribute("data-key")));
        }
        assertTrue(classed > 0 && unclassed >= 3, "both kinds of region were checked: " + classed + ", " + unclassed);
    }

    @Test
    void webSvgIsResponsiveAndLabelled() {
        DrawnMap map = MapDrawings.webSvg(MODEL, DAYLIGHT, WebSize.STANDARD);
        Element root = SvgDoc.parse(map.bytes()).root();
        assertEquals("", root.getAttribute("width"), "no fixed width");
        assertEquals("", root.getAttribute("height"), "no fixed height");
        String[] viewBox = root.getAttribute("viewBox").split(" ");
        assertEquals(1200.0, Double.parseDouble(viewBox[2]));
        assertEquals(map.height(), Double.parseDouble(viewBox[3]));
        assertEquals("img", root.getAttribute("role"));
        SvgDoc doc = SvgDoc.parse(map.bytes());
        for (String id : root.getAttribute("aria-labelledby").split(" ")) {
            assertNotNull(doc.byId(id), "aria-labelledby points at " + id);
            assertFalse(doc.byId(id).getTextContent().isBlank());
        }
    }

    /** Whether a path of separate segments ("Mx,y" then a relative "ldx,dy") has only level ones (dy = 0). */
    private static boolean levelLines(String d) {
        java.util.regex.Matcher m = java.util.regex.Pattern.compile("M[-0-9.]+,[-0-9.]+l[-0-9.]+,([-0-9.]+)").matcher(d);
        int segments = 0;
        while (m.find()) {
            segments++;
            if (Double.parseDouble(m.group(1)) != 0) {
                return false;
            }
        }
        return segments > 0;
    }

    @Test
    void noDataIsHatchedAndNeverARampColour() {
        SvgDoc svg = SvgDoc.parse(MapDrawings.webSvg(MODEL, DAYLIGHT, WebSize.STANDARD).bytes());
        List<String> rampFills = new ArrayList<>();
        for (Rgb fill : MODEL.ramp().fills()) {
            rampFills.add(rgb(fill));
        }
        int statuses = 0;
        for (Element g : SvgDoc.children(svg.byId("regions"))) {
            String cls = g.getAttribute("data-class");
            String style = SvgDoc.elements(g, "g").get(0).getAttribute("style");
            if (cls.equals("no-data") || cls.equals("withheld")) {
                statuses++;
                assertTrue(style.contains(rgb(DAYLIGHT.colours().noData())), style);
                boolean hatched = SvgDoc.elements(g, "g").stream()
                        .anyMatch(e -> e.getAttribute("style").contains("stroke:" + rgb(DAYLIGHT.colours().noDataHatch())));
                assertTrue(hatched, "no-data and withheld regions carry hatch lines");
                Element firstHatch = SvgDoc.elements(g, "g").stream()
                        .filter(e -> e.getAttribute("style").contains("stroke:" + rgb(DAYLIGHT.colours().noDataHatch()))).findFirst().orElseThrow();
                assertFalse(levelLines(SvgDoc.elements(firstHatch, "path").get(0).getAttribute("d")), "their lines are slanted");
            }
            if (cls.equals("not-applicable")) {
                statuses++;
                assertTrue(style.contains(rgb(DAYLIGHT.colours().notApplicable())), style);
                // level lines, so a near-white "not applicable" is not read as a light class colour
                List<Element> hatch = SvgDoc.elements(g, "g").stream()
                        .filter(e -> e.getAttribute("style").contains("stroke:" + rgb(DAYLIGHT.colours().noDataHatch()))).toList();
                assertEquals(1, hatch.size(), "one set of hatch lines");
                String d = SvgDoc.elements(hatch.get(0), "path").get(0).getAttribute("d");
                assertTrue(levelLines(d), "the lines are level: " + d);
            }
            if (!cls.matches("\\d+")) {
                for (String ramp : rampFills) {
                    assertFalse(style.contains(ramp), "status region " + g.getAttribute("id") + " has a ramp colour");
                }
            }
        }
        assertEquals(3, statuses, "the fixture has one no-data, one withheld and one not-applicable region");
    }

    /**
     * The web SVG's inner borders are the stroke its region fills inherit from presentation attributes on the
     * regions group; hatch lines set their own stroke, so they keep their colour. (An earlier style rule aimed
     * at every path of a region also turned the hatch lines into white borders.) Inheritance, and a property
     * set on the element itself winning over it: SVG 2, section 6.8 and CSS Cascade 4, section 7. Chromium's
     * computed strokes are checked in EmbedBrowserTest.
     */
    @Test
    void bordersAreTheFillsStrokeAndHatchLinesKeepTheirOwn() {
        SvgDoc svg = SvgDoc.parse(MapDrawings.webSvg(MODEL, DAYLIGHT, WebSize.STANDARD).bytes());
        assertTrue(SvgDoc.elements(svg.root(), "style").isEmpty(), "no style sheet inside the SVG");
        Element regions = svg.byId("regions");
        assertEquals(DAYLIGHT.colours().border().hex(), regions.getAttribute("stroke"));
        assertTrue(Double.parseDouble(regions.getAttribute("stroke-width")) > 0);
        int hatches = 0;
        for (Element region : SvgDoc.children(regions)) {
            List<Element> parts = SvgDoc.children(region).stream().filter(e -> e.getLocalName().equals("g")).toList();
            assertFalse(parts.get(0).getAttribute("style").contains("stroke"), "the fill inherits the border stroke");
            for (Element hatch : parts.subList(1, parts.size())) {
                String style = hatch.getAttribute("style");
                assertTrue(style.contains("fill:none") && style.matches(".*(^|;)stroke:rgb\\(.*")
                        && style.contains("stroke-width:"), "hatch lines set their own stroke: " + style);
                hatches++;
            }
        }
        assertTrue(hatches >= 3, "the fixture has hatched regions: " + hatches);
    }

    @Test
    void rendersAreByteIdentical() {
        assertArrayEquals(MapDrawings.webSvg(MODEL, DAYLIGHT, WebSize.STANDARD).bytes(),
                MapDrawings.webSvg(MODEL, DAYLIGHT, WebSize.STANDARD).bytes());
        PrintSize size = PrintSize.of(PrintPreset.TWO_COLUMNS);
        assertArrayEquals(MapDrawings.printSvg(MODEL, NEWSPRINT, size).bytes(), MapDrawings.printSvg(MODEL, NEWSPRINT, size).bytes());
        assertArrayEquals(MapDrawings.png(MODEL, DAYLIGHT, 600, 1).bytes(), MapDrawings.png(MODEL, DAYLIGHT, 600, 1).bytes());
        assertArrayEquals(MapDrawings.pdf(MODEL, NEWSPRINT, size, DrawOptions.print()).bytes(),
                MapDrawings.pdf(MODEL, NEWSPRINT, size, DrawOptions.print()).bytes());
    }

    @Test
    void printSvgHasExactPhysicalSizeInMillimetres() {
        for (PrintPreset preset : PrintPreset.values()) {
            DrawnMap map = MapDrawings.printSvg(MODEL, NEWSPRINT, PrintSize.of(preset));
            Element root = SvgDoc.parse(map.bytes()).root();
            assertEquals(preset.widthMm() + "mm", Double.parseDouble(root.getAttribute("width").replace("mm", "")) + "mm");
            assertEquals(preset.widthMm(), Double.parseDouble(root.getAttribute("width").replace("mm", "")), 0.0);
            assertTrue(root.getAttribute("width").endsWith("mm") && root.getAttribute("height").endsWith("mm"));
            double heightMm = Double.parseDouble(root.getAttribute("height").replace("mm", ""));
            assertEquals(map.height(), heightMm, 0.0, "height written exactly");
            assertEquals("0 0 " + new FixedDecimal(2).apply(preset.widthMm()) + " " + new FixedDecimal(2).apply(heightMm),
                    root.getAttribute("viewBox"), "one user unit is one millimetre");
        }
        DrawnMap fixed = MapDrawings.printSvg(MODEL, NEWSPRINT, new PrintSize(120, 150));
        Element root = SvgDoc.parse(fixed.bytes()).root();
        assertEquals("120mm", root.getAttribute("width"));
        assertEquals("150mm", root.getAttribute("height"));
    }

    @Test
    void printSvgIsEditableLayersWithLiveTextAndNoMasks() {
        DrawnMap map = MapDrawings.printSvg(MODEL, NEWSPRINT, PrintSize.of(PrintPreset.THREE_COLUMNS));
        SvgDoc svg = SvgDoc.parse(map.bytes());
        for (String layer : List.of("background", "title", "regions", "borders", "outline", "labels", "legend", "area-scale",
                "caption", "credits")) {
            assertNotNull(svg.byId(layer), "named group " + layer);
        }
        for (String forbidden : List.of("clipPath", "mask", "image", "pattern", "filter")) {
            assertTrue(svg.elements(forbidden).isEmpty(), "no <" + forbidden + "> in print files");
        }
        assertFalse(SvgDoc.texts(svg.byId("legend")).isEmpty(), "legend is live text");
        assertFalse(SvgDoc.texts(svg.byId("caption")).isEmpty(), "caption is live text");
        for (Element path : svg.elements("path")) {
            for (String number : SvgDoc.numbers(path.getAttribute("d"))) {
                int dot = number.indexOf('.');
                assertTrue(dot < 0 || number.length() - dot - 1 <= 2, "coordinates to 0.01 mm: " + number);
            }
        }
        String font = svg.elements("text").get(0).getAttribute("style");
        assertTrue(font.contains(NEWSPRINT.fonts().cssStack()), "theme font stack: " + font);
    }

    @Test
    void hostileKeysAndNamesGiveValidXmlAndUniqueIds() {
        List<MapRegion> regions = new ArrayList<>();
        String[] keys = {"a'b", "a b", "a_20b", "<x>&\"", "\u00e9t\u00e9"};
        for (int i = 0; i < keys.length; i++) {
            MapRegion base = MODEL.regions().get(i + 20);
            regions.add(new MapRegion(keys[i], "Name <script>alert('" + i + "')</script> &\u200f\u0001", base.geodesicAreaKm2(),
                    1.0, base.planarM(), base.values()));
        }
        regions.sort(java.util.Comparator.comparing(MapRegion::key));
        MapModel hostile = new MapModel(MODEL.spec(), MODEL.periods(), MODEL.projection(), regions, MODEL.classification(),
                MODEL.ramp(), MODEL.areaAudit(), List.of());
        SvgDoc svg = SvgDoc.parse(MapDrawings.webSvg(hostile, DAYLIGHT, WebSize.STANDARD).bytes());
        Set<String> ids = new HashSet<>();
        for (Element g : SvgDoc.children(svg.byId("regions"))) {
            assertTrue(g.getAttribute("id").matches("r-[A-Za-z0-9_-]+"), g.getAttribute("id"));
            assertTrue(ids.add(g.getAttribute("id")));
        }
        assertEquals(keys.length, ids.size());
        SvgDoc.parse(MapDrawings.printSvg(hostile, NEWSPRINT, PrintSize.of(PrintPreset.TWO_COLUMNS)).bytes());
    }

    private static String rgb(Rgb c) {
        return "rgb(" + c.red() + "," + c.green() + "," + c.blue() + ")";
    }
}
