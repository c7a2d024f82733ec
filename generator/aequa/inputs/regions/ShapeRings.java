package aequa.inputs.regions;

import java.util.ArrayList;
import java.util.List;

import org.locationtech.jts.algorithm.PointLocation;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Envelope;

/**
 * Groups the rings of a Shapefile polygon record into polygons, by orientation as the ESRI Shapefile Technical
 * Description (1998, "Polygon") defines it: "the neighborhood to the right of an observer walking along the
 * ring in vertex order is the inside", so outer rings run clockwise and holes counter-clockwise, and the
 * order of the parts carries no meaning. Each hole goes to the smallest outer ring that contains it.
 *
 * <p>The result is in aequa's model, RFC 7946's orientation (section 3.1.6): each polygon's exterior ring
 * first and counter-clockwise, its holes clockwise. A counter-clockwise ring that no outer ring contains is
 * taken as an outer ring (reported by the caller through {@link Grouping#orphanHoles()}); rings of zero area
 * count as outer rings, kept as they are, for the validator to judge.
 */
final class ShapeRings {

    /**
     * @param polygons    for each polygon its rings, exterior first, in RFC 7946 orientation
     * @param orphanHoles how many counter-clockwise rings lay in no outer ring and were taken as outer rings
     */
    record Grouping(List<List<DoubleList>> polygons, int orphanHoles) {
    }

    private ShapeRings() {
    }

    static Grouping group(List<DoubleList> rings) {
        List<DoubleList> shells = new ArrayList<>();
        List<Double> shellAreas = new ArrayList<>();
        List<DoubleList> holes = new ArrayList<>();
        for (DoubleList ring : rings) {
            double signedArea = signedArea(ring);
            if (signedArea > 0) {
                holes.add(ring);
            } else {
                shells.add(signedArea < 0 ? reversed(ring) : ring);
                shellAreas.add(-signedArea);
            }
        }
        List<List<DoubleList>> polygons = new ArrayList<>(shells.size());
        for (DoubleList shell : shells) {
            List<DoubleList> polygon = new ArrayList<>();
            polygon.add(shell);
            polygons.add(polygon);
        }
        int orphans = 0;
        Envelope[] envelopes = shells.size() > 1 ? shells.stream().map(ShapeRings::envelope).toArray(Envelope[]::new) : null;
        for (DoubleList hole : holes) {
            int owner = shells.size() == 1 ? 0 : owner(hole, shells, shellAreas, envelopes);
            if (owner < 0) {
                orphans++;
                List<DoubleList> polygon = new ArrayList<>();
                polygon.add(hole);
                polygons.add(polygon);
            } else {
                polygons.get(owner).add(reversed(hole));
            }
        }
        return new Grouping(polygons, orphans);
    }

    /** The smallest shell containing the hole's envelope and a vertex of the hole not on the shell; -1 if none. */
    private static int owner(DoubleList hole, List<DoubleList> shells, List<Double> shellAreas, Envelope[] envelopes) {
        Envelope holeEnvelope = envelope(hole);
        int best = -1;
        for (int s = 0; s < shells.size(); s++) {
            if (!envelopes[s].covers(holeEnvelope) || (best >= 0 && shellAreas.get(s) >= shellAreas.get(best))) {
                continue;
            }
            if (inside(hole, coordinates(shells.get(s)))) {
                best = s;
            }
        }
        return best;
    }

    /** Whether the hole's first vertex that is not on the shell's boundary lies inside the shell. */
    private static boolean inside(DoubleList hole, Coordinate[] shell) {
        for (int i = 0; i + 1 < hole.size(); i += 2) {
            Coordinate p = new Coordinate(hole.get(i), hole.get(i + 1));
            if (!PointLocation.isOnLine(p, shell)) {
                return PointLocation.isInRing(p, shell);
            }
        }
        return true; // every vertex on the shell's boundary: the hole touches it all along, it belongs to it
    }

    /** The shoelace formula (half the sum of cross products); positive for a counter-clockwise ring with y up (x east, y north). */
    static double signedArea(DoubleList ring) {
        int n = ring.size() / 2;
        double sum = 0;
        for (int i = 0; i < n; i++) {
            int j = (i + 1) % n;
            sum += ring.get(2 * i) * ring.get(2 * j + 1) - ring.get(2 * j) * ring.get(2 * i + 1);
        }
        return sum / 2;
    }

    static DoubleList reversed(DoubleList ring) {
        int n = ring.size() / 2;
        DoubleList out = new DoubleList(ring.size());
        for (int i = n - 1; i >= 0; i--) {
            out.add(ring.get(2 * i));
            out.add(ring.get(2 * i + 1));
        }
        return out;
    }

    private static Envelope envelope(DoubleList ring) {
        Envelope envelope = new Envelope();
        for (int i = 0; i + 1 < ring.size(); i += 2) {
            envelope.expandToInclude(ring.get(i), ring.get(i + 1));
        }
        return envelope;
    }

    private static Coordinate[] coordinates(DoubleList ring) {
        int n = ring.size() / 2;
        Coordinate[] coordinates = new Coordinate[n];
        for (int i = 0; i < n; i++) {
            coordinates[i] = new Coordinate(ring.get(2 * i), ring.get(2 * i + 1));
        }
        return coordinates;
    }
}
