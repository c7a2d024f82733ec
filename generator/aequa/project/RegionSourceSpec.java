package aequa.project;

/**
 * A geometry source: polygons of regions.
 *
 * @param file  path relative to the project folder; GeoJSON ({@code .geojson}, {@code .json}) or GeoPackage ({@code .gpkg})
 * @param key   the property that holds each region's key, or {@value #FEATURE_ID} for the GeoJSON feature id
 * @param name  the property that holds the region's display name, or empty to show the key
 * @param layer the GeoPackage layer (table) name; empty for GeoJSON or a one-layer GeoPackage
 * @param insets how the detached parts of maps of these regions are drawn, unless a map says otherwise
 */
public record RegionSourceSpec(String file, String key, String name, String layer, InsetsSpec insets) {

    public static final String FEATURE_ID = "@id";

    public RegionSourceSpec {
        key = key == null ? FEATURE_ID : key;
        name = name == null ? "" : name;
        layer = layer == null ? "" : layer;
        insets = insets == null ? InsetsSpec.AUTO : insets;
    }

    /** A source with the automatic {@code insets} setting. */
    public RegionSourceSpec(String file, String key, String name, String layer) {
        this(file, key, name, layer, null);
    }
}
