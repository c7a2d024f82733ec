package aequa.planar;

import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.CoordinateSequence;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.Point;
import org.locationtech.jts.geom.Polygon;

import aequa.projection.AspectFrame;
import aequa.projection.EqualAreaProjection;

/**
 * Which regions a projection cannot draw whole, found on the outline as it is drawn (densified, lon/lat).
 * Immutable and thread-safe.
 *
 * <ul>
 * <li><b>Beyond the domain</b>: a continuous projection (the azimuthal family) is defined on a cap around its
 *     centre ({@link AspectFrame#minFrameLatDeg()}: 135 deg from the centre for aequa's azimuthal maps, the
 *     limit the chooser's rules state); a vertex beyond it would be clipped, so the region could not keep
 *     its area. The test is the frame latitude of every drawn vertex, strictly below the cap's edge (a
 *     vertex on the edge projects, so a region touching the edge is drawn whole).</li>
 * <li><b>Around an aspect's pole</b>: a cylinder in transverse or oblique aspect is cut along its frame's
 *     antimeridian from one frame pole to the other; a region that holds a frame pole inside winds once
 *     around it, so the cut leaves it open and the closing along the pole line (which the normal aspect's
 *     RFC 7946 polar rings spell out in the data) is unknown. Such a region is refused rather than drawn
 *     with a false area. The normal aspect's poles are the geographic ones, never inside an RFC 7946 ring,
 *     so they are not tested. The frame poles are mapped back to lon/lat and tested for inclusion in the
 *     lon/lat polygon (exact for edges straight in lon/lat, as RFC 7946 reads them).</li>
 * </ul>
 */
public final class ProjectionDomain {

    /** A frame pole this close to a geographic pole, in degrees of latitude, is a normal aspect's pole. */
    private static final double NORMAL_ASPECT_DEG = 1e-6;

    private static final GeometryFactory LON_LAT = new GeometryFactory();

    /** What stops a region from being drawn whole. */
    public enum Limit {
        NONE, BEYOND_DOMAIN, AROUND_ASPECT_POLE
    }

    private final AspectFrame frame;
    private final boolean capped;
    private final Point[] aspectPoles;

    public ProjectionDomain(EqualAreaProjection projection) {
        this.frame = projection.frame();
        this.capped = !frame.hasCut() && frame.minFrameLatDeg() > -90;
        this.aspectPoles = frame.hasCut() ? obliquePoles(frame) : new Point[0];
    }

    /** The limit the region meets; {@code lonLat} is the outline as drawn (densified), Polygon or MultiPolygon. */
    public Limit of(Geometry lonLat) {
        for (Point pole : aspectPoles) {
            if (lonLat.getEnvelopeInternal().covers(pole.getCoordinate()) && lonLat.covers(pole)) {
                return Limit.AROUND_ASPECT_POLE;
            }
        }
        if (capped && reachesBeyondCap(lonLat)) {
            return Limit.BEYOND_DOMAIN;
        }
        return Limit.NONE;
    }

    private boolean reachesBeyondCap(Geometry lonLat) {
        double[] xy = new double[2];
        for (int p = 0; p < lonLat.getNumGeometries(); p++) {
            Polygon polygon = (Polygon) lonLat.getGeometryN(p);
            for (int r = -1; r < polygon.getNumInteriorRing(); r++) {
                CoordinateSequence ring = (r < 0 ? polygon.getExteriorRing() : polygon.getInteriorRingN(r)).getCoordinateSequence();
                for (int i = 0; i < ring.size(); i++) {
                    frame.toFrame(ring.getX(i), ring.getY(i), xy);
                    if (xy[1] < frame.minFrameLatDeg()) {
                        return true;
                    }
                }
            }
        }
        return false;
    }

    /** The frame's poles in lon/lat when they are not the geographic poles (transverse and oblique aspects). */
    private static Point[] obliquePoles(AspectFrame frame) {
        double[] north = new double[2];
        double[] south = new double[2];
        frame.fromFrame(0, 90, north);
        frame.fromFrame(0, -90, south);
        if (90 - Math.abs(north[1]) < NORMAL_ASPECT_DEG) {
            return new Point[0];
        }
        return new Point[] {LON_LAT.createPoint(new Coordinate(north[0], north[1])),
                LON_LAT.createPoint(new Coordinate(south[0], south[1]))};
    }
}
