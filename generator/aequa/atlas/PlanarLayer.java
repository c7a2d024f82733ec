package aequa.atlas;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.stream.IntStream;

import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;

import aequa.ellipsoid.LonLatDensifier;
import aequa.inputs.regions.Region;
import aequa.planar.AreaAudit;
import aequa.planar.AreaAuditor;
import aequa.planar.CoverageSimplification;
import aequa.planar.PolygonProjector;
import aequa.planar.RegionAreaCheck;
import aequa.projection.EqualAreaProjection;
import aequa.projection.Footprint;

/**
 * A region layer on the map plane: densified in lon/lat, cut at the projection's seam, projected, audited
 * for area (before simplification) and simplified as one coverage for the finest output aequa draws.
 *
 * @param simplifiedM     the drawable geometry per key, metres
 * @param mapAreaRatio    planar / geodesic area per key
 * @param audit           the map's area proof
 * @param droppedIslands  a readable note on the parts too small to draw, if any
 */
record PlanarLayer(Map<String, Geometry> simplifiedM, Map<String, Double> mapAreaRatio, AreaAudit audit,
                   List<String> droppedIslands) {

    /** The web map is drawn this many pixels wide; print maps at most {@value #PRINT_WIDTH_MM} mm. */
    static final double WEB_WIDTH_PX = 1200;
    static final double PRINT_WIDTH_MM = 260;

    static PlanarLayer of(RegionLayer layer, EqualAreaProjection projection, Footprint footprint, double tolerance) {
        double stepDeg = LonLatDensifier.stepDeg(roughWidthM(footprint), WEB_WIDTH_PX);
        PolygonProjector projector = new PolygonProjector(projection, stepDeg);
        List<String> keys = layer.regions().stream().map(Region::key).toList();
        // each region is densified, projected and measured alone, in parallel; the lists keep the layer's order
        List<Geometry> planar = layer.regions().parallelStream()
                .map(region -> projector.project(LonLatDensifier.densify(region.lonLat(), stepDeg))).toList();
        List<RegionAreaCheck> checks = IntStream.range(0, keys.size()).parallel()
                .mapToObj(i -> AreaAuditor.check(keys.get(i), layer.areaKm2ByKey().get(keys.get(i)), planar.get(i))).toList();
        Envelope extent = new Envelope();
        planar.forEach(projected -> extent.expandToInclude(projected.getEnvelopeInternal()));
        AreaAudit audit = AreaAuditor.audit(checks, tolerance);
        double widthM = Math.max(extent.getWidth(), extent.getHeight());
        double toleranceM = Math.min(CoverageSimplification.screenToleranceM(widthM, WEB_WIDTH_PX),
                CoverageSimplification.printToleranceM(widthM, PRINT_WIDTH_MM));
        CoverageSimplification.Result simplified = CoverageSimplification.simplify(keys, planar, toleranceM,
                CoverageSimplification.islandThresholdM2(toleranceM));
        Map<String, Geometry> byKey = new LinkedHashMap<>();
        Map<String, Double> ratios = new LinkedHashMap<>();
        for (int i = 0; i < keys.size(); i++) {
            byKey.put(keys.get(i), simplified.planarM().get(i));
            ratios.put(keys.get(i), checks.get(i).mapAreaRatio());
        }
        List<String> dropped = droppedNotice(simplified.dropped());
        return new PlanarLayer(byKey, ratios, audit, dropped);
    }

    /**
     * One sentence for readers, however many islands were left out: a national file can drop hundreds of
     * specks, and a caption must stay readable.
     */
    private static List<String> droppedNotice(List<CoverageSimplification.DroppedPart> dropped) {
        if (dropped.isEmpty()) {
            return List.of();
        }
        double totalKm2 = dropped.stream().mapToDouble(CoverageSimplification.DroppedPart::areaKm2).sum();
        long regions = dropped.stream().map(CoverageSimplification.DroppedPart::key).distinct().count();
        String parts = dropped.size() == 1 ? "One island" : dropped.size() + " islands";
        return List.of(String.format(Locale.ROOT,
                "%s of %d %s (%.1f km² in all) %s too small to draw at this scale and %s left out of the drawing; "
                        + "their figures are those of their regions.",
                parts, regions, regions == 1 ? "region" : "regions", totalKm2, dropped.size() == 1 ? "is" : "are",
                dropped.size() == 1 ? "was" : "were"));
    }

    /** The footprint's width on the ground, roughly, to choose the densification step before projecting. */
    private static double roughWidthM(Footprint footprint) {
        double metresPerDeg = 111_320;
        double midLat = Math.toRadians(footprint.midLatDeg());
        double eastWest = footprint.lonSpanDeg() * Math.cos(midLat);
        double northSouth = footprint.maxLatDeg() - footprint.minLatDeg();
        return Math.max(eastWest, northSouth) * metresPerDeg;
    }
}
