package aequa.planar;

/**
 * One region's two areas: on the ellipsoid and on the map.
 *
 * @param key             the region's key
 * @param geodesicAreaKm2 area on WGS 84 with edges straight in lon/lat, as drawn and as RFC 7946 reads
 *                        them ({@code aequa.ellipsoid.LonLatArea}); the name is kept from report.json
 * @param planarAreaKm2   area of the projected polygon before simplification, in km2 of the map plane
 */
public record RegionAreaCheck(String key, double geodesicAreaKm2, double planarAreaKm2) {

    /** planar / geodesic: 1 for a true-area map; NaN when the geodesic area is 0 or not finite. */
    public double mapAreaRatio() {
        return geodesicAreaKm2 > 0 && Double.isFinite(geodesicAreaKm2) ? planarAreaKm2 / geodesicAreaKm2 : Double.NaN;
    }
}
