package aequa.atlas;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.stream.IntStream;

import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.util.AffineTransformation;

import aequa.ellipsoid.EdgeSteps;
import aequa.ellipsoid.LonLatDensifier;
import aequa.inputs.regions.Region;
import aequa.planar.AreaAudit;
import aequa.planar.AreaAuditor;
import aequa.planar.CoverageSimplification;
import aequa.planar.PolygonProjector;
import aequa.planar.ProjectionDomain;
import aequa.planar.RegionAreaCheck;
import aequa.projection.EqualAreaProjection;
import aequa.projection.Footprint;

/**
 * A region layer on the map plane: densified in lon/lat, checked against the projection's domain, cut at the
 * projection's seam, projected, audited for area (before simplification) and simplified as one coverage for the finest output aequa draws.
 *
 * @param simplifiedM     the drawable geometry per key, metres
 * @param mapAreaRatio    planar / geodesic area per key (planar / (area scale x geodesic) for a scaled part)
 * @param audit           the map's area proof
 * @param dropped         the islands too small to draw
 */
record PlanarLayer(Map<String, Geometry> simplifiedM, Map<String, Double> mapAreaRatio, AreaAudit audit,
                   List<CoverageSimplification.DroppedPart> dropped) {

    PlanarLayer {
        dropped = List.copyOf(dropped);
    }

    /** A readable note on the islands too small to draw, if any. */
    List<String> droppedIslands() {
        return droppedNotice(dropped);
    }

    /** The web map is drawn this many pixels wide; print maps at most {@value #PRINT_WIDTH_MM} mm. */
    static final double WEB_WIDTH_PX = 1200;
    static final double PRINT_WIDTH_MM = 260;

    /** Share of the area tolerance that the chords of a thin region may use (our choice: a tenth). */
    static final double FINER_STEP_MARGIN = 0.1;

    static PlanarLayer of(RegionLayer layer, EqualAreaProjection projection, Footprint footprint, double tolerance) {
        return of(layer, projection, footprint, tolerance, 1, 0);
    }

    /**
     * A layer drawn as one part of a composite map: its areas multiplied by {@code areaScale} (the audit then
     * checks drawn area against {@code areaScale} times the geodesic area), densified for a drawing of
     * {@code drawnFootprint}'s width and simplified for a map at least {@code minDrawnWidthM} wide.
     */
    static PlanarLayer of(RegionLayer layer, EqualAreaProjection projection, Footprint drawnFootprint, double tolerance,
                          double areaScale, double minDrawnWidthM) {
        double stepDeg = LonLatDensifier.stepDeg(roughWidthM(drawnFootprint), WEB_WIDTH_PX);
        AffineTransformation scaling = areaScale == 1 ? null : AffineTransformation.scaleInstance(Math.sqrt(areaScale), Math.sqrt(areaScale));
        PolygonProjector projector = new PolygonProjector(projection, stepDeg);
        // thin, tiny and strongly bent regions get finer steps, so the drawn chords keep the true area (EdgeSteps)
        EdgeSteps steps = EdgeSteps.forLayer(layer.regions().stream().map(Region::lonLat).toList(), stepDeg,
                tolerance * FINER_STEP_MARGIN, (lonLat, xy, count) -> projection.forward(lonLat, 0, xy, 0, count));
        List<String> keys = layer.regions().stream().map(Region::key).toList();
        ProjectionDomain domain = new ProjectionDomain(projection);
        // each region is densified, checked against the domain, projected, scaled and measured alone, in
        // parallel; the lists keep the layer's order (EdgeSteps and the transformation are only read)
        List<Geometry> densified = layer.regions().parallelStream().map(region -> LonLatDensifier.densify(region.lonLat(), steps)).toList();
        List<ProjectionDomain.Limit> limits = densified.parallelStream().map(domain::of).toList();
        List<Geometry> planar = densified.parallelStream().map(lonLat -> {
            Geometry projected = projector.project(lonLat);
            return scaling == null ? projected : scaling.transform(projected);
        }).toList();
        List<RegionAreaCheck> checks = IntStream.range(0, keys.size()).parallel()
                .mapToObj(i -> AreaAuditor.check(keys.get(i), areaScale * layer.areaKm2ByKey().get(keys.get(i)), planar.get(i)))
                .toList();
        AreaAudit audit = AreaAuditor.audit(checks, tolerance, keysWith(keys, limits, ProjectionDomain.Limit.BEYOND_DOMAIN),
                keysWith(keys, limits, ProjectionDomain.Limit.AROUND_ASPECT_POLE));
        Envelope extent = new Envelope();
        planar.forEach(projected -> extent.expandToInclude(projected.getEnvelopeInternal()));
        double widthM = Math.max(Math.max(extent.getWidth(), extent.getHeight()), minDrawnWidthM);
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
        return new PlanarLayer(byKey, ratios, audit, simplified.dropped());
    }

    /**
     * One sentence for readers, however many islands were left out: a national file can drop hundreds of
     * specks, and a caption must stay readable.
     */
    static List<String> droppedNotice(List<CoverageSimplification.DroppedPart> dropped) {
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

    private static List<String> keysWith(List<String> keys, List<ProjectionDomain.Limit> limits, ProjectionDomain.Limit limit) {
        return IntStream.range(0, keys.size()).filter(i -> limits.get(i) == limit).mapToObj(keys::get).toList();
    }

    /** The footprint's width on the ground, roughly, to choose the densification step before projecting. */
    static double roughWidthM(Footprint footprint) {
        double metresPerDeg = 111_320;
        double midLat = Math.toRadians(footprint.midLatDeg());
        double eastWest = footprint.lonSpanDeg() * Math.cos(midLat);
        double northSouth = footprint.maxLatDeg() - footprint.minLatDeg();
        return Math.max(eastWest, northSouth) * metresPerDeg;
    }
}
