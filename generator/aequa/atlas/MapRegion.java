package aequa.atlas;

import java.util.List;

import org.locationtech.jts.geom.Geometry;

/**
 * One region of one map, ready to draw.
 *
 * @param key             the join key
 * @param name            the display name
 * @param geodesicAreaKm2 the region's area on the WGS 84 ellipsoid
 * @param mapAreaRatio    projected planar area (before simplification) / geodesic area
 * @param planarM         the projected, simplified Polygon or MultiPolygon, in metres (may be empty when
 *                        simplification dropped a tiny island region; see the report)
 * @param values          one value per period of the map, in the order of {@link MapModel#periods()}
 */
public record MapRegion(String key, String name, double geodesicAreaKm2, double mapAreaRatio, Geometry planarM,
                        List<RegionValue> values) {

    public MapRegion {
        values = List.copyOf(values);
    }
}
