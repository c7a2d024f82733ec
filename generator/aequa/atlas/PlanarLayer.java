package aequa.atlas;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

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
 * @param droppedIslands  readable notes on parts too small to draw
 */
record PlanarLayer(Map<String, Geometry> simplifiedM, Map<String, Double> mapAreaRatio, AreaAudit audit,
                   List<String> droppedIslands) {

    /** The web map is drawn this many pixels wide; print maps at most {@value #PRINT_WIDTH_MM} mm. */
    static final double WEB_WIDTH_PX = 1200;
    static final double PRINT_WIDTH_MM = 260;

    static PlanarLayer of(RegionLayer layer, EqualAreaProjection projection, Footprint footprint, double tolerance) {
        double stepDeg = LonLatDensifier.stepDeg(roughWidthM(footprint), WEB_WIDTH_PX);
        PolygonProjector projector = new PolygonProjector(projection, stepDeg);
        List<String> keys = new ArrayList<>();
        List<Geometry> planar = new ArrayList<>();
        List<RegionAreaCheck> checks = new ArrayList<>();
        Envelope extent = new Envelope();
        for (Region region : layer.regions()) {
            Geometry projected = projector.project(LonLatDensifier.densify(region.lonLat(), stepDeg));
            keys.add(region.key());
            planar.add(projected);
            checks.add(AreaAuditor.check(region.key(), layer.areaKm2ByKey().get(region.key()), projected));
            extent.expandToInclude(projected.getEnvelopeInternal());
        }
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
        List<String> dropped = simplified.dropped().stream()
                .map(d -> String.format(Locale.ROOT, "An island of %s (%.3f km²) is too small to draw at this scale and was left out of the drawing.",
                        d.key(), d.areaKm2()))
                .toList();
        return new PlanarLayer(byKey, ratios, audit, dropped);
    }

    /** The footprint's width on the ground, roughly, to choose the densification step before projecting. */
    private static double roughWidthM(Footprint footprint) {
        double metresPerDeg = 111_320;
        double midLat = Math.toRadians((footprint.minLatDeg() + footprint.maxLatDeg()) / 2);
        double eastWest = footprint.lonSpanDeg() * Math.cos(midLat);
        double northSouth = footprint.maxLatDeg() - footprint.minLatDeg();
        return Math.max(eastWest, northSouth) * metresPerDeg;
    }
}
