package aequa.inputs.regions;

import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;

import org.locationtech.jts.geom.CoordinateSequenceFilter;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.MultiPolygon;
import org.locationtech.jts.geom.Polygon;
import org.locationtech.jts.io.ParseException;
import org.locationtech.jts.io.WKBReader;
import org.sqlite.SQLiteConfig;

import aequa.findings.Finding;
import aequa.findings.Findings;
import aequa.inputs.SqliteColumns;
import aequa.project.RegionSourceSpec;

/**
 * Reads the regions of one feature table of a GeoPackage (OGC 12-128r18, GeoPackage 1.3) through
 * sqlite-jdbc, read-only. The layer is found in {@code gpkg_contents} (clause 1.1.3), its geometry column
 * and SRS in {@code gpkg_geometry_columns} (clause 2.1.5), the SRS definition in {@code gpkg_spatial_ref_sys}
 * (clause 1.1.2). Layers whose SRS is not WGS 84 lon/lat (EPSG 4326) are transformed with the resolver the
 * caller gives; without one they are reported and not read.
 */
final class GeoPackageRegionReader {

    private static final int WGS84_LONLAT = 4326;

    private final String file;
    private final RegionSourceSpec spec;
    private final SourceCrsResolver crs;
    private final Findings findings;

    GeoPackageRegionReader(String file, RegionSourceSpec spec, SourceCrsResolver crs, Findings findings) {
        this.file = file;
        this.spec = spec;
        this.crs = crs;
        this.findings = findings;
    }

    List<Region> read(Path path) {
        SQLiteConfig config = new SQLiteConfig();
        config.setReadOnly(true);
        try (Connection connection = DriverManager.getConnection("jdbc:sqlite:" + path, config.toProperties())) {
            return readLayer(connection);
        } catch (SQLException e) {
            findings.add(Finding.error("geopackage-unreadable", file, spec.layer().isEmpty() ? "" : "layer \"" + spec.layer() + "\"",
                    "The GeoPackage could not be read: " + e.getMessage() + ".",
                    "Check that the file is a GeoPackage (OGC 12-128) and that the layer and key column exist."));
            return List.of();
        }
    }

    private List<Region> readLayer(Connection connection) throws SQLException {
        List<String> layers = new ArrayList<>();
        try (Statement s = connection.createStatement();
             ResultSet rs = s.executeQuery("SELECT table_name FROM gpkg_contents WHERE data_type = 'features' ORDER BY table_name")) {
            while (rs.next()) {
                layers.add(rs.getString(1));
            }
        }
        String layer = spec.layer();
        if (layer.isEmpty() && layers.size() == 1) {
            layer = layers.get(0);
        }
        if (!layers.contains(layer)) {
            findings.add(Finding.error("geopackage-layer-missing", file, "",
                    (layer.isEmpty() ? "The GeoPackage has several feature layers and none was named"
                            : "The GeoPackage has no feature layer \"" + layer + "\"") + "; its layers are " + layers + ".",
                    "Name one of these layers in the project file."));
            return List.of();
        }
        String geometryColumn;
        int srsId;
        try (PreparedStatement s = connection.prepareStatement(
                "SELECT column_name, srs_id FROM gpkg_geometry_columns WHERE table_name = ?")) {
            s.setString(1, layer);
            try (ResultSet rs = s.executeQuery()) {
                if (!rs.next()) {
                    findings.add(Finding.error("geopackage-layer-missing", file, "layer \"" + layer + "\"",
                            "The layer has no entry in gpkg_geometry_columns.", "Recreate the layer with a GeoPackage writer."));
                    return List.of();
                }
                geometryColumn = rs.getString(1);
                srsId = rs.getInt(2);
            }
        }
        Optional<CoordinateSequenceFilter> toLonLat = transformFor(connection, layer, srsId);
        if (toLonLat == null) {
            return List.of();
        }
        return readFeatures(connection, layer, geometryColumn, toLonLat.orElse(null));
    }

    /** @return empty when no transform is needed, the transform when one is, null when the layer cannot be used */
    private Optional<CoordinateSequenceFilter> transformFor(Connection connection, String layer, int srsId) throws SQLException {
        String organization = "";
        int organizationId = -1;
        String definition = "";
        try (PreparedStatement s = connection.prepareStatement(
                "SELECT organization, organization_coordsys_id, definition FROM gpkg_spatial_ref_sys WHERE srs_id = ?")) {
            s.setInt(1, srsId);
            try (ResultSet rs = s.executeQuery()) {
                if (rs.next()) {
                    organization = String.valueOf(rs.getString(1));
                    organizationId = rs.getInt(2);
                    definition = String.valueOf(rs.getString(3));
                }
            }
        }
        boolean epsg4326 = "EPSG".equalsIgnoreCase(organization) && organizationId == WGS84_LONLAT;
        // Clause 1.1.2.1.2: srs_id 0 is "undefined geographic coordinate reference system"; treated as WGS 84.
        if (srsId == WGS84_LONLAT || epsg4326 || srsId == 0) {
            if (srsId == 0) {
                findings.add(Finding.warning("crs-undefined", file, "layer \"" + layer + "\"",
                        "The layer's coordinate system is undefined geographic (srs_id 0); aequa read it as WGS 84 longitude/latitude.",
                        "Assign EPSG:4326 to the layer if that is what it is."));
            }
            return Optional.empty();
        }
        Optional<CoordinateSequenceFilter> transform = definition.isBlank() || "undefined".equals(definition)
                ? Optional.empty() : crs.toLonLat(definition);
        if (transform.isEmpty()) {
            findings.add(Finding.error("crs-unsupported", file, "layer \"" + layer + "\"",
                    "The layer is in coordinate system " + organization + ":" + organizationId + " (srs_id " + srsId
                            + ") and aequa cannot transform it to WGS 84 longitude/latitude from its definition.",
                    "Reproject the layer to EPSG:4326, or store a full WKT definition in gpkg_spatial_ref_sys."));
            return null;
        }
        return transform;
    }

    /** The row's other text and number columns (after the three named ones, {@code SELECT *} repeats the row). */
    private static java.util.Map<String, String> otherColumns(ResultSet rs, String... skipped) throws SQLException {
        java.util.Map<String, String> kept = new java.util.HashMap<>();
        var meta = rs.getMetaData();
        for (int c = 4; c <= meta.getColumnCount(); c++) {
            String column = meta.getColumnName(c);
            Object value = rs.getObject(c);
            if (List.of(skipped).contains(column) || !(value instanceof String || value instanceof Number)) {
                continue;
            }
            Region.keep(kept, column, value.toString());
        }
        return kept;
    }

    private List<Region> readFeatures(Connection connection, String layer, String geometryColumn,
                                      CoordinateSequenceFilter toLonLat) throws SQLException {
        String keyColumn = RegionSourceSpec.FEATURE_ID.equals(spec.key()) ? primaryKey(connection, layer) : spec.key();
        String nameColumn = spec.name().isEmpty() ? keyColumn : spec.name();
        String sql = "SELECT " + SqliteColumns.quote(keyColumn) + ", " + SqliteColumns.quote(nameColumn)  + ", " + SqliteColumns.quote(geometryColumn)
                + ", * FROM " + SqliteColumns.quote(layer) + " ORDER BY rowid";
        WKBReader wkb = new WKBReader(RegionGeometries.FACTORY);
        List<Region> regions = new ArrayList<>();
        try (Statement s = connection.createStatement(); ResultSet rs = s.executeQuery(sql)) {
            int row = 0;
            while (rs.next()) {
                row++;
                String key = rs.getString(1);
                String place = key == null ? "row " + row : "feature \"" + key + "\"";
                if (key == null) {
                    findings.add(Finding.error("region-key-missing", file, place,
                            "Its key (column \"" + keyColumn + "\") is empty, so the feature was skipped.",
                            "Give every feature a key, or name another key column in the project file."));
                    continue;
                }
                Geometry geometry = geometry(rs.getBytes(3), wkb, place);
                if (geometry == null) {
                    continue;
                }
                if (toLonLat != null && !geometry.isEmpty()) {
                    geometry.apply(toLonLat);
                    geometry.geometryChanged();
                }
                regions.add(new Region(key, rs.getString(2), geometry, otherColumns(rs, keyColumn, nameColumn, geometryColumn)));
            }
        }
        return regions;
    }

    /** @return the polygonal geometry, an empty polygon for NULL or empty, or null (reported) when unusable */
    private Geometry geometry(byte[] blob, WKBReader wkb, String place) {
        if (blob == null) {
            return RegionGeometries.empty();
        }
        GeoPackageBinary header = GeoPackageBinary.parse(blob);
        if (header == null) {
            findings.add(Finding.error("geopackage-geometry-malformed", file, place,
                    "Its geometry blob is not GeoPackageBinary (OGC 12-128, clause 2.1.3), so the feature was skipped.",
                    "Rewrite the layer with a GeoPackage writer."));
            return null;
        }
        if (header.empty()) {
            return RegionGeometries.empty();
        }
        Geometry geometry;
        try {
            geometry = wkb.read(Arrays.copyOfRange(blob, header.wkbOffset(), blob.length));
        } catch (ParseException | IllegalArgumentException e) {
            findings.add(Finding.error("geopackage-geometry-malformed", file, place,
                    "Its WKB geometry could not be read (" + e.getMessage() + "), so the feature was skipped.",
                    "Rewrite the layer with a GeoPackage writer."));
            return null;
        }
        if (!(geometry instanceof Polygon) && !(geometry instanceof MultiPolygon)) {
            findings.add(Finding.warning("geometry-unsupported", file, place,
                    "Its geometry is a " + geometry.getGeometryType() + "; aequa maps only Polygon and MultiPolygon regions, so it was skipped.",
                    "Convert points and lines to the areas they stand for, or leave them out of the layer."));
            return null;
        }
        return geometry;
    }

    private static String primaryKey(Connection connection, String layer) throws SQLException {
        try (Statement s = connection.createStatement();
             ResultSet rs = s.executeQuery("PRAGMA table_info(" + SqliteColumns.quote(layer) + ")")) {
            while (rs.next()) {
                if (rs.getInt("pk") == 1) {
                    return rs.getString("name");
                }
            }
        }
        return "rowid";
    }
}
