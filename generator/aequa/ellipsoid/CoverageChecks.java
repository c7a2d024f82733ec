package aequa.ellipsoid;

import java.util.List;
import java.util.Locale;

import org.locationtech.jts.coverage.CoverageValidator;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;

import aequa.findings.Finding;
import aequa.findings.Findings;
import aequa.inputs.regions.Region;

/**
 * Reports where neighbouring regions overlap or leave narrow gaps, using JTS CoverageValidator, which
 * finds edges not matched exactly by a neighbour's edge. Nothing is changed: whether a gap is a lake or a
 * digitising error is the user's call. Regions must already be valid polygons ({@link RegionValidator}),
 * as the coverage validator does not check each polygon's own validity.
 */
public final class CoverageChecks {

    /**
     * Gaps narrower than this, in degrees (about 110 m at the equator), are reported; wider ones are taken to be
     * real (lakes, seas, unclaimed land). Our choice, a few pixels of a national map's width.
     */
    public static final double GAP_WIDTH_DEG = 0.001;

    private CoverageChecks() {
    }

    /** Adds one warning {@code coverage-mismatch} per region whose border overlaps or leaves a narrow gap with a neighbour. */
    public static void report(List<Region> regions, String file, Findings findings) {
        Geometry[] coverage = regions.stream().map(Region::lonLat).toArray(Geometry[]::new);
        Geometry[] invalid = CoverageValidator.validate(coverage, GAP_WIDTH_DEG);
        for (int i = 0; i < invalid.length; i++) {
            if (invalid[i] == null || invalid[i].isEmpty()) {
                continue;
            }
            Coordinate at = invalid[i].getCoordinate();
            findings.add(Finding.warning("coverage-mismatch", file, "feature \"" + regions.get(i).key() + "\"",
                    String.format(Locale.ROOT, "Its border does not match its neighbours' near (%.6f, %.6f): they overlap or leave a gap narrower than %s deg.",
                            at.x, at.y, GAP_WIDTH_DEG),
                    "Make neighbouring regions share their border vertex for vertex (for example, export the boundaries from one topology)."));
        }
    }
}
