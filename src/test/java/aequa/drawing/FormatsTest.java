package aequa.drawing;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.w3c.dom.Element;

import aequa.atlas.MapModel;
import aequa.project.ClassMethod;

/** PDF structure, proportional symbols, the graticule and globe, and the size goal of web SVGs. */
class FormatsTest {

    private static final Theme DAYLIGHT = Themes.bundled("daylight");

    /**
     * A PDF reader finds the cross-reference table through the byte offset after {@code startxref}, and each
     * object through the offsets in that table (ISO 32000-1, sections 7.5.4 and 7.5.5). Check both, the header
     * and trailer markers, the page size in points, and that no clock time is left in the file.
     */
    @Test
    void pdfIsStructurallyValidAndDated() {
        MapModel model = MapFixtures.choropleth(10, 8);
        DrawnMap pdf = MapDrawings.pdf(model, Themes.bundled("newsprint"), PrintSize.of(PrintPreset.TWO_COLUMNS), DrawOptions.print());
        String text = new String(pdf.bytes(), StandardCharsets.ISO_8859_1);
        assertTrue(text.startsWith("%PDF-1."));
        assertTrue(text.stripTrailing().endsWith("%%EOF"));
        assertTrue(PdfXref.assertPointsAtEveryObject(text) > 4, "several objects");
        double widthPt = 104 * 72 / 25.4; // 1 in = 25.4 mm = 72 pt
        assertTrue(text.contains("/MediaBox [0.0 0.0 " + (float) widthPt) || text.contains("/MediaBox [0.0 0.0 " + widthPt), text.substring(0, 600));
        // ISO 32000-1, section 7.9.4: a date with O = Z is universal time; no offset of the machine's zone
        assertTrue(text.contains("/CreationDate (D:20000101000000Z00'00')") && text.contains("/ModDate (D:20000101000000Z00'00')"),
                "fixed dates in UTC");
        // text is drawn as outlines of the font the layout measured (so any script that font covers
        // survives): the file needs no font resource at all (ISO 32000-1, section 9.2: text-showing
        // operators need a /Font entry in the page resources)
        assertFalse(text.contains("/Font"), "no font resource");
        assertFalse(text.contains("/Helvetica"), "no standard font");
        byte[] again = MapDrawings.pdf(model, Themes.bundled("newsprint"), PrintSize.of(PrintPreset.TWO_COLUMNS), DrawOptions.print()).bytes();
        assertArrayEquals(pdf.bytes(), again, "two renders are byte-identical");
    }

    @Test
    void circlesAreDrawnLargestFirstWithAreaProportionalToValue() {
        MapModel circles = MapFixtures.build(12, 10, List.of("2024"), "circles", ClassMethod.QUANTILE, 5, 3);
        SvgDoc svg = SvgDoc.parse(MapDrawings.webSvg(circles, DAYLIGHT, WebSize.STANDARD).bytes());
        List<Double> radii = new ArrayList<>();
        List<Double> values = new ArrayList<>();
        for (Element g : SvgDoc.children(svg.byId("symbols"))) {
            Element ellipse = SvgDoc.elements(g, "ellipse").get(0);
            radii.add(Double.parseDouble(ellipse.getAttribute("rx")));
            String key = g.getAttribute("id").substring(2);
            values.add(circles.regions().stream().filter(r -> r.key().equals(key)).findFirst().orElseThrow()
                    .values().get(0).normalisedValue());
        }
        assertFalse(radii.isEmpty());
        for (int i = 1; i < radii.size(); i++) {
            assertTrue(radii.get(i) <= radii.get(i - 1), "largest first");
            // area ratio equals value ratio; radii are written to 0.1 px, so allow that rounding
            double expected = Math.sqrt(values.get(i) / values.get(0)) * radii.get(0);
            assertEquals(expected, radii.get(i), 0.1 + expected * 1e-3);
        }
    }

    @Test
    void graticuleAndGlobeOutlineOnWorldMaps() {
        SvgDoc world = SvgDoc.parse(MapDrawings.webSvg(WorldFixture.model(), DAYLIGHT, WebSize.STANDARD).bytes());
        Element globe = world.byId("globe");
        assertTrue(globe != null && SvgDoc.elements(globe, "path").size() >= 3, "sea, graticule and outline");
        SvgDoc regional = SvgDoc.parse(MapDrawings.webSvg(MapFixtures.choropleth(10, 8), DAYLIGHT, WebSize.STANDARD).bytes());
        assertEquals(null, regional.byId("globe"), "no globe on a regional map by default");
        SvgDoc forced = SvgDoc.parse(MapDrawings.webSvg(MapFixtures.choropleth(10, 8), DAYLIGHT, WebSize.STANDARD,
                DrawOptions.web().withGraticule(DrawOptions.Graticule.ALWAYS)).bytes());
        assertTrue(forced.byId("graticule") != null);
    }

    /** Issue goal: about 3,000 regions at 1,200 px wide in under 1 MB of SVG. */
    @Test
    void threeThousandRegionsAtTwelveHundredPixelsStayUnderOneMegabyte() {
        MapModel big = MapFixtures.build(70, 62, List.of("2024"), "choropleth", ClassMethod.QUANTILE, 5, 3);
        assertTrue(big.regions().size() >= 3000, "fixture has " + big.regions().size() + " regions");
        DrawnMap map = MapDrawings.webSvg(big, DAYLIGHT, WebSize.STANDARD);
        assertTrue(map.bytes().length < 1_000_000, map.bytes().length + " bytes");
        assertEquals(big.regions().size(), SvgDoc.children(SvgDoc.parse(map.bytes()).byId("regions")).size());
    }
}
