package aequa.projection;

import java.util.ArrayList;
import java.util.List;

import org.locationtech.jts.algorithm.locate.IndexedPointInAreaLocator;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Location;
import org.locationtech.jts.geom.Polygon;
import org.locationtech.jts.index.strtree.STRtree;

/**
 * Area-weighted sample points over the interiors of polygons in lon/lat: the centres of a grid of nearly
 * equal-area cells over the data's box (rows of equal latitude height, each row cut into as many columns as
 * keep the cells near square on the sphere), kept when they fall inside a polygon (JTS
 * {@link IndexedPointInAreaLocator}, holes respected) and weighted by their cell's exact area on the unit
 * sphere, dlon (sin lat1 - sin lat0). When the data fill little of their box (scattered islands) the grid is
 * refined, at most three times, so that about {@value #TARGET_INTERIOR} points land inside.
 */
final class FootprintSampler {

    /** Number of interior samples aimed at; the automatic choice thins them further for its search. */
    static final int TARGET_INTERIOR = 2000;

    /** Most grid cells ever tested, whatever the data: bounds the time spent (about 30 ms on this machine). */
    private static final int MAX_CELLS = 250_000;

    private final List<Polygon> polygons;
    private final STRtree index = new STRtree();
    private final IndexedPointInAreaLocator[] locators;
    private final boolean acceptEverything;
    private final double[] shiftsDeg;

    /**
     * @param polygons         the polygons, in lon/lat degrees
     * @param acceptEverything when true (no polygons: the whole globe), every grid point is kept
     */
    FootprintSampler(List<Polygon> polygons, boolean acceptEverything) {
        this.polygons = polygons;
        this.locators = new IndexedPointInAreaLocator[polygons.size()];
        this.acceptEverything = acceptEverything;
        Envelope all = new Envelope();
        for (int i = 0; i < polygons.size(); i++) {
            index.insert(polygons.get(i).getEnvelopeInternal(), i);
            all.expandToInclude(polygons.get(i).getEnvelopeInternal());
        }
        // data written with longitudes past +-180 (not cut at the antimeridian) are found one turn away
        List<Double> shifts = new ArrayList<>(List.of(0.0));
        if (all.getMaxX() > 180.0) {
            shifts.add(360.0);
        }
        if (all.getMinX() < -180.0) {
            shifts.add(-360.0);
        }
        this.shiftsDeg = shifts.stream().mapToDouble(Double::doubleValue).toArray();
    }

    /** Interior samples: interleaved (lon, lat) in degrees and weights, returned as {xy, w}. */
    double[][] sample(double westLonDeg, double lonSpanDeg, double minLatDeg, double maxLatDeg) {
        double span = Math.max(lonSpanDeg, 1e-6);
        double south = Math.max(-90.0, Math.min(minLatDeg, maxLatDeg - 1e-6));
        double north = Math.min(90.0, Math.max(maxLatDeg, minLatDeg + 1e-6));
        int cells = TARGET_INTERIOR;
        double[][] result = grid(westLonDeg, span, south, north, cells);
        for (int round = 0; round < 3 && result[1].length < TARGET_INTERIOR / 2 && cells < MAX_CELLS; round++) {
            int factor = (int) Math.min(16, Math.ceil((double) TARGET_INTERIOR / Math.max(1, result[1].length)));
            cells = Math.min(MAX_CELLS, cells * Math.max(2, factor));
            result = grid(westLonDeg, span, south, north, cells);
        }
        return result;
    }

    private double[][] grid(double west, double span, double south, double north, int cells) {
        double spanRad = Math.toRadians(span);
        double areaSr = spanRad * (Math.sin(Math.toRadians(north)) - Math.sin(Math.toRadians(south)));
        double side = Math.sqrt(areaSr / cells);
        int rows = Math.max(1, (int) Math.ceil(Math.toRadians(north - south) / side));
        double rowHeight = (north - south) / rows;
        List<double[]> kept = new ArrayList<>();
        Coordinate probe = new Coordinate();
        for (int r = 0; r < rows; r++) {
            double lat0 = south + r * rowHeight;
            double lat1 = r == rows - 1 ? north : lat0 + rowHeight;
            double mid = (lat0 + lat1) / 2;
            int cols = Math.max(1, (int) Math.round(spanRad * Math.cos(Math.toRadians(mid)) / side));
            double colWidth = span / cols;
            double weight = Math.toRadians(colWidth) * (Math.sin(Math.toRadians(lat1)) - Math.sin(Math.toRadians(lat0)));
            for (int c = 0; c < cols; c++) {
                double lon = Longitudes.normalize(west + (c + 0.5) * colWidth);
                probe.x = lon;
                probe.y = mid;
                if (acceptEverything || inside(probe)) {
                    kept.add(new double[] {lon, mid, weight});
                }
            }
        }
        double[] xy = new double[2 * kept.size()];
        double[] w = new double[kept.size()];
        for (int i = 0; i < kept.size(); i++) {
            xy[2 * i] = kept.get(i)[0];
            xy[2 * i + 1] = kept.get(i)[1];
            w[i] = kept.get(i)[2];
        }
        return new double[][] {xy, w};
    }

    private boolean inside(Coordinate point) {
        for (double shift : shiftsDeg) {
            Coordinate p = shift == 0.0 ? point : new Coordinate(point.x + shift, point.y);
            @SuppressWarnings("unchecked")
            List<Integer> hits = index.query(new Envelope(p));
            for (int i : hits) {
                if (locator(i).locate(p) != Location.EXTERIOR) {
                    return true;
                }
            }
        }
        return false;
    }

    private IndexedPointInAreaLocator locator(int i) {
        if (locators[i] == null) {
            locators[i] = new IndexedPointInAreaLocator(polygons.get(i));
        }
        return locators[i];
    }
}
