package aequa.demo;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Random;
import java.util.function.BiPredicate;

import org.locationtech.jts.algorithm.Orientation;
import org.locationtech.jts.densify.Densifier;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LinearRing;
import org.locationtech.jts.geom.Polygon;
import org.locationtech.jts.geom.util.GeometryFixer;
import org.locationtech.jts.operation.overlayng.OverlayNG;
import org.locationtech.jts.operation.overlayng.OverlayNGRobust;
import org.locationtech.jts.triangulate.VoronoiDiagramBuilder;

/**
 * Tiles an invented land mass with Voronoi cells that share their borders exactly, and places them on the
 * globe as RFC 7946 polygons: lon/lat degrees, exterior rings counter-clockwise, cut at the antimeridian
 * (RFC 7946, section 3.1.9).
 */
final class InventedCells {

    private static final GeometryFactory GF = new GeometryFactory();
    private static final double DECIMALS = 1e6;

    private InventedCells() {
    }

    /**
     * @param plane        the plane the cells are drawn in
     * @param planeExtent  where seeds are scattered, in plane units (degrees)
     * @param seedCount    how many seeds to scatter
     * @param land         which (lon, lat) points are land; only cells whose seed is land are kept
     * @param densifyDeg   the longest plane edge before it is placed on the globe
     */
    static List<Geometry> tile(LocalPlane plane, Envelope planeExtent, int seedCount,
                               BiPredicate<Double, Double> land, double densifyDeg, Random random) {
        List<Coordinate> seeds = new ArrayList<>();
        double[] lonLat = new double[2];
        for (int i = 0; i < seedCount; i++) {
            double x = planeExtent.getMinX() + random.nextDouble() * planeExtent.getWidth();
            double y = planeExtent.getMinY() + random.nextDouble() * planeExtent.getHeight();
            seeds.add(new Coordinate(x, y));
        }
        VoronoiDiagramBuilder voronoi = new VoronoiDiagramBuilder();
        voronoi.setSites(seeds);
        voronoi.setClipEnvelope(planeExtent);
        Geometry cells = voronoi.getDiagram(GF);
        Geometry frame = GF.toGeometry(planeExtent);
        List<Geometry> kept = new ArrayList<>();
        for (int i = 0; i < cells.getNumGeometries(); i++) {
            Geometry cell = cells.getGeometryN(i);
            Coordinate seed = (Coordinate) cell.getUserData();
            plane.toLonLat(seed.x, seed.y, lonLat);
            if (!land.test(lonLat[0], lonLat[1])) {
                continue;
            }
            Geometry clipped = OverlayNGRobust.overlay(cell, frame, OverlayNG.INTERSECTION);
            Geometry placed = place((Polygon) Densifier.densify(clipped, densifyDeg), plane);
            kept.add(placed);
        }
        kept.sort(Comparator.comparingDouble((Geometry g) -> -g.getCentroid().getY())
                .thenComparingDouble(g -> g.getCentroid().getX()));
        return kept;
    }

    /** Maps a plane polygon to lon/lat with continuous longitudes, then cuts it at +-180. */
    private static Geometry place(Polygon planePolygon, LocalPlane plane) {
        Coordinate[] ring = planePolygon.getExteriorRing().getCoordinates();
        Coordinate[] placed = new Coordinate[ring.length];
        double[] lonLat = new double[2];
        double previousLon = Double.NaN;
        for (int i = 0; i < ring.length; i++) {
            plane.toLonLat(ring[i].x, ring[i].y, lonLat);
            double lon = lonLat[0];
            if (!Double.isNaN(previousLon)) {
                lon += 360.0 * Math.round((previousLon - lon) / 360.0);
            }
            previousLon = lon;
            placed[i] = new Coordinate(round(lon), round(lonLat[1]));
        }
        if (Math.abs(placed[placed.length - 1].x - placed[0].x) > 1e-6) {
            throw new IllegalStateException("an invented cell encloses a pole; keep the land mask away from it");
        }
        placed[placed.length - 1] = placed[0].copy();
        Polygon unwrapped = GF.createPolygon(placed);
        return cutAtAntimeridian(unwrapped);
    }

    private static Geometry cutAtAntimeridian(Polygon unwrapped) {
        Envelope e = unwrapped.getEnvelopeInternal();
        double shift = e.getMaxX() > 180.0 ? -360.0 : (e.getMinX() < -180.0 ? 360.0 : 0.0);
        if (shift == 0.0) {
            return counterClockwise(unwrapped);
        }
        double cut = shift < 0 ? 180.0 : -180.0;
        Geometry near = OverlayNGRobust.overlay(unwrapped,
                GF.toGeometry(shift < 0 ? new Envelope(-540, cut, -90, 90) : new Envelope(cut, 540, -90, 90)), OverlayNG.INTERSECTION);
        Geometry far = OverlayNGRobust.overlay(unwrapped,
                GF.toGeometry(shift < 0 ? new Envelope(cut, 540, -90, 90) : new Envelope(-540, cut, -90, 90)), OverlayNG.INTERSECTION);
        Geometry farShifted = far.copy();
        farShifted.apply((org.locationtech.jts.geom.CoordinateFilter) c -> c.x += shift);
        farShifted.geometryChanged();
        List<Polygon> parts = new ArrayList<>();
        for (Geometry piece : List.of(near, farShifted)) {
            for (int i = 0; i < piece.getNumGeometries(); i++) {
                if (piece.getGeometryN(i) instanceof Polygon p && !p.isEmpty()) {
                    parts.add(counterClockwise(roundAll(p)));
                }
            }
        }
        return GF.createMultiPolygon(parts.toArray(Polygon[]::new));
    }

    private static Polygon roundAll(Polygon p) {
        Geometry copy = p.copy();
        copy.apply((org.locationtech.jts.geom.CoordinateFilter) c -> {
            c.x = round(c.x);
            c.y = round(c.y);
        });
        copy.geometryChanged();
        Geometry valid = copy.isValid() ? copy : GeometryFixer.fix(copy);
        return (Polygon) valid.getGeometryN(0);
    }

    /** RFC 7946 section 3.1.6: exterior rings counter-clockwise, holes clockwise. */
    private static Polygon counterClockwise(Polygon p) {
        LinearRing shell = p.getExteriorRing();
        if (!Orientation.isCCW(shell.getCoordinates())) {
            shell = shell.reverse();
        }
        return GF.createPolygon(shell);
    }

    static double round(double v) {
        return Math.round(v * DECIMALS) / DECIMALS;
    }
}
