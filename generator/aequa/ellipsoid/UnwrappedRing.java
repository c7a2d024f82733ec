package aequa.ellipsoid;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import org.locationtech.jts.geom.Coordinate;

/**
 * One ring of a frame polygon with its longitudes unwrapped (made continuous) and, when it encircles a pole,
 * closed along that pole; a helper of {@link AntimeridianCutter}, which documents the method.
 */
final class UnwrappedRing {

    private final List<double[]> points = new ArrayList<>();
    private final List<Coordinate> originals = new ArrayList<>();

    private UnwrappedRing() {
    }

    /** One vertex after snapping: x, y, the input coordinate it came from (null if moved or new), pole flag. */
    private record Vertex(double x, double y, Coordinate original, boolean pole) {
    }

    /** @return the unwrapped ring, or null when it has no vertex off the poles or fewer than three vertices */
    static UnwrappedRing of(Coordinate[] ring, boolean hole, AntimeridianCutter.Options options,
                            Map<Coordinate, Coordinate> originalsByUnwrapped) {
        List<Vertex> vertices = withCutPoints(ring);
        int start = -1;
        for (int i = 0; i < vertices.size() && start < 0; i++) {
            if (!vertices.get(i).pole()) {
                start = i;
            }
        }
        if (start < 0 || vertices.size() < 3) {
            return null;
        }
        List<Vertex> rotated = new ArrayList<>(vertices.subList(start, vertices.size()));
        rotated.addAll(vertices.subList(0, start));
        int m = rotated.size();

        // unwrap: every step the short way round; steps across a pole run are "free"
        double[] xu = new double[m + 1];
        xu[0] = rotated.get(0).x();
        int lastSolid = 0;
        int freeIndex = -1;
        for (int k = 1; k <= m; k++) {
            Vertex v = rotated.get(k % m);
            if (v.pole() && k < m) {
                continue;
            }
            if (k - lastSolid > 1 && freeIndex < 0) {
                freeIndex = k;
            }
            xu[k] = xu[lastSolid] + shortWay(v.x() - rotated.get(lastSolid).x());
            lastSolid = k;
        }
        long turns = Math.round((xu[m] - xu[0]) / 360);
        if (turns != 0 && freeIndex >= 0) {
            for (int k = freeIndex; k <= m; k++) {
                xu[k] -= 360.0 * turns;
            }
            turns = 0;
        }

        UnwrappedRing result = new UnwrappedRing();
        for (int k = 0; k < m; k++) {
            Vertex v = rotated.get(k);
            if (!v.pole()) {
                result.add(xu[k], v.y(), v.original(), originalsByUnwrapped);
                continue;
            }
            boolean runStart = !rotated.get(k - 1).pole();
            boolean runEnd = k + 1 == m || !rotated.get(k + 1).pole();
            if (runStart) {
                result.add(xu[k - 1], v.y(), null, originalsByUnwrapped);
            }
            if (runEnd) {
                int next = k + 1;
                while (next < m && rotated.get(next).pole()) {
                    next++;
                }
                result.add(xu[next], v.y(), null, originalsByUnwrapped);
            }
        }
        if (turns != 0) {
            double poleLat = encloseNorth(rotated, turns, hole, options.poleRule()) ? 90 : -90;
            Vertex first = rotated.get(0);
            double end = xu[0] + 360.0 * turns;
            result.add(end, first.y(), first.original(), originalsByUnwrapped);
            result.add(end, poleLat, null, originalsByUnwrapped);
            result.add(xu[0], poleLat, null, originalsByUnwrapped);
        }
        return result;
    }

    private static boolean encloseNorth(List<Vertex> ring, long turns, boolean hole, AntimeridianCutter.PoleRule rule) {
        if (rule == AntimeridianCutter.PoleRule.NEARER_POLE) {
            double sum = 0;
            for (Vertex v : ring) {
                sum += v.y();
            }
            return sum >= 0;
        }
        // eastward (turns > 0) with the interior on the left: the interior is north of the ring
        return (turns > 0) != hole;
    }

    /** Snaps to the cut and poles, and inserts the two points where each edge crosses the cut. */
    private static List<Vertex> withCutPoints(Coordinate[] ring) {
        int n = ring.length - 1;
        List<Vertex> out = new ArrayList<>(n + 8);
        for (int i = 0; i < n; i++) {
            Vertex a = snapped(ring[i]);
            Vertex b = snapped(ring[(i + 1) % n]);
            out.add(a);
            boolean onCut = Math.abs(a.x()) == 180 || Math.abs(b.x()) == 180;
            if (!a.pole() && !b.pole() && !onCut && Math.abs(b.x() - a.x()) > 180) {
                // crossing latitude from the east-side end (x > 0), whatever the edge's direction
                Vertex east = a.x() > 0 ? a : b;
                Vertex west = a.x() > 0 ? b : a;
                double toCutEast = 180 - east.x();
                double toCutWest = 180 + west.x();
                double crossingLat = east.y() + toCutEast / (toCutEast + toCutWest) * (west.y() - east.y());
                out.add(new Vertex(Math.copySign(180, a.x()), crossingLat, null, false));
                out.add(new Vertex(Math.copySign(180, b.x()), crossingLat, null, false));
            }
        }
        return out;
    }

    private static Vertex snapped(Coordinate c) {
        double x = c.x;
        double y = c.y;
        boolean pole = Math.abs(y) >= 90 - AntimeridianCutter.SNAP_DEG;
        boolean moved = false;
        if (pole) {
            y = Math.copySign(90, y);
            moved = true;
        }
        if (Math.abs(x) >= 180 - AntimeridianCutter.SNAP_DEG) {
            x = Math.copySign(180, x);
            moved = true;
        }
        return new Vertex(x, y, moved ? null : c, pole);
    }

    /** The difference wrapped into (-180, 180]. */
    static double shortWay(double dLon) {
        return dLon - 360 * Math.round(dLon / 360);
    }

    private void add(double x, double y, Coordinate original, Map<Coordinate, Coordinate> originalsByUnwrapped) {
        points.add(new double[] {x, y});
        originals.add(original);
        if (original != null) {
            originalsByUnwrapped.put(new Coordinate(x, y), original);
        }
    }

    /** Shifts this ring (a hole) by a multiple of 360 deg so it lies over its shell; re-registers its originals. */
    Coordinate[] alignedTo(UnwrappedRing shell, Map<Coordinate, Coordinate> originalsByUnwrapped) {
        long k = Math.round((shell.meanX() - meanX()) / 360);
        if (k != 0) {
            for (int i = 0; i < points.size(); i++) {
                points.get(i)[0] += 360.0 * k;
                if (originals.get(i) != null) {
                    originalsByUnwrapped.put(new Coordinate(points.get(i)[0], points.get(i)[1]), originals.get(i));
                }
            }
        }
        return coordinates();
    }

    private double meanX() {
        double sum = 0;
        for (double[] p : points) {
            sum += p[0];
        }
        return sum / points.size();
    }

    /** The closed ring in unwrapped coordinates. */
    Coordinate[] coordinates() {
        Coordinate[] out = new Coordinate[points.size() + 1];
        for (int i = 0; i < points.size(); i++) {
            out[i] = new Coordinate(points.get(i)[0], points.get(i)[1]);
        }
        out[points.size()] = out[0].copy();
        return out;
    }
}
