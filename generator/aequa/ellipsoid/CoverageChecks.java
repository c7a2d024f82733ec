package aequa.ellipsoid;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.IdentityHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.stream.IntStream;

import org.locationtech.jts.coverage.CoveragePolygonValidator;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.index.strtree.STRtree;

import aequa.findings.Finding;
import aequa.findings.Findings;
import aequa.inputs.regions.Region;

/**
 * Reports where neighbouring regions overlap or leave narrow gaps, using JTS CoveragePolygonValidator,
 * which finds edges not matched exactly by a neighbour's edge. Nothing is changed: whether a gap is a lake or a
 * digitising error is the user's call. Regions must already be valid polygons ({@link RegionValidator}),
 * as the coverage validator does not check each polygon's own validity.
 *
 * <p>Each region is checked against the polygon parts of other regions whose bounding boxes (widened by
 * {@link #GAP_WIDTH_DEG}) meet one of its own parts, found through an STR-tree. JTS's CoverageValidator does
 * the same with whole regions; by parts, a region spread over the globe (a country with far-off islands)
 * does not make every region a neighbour of every other, and the work stays near-linear in the vertices of a
 * real coverage. The work is still bounded: when the vertices to compare would pass
 * {@value #WORK_PER_VERTEX} times the source's own vertex count (plus {@value #WORK_FLOOR}), as for a file of
 * features piled on top of one another, the check stops before the region that would pass it and says so
 * (warning {@code coverage-check-bounded}); the bound counts vertices, not time, so findings stay
 * deterministic.
 */
public final class CoverageChecks {

    /**
     * Gaps narrower than this, in degrees (about 110 m at the equator), are reported; wider ones are taken to be
     * real (lakes, seas, unclaimed land). Our choice, a few pixels of a national map's width.
     */
    public static final double GAP_WIDTH_DEG = 0.001;

    /**
     * Vertices compared per vertex of the source before the check stops. Our choice: a real coverage compares
     * each vertex with those of its few neighbours (each counted once per region whose part boxes meet it),
     * far below this; features piled on top of each other compare every vertex with every other.
     */
    static final int WORK_PER_VERTEX = 32;
    /** Vertices always allowed, so that small sources are never bounded; our choice. */
    static final long WORK_FLOOR = 100_000;

    private record Part(int region, int index, Geometry polygon) {
    }

    private CoverageChecks() {
    }

    /**
     * Adds one warning {@code coverage-mismatch} per region whose border overlaps or leaves a narrow gap with
     * a neighbour, and a warning {@code coverage-check-bounded} when the check stopped early.
     */
    public static void report(List<Region> regions, String file, Findings findings) {
        long vertices = regions.stream().mapToLong(r -> r.lonLat().getNumPoints()).sum();
        report(regions, file, findings, WORK_PER_VERTEX * vertices + WORK_FLOOR);
    }

    static void report(List<Region> regions, String file, Findings findings, long workBudget) {
        List<List<Part>> parts = new ArrayList<>(regions.size());
        STRtree index = new STRtree();
        for (int r = 0; r < regions.size(); r++) {
            Geometry geometry = regions.get(r).lonLat();
            List<Part> own = new ArrayList<>(geometry.getNumGeometries());
            for (int p = 0; p < geometry.getNumGeometries(); p++) {
                Part part = new Part(r, p, geometry.getGeometryN(p));
                own.add(part);
                if (!part.polygon().isEmpty()) {
                    index.insert(part.polygon().getEnvelopeInternal(), part);
                }
            }
            parts.add(own);
        }
        // the neighbours and the budget are settled in input order first, so where the check stops does not
        // depend on the parallelism; the regions within the budget are then validated side by side (each
        // alone, reading its neighbours) and their findings added in input order
        List<Geometry[]> adjacent = new ArrayList<>(regions.size());
        long work = 0;
        int checkedCount = regions.size();
        for (int r = 0; r < regions.size(); r++) {
            Geometry target = regions.get(r).lonLat();
            if (target.isEmpty()) {
                adjacent.add(null);
                continue;
            }
            List<Part> near = neighbours(index, parts.get(r), r);
            long cost = target.getNumPoints() + near.stream().mapToLong(p -> p.polygon().getNumPoints()).sum();
            if (work + cost > workBudget) {
                checkedCount = r;
                break;
            }
            work += cost;
            adjacent.add(near.stream().map(Part::polygon).toArray(Geometry[]::new));
        }
        List<Geometry> invalid = IntStream.range(0, checkedCount).parallel()
                .mapToObj(r -> adjacent.get(r) == null ? null
                        : CoveragePolygonValidator.validate(regions.get(r).lonLat(), adjacent.get(r), GAP_WIDTH_DEG))
                .toList();
        for (int r = 0; r < checkedCount; r++) {
            if (invalid.get(r) != null && !invalid.get(r).isEmpty()) {
                Coordinate at = invalid.get(r).getCoordinate();
                findings.add(Finding.warning("coverage-mismatch", file, "feature \"" + regions.get(r).key() + "\"",
                        String.format(Locale.ROOT, "Its border does not match its neighbours' near (%.6f, %.6f): they overlap or leave a gap narrower than %s deg.",
                                at.x, at.y, GAP_WIDTH_DEG),
                        "Make neighbouring regions share their border vertex for vertex (for example, export the boundaries from one topology)."));
            }
        }
        if (checkedCount < regions.size()) {
            findings.add(Finding.warning("coverage-check-bounded", file, "",
                    String.format(Locale.ROOT, "The check for gaps and overlaps between neighbours stopped after"
                            + " %d of %d regions: their bounding boxes overlap so much that checking them all would compare"
                            + " more than %,d vertices.", checkedCount, regions.size(), workBudget),
                    "Check that the file holds one layer of neighbouring regions, not features piled on top of each other."));
        }
    }

    /** The parts of other regions whose boxes meet a widened box of one of {@code own}, in region and part order. */
    private static List<Part> neighbours(STRtree index, List<Part> own, int region) {
        Map<Part, Boolean> found = new IdentityHashMap<>();
        for (Part part : own) {
            Envelope box = new Envelope(part.polygon().getEnvelopeInternal());
            box.expandBy(GAP_WIDTH_DEG);
            for (Object hit : index.query(box)) {
                Part other = (Part) hit;
                if (other.region() != region) {
                    found.put(other, Boolean.TRUE);
                }
            }
        }
        List<Part> sorted = new ArrayList<>(found.keySet());
        sorted.sort(Comparator.comparingInt(Part::region).thenComparingInt(Part::index));
        return sorted;
    }
}
