package aequa.inputs.regions;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.zip.ZipFile;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;

import aequa.inputs.SqliteColumns;
import aequa.project.RegionSourceSpec;

/**
 * The attributes of a region file and their values, feature by feature, for guessing which one is the key:
 * GeoJSON and TopoJSON properties, then the feature id as {@value RegionSourceSpec#FEATURE_ID} (last, so that a
 * property holding the same codes is preferred on a tie, as more explicit), and the fields of
 * a Shapefile's {@code .dbf}, beside a {@code .shp} or in a {@code .zip} (its first Shapefile, by name), and the
 * columns of a GeoPackage's first features table (by name) but its geometry column. Values are text as the readers see them (leading zeros kept); a missing
 * value is null. The whole file is read in memory, which suits boundary files of a few tens of MB.
 *
 * @param attributes attribute name to its values in feature order, attributes in first-seen order
 * @param part       which part of the file was read: the TopoJSON object (the first of the topology), the
 *                   Shapefile in a zip (the first, sorted by name) or the GeoPackage layer; empty for other kinds
 */
public record RegionAttributes(Map<String, List<String>> attributes, String part) {

    /** The file kinds this sampler reads, for a usage message. */
    public static final String KINDS = "GeoJSON (.geojson, .json), TopoJSON (.topojson), GeoPackage (.gpkg) or Shapefile"
            + " (.shp, or a .zip holding one)";

    public RegionAttributes {
        Map<String, List<String>> copy = new LinkedHashMap<>();
        attributes.forEach((name, values) -> copy.put(name, Collections.unmodifiableList(new ArrayList<>(values))));
        attributes = Collections.unmodifiableMap(copy);
    }

    /**
     * @return the attributes, or empty when the file's kind is not one of {@link #KINDS}
     * @throws IOException when the file cannot be read or is not valid JSON or dBASE
     */
    public static Optional<RegionAttributes> read(Path file) throws IOException {
        String name = file.getFileName().toString().toLowerCase(Locale.ROOT);
        if (name.endsWith(".shp")) {
            return Optional.of(new RegionAttributes(dbf(file, ShapefileFiles.loose(file)), ""));
        }
        if (name.endsWith(".gpkg")) {
            // GeoPackage 1.3, clauses 1.1.3 and 2.1.5: features tables are listed in gpkg_contents, their
            // geometry columns in gpkg_geometry_columns
            String layer = SqliteColumns.firstName(file, "SELECT table_name FROM gpkg_contents WHERE data_type = 'features'"
                    + " ORDER BY table_name").orElseThrow(() -> new IOException(file.getFileName() + " holds no features table"));
            String literal = "'" + layer.replace("'", "''") + "'";
            Optional<String> geometry = SqliteColumns.firstName(file,
                    "SELECT column_name FROM gpkg_geometry_columns WHERE table_name = " + literal);
            return Optional.of(new RegionAttributes(SqliteColumns.read(file, layer, geometry.map(java.util.Set::of)
                    .orElse(java.util.Set.of())), layer));
        }
        if (name.endsWith(".zip")) {
            try (ZipFile zip = new ZipFile(file.toFile())) {
                List<String> layers = ShapefileFiles.layersIn(zip);
                if (layers.isEmpty()) {
                    throw new IOException(file.getFileName() + " holds no Shapefile (.shp)");
                }
                return Optional.of(new RegionAttributes(dbf(file, ShapefileFiles.inZip(zip, layers.get(0))), layers.get(0)));
            }
        }
        if (!name.endsWith(".geojson") && !name.endsWith(".json") && !name.endsWith(".topojson")) {
            return Optional.empty();
        }
        JsonNode root = new ObjectMapper().readTree(file.toFile());
        if ("Topology".equals(root.path("type").asText())) {
            var names = root.path("objects").fieldNames();
            String object = names.hasNext() ? names.next() : "";
            return Optional.of(new RegionAttributes(features(root.path("objects").path(object).path("geometries")), object));
        }
        return Optional.of(new RegionAttributes(features(root.path("features")), ""));
    }

    private static Map<String, List<String>> features(JsonNode features) {
        Map<String, List<String>> columns = new LinkedHashMap<>();
        List<String> ids = new ArrayList<>();
        int count = 0;
        for (JsonNode feature : features) {
            JsonNode id = feature.get("id");
            ids.add(id == null || id.isNull() || id.isContainerNode() ? null : id.asText());
            var fields = feature.path("properties").fields();
            while (fields.hasNext()) {
                var field = fields.next();
                add(columns, field.getKey(), field.getValue(), count);
            }
            count++;
            for (List<String> values : columns.values()) {
                while (values.size() < count) {
                    values.add(null);
                }
            }
        }
        if (ids.stream().anyMatch(Objects::nonNull)) {
            columns.put(RegionSourceSpec.FEATURE_ID, ids);
        }
        return columns;
    }

    private static void add(Map<String, List<String>> columns, String name, JsonNode value, int featureIndex) {
        if (value == null || value.isNull() || value.isContainerNode()) {
            return;
        }
        List<String> values = columns.computeIfAbsent(name, n -> new ArrayList<>());
        while (values.size() < featureIndex) {
            values.add(null);
        }
        values.add(value.asText());
    }

    private static Map<String, List<String>> dbf(Path shp, ShapefileFiles files) throws IOException {
        Map<String, List<String>> columns = new LinkedHashMap<>();
        if (!files.has(ShapefileFiles.Member.DBF)) {
            return columns;
        }
        byte[] dbf;
        try (var in = files.open(ShapefileFiles.Member.DBF)) {
            dbf = in.readAllBytes();
        }
        DbfCodePage.Decision codePage = DbfCodePage.decide(files.text(ShapefileFiles.Member.CPG), dbf);
        try (DbfTable table = DbfTable.open(dbf, codePage.charset())) {
            for (String field : table.fieldNames()) {
                columns.put(field, new ArrayList<>());
            }
            for (String[] record = table.next(); record != null; record = table.next()) {
                for (int i = 0; i < record.length; i++) {
                    columns.get(table.fieldNames().get(i)).add(record[i]);
                }
            }
        } catch (DbfTable.MalformedDbf e) {
            throw new IOException(shp.getFileName() + ": the .dbf cannot be read: " + e.getMessage(), e);
        }
        return columns;
    }
}
