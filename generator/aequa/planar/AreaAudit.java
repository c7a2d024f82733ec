package aequa.planar;

import java.util.List;

/**
 * The proof that a map's areas are true: each region's projected planar area (before simplification)
 * divided by its geodesic area on the WGS 84 ellipsoid, and the regions the projection could not draw whole.
 *
 * @param maxRelativeError the largest |ratio - 1| over the map's regions
 * @param worstKey         the key of the region where it occurs
 * @param tolerance        the threshold from the project file
 * @param clippedKeys      regions reaching beyond the projection's domain (an azimuthal map's far side), cut
 *                         off there, in layer order ({@link ProjectionDomain})
 * @param aroundPoleKeys   regions around a pole of a cylinder's transverse or oblique aspect, which the cut
 *                         at that aspect's antimeridian cannot close, in layer order ({@link ProjectionDomain})
 */
public record AreaAudit(double maxRelativeError, String worstKey, double tolerance, List<String> clippedKeys,
                        List<String> aroundPoleKeys) {

    public AreaAudit {
        clippedKeys = List.copyOf(clippedKeys);
        aroundPoleKeys = List.copyOf(aroundPoleKeys);
    }

    /** An audit of a map whose every region was drawn whole. */
    public AreaAudit(double maxRelativeError, String worstKey, double tolerance) {
        this(maxRelativeError, worstKey, tolerance, List.of(), List.of());
    }

    /** Whether every region was drawn whole: none clipped at the domain, none around an aspect's pole. */
    public boolean drawnWhole() {
        return clippedKeys.isEmpty() && aroundPoleKeys.isEmpty();
    }

    /**
     * Whether the map may be called true to area: every region drawn whole and the largest difference within
     * the tolerance. A clipped region fails even when its difference is within a loose tolerance.
     */
    public boolean passed() {
        return drawnWhole() && maxRelativeError <= tolerance;
    }
}
