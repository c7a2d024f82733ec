package aequa.projection;

import java.util.ArrayList;
import java.util.List;

import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.Polygon;

/** Test regions in lon/lat: boxes with edges densified every degree, as a GeoJSON file would carry them. */
final class Regions {

    private static final GeometryFactory FACTORY = new GeometryFactory();

    private Regions() {
    }

    /** A counter-clockwise lon/lat box with a vertex at least every degree along each edge. */
    static Polygon box(double west, double south, double east, double north) {
        List<Coordinate> ring = new ArrayList<>();
        edge(ring, west, south, east, south);
        edge(ring, east, south, east, north);
        edge(ring, east, north, west, north);
        edge(ring, west, north, west, south);
        ring.add(new Coordinate(west, south));
        return FACTORY.createPolygon(ring.toArray(Coordinate[]::new));
    }

    private static void edge(List<Coordinate> ring, double x0, double y0, double x1, double y1) {
        int steps = (int) Math.max(1, Math.ceil(Math.max(Math.abs(x1 - x0), Math.abs(y1 - y0))));
        for (int i = 0; i < steps; i++) {
            double t = (double) i / steps;
            ring.add(new Coordinate(x0 + t * (x1 - x0), y0 + t * (y1 - y0)));
        }
    }
}
