package aequa.drawing;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.junit.jupiter.api.Test;

import aequa.atlas.MapModel;
import aequa.project.ClassMethod;

/**
 * The size of proportional circles in print (SVG units are millimetres): the map's {@code largest-circle-mm}
 * sets the largest circle's diameter; without it, a map of many regions gets circles that together cover at
 * most {@link Symbols#MAX_COVER_SHARE} of the regions' drawn area, measured through the map's own area-scale
 * square (page area = ground area x scale², the definition of an equal-area drawing's scale, Snyder 1987 p. 4).
 * Circles are drawn largest first. The fixture's regions and counts are invented; they are no oracle, only
 * the geometry of what is drawn is checked.
 */
class CircleSizeTest {

    private static final Pattern CIRCLE = Pattern.compile("<g id='s-[^']*'><ellipse cx='[^']*' cy='[^']*' rx='([0-9.]+)'");

    @Test
    void theSettingFixesTheLargestCirclesDiameterInMillimetres() {
        MapModel circles = MapFixtures.build(14, 12, List.of("2024"), "circles", ClassMethod.QUANTILE, 5, 4);
        String svg = printSvg(withLargestCircle(circles, 12.0));
        List<Double> radii = radii(svg);
        assertEquals(6.0, radii.get(0), 0.01, "the first circle drawn is the largest, 12 mm across");
        for (int i = 1; i < radii.size(); i++) {
            assertTrue(radii.get(i) <= radii.get(i - 1), "largest first");
        }
    }

    @Test
    void manyRegionsGetCirclesCoveringAFixedShareOfTheirArea() {
        MapModel circles = MapFixtures.build(70, 60, List.of("2024"), "circles", ClassMethod.QUANTILE, 5, 4);
        String svg = printSvg(circles);
        double circlesMm2 = radii(svg).stream().mapToDouble(r -> Math.PI * r * r).sum();
        Matcher square = Pattern.compile("<g id='area-scale'>.*?<rect x='[^']*' y='[^']*' width='([0-9.]+)'.*?>([0-9,.]+) km\u00b2<")
                .matcher(svg);
        assertTrue(square.find());
        double mmPerM = Double.parseDouble(square.group(1)) / Math.sqrt(Double.parseDouble(square.group(2).replace(",", "")) * 1e6);
        double regionsMm2 = circles.regions().stream().mapToDouble(r -> r.planarM().getArea()).sum() * mmPerM * mmPerM;
        // SVG coordinates are written to 0.01 mm, so radii carry up to 0.005 mm of rounding
        assertEquals(Symbols.MAX_COVER_SHARE, circlesMm2 / regionsMm2, 0.03, "the cover rule binds on a map of many regions");
    }

    private static String printSvg(MapModel model) {
        return new String(MapDrawings.printSvg(model, Themes.bundled("newsprint"), PrintSize.of(PrintPreset.TWO_COLUMNS)).bytes(),
                StandardCharsets.UTF_8);
    }

    private static List<Double> radii(String svg) {
        List<Double> radii = new ArrayList<>();
        Matcher m = CIRCLE.matcher(svg);
        while (m.find()) {
            radii.add(Double.parseDouble(m.group(1)));
        }
        assertTrue(!radii.isEmpty());
        return radii;
    }

    private static MapModel withLargestCircle(MapModel m, double mm) {
        return MapFixtures.withSpec(m, m.spec().toBuilder().largestCircleMm(mm).build());
    }
}
