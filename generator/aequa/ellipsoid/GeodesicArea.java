package aequa.ellipsoid;

import org.locationtech.jts.algorithm.Orientation;
import org.locationtech.jts.geom.CoordinateSequence;
import org.locationtech.jts.geom.Geometry;

import net.sf.geographiclib.Geodesic;
import net.sf.geographiclib.PolygonArea;
import net.sf.geographiclib.PolygonResult;

/**
 * Areas on the WGS 84 ellipsoid, with geodesic edges between consecutive vertices, by GeographicLib's
 * {@code PolygonArea} (Karney 2013, "Algorithms for geodesics", J. Geodesy 87, doi:10.1007/s00190-012-0578-z,
 * section 6). GeographicLib is used here and in {@link GeodesicDistance} only.
 *
 * <p>Input is a Polygon or MultiPolygon in lon/lat degrees (x = lon), in RFC 7946 form: rings do not cross
 * +-180 and their orientation in the lon/lat plane says which side is inside. GeographicLib takes
 * latitude first. A ring counter-clockwise in the lon/lat plane has its interior on the left, so it is
 * measured in unsigned mode as GeographicLib gives it ({@code Compute(false, false)}, the area to the left,
 * right for any size up to the whole ellipsoid); a clockwise ring is measured reversed. Holes are
 * subtracted, parts of a MultiPolygon summed. Empty geometry has area 0; NaN coordinates give NaN. A ring
 * that is not in RFC 7946 form (an edge spans more than 180 deg of longitude, i.e. it wraps across +-180)
 * is taken to enclose the smaller of its two sides (GeographicLib's signed mode).
 *
 * <p>To match what a map draws, pass the densified geometry: the map's edges between densified vertices
 * differ from geodesics by less than the densification error (a 1 x 1 deg cell's lon/lat-straight and
 * geodesic areas differ by 2.6e-5, shrinking with the square of the step; reference/README.md).
 */
public final class GeodesicArea {

    private static final double M2_PER_KM2 = 1e6;

    private GeodesicArea() {
    }

    /** The area of a Polygon or MultiPolygon in square kilometres. */
    public static double areaKm2(Geometry lonLat) {
        return areaM2(lonLat) / M2_PER_KM2;
    }

    /** The area of a Polygon or MultiPolygon in square metres. */
    public static double areaM2(Geometry lonLat) {
        return RingSums.areaM2(lonLat, GeodesicArea::ringAreaM2);
    }

    /** The area enclosed by one closed ring, whatever its orientation, in square metres. */
    static double ringAreaM2(CoordinateSequence ring) {
        int n = ring.size();
        if (n < 4) {
            return 0;
        }
        PolygonArea polygon = new PolygonArea(Geodesic.WGS84, false);
        // the closing vertex repeats the first: GeographicLib closes the polygon itself
        for (int i = 0; i < n - 1; i++) {
            polygon.AddPoint(ring.getY(i), ring.getX(i));
        }
        if (jumpsAcrossAntimeridian(ring)) {
            // not RFC 7946 form, so the plane says nothing about the inside: take the smaller side
            return Math.abs(polygon.Compute(false, true).area);
        }
        boolean counterClockwise = Orientation.isCCW(ring);
        PolygonResult result = polygon.Compute(!counterClockwise, false);
        return result.area;
    }

    /** Whether an edge of the ring jumps more than 180 deg of longitude (so it is not in RFC 7946 form). */
    static boolean jumpsAcrossAntimeridian(CoordinateSequence ring) {
        for (int i = 0; i + 1 < ring.size(); i++) {
            if (Math.abs(ring.getX(i + 1) - ring.getX(i)) > 180) {
                return true;
            }
        }
        return false;
    }

    /** The total surface area of the WGS 84 ellipsoid in square metres (Karney 2013, eq. 60 ff.). */
    public static double ellipsoidAreaM2() {
        return Geodesic.WGS84.EllipsoidArea();
    }
}
