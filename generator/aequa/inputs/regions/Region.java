package aequa.inputs.regions;

import java.util.Objects;

import org.locationtech.jts.geom.Geometry;

/**
 * One region as read from a geometry source.
 *
 * @param key    the join key, as text exactly as in the source
 * @param name   the display name (the key when the source has none)
 * @param lonLat a Polygon or MultiPolygon in WGS 84 degrees, x = longitude, y = latitude; may be empty
 *               (empty geometries are reported, not dropped silently)
 */
public record Region(String key, String name, Geometry lonLat) {

    public Region {
        Objects.requireNonNull(key, "key");
        name = name == null || name.isBlank() ? key : name;
        Objects.requireNonNull(lonLat, "lonLat");
    }
}
