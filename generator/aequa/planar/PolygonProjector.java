package aequa.planar;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.CoordinateList;
import org.locationtech.jts.geom.CoordinateSequence;
import org.locationtech.jts.geom.CoordinateSequenceFilter;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LinearRing;
import org.locationtech.jts.geom.Polygon;
import org.locationtech.jts.geom.PrecisionModel;
import org.locationtech.jts.geom.impl.PackedCoordinateSequence;
import org.locationtech.jts.geom.impl.PackedCoordinateSequenceFactory;
import org.locationtech.jts.operation.overlayng.OverlayNGRobust;

import aequa.ellipsoid.AntimeridianCutter;
import aequa.projection.AspectFrame;
import aequa.projection.EqualAreaProjection;

/**
 * Projects region polygons (lon/lat degrees, RFC 7946 form, already densified) to metres with an
 * equal-area projection, cutting them at the projection's discontinuity first so nothing streaks across
 * the map. Immutable and thread-safe.
 *
 * <p>Two kinds of projection are told apart by {@link AspectFrame#hasCut()}: azimuthal projections are
 * continuous across their frame's antimeridian; cylindrical, conic and pseudocylindrical ones are cut there
 * (points either side of it land on opposite edges of the map).
 * <ul>
 * <li>Cut projections: a part that lies within the frame's strip and latitude band, with no vertex within
 *     1e-9 deg of the cut, is projected as it is. Any other part goes through {@link AntimeridianCutter} in
 *     frame coordinates (cut at frame longitude +-180, closed along frame poles, clipped to the band). Points
 *     on the cut are placed {@value #CUT_NUDGE_DEG} deg (about 0.1 mm on the ground) inside their piece
 *     before they are mapped back with {@link AspectFrame#fromFrame} and projected, so each lands on its
 *     own edge of the map; the nudge is far larger than the frame round trip's error (about 1e-13 deg) and
 *     far smaller than anything drawn. New edges along the cut are densified to the given step.</li>
 * <li>Continuous projections: parts are projected as they are (a region around the centre needs no cut);
 *     a part with a point the projection returns as NaN, i.e. beyond the frame's lowest latitude, is clipped to it in frame coordinates by
 *     {@link AntimeridianCutter} (the projection returns NaN beyond its domain, so clipping after
 *     projecting would be too late) and its pieces are merged again once projected.</li>
 * </ul>
 * Parts of a region that were cut at +-180 in the source (RFC 7946, section 3.1.9) and meet again on a map
 * whose cut is elsewhere are merged (JTS OverlayNG union). Input vertices keep their exact lon/lat through this, so regions that share a border vertex for vertex
 * still do after projection. Output: a Polygon or MultiPolygon in metres (packed coordinates, SRID 0),
 * empty when nothing lies in the domain; unprojectable points (NaN) are dropped from their ring.
 */
public final class PolygonProjector {

    static final double CUT_NUDGE_DEG = 1e-9;

    /** Same as the cutter's snap: frame longitudes this close to +-180 (latitudes to +-90) count as on the cut (pole). */
    private static final double CUT_SNAP_DEG = 1e-9;

    private static final GeometryFactory METRES =
            new GeometryFactory(new PrecisionModel(), 0, PackedCoordinateSequenceFactory.DOUBLE_FACTORY);

    private final EqualAreaProjection projection;
    private final AspectFrame frame;
    private final AntimeridianCutter.Options cutOptions;
    private final boolean continuous;

    /**
     * @param projection     the map's projection
     * @param newEdgeStepDeg step for edges created by cutting (use the step the regions were densified with)
     */
    public PolygonProjector(EqualAreaProjection projection, double newEdgeStepDeg) {
        this.projection = projection;
        this.frame = projection.frame();
        this.cutOptions = new AntimeridianCutter.Options(frame.minFrameLatDeg(), frame.maxFrameLatDeg(), CUT_NUDGE_DEG,
                newEdgeStepDeg, AntimeridianCutter.PoleRule.ORIENTATION);
        this.continuous = !frame.hasCut();
    }

    /** True when the projection has no cut at the frame's antimeridian (azimuthal projections). */
    public boolean continuousAcrossCut() {
        return continuous;
    }

    /** Projects a Polygon or MultiPolygon in lon/lat degrees to metres. */
    public Geometry project(Geometry lonLat) {
        List<Polygon> out = new ArrayList<>();
        for (int i = 0; i < lonLat.getNumGeometries(); i++) {
            Polygon part = (Polygon) lonLat.getGeometryN(i);
            if (!part.isEmpty()) {
                projectPart(part, out);
            }
        }
        if (out.isEmpty()) {
            return METRES.createPolygon();
        }
        if (out.size() == 1) {
            return out.get(0);
        }
        Geometry parts = METRES.createMultiPolygon(out.toArray(new Polygon[0]));
        // RFC 7946 pieces cut at +-180 meet again when the map's cut is elsewhere: merge them into one
        // polygon so the region stays a valid MultiPolygon and draws without a seam
        return touchesAntimeridian(lonLat) ? OverlayNGRobust.union(parts) : parts;
    }

    private static boolean touchesAntimeridian(Geometry lonLat) {
        boolean[] found = {false};
        lonLat.apply(new CoordinateSequenceFilter() {
            @Override
            public void filter(CoordinateSequence seq, int i) {
                found[0] |= Math.abs(seq.getX(i)) == 180;
            }

            @Override
            public boolean isDone() {
                return found[0];
            }

            @Override
            public boolean isGeometryChanged() {
                return false;
            }
        });
        return found[0];
    }

    private void projectPart(Polygon part, List<Polygon> out) {
        if (continuous && projectWithinDomain(part, out)) {
            return;
        }
        if (!continuous && fitsFrame(part)) {
            Polygon projected = projectRings(part);
            if (projected != null) {
                out.add(projected);
            }
            return;
        }
        List<Polygon> pieces = cutAndProject(part);
        if (continuous && pieces.size() > 1) {
            // clipped to the domain in the frame, where the cap's edge is a parallel; the pieces the cutter
            // makes at the frame antimeridian meet again on the map (it is continuous there) and are merged
            Geometry merged = OverlayNGRobust.union(METRES.createMultiPolygon(pieces.toArray(new Polygon[0])));
            for (int i = 0; i < merged.getNumGeometries(); i++) {
                if (merged.getGeometryN(i) instanceof Polygon polygon && !polygon.isEmpty()) {
                    out.add(polygon);
                }
            }
        } else {
            out.addAll(pieces);
        }
    }

    /** The part cut (or clipped) by {@link AntimeridianCutter} in frame coordinates, each piece projected. */
    private List<Polygon> cutAndProject(Polygon part) {
        Map<Coordinate, Coordinate> geoByFrame = new HashMap<>();
        Polygon framePart = toFrame(part, geoByFrame);
        List<Polygon> pieces = new ArrayList<>();
        for (Polygon piece : AntimeridianCutter.cut(framePart, cutOptions, METRES)) {
            Polygon projected = projectRings(fromFrame(piece, geoByFrame));
            if (projected != null) {
                pieces.add(projected);
            }
        }
        return pieces;
    }

    /**
     * True when every vertex of the part lies within the frame's strip and latitude band, none on the cut
     * and no edge jumps across it: the part can be projected as it is (the common, fast case, decided
     * without building any geometry).
     */
    private boolean fitsFrame(Polygon part) {
        double[] xy = new double[2];
        for (int r = -1; r < part.getNumInteriorRing(); r++) {
            CoordinateSequence ring = (r < 0 ? part.getExteriorRing() : part.getInteriorRingN(r)).getCoordinateSequence();
            double previousX = Double.NaN;
            for (int i = 0; i < ring.size(); i++) {
                frame.toFrame(ring.getX(i), ring.getY(i), xy);
                boolean onCut = Math.abs(xy[0]) >= 180 - CUT_SNAP_DEG;
                boolean offBand = xy[1] < frame.minFrameLatDeg() || xy[1] > frame.maxFrameLatDeg() || Math.abs(xy[1]) >= 90 - CUT_SNAP_DEG;
                boolean crossing = Math.abs(xy[0] - previousX) > 180;
                if (onCut || offBand || crossing) {
                    return false;
                }
                previousX = xy[0];
            }
        }
        return true;
    }

    private Polygon toFrame(Polygon lonLat, Map<Coordinate, Coordinate> geoByFrame) {
        LinearRing shell = toFrame(lonLat.getExteriorRing().getCoordinates(), geoByFrame);
        LinearRing[] holes = new LinearRing[lonLat.getNumInteriorRing()];
        for (int h = 0; h < holes.length; h++) {
            holes[h] = toFrame(lonLat.getInteriorRingN(h).getCoordinates(), geoByFrame);
        }
        return METRES.createPolygon(shell, holes);
    }

    private LinearRing toFrame(Coordinate[] ring, Map<Coordinate, Coordinate> geoByFrame) {
        double[] xy = new double[2];
        Coordinate[] out = new Coordinate[ring.length];
        for (int i = 0; i < ring.length; i++) {
            frame.toFrame(ring[i].x, ring[i].y, xy);
            out[i] = new Coordinate(xy[0], xy[1]);
            geoByFrame.put(out[i], ring[i]);
        }
        out[ring.length - 1] = out[0];
        return METRES.createLinearRing(out);
    }

    /** Frame coordinates back to lon/lat: exact input vertices where the piece kept them, else {@link AspectFrame#fromFrame}. */
    private Polygon fromFrame(Polygon piece, Map<Coordinate, Coordinate> geoByFrame) {
        LinearRing shell = fromFrame(piece.getExteriorRing().getCoordinates(), geoByFrame);
        LinearRing[] holes = new LinearRing[piece.getNumInteriorRing()];
        for (int h = 0; h < holes.length; h++) {
            holes[h] = fromFrame(piece.getInteriorRingN(h).getCoordinates(), geoByFrame);
        }
        return METRES.createPolygon(shell, holes);
    }

    private LinearRing fromFrame(Coordinate[] ring, Map<Coordinate, Coordinate> geoByFrame) {
        double[] lonLat = new double[2];
        Coordinate[] out = new Coordinate[ring.length];
        for (int i = 0; i < ring.length; i++) {
            Coordinate geo = geoByFrame.get(ring[i]);
            if (geo == null) {
                frame.fromFrame(ring[i].x, ring[i].y, lonLat);
                geo = new Coordinate(lonLat[0], lonLat[1]);
            }
            out[i] = geo;
        }
        out[ring.length - 1] = out[0];
        return METRES.createLinearRing(out);
    }

    /**
     * The fast path of a continuous projection: projects the part as it is and adds it to {@code out}
     * unless some point came out NaN, that is beyond the projection's domain (the {@link EqualAreaProjection}
     * contract), in which case nothing is added and false returned so the caller clips the part in the
     * frame. This spares the frame scan (an authalic latitude and a rotation per vertex, as costly as the
     * projection itself) for the common region that lies well inside the domain.
     */
    private boolean projectWithinDomain(Polygon lonLat, List<Polygon> out) {
        double[][] rings = new double[1 + lonLat.getNumInteriorRing()][];
        for (int r = 0; r < rings.length; r++) {
            rings[r] = forward((r == 0 ? lonLat.getExteriorRing() : lonLat.getInteriorRingN(r - 1)).getCoordinateSequence());
            for (double v : rings[r]) {
                if (Double.isNaN(v)) {
                    return false;
                }
            }
        }
        Polygon projected = polygon(rings);
        if (projected != null) {
            out.add(projected);
        }
        return true;
    }

    /** Projects each ring with one batch call; drops NaN points and repeated points; null when the shell collapses. */
    private Polygon projectRings(Polygon lonLat) {
        double[][] rings = new double[1 + lonLat.getNumInteriorRing()][];
        for (int r = 0; r < rings.length; r++) {
            rings[r] = forward((r == 0 ? lonLat.getExteriorRing() : lonLat.getInteriorRingN(r - 1)).getCoordinateSequence());
        }
        return polygon(rings);
    }

    /** Builds the polygon from projected rings (shell first); null when the shell collapses. */
    private static Polygon polygon(double[][] projectedRings) {
        LinearRing shell = compactRing(projectedRings[0]);
        if (shell == null) {
            return null;
        }
        List<LinearRing> holes = new ArrayList<>();
        for (int h = 1; h < projectedRings.length; h++) {
            LinearRing hole = compactRing(projectedRings[h]);
            if (hole != null) {
                holes.add(hole);
            }
        }
        return METRES.createPolygon(shell, holes.toArray(new LinearRing[0]));
    }

    /** The ring's points projected, interleaved x, y in metres, in a new array of exactly 2 * size; NaN off the domain. */
    private double[] forward(CoordinateSequence ring) {
        int n = ring.size();
        double[] xy = new double[2 * n];
        if (ring instanceof PackedCoordinateSequence.Double packed && packed.getDimension() == 2 && packed.getMeasures() == 0) {
            // the readers' and the densifier's sequences: read their array directly, no copy
            projection.forward(packed.getRawCoordinates(), 0, xy, 0, n);
            return xy;
        }
        for (int i = 0; i < n; i++) {
            xy[2 * i] = ring.getX(i);
            xy[2 * i + 1] = ring.getY(i);
        }
        projection.forward(xy, 0, xy, 0, n);
        return xy;
    }

    /** Drops NaN points and repeated points from a projected ring and closes it; null when fewer than four points are left. */
    private static LinearRing compactRing(double[] xy) {
        int n = xy.length / 2;
        int kept = 0;
        for (int i = 0; i < n; i++) {
            double x = xy[2 * i];
            double y = xy[2 * i + 1];
            boolean repeated = kept > 0 && x == xy[2 * kept - 2] && y == xy[2 * kept - 1];
            if (Double.isFinite(x) && Double.isFinite(y) && !repeated) {
                xy[2 * kept] = x;
                xy[2 * kept + 1] = y;
                kept++;
            }
        }
        if (kept > 0 && (xy[0] != xy[2 * kept - 2] || xy[1] != xy[2 * kept - 1])) {
            xy[2 * kept] = xy[0];
            xy[2 * kept + 1] = xy[1];
            kept++;
        }
        if (kept < 4) {
            return null;
        }
        // the array is used as it is when every point was kept (the common case): no copy
        double[] packed = 2 * kept == xy.length ? xy : Arrays.copyOf(xy, 2 * kept);
        return METRES.createLinearRing(new PackedCoordinateSequence.Double(packed, 2, 0));
    }

}
