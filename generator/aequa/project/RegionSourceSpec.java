package aequa.project;

import java.util.List;
import java.util.Locale;

/**
 * A geometry source: polygons of regions.
 *
 * @param file   path relative to the project folder: GeoJSON ({@code .geojson}, {@code .json}), TopoJSON
 *               ({@code .topojson}, or {@code .json} with {@code object} set), GeoPackage ({@code .gpkg}) or
 *               Shapefile ({@code .shp}, or a {@code .zip} holding one)
 * @param key    the property (GeoJSON, TopoJSON), column (GeoPackage) or field (Shapefile) that holds each
 *               region's key, or {@value #FEATURE_ID} for the feature id (the record number of a Shapefile)
 * @param name   the property that holds the region's display name, or empty to show the key
 * @param layer  the GeoPackage layer (table) name, or the Shapefile's name (without {@code .shp}) inside a zip
 *               holding several; empty when the file holds one
 * @param object the TopoJSON object (a key of the topology's {@code objects}); empty when it holds one
 * @param insets how the detached parts of maps of these regions are drawn, unless a map says otherwise
 */
public record RegionSourceSpec(String file, String key, String name, String layer, String object, InsetsSpec insets) {

    public static final String FEATURE_ID = "@id";
    /** Every file name ending a geometry source may have, lower case: the one list the checks, explain and the readers share. */
    public static final List<String> FILE_TYPES = List.of(".geojson", ".json", ".topojson", ".gpkg", ".shp", ".zip");
    /** The file types of {@link #FILE_TYPES} in words, for messages. */
    public static final String FILE_TYPES_IN_WORDS = "GeoJSON (.geojson, .json), TopoJSON (.topojson, or .json with an"
            + " 'object'), GeoPackage (.gpkg) or Shapefile (.shp, or a .zip holding one)";

    /** True when {@code fileName} ends in one of {@link #FILE_TYPES}, in any letter case. */
    public static boolean isGeometryFile(String fileName) {
        String lower = fileName.toLowerCase(Locale.ROOT);
        return FILE_TYPES.stream().anyMatch(lower::endsWith);
    }

    public RegionSourceSpec {
        key = key == null ? FEATURE_ID : key;
        name = name == null ? "" : name;
        layer = layer == null ? "" : layer;
        object = object == null ? "" : object;
        insets = insets == null ? InsetsSpec.AUTO : insets;
    }

    /** A source that is not a TopoJSON file, with the automatic {@code insets} setting. */
    public RegionSourceSpec(String file, String key, String name, String layer) {
        this(file, key, name, layer, "", null);
    }

    /** A source with the automatic {@code insets} setting. */
    public RegionSourceSpec(String file, String key, String name, String layer, String object) {
        this(file, key, name, layer, object, null);
    }

    /** A source that is not a TopoJSON file. */
    public RegionSourceSpec(String file, String key, String name, String layer, InsetsSpec insets) {
        this(file, key, name, layer, "", insets);
    }
}
