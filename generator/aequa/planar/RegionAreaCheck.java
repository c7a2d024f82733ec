package aequa.planar;

/**
 * One region's two areas: on the ellipsoid and on the map.
 *
 * @param key             the region's key
 * @param geodesicAreaKm2 area on WGS 84 with geodesic edges between the densified vertices
 *                        ({@code aequa.ellipsoid.GeodesicArea})
 * @param planarAreaKm2   area of the projected polygon before simplification, in km2 of the map plane
 */
public record RegionAreaCheck(String key, double geodesicAreaKm2, double planarAreaKm2) {

    /** planar / geodesic: 1 for a true-area map; NaN when the geodesic area is 0 or not finite. */
    public double mapAreaRatio() {
        return geodesicAreaKm2 > 0 && Double.isFinite(geodesicAreaKm2) ? planarAreaKm2 / geodesicAreaKm2 : Double.NaN;
    }
}
