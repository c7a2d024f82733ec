package aequa.inputs.regions;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.LinearRing;
import org.locationtech.jts.geom.Polygon;
import org.locationtech.jts.geom.impl.PackedCoordinateSequence;

import aequa.findings.Finding;
import aequa.findings.Findings;

/**
 * Builds JTS polygons from rings of interleaved (lon, lat) numbers as a source gives them. It does the two
 * repairs that must happen before JTS can hold a ring at all, and reports each: a ring whose last position
 * differs from its first is closed (RFC 7946, section 3.1.6, requires them to be equal), and a ring with
 * fewer than four positions once closed (RFC 7946, section 3.1.6: "a closed LineString with four or more
 * positions") is dropped; dropping an exterior ring drops its holes too. All other checks happen in the
 * ellipsoid stage.
 */
final class RingAssembler {

    private final String file;
    private final Findings findings;

    RingAssembler(String file, Findings findings) {
        this.file = file;
        this.findings = findings;
    }

    /**
     * @param polygons for each polygon, its rings (exterior first); each ring holds {@code x0, y0, x1, y1, ...}
     *                 with exactly {@code 2 * n} used entries as given by {@link DoubleList#size()}
     * @param place    where the feature is, for findings
     * @return a Polygon when one polygon is left, a MultiPolygon when several, an empty Polygon when none
     */
    Geometry assemble(List<List<DoubleList>> polygons, String place) {
        List<Polygon> built = new ArrayList<>(polygons.size());
        for (int p = 0; p < polygons.size(); p++) {
            List<DoubleList> rings = polygons.get(p);
            if (rings.isEmpty()) {
                continue;
            }
            LinearRing shell = ring(rings.get(0), p, 0, place);
            if (shell == null) {
                continue;
            }
            List<LinearRing> holes = new ArrayList<>();
            for (int r = 1; r < rings.size(); r++) {
                LinearRing hole = ring(rings.get(r), p, r, place);
                if (hole != null) {
                    holes.add(hole);
                }
            }
            built.add(RegionGeometries.FACTORY.createPolygon(shell, holes.toArray(new LinearRing[0])));
        }
        if (built.isEmpty()) {
            return RegionGeometries.empty();
        }
        if (built.size() == 1) {
            return built.get(0);
        }
        return RegionGeometries.FACTORY.createMultiPolygon(built.toArray(new Polygon[0]));
    }

    private LinearRing ring(DoubleList xy, int polygonIndex, int ringIndex, String place) {
        int n = xy.size() / 2;
        boolean closed = n > 0 && xy.get(0) == xy.get(2 * n - 2) && xy.get(1) == xy.get(2 * n - 1);
        double[] packed;
        if (closed) {
            packed = xy.trimmedArray();
        } else {
            packed = new double[2 * n + 2];
            System.arraycopy(xy.raw(), 0, packed, 0, 2 * n);
            if (n > 0) {
                packed[2 * n] = xy.get(0);
                packed[2 * n + 1] = xy.get(1);
            }
        }
        int count = packed.length / 2;
        if (count < 4) {
            findings.add(Finding.warning("ring-degenerate", file, place,
                    String.format(Locale.ROOT, "%s has %d position(s); a ring needs at least four, the last equal to the first, so it was left out.",
                            ringName(polygonIndex, ringIndex), n),
                    "Remove the ring or give it its full outline."));
            return null;
        }
        if (!closed) {
            findings.add(Finding.note("ring-unclosed", file, place,
                    ringName(polygonIndex, ringIndex) + " did not end where it started; aequa closed it.",
                    "Repeat the first position at the end of every ring (RFC 7946, section 3.1.6)."));
        }
        return RegionGeometries.FACTORY.createLinearRing(new PackedCoordinateSequence.Double(packed, 2, 0));
    }

    private static String ringName(int polygonIndex, int ringIndex) {
        return ringIndex == 0
                ? String.format(Locale.ROOT, "The exterior ring of polygon %d", polygonIndex + 1)
                : String.format(Locale.ROOT, "Hole %d of polygon %d", ringIndex, polygonIndex + 1);
    }
}
