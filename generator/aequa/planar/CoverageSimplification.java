package aequa.planar;

import java.util.ArrayList;
import java.util.List;

import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.Polygon;
import org.locationtech.jts.index.strtree.STRtree;

/**
 * Simplifies a map's projected regions together, as one coverage, with {@link EdgeCoverageSimplifier}
 * (Visvalingam-Whyatt on each border with guards that keep the coverage valid): each border shared by two regions is simplified once
 * and used by both, so no gaps or slivers appear between neighbours; node vertices never move. The input
 * must be vertex-exact along shared borders, which the readers, the lon/lat densifier and the projector
 * preserve.
 *
 * <p>Afterwards, small islands are dropped: a polygon part smaller than the island threshold that touches
 * no other polygon, and is not its region's largest part (a region never disappears). Each drop is
 * returned so the report can list it.
 */
public final class CoverageSimplification {

    /** Screen: half a pixel. Our choice: below what antialiasing shows. */
    public static final double PIXEL_FRACTION = 0.5;

    /** Print: a tenth of a millimetre, about the width of a hairline (0.1 mm, common practice in print). */
    public static final double MILLIMETRE_FRACTION = 0.1;

    /**
     * A part dropped from a region.
     *
     * @param key     the region's key
     * @param areaKm2 the part's area on the map (equal-area, so also on the ground)
     * @param xM      a point inside the part, metres
     * @param yM      a point inside the part, metres
     */
    public record DroppedPart(String key, double areaKm2, double xM, double yM) {
    }

    /** The simplified regions (same order as the input) and the parts dropped. */
    public record Result(List<Geometry> planarM, List<DroppedPart> dropped) {
        public Result {
            planarM = List.copyOf(planarM);
            dropped = List.copyOf(dropped);
        }
    }

    private CoverageSimplification() {
    }

    /** Tolerance in metres for a screen map {@code outputWidthPx} pixels wide showing {@code mapWidthM} metres. */
    public static double screenToleranceM(double mapWidthM, double outputWidthPx) {
        return PIXEL_FRACTION * mapWidthM / outputWidthPx;
    }

    /** Tolerance in metres for a printed map {@code outputWidthMm} millimetres wide showing {@code mapWidthM} metres. */
    public static double printToleranceM(double mapWidthM, double outputWidthMm) {
        return MILLIMETRE_FRACTION * mapWidthM / outputWidthMm;
    }

    /**
     * The island threshold for a tolerance: a square two tolerances on a side, i.e. one pixel on screen
     * (a 0.2 mm square in print). Smaller free-standing islands cannot be seen as shapes.
     */
    public static double islandThresholdM2(double toleranceM) {
        return 4 * toleranceM * toleranceM;
    }

    /**
     * @param keys       the regions' keys, parallel to {@code planarM}
     * @param planarM    projected Polygon/MultiPolygon per region (a valid coverage; empty entries allowed)
     * @param toleranceM the simplification tolerance, metres (0 keeps every vertex)
     * @param islandM2   parts smaller than this that touch nothing are dropped (0 keeps all)
     */
    public static Result simplify(List<String> keys, List<Geometry> planarM, double toleranceM, double islandM2) {
        Geometry[] simplified = toleranceM > 0
                ? EdgeCoverageSimplifier.simplify(planarM.toArray(new Geometry[0]), toleranceM)
                : planarM.toArray(new Geometry[0]);
        List<DroppedPart> dropped = new ArrayList<>();
        if (islandM2 > 0 && anyMultiPart(simplified)) {
            STRtree index = new STRtree();
            for (int i = 0; i < simplified.length; i++) {
                for (int p = 0; p < simplified[i].getNumGeometries(); p++) {
                    Geometry part = simplified[i].getGeometryN(p);
                    index.insert(part.getEnvelopeInternal(), new int[] {i, p});
                }
            }
            Geometry[] beforeDrops = simplified.clone();
            for (int i = 0; i < simplified.length; i++) {
                simplified[i] = dropIslands(keys.get(i), i, beforeDrops, index, islandM2, dropped);
            }
        }
        return new Result(List.of(simplified), dropped);
    }

    /** Only a region of several parts can lose one: with none, the part index need not be built. */
    private static boolean anyMultiPart(Geometry[] regions) {
        for (Geometry region : regions) {
            if (region.getNumGeometries() > 1) {
                return true;
            }
        }
        return false;
    }

    private static Geometry dropIslands(String key, int region, Geometry[] all, STRtree index, double islandM2,
                                       List<DroppedPart> dropped) {
        Geometry geometry = all[region];
        if (geometry.getNumGeometries() < 2) {
            return geometry;
        }
        int largest = 0;
        for (int p = 1; p < geometry.getNumGeometries(); p++) {
            if (geometry.getGeometryN(p).getArea() > geometry.getGeometryN(largest).getArea()) {
                largest = p;
            }
        }
        List<Polygon> kept = new ArrayList<>();
        for (int p = 0; p < geometry.getNumGeometries(); p++) {
            Polygon part = (Polygon) geometry.getGeometryN(p);
            if (p != largest && part.getArea() < islandM2 && touchesNothing(part, region, p, all, index)) {
                var inside = part.getInteriorPoint().getCoordinate();
                dropped.add(new DroppedPart(key, part.getArea() / 1e6, inside.x, inside.y));
            } else {
                kept.add(part);
            }
        }
        if (kept.size() == geometry.getNumGeometries()) {
            return geometry;
        }
        return kept.size() == 1 ? kept.get(0) : geometry.getFactory().createMultiPolygon(kept.toArray(new Polygon[0]));
    }

    private static boolean touchesNothing(Polygon part, int region, int partIndex, Geometry[] all, STRtree index) {
        for (Object hit : index.query(part.getEnvelopeInternal())) {
            int[] id = (int[]) hit;
            if ((id[0] != region || id[1] != partIndex) && part.intersects(all[id[0]].getGeometryN(id[1]))) {
                return false;
            }
        }
        return true;
    }
}
