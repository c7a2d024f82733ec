package aequa.planar;

/**
 * The proof that a map's areas are true: each region's projected planar area (before simplification)
 * divided by its geodesic area on the WGS 84 ellipsoid.
 *
 * @param maxRelativeError the largest |ratio - 1| over the map's regions
 * @param worstKey         the key of the region where it occurs
 * @param tolerance        the threshold from the project file
 */
public record AreaAudit(double maxRelativeError, String worstKey, double tolerance) {

    public boolean passed() {
        return maxRelativeError <= tolerance;
    }
}
