package aequa.statistics;

import java.util.Objects;

/**
 * A region of the geometry as the join needs it.
 *
 * @param key             the region's join key, exactly as in the geometry source
 * @param geodesicAreaKm2 the region's area on the WGS 84 ellipsoid in km2 (NaN or 0 when unknown or empty;
 *                        such a region cannot be normalised per km2 and is reported)
 */
public record RegionArea(String key, double geodesicAreaKm2) {

    public RegionArea {
        Objects.requireNonNull(key, "key");
    }
}
