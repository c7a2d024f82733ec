package aequa.drawing;

import java.util.ArrayList;
import java.util.List;

import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.geom.Polygon;
import org.locationtech.jts.operation.overlayng.OverlayNG;
import org.locationtech.jts.operation.overlayng.OverlayNGRobust;

import aequa.projection.AspectFrame;
import aequa.projection.EqualAreaProjection;

/**
 * Meridians, parallels and the outline of the projected globe, in projected metres. Lines are densified
 * in geographic coordinates and sent through the projection's own {@code forward}; they are cut where the
 * projection is cut (its {@link AspectFrame}'s antimeridian) and where they leave its domain, so no line
 * jumps across the map.
 */
final class GlobeLines {

    private static final GeometryFactory FACTORY = new GeometryFactory();
    /** Densification step along graticule lines, degrees; fine enough that chords stay within a hairline. */
    private static final double STEP_DEG = 0.5;
    /** Distance kept from the frame's cut, degrees, so both sides of the cut project to distinct points. */
    private static final double CUT_EPS_DEG = 1e-7;

    private GlobeLines() {
    }

    /** True when the projection shows the whole globe (a world map), so the globe's outline is drawn. */
    static boolean wholeGlobe(EqualAreaProjection projection) {
        return projection.family().world();
    }

    /** Meridians and parallels every {@code spacingDeg} degrees over the whole globe, in metres. */
    static Geometry graticule(EqualAreaProjection projection, double spacingDeg) {
        return graticule(projection, spacingDeg, -180, 180, -90, 90);
    }

    /**
     * Meridians and parallels every {@code spacingDeg} degrees within a lon/lat box (degrees), as a
     * MultiLineString in metres, densified every {@code min(0.5, spacing / 10)} degrees.
     */
    static Geometry graticule(EqualAreaProjection projection, double spacingDeg, double westDeg, double eastDeg,
                              double southDeg, double northDeg) {
        double step = Math.min(STEP_DEG, spacingDeg / 10);
        double firstLon = Math.ceil(westDeg / spacingDeg) * spacingDeg;
        double firstLat = Math.ceil(southDeg / spacingDeg) * spacingDeg;
        List<LineString> lines = new ArrayList<>();
        for (double lon = firstLon; lon <= eastDeg + 1e-9 && lon < 180; lon += spacingDeg) {
            List<double[]> points = new ArrayList<>();
            for (double lat = southDeg; lat <= northDeg + 1e-9; lat += step) {
                points.add(new double[]{lon, Math.max(-90, Math.min(90, lat))});
            }
            addProjected(projection, points, lines);
        }
        for (double lat = firstLat; lat <= northDeg + 1e-9; lat += spacingDeg) {
            if (lat <= -90 || lat >= 90) {
                continue;
            }
            List<double[]> points = new ArrayList<>();
            for (double lon = westDeg; lon <= eastDeg + 1e-9; lon += step) {
                points.add(new double[]{Math.min(180, lon), lat});
            }
            addProjected(projection, points, lines);
        }
        return FACTORY.createMultiLineString(lines.toArray(new LineString[0]));
    }

    /**
     * The lon/lat box {west, east, south, north} of a projected extent, from its inverse-projected corners,
     * edge midpoints and centre, widened by {@code marginDeg}; longitudes assume the extent does not
     * straddle the antimeridian (world maps use the whole globe instead).
     */
    static double[] geographicBox(EqualAreaProjection projection, Envelope extentM, double marginDeg) {
        double[] xs = {extentM.getMinX(), (extentM.getMinX() + extentM.getMaxX()) / 2, extentM.getMaxX()};
        double[] ys = {extentM.getMinY(), (extentM.getMinY() + extentM.getMaxY()) / 2, extentM.getMaxY()};
        double[] box = {Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY};
        double[] lonLat = new double[2];
        for (double x : xs) {
            for (double y : ys) {
                projection.inverse(new double[]{x, y}, 0, lonLat, 0, 1);
                if (Double.isFinite(lonLat[0]) && Double.isFinite(lonLat[1])) {
                    box[0] = Math.min(box[0], lonLat[0]);
                    box[1] = Math.max(box[1], lonLat[0]);
                    box[2] = Math.min(box[2], lonLat[1]);
                    box[3] = Math.max(box[3], lonLat[1]);
                }
            }
        }
        if (!(box[0] <= box[1])) {
            return new double[]{-180, 180, -90, 90};
        }
        return new double[]{Math.max(-180, box[0] - marginDeg), Math.min(180, box[1] + marginDeg),
                Math.max(-90, box[2] - marginDeg), Math.min(90, box[3] + marginDeg)};
    }

    /** The projected globe as a polygon in metres (the area a world map's sea fills). */
    static Polygon globe(EqualAreaProjection projection) {
        AspectFrame frame = projection.frame();
        double west = -180 + CUT_EPS_DEG;
        double east = 180 - CUT_EPS_DEG;
        double south = frame.minFrameLatDeg();
        double north = frame.maxFrameLatDeg();
        List<double[]> ring = new ArrayList<>();
        for (double lat = south; lat < north; lat += STEP_DEG) {
            ring.add(new double[]{west, lat});
        }
        for (double lon = west; lon < east; lon += STEP_DEG) {
            ring.add(new double[]{lon, north});
        }
        for (double lat = north; lat > south; lat -= STEP_DEG) {
            ring.add(new double[]{east, lat});
        }
        for (double lon = east; lon > west; lon -= STEP_DEG) {
            ring.add(new double[]{lon, south});
        }
        List<Coordinate> coordinates = new ArrayList<>();
        double[] geo = new double[2];
        double[] xy = new double[2];
        for (double[] f : ring) {
            frame.fromFrame(f[0], f[1], geo);
            projection.forward(geo, 0, xy, 0, 1);
            if (Double.isFinite(xy[0]) && Double.isFinite(xy[1])) {
                coordinates.add(new Coordinate(xy[0], xy[1]));
            }
        }
        coordinates.add(new Coordinate(coordinates.get(0)));
        return FACTORY.createPolygon(coordinates.toArray(new Coordinate[0]));
    }

    /** {@code lines} cut to the rectangle {@code extentM}. */
    static Geometry clip(Geometry lines, Envelope extentM) {
        return OverlayNGRobust.overlay(lines, FACTORY.toGeometry(extentM), OverlayNG.INTERSECTION);
    }

    private static void addProjected(EqualAreaProjection projection, List<double[]> points, List<LineString> out) {
        AspectFrame frame = projection.frame();
        double[] inFrame = new double[2];
        double[] xy = new double[2];
        List<Coordinate> run = new ArrayList<>();
        double previousFrameLon = Double.NaN;
        for (double[] p : points) {
            frame.toFrame(p[0], p[1], inFrame);
            boolean inside = inFrame[1] >= frame.minFrameLatDeg() && inFrame[1] <= frame.maxFrameLatDeg();
            boolean crossesCut = !Double.isNaN(previousFrameLon) && Math.abs(inFrame[0] - previousFrameLon) > 180;
            projection.forward(p, 0, xy, 0, 1);
            boolean finite = Double.isFinite(xy[0]) && Double.isFinite(xy[1]);
            if (!inside || !finite || crossesCut) {
                flush(run, out);
            }
            if (inside && finite) {
                run.add(new Coordinate(xy[0], xy[1]));
            }
            previousFrameLon = inFrame[0];
        }
        flush(run, out);
    }

    private static void flush(List<Coordinate> run, List<LineString> out) {
        if (run.size() >= 2) {
            out.add(FACTORY.createLineString(run.toArray(new Coordinate[0])));
        }
        run.clear();
    }
}
