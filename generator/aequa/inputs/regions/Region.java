package aequa.inputs.regions;

import java.util.Map;
import java.util.Objects;
import java.util.TreeMap;

import org.locationtech.jts.geom.Geometry;

/**
 * One region as read from a geometry source.
 *
 * @param key        the join key, as text exactly as in the source
 * @param name       the display name (the key when the source has none)
 * @param lonLat     a Polygon or MultiPolygon in WGS 84 degrees, x = longitude, y = latitude; may be empty
 *                   (empty geometries are reported, not dropped silently)
 * @param attributes the feature's other text and number properties, as text, sorted by name (at most
 *                   {@value #MAX_ATTRIBUTES}, each value at most {@value #MAX_ATTRIBUTE_CHARS} characters;
 *                   longer values and further properties are not kept); used for name patterns, outlines by a
 *                   property and the names of detached parts
 */
public record Region(String key, String name, Geometry lonLat, Map<String, String> attributes) {

    /** Properties kept per region: enough for a feature's names and codes, bounded for memory. */
    public static final int MAX_ATTRIBUTES = 32;
    /** Longest property value kept, characters (the limit on region names). */
    public static final int MAX_ATTRIBUTE_CHARS = 200;

    public Region {
        Objects.requireNonNull(key, "key");
        name = name == null || name.isBlank() ? key : name;
        Objects.requireNonNull(lonLat, "lonLat");
        attributes = attributes == null ? Map.of() : java.util.Collections.unmodifiableMap(new TreeMap<>(attributes));
    }

    /** A region without other properties. */
    public Region(String key, String name, Geometry lonLat) {
        this(key, name, lonLat, Map.of());
    }

    /** The same region with another outline. */
    public Region withLonLat(Geometry other) {
        return new Region(key, name, other, attributes);
    }

    /** The same region with another display name. */
    public Region withName(String other) {
        return new Region(key, other, lonLat, attributes);
    }

    /**
     * Adds a property to {@code into} when it is kept: text or a number, within the limits above.
     */
    public static void keep(Map<String, String> into, String property, String value) {
        if (value != null && into.size() < MAX_ATTRIBUTES && value.length() <= MAX_ATTRIBUTE_CHARS
                && property.length() <= MAX_ATTRIBUTE_CHARS) {
            into.putIfAbsent(property, value);
        }
    }
}
