package aequa.demo;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;

import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;

/**
 * An invented southern ice land around the south pole, in four regions of 90 degrees of longitude each.
 * As RFC 7946 (section 3.1.9) asks, the ring that holds the pole runs along the antimeridian and along
 * latitude -90, so the pole-side edge of each region is the line lat = -90.
 */
final class IceShelf {

    private static final GeometryFactory GF = new GeometryFactory();
    private static final double STEP_DEG = 1.0;

    private IceShelf() {
    }

    static List<Geometry> cells(Random random) {
        double phase = random.nextDouble() * 360;
        List<Geometry> cells = new ArrayList<>();
        for (int quarter = 0; quarter < 4; quarter++) {
            double west = -180 + 90 * quarter;
            double east = west + 90;
            List<Coordinate> ring = new ArrayList<>();
            for (double lon = west; lon < east; lon += STEP_DEG) {
                ring.add(new Coordinate(lon, -90));
            }
            for (double lon = east; lon > west; lon -= STEP_DEG) {
                ring.add(new Coordinate(lon, coastLatDeg(lon, phase)));
            }
            ring.add(new Coordinate(west, coastLatDeg(west, phase)));
            ring.add(new Coordinate(west, -90));
            cells.add(GF.createPolygon(ring.toArray(Coordinate[]::new)));
        }
        return cells;
    }

    /** The ragged coast; equal at -180 and 180 so the land closes around the globe. */
    private static double coastLatDeg(double lon, double phase) {
        return InventedCells.round(-71 + 2.5 * Math.sin(Math.toRadians(3 * lon + phase)) + 1.2 * Math.cos(Math.toRadians(7 * lon)));
    }
}
