package aequa.ellipsoid;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.CoordinateList;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LinearRing;
import org.locationtech.jts.geom.Polygon;
import org.locationtech.jts.geom.util.GeometryFixer;
import org.locationtech.jts.operation.overlayng.OverlayNG;
import org.locationtech.jts.operation.overlayng.OverlayNGRobust;

/**
 * Cuts a polygon given in a lon/lat frame (geographic, or a projection's rotated frame) at the frame's
 * antimeridian (lon = +-180) and clips it to a latitude band, so that every piece lies inside
 * [-180, 180] x [minLat, maxLat] without any edge spanning the cut. This is what keeps a projection whose
 * cut is that meridian from drawing streaks across the map.
 *
 * <p>Method (our own; RFC 7946, section 3.1.9 states the required output, not an algorithm): each ring's
 * longitudes are unwrapped (every step taken the short way round, which is right for densified edges);
 * a ring whose unwrapped longitudes end 360 deg from where they began encircles a pole and is closed
 * along that pole's latitude; a ring that passes through a pole takes its free turn there so that it
 * closes. The unwrapped polygon is intersected with the strips [-180 + 360 k, 180 + 360 k] x [minLat, maxLat]
 * (JTS OverlayNG) and each piece is shifted back by -360 k.
 *
 * <p>Guarantees: vertices of the input keep their exact coordinates (so shared borders stay vertex-exact),
 * except those on the cut. Points where an edge crosses the cut are computed from the edge's two end points
 * in a fixed order, so two regions sharing the edge get the same point. Points on the cut land at
 * {@code +-(180 - nudgeDeg)} according to the side of the piece they bound, so that a projection fed the
 * mapped-back point puts it on the correct edge of the map. New edges (along the cut, a pole, or the band
 * limits) are densified to {@code newEdgeStepDeg}.
 */
public final class AntimeridianCutter {

    /** Which pole a ring that encircles one is taken to enclose. */
    public enum PoleRule {
        /** The pole on the side of the ring's mean latitude: for input whose orientation cannot be trusted. */
        NEARER_POLE,
        /** The pole to the left of the ring's direction (exterior rings counter-clockwise, holes clockwise). */
        ORIENTATION
    }

    /**
     * @param minLatDeg      southern limit of the frame's domain, degrees
     * @param maxLatDeg      northern limit, degrees
     * @param nudgeDeg       how far inside the cut its points are placed (0 keeps them on +-180)
     * @param newEdgeStepDeg largest step along new edges, degrees ({@code Double.POSITIVE_INFINITY}: none added)
     * @param poleRule       how to decide which pole an encircling ring encloses
     */
    public record Options(double minLatDeg, double maxLatDeg, double nudgeDeg, double newEdgeStepDeg, PoleRule poleRule) {
    }

    /** Longitudes and latitudes within this of +-180 or +-90 are taken to be exactly on the cut or pole. */
    static final double SNAP_DEG = 1e-9;

    private static final GeometryFactory PLANE = new GeometryFactory();

    private AntimeridianCutter() {
    }

    /**
     * @param frame   a polygon in frame lon/lat degrees (x = frame longitude in [-180, 180])
     * @param factory the factory for the pieces
     * @return the pieces, each a valid polygon inside the frame's strip and band; empty when nothing is left
     */
    public static List<Polygon> cut(Polygon frame, Options options, GeometryFactory factory) {
        if (frame.isEmpty()) {
            return List.of();
        }
        Map<Coordinate, Coordinate> originals = new HashMap<>();
        UnwrappedRing shell = UnwrappedRing.of(frame.getExteriorRing().getCoordinates(), false, options, originals);
        if (shell == null) {
            return List.of();
        }
        List<LinearRing> holes = new ArrayList<>();
        for (int h = 0; h < frame.getNumInteriorRing(); h++) {
            UnwrappedRing hole = UnwrappedRing.of(frame.getInteriorRingN(h).getCoordinates(), true, options, originals);
            if (hole != null) {
                holes.add(PLANE.createLinearRing(hole.alignedTo(shell, originals)));
            }
        }
        Geometry unwrapped = PLANE.createPolygon(PLANE.createLinearRing(shell.coordinates()), holes.toArray(new LinearRing[0]));
        if (!unwrapped.isValid()) {
            unwrapped = GeometryFixer.fix(unwrapped);
        }
        var envelope = unwrapped.getEnvelopeInternal();
        int firstStrip = (int) Math.ceil((envelope.getMinX() - 180) / 360);
        int lastStrip = (int) Math.floor((envelope.getMaxX() + 180) / 360);
        List<Polygon> pieces = new ArrayList<>();
        for (int strip = firstStrip; strip <= lastStrip; strip++) {
            double west = -180 + 360.0 * strip;
            double east = 180 + 360.0 * strip;
            Geometry band = PLANE.toGeometry(new org.locationtech.jts.geom.Envelope(west, east, options.minLatDeg(), options.maxLatDeg()));
            Geometry inside = envelope.getMinX() >= west && envelope.getMaxX() <= east
                    && envelope.getMinY() >= options.minLatDeg() && envelope.getMaxY() <= options.maxLatDeg()
                    ? unwrapped : OverlayNGRobust.overlay(unwrapped, band, OverlayNG.INTERSECTION);
            for (int i = 0; i < inside.getNumGeometries(); i++) {
                if (inside.getGeometryN(i) instanceof Polygon && !inside.getGeometryN(i).isEmpty()) {
                    Polygon piece = mapBack((Polygon) inside.getGeometryN(i), strip, options, originals, factory);
                    if (piece != null) {
                        pieces.add(piece);
                    }
                }
            }
        }
        return pieces;
    }

    private static Polygon mapBack(Polygon piece, int strip, Options options, Map<Coordinate, Coordinate> originals,
                                   GeometryFactory factory) {
        LinearRing shell = mapBack(piece.getExteriorRing(), strip, options, originals, factory);
        if (shell == null) {
            return null;
        }
        List<LinearRing> holes = new ArrayList<>();
        for (int h = 0; h < piece.getNumInteriorRing(); h++) {
            LinearRing hole = mapBack(piece.getInteriorRingN(h), strip, options, originals, factory);
            if (hole != null) {
                holes.add(hole);
            }
        }
        return factory.createPolygon(shell, holes.toArray(new LinearRing[0]));
    }

    private static LinearRing mapBack(LinearRing ring, int strip, Options options, Map<Coordinate, Coordinate> originals,
                                      GeometryFactory factory) {
        double shift = 360.0 * strip;
        CoordinateList out = new CoordinateList();
        Coordinate previous = null;
        boolean previousNew = false;
        for (Coordinate unwrapped : ring.getCoordinates()) {
            Coordinate original = originals.get(unwrapped);
            Coordinate mapped;
            if (unwrapped.x == 180 + shift) {
                mapped = new Coordinate(180 - options.nudgeDeg(), unwrapped.y);
            } else if (unwrapped.x == -180 + shift) {
                mapped = new Coordinate(-180 + options.nudgeDeg(), unwrapped.y);
            } else if (original != null) {
                mapped = original;
            } else {
                mapped = new Coordinate(unwrapped.x - shift, unwrapped.y);
            }
            boolean isNew = mapped != original;
            if (previous != null && previousNew && isNew) {
                densify(previous, mapped, options.newEdgeStepDeg(), out);
            }
            out.add(mapped, false);
            previous = mapped;
            previousNew = isNew;
        }
        out.closeRing();
        if (out.size() < 4) {
            return null;
        }
        LinearRing result = factory.createLinearRing(out.toCoordinateArray());
        return result.getLength() == 0 ? null : result;
    }

    private static void densify(Coordinate from, Coordinate to, double stepDeg, CoordinateList out) {
        double span = Math.max(Math.abs(to.x - from.x), Math.abs(to.y - from.y));
        int steps = Double.isInfinite(stepDeg) ? 1 : (int) Math.ceil(span / stepDeg);
        for (int s = 1; s < steps; s++) {
            double t = (double) s / steps;
            out.add(new Coordinate(from.x + (to.x - from.x) * t, from.y + (to.y - from.y) * t), false);
        }
    }
}
