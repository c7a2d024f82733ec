package aequa.inputs.regions;

import java.io.BufferedInputStream;
import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.zip.ZipException;
import java.util.zip.ZipFile;

import org.locationtech.jts.geom.CoordinateSequenceFilter;
import org.locationtech.jts.geom.Geometry;

import aequa.findings.Finding;
import aequa.findings.Findings;
import aequa.inputs.regions.ShapefileFiles.Member;
import aequa.inputs.regions.ShpRecords.ShapeRecord;
import aequa.project.RegionSourceSpec;

/**
 * Reads the regions of a Shapefile (ESRI Shapefile Technical Description, July 1998), from loose files beside a
 * {@code .shp} or straight from a {@code .zip}: polygon shapes (types 5, 15 and 25; Z and M ignored) streamed
 * from the {@code .shp}, paired by order with the records of the {@code .dbf} ({@link DbfTable}), whose text is
 * decoded as {@link DbfCodePage} decides. The CRS comes from the {@code .prj} (the ESRI flavour of WKT 1),
 * turned into a transform to WGS 84 lon/lat by the resolver the caller gives, as GeoPackage layers are; with no
 * {@code .prj}, coordinates inside the longitude/latitude range are read as WGS 84 with a warning, others are
 * refused. The {@code .shx} index is not needed, as records are read in order.
 *
 * <p>Null shapes become regions with an empty geometry (reported by the validator as missing geometry, after a
 * note here naming the record). Keys and names are the {@code .dbf} text as stored, leading zeros kept.
 */
final class ShapefileRegionReader {

    private final String file;
    private final RegionSourceSpec spec;
    private final SourceCrsResolver crs;
    private final Findings findings;

    ShapefileRegionReader(String file, RegionSourceSpec spec, SourceCrsResolver crs, Findings findings) {
        this.file = file;
        this.spec = spec;
        this.crs = crs;
        this.findings = findings;
    }

    List<Region> read(Path path) throws IOException {
        if (!path.getFileName().toString().toLowerCase(Locale.ROOT).endsWith(".zip")) {
            return read(ShapefileFiles.loose(path));
        }
        try (ZipFile zip = new ZipFile(path.toFile())) {
            List<String> layers = ShapefileFiles.layersIn(zip);
            Optional<String> layer = layers.stream()
                    .filter(l -> spec.layer().isEmpty() ? layers.size() == 1
                            : l.equals(spec.layer()) || l.endsWith("/" + spec.layer()))
                    .findFirst();
            if (layer.isEmpty()) {
                findings.add(Finding.error("shapefile-layer-missing", file, spec.layer().isEmpty() ? "" : "layer \"" + spec.layer() + "\"",
                        layers.isEmpty() ? "The zip holds no Shapefile (.shp)."
                                : (spec.layer().isEmpty() ? "The zip holds several Shapefiles and none was named"
                                        : "The zip holds no Shapefile \"" + spec.layer() + "\"") + "; it holds " + layers + ".",
                        "Set 'layer' in the project file to one of these names (without .shp)."));
                return List.of();
            }
            return read(ShapefileFiles.inZip(zip, layer.get()));
        } catch (ZipException e) {
            findings.add(Finding.error("shapefile-zip-unreadable", file, "", "The zip cannot be opened: " + e.getMessage() + ".",
                    "Check that the file is a complete zip archive."));
            return List.of();
        }
    }

    private List<Region> read(ShapefileFiles files) throws IOException {
        if (!files.has(Member.DBF)) {
            findings.add(Finding.error("shapefile-member-missing", file, files.name(Member.DBF),
                    "The Shapefile has no attribute table (" + files.name(Member.DBF) + "), so its regions have no keys.",
                    "Keep the .shp, .shx, .dbf, .prj and .cpg files of a Shapefile together."));
            return List.of();
        }
        byte[] dbf;
        try (InputStream in = files.open(Member.DBF)) {
            dbf = in.readAllBytes();
        }
        DbfCodePage.Decision codePage = DbfCodePage.decide(files.text(Member.CPG), dbf);
        reportCodePage(files, codePage);
        try (DbfTable table = DbfTable.open(dbf, codePage.charset());
             InputStream shp = new BufferedInputStream(files.open(Member.SHP), 1 << 16)) {
            int keyField = field(table, spec.key(), "key", files);
            int nameField = spec.name().isEmpty() ? keyField : field(table, spec.name(), "name", files);
            if (keyField == -2 || nameField == -2) {
                return List.of();
            }
            ShpRecords records = ShpRecords.open(shp);
            if (!polygonType(records.header().shapeType(), files.name(Member.SHP), "The file")) {
                return List.of();
            }
            Optional<CoordinateSequenceFilter> toLonLat = transform(files, records.header());
            if (toLonLat == null) {
                return List.of();
            }
            return readRecords(files, records, table, keyField, nameField, toLonLat.orElse(null));
        } catch (DbfTable.MalformedDbf e) {
            findings.add(Finding.error("shapefile-dbf-malformed", file, files.name(Member.DBF),
                    "The attribute table cannot be read: " + e.getMessage() + ".", "Rewrite the Shapefile with a GIS or a Shapefile writer."));
        } catch (ShpRecords.MalformedShp e) {
            findings.add(Finding.error("shapefile-shp-malformed", file, files.name(Member.SHP) + (e.record > 0 ? ", record " + e.record : ""),
                    "The shapes cannot be read: " + e.getMessage() + "; regions after that point were not read.",
                    "The .shp may be truncated (an interrupted copy or download); take it again from its source."));
        }
        return List.of();
    }

    private List<Region> readRecords(ShapefileFiles files, ShpRecords records, DbfTable table, int keyField,
                                     int nameField, CoordinateSequenceFilter toLonLat)
            throws IOException, ShpRecords.MalformedShp, DbfTable.MalformedDbf {
        RingAssembler assembler = new RingAssembler(file, findings);
        List<Region> regions = new ArrayList<>();
        ShapeRecord shape;
        while ((shape = records.next()) != null) {
            int record = records.recordsRead();
            String[] attributes = table.next();
            if (attributes == null) {
                findings.add(Finding.error("shapefile-dbf-short", file, files.name(Member.DBF) + ", record " + record,
                        "The attribute table ends before the shapes do: shape " + record + " and those after it have no"
                                + " attributes (the table declares " + table.declaredRecords() + " records).",
                        "The .dbf must hold one record per shape, in the same order; take the Shapefile again from its source."));
                return regions;
            }
            String key = keyField == -1 ? Integer.toString(record) : attributes[keyField];
            String place = files.name(Member.SHP) + ", record " + record;
            if (key == null) {
                findings.add(Finding.error("region-key-missing", file, place,
                        "Its key (field \"" + spec.key() + "\") is empty, so the shape was skipped.",
                        "Give every record a key, or name another key field in the project file."));
                continue;
            }
            Geometry geometry = geometry(shape, place, key, assembler);
            if (geometry == null) {
                continue;
            }
            if (toLonLat != null && !geometry.isEmpty()) {
                geometry.apply(toLonLat);
                geometry.geometryChanged();
            }
            java.util.Map<String, String> kept = new java.util.HashMap<>();
            for (int f = 0; f < attributes.length; f++) {
                if (f != keyField && f != nameField) {
                    Region.keep(kept, table.fieldNames().get(f), attributes[f]);
                }
            }
            regions.add(new Region(key, nameField == -1 ? key : attributes[nameField], geometry, kept));
        }
        if (table.declaredRecords() > records.recordsRead()) {
            findings.add(Finding.warning("shapefile-dbf-long", file, files.name(Member.DBF),
                    "The attribute table declares " + table.declaredRecords() + " records for " + records.recordsRead()
                            + " shapes; the records after the last shape were ignored.",
                    "The .dbf must hold one record per shape, in the same order; take the Shapefile again from its source."));
        }
        return regions;
    }

    /** @return the polygon(s), an empty polygon for a null shape, or null (reported) for another shape type */
    private Geometry geometry(ShapeRecord shape, String place, String key, RingAssembler assembler) {
        boolean nullShape = shape.shapeType() == ShpRecords.NULL_SHAPE;
        if (!nullShape && !polygonType(shape.shapeType(), place, "The record")) {
            return null;
        }
        if (nullShape || shape.rings().isEmpty()) {
            findings.add(Finding.note("shapefile-null-shape", file, place,
                    "Record " + shape.number() + " (key \"" + key + "\") has no geometry (a null shape).",
                    "Draw its outline in the Shapefile, or remove the record."));
            return RegionGeometries.empty();
        }
        ShapeRings.Grouping grouping = ShapeRings.group(shape.rings());
        if (grouping.orphanHoles() > 0) {
            findings.add(Finding.note("shapefile-ring-orientation", file, place,
                    grouping.orphanHoles() + " counter-clockwise ring(s) lie in no clockwise ring; aequa read them as outer rings.",
                    "The Shapefile description makes outer rings clockwise and holes counter-clockwise; rewrite the file with a GIS."));
        }
        return assembler.assemble(grouping.polygons(), "feature \"" + key + "\"");
    }

    private boolean polygonType(int type, String place, String subject) {
        if (type == ShpRecords.POLYGON || type == ShpRecords.POLYGON_Z || type == ShpRecords.POLYGON_M) {
            return true;
        }
        findings.add(Finding.error("geometry-unsupported", file, place,
                subject + " holds shape type " + type + "; aequa maps areas only: Polygon (5), PolygonZ (15) or PolygonM (25).",
                "Convert points and lines to the areas they stand for, or use the Shapefile of the areas."));
        return false;
    }

    /** @return -1 for the record number ({@link RegionSourceSpec#FEATURE_ID}), the field's index, or -2 (reported) */
    private int field(DbfTable table, String wanted, String setting, ShapefileFiles files) {
        if (RegionSourceSpec.FEATURE_ID.equals(wanted)) {
            return -1;
        }
        int index = table.fieldNames().indexOf(wanted);
        if (index >= 0) {
            return index;
        }
        String near = table.fieldNames().stream().filter(n -> n.equalsIgnoreCase(wanted)).findFirst()
                .map(n -> "Did you mean \"" + n + "\"? Field names must match exactly.")
                .orElse("Its fields are " + table.fieldNames() + ".");
        findings.add(Finding.error("shapefile-field-missing", file, files.name(Member.DBF),
                "The attribute table has no field \"" + wanted + "\" (" + setting + ").", near + " Set '" + setting + "' in the project file."));
        return -2;
    }

    /** @return empty for WGS 84 lon/lat as stored, a transform, or null (reported) when the CRS cannot be used */
    private Optional<CoordinateSequenceFilter> transform(ShapefileFiles files, ShpRecords.Header header) throws IOException {
        Optional<String> prj = files.text(Member.PRJ);
        if (prj.isEmpty()) {
            boolean lonLatRange = header.minX() >= -180 && header.maxX() <= 180 && header.minY() >= -90 && header.maxY() <= 90;
            if (lonLatRange) {
                findings.add(Finding.warning("crs-assumed", file, files.name(Member.PRJ),
                        "The Shapefile has no .prj, so its coordinate system is unknown; its coordinates lie within"
                                + " longitude/latitude range, and aequa assumed WGS 84 longitude/latitude.",
                        "Keep the .prj with the Shapefile so that nothing has to be assumed."));
                return Optional.empty();
            }
            findings.add(Finding.error("crs-missing", file, files.name(Member.PRJ),
                    "The Shapefile has no .prj, and its coordinates (x " + header.minX() + " to " + header.maxX()
                            + ") are not longitude/latitude, so aequa cannot place them.",
                    "Keep the .prj with the Shapefile, or reproject it to WGS 84 longitude/latitude."));
            return null;
        }
        Optional<CoordinateSequenceFilter> transform = crs.toLonLat(prj.get());
        if (transform.isEmpty()) {
            String start = prj.get().length() > 60 ? prj.get().substring(0, 60) + "..." : prj.get();
            findings.add(Finding.error("crs-unsupported", file, files.name(Member.PRJ),
                    "aequa cannot transform the coordinate system of the .prj (" + start + ") to WGS 84 longitude/latitude.",
                    "Check that the .prj holds a WKT coordinate system, or reproject the Shapefile to WGS 84 (EPSG:4326)."));
            return null;
        }
        return transform;
    }

    private void reportCodePage(ShapefileFiles files, DbfCodePage.Decision decision) {
        if (!decision.cpgProblem().isEmpty()) {
            findings.add(Finding.warning("shapefile-code-page-unknown", file, files.name(Member.CPG),
                    "The .cpg names a code page aequa does not know (\"" + decision.cpgProblem() + "\"); names were read as "
                            + decision.charset().name() + ".",
                    "Write a known name in the .cpg, for example UTF-8 or 1252."));
        }
        if (decision.source() == DbfCodePage.Source.ASSUMED) {
            findings.add(Finding.note("shapefile-code-page-assumed", file, files.name(Member.DBF),
                    "Neither a .cpg nor the table's language driver names a code page; aequa read the names as "
                            + decision.charset().name() + ".",
                    "Check accented names on the map; a .cpg file holding the code page (such as UTF-8) removes the guess."));
        }
    }
}
