package aequa.inputs.regions;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.PreparedStatement;
import java.sql.Statement;
import java.util.List;
import java.util.stream.Collectors;

import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.io.ByteOrderValues;
import org.locationtech.jts.io.WKBWriter;
import org.locationtech.jts.io.WKTReader;

import aequa.findings.Finding;
import aequa.findings.Findings;
import aequa.project.RegionSourceSpec;
import aequa.projection.SourceCrs;

/**
 * Builds a GeoPackage from code, following OGC 12-128r18 (GeoPackage 1.3): the required tables
 * gpkg_spatial_ref_sys (clause 1.1.2, Table 3), gpkg_contents (1.1.3, Table 5) and gpkg_geometry_columns
 * (2.1.5, Table 7), and feature rows whose geometry is a GeoPackageBinary header (2.1.3, Table 6)
 * followed by WKB, in both byte orders, with and without envelope.
 */
class GeoPackageRegionReaderTest {

    /** EPSG:3035 ETRS89 / LAEA Europe as WKT 1 (parameters from IOGP GN 7-2, method 9820; written from memory). */
    private static final String ETRS89_LAEA_WKT = "PROJCS[\"ETRS89 / LAEA Europe\",GEOGCS[\"ETRS89\","
            + "DATUM[\"European_Terrestrial_Reference_System_1989\",SPHEROID[\"GRS 1980\",6378137,298.257222101]],"
            + "PRIMEM[\"Greenwich\",0],UNIT[\"degree\",0.0174532925199433]],PROJECTION[\"Lambert_Azimuthal_Equal_Area\"],"
            + "PARAMETER[\"latitude_of_center\",52],PARAMETER[\"longitude_of_center\",10],PARAMETER[\"false_easting\",4321000],"
            + "PARAMETER[\"false_northing\",3210000],UNIT[\"metre\",1]]";

    @TempDir
    Path dir;

    @BeforeEach
    void writeGeoPackage() throws Exception {
        try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + dir.resolve("regions.gpkg"));
             Statement s = c.createStatement()) {
            s.execute("PRAGMA application_id = 1196444487"); // 0x47504B47 "GPKG", clause 1.1.1.1.1
            s.execute("PRAGMA user_version = 10300");
            s.execute("CREATE TABLE gpkg_spatial_ref_sys (srs_name TEXT NOT NULL, srs_id INTEGER PRIMARY KEY,"
                    + " organization TEXT NOT NULL, organization_coordsys_id INTEGER NOT NULL, definition TEXT NOT NULL, description TEXT)");
            s.execute("INSERT INTO gpkg_spatial_ref_sys VALUES ('WGS 84', 4326, 'EPSG', 4326, 'GEOGCS[\"WGS 84\"]', null),"
                    + " ('Undefined cartesian', -1, 'NONE', -1, 'undefined', null), ('Undefined geographic', 0, 'NONE', 0, 'undefined', null),"
                    + " ('ETRS89 / LAEA Europe', 3035, 'EPSG', 3035, '" + ETRS89_LAEA_WKT + "', null)");
            s.execute("CREATE TABLE gpkg_contents (table_name TEXT PRIMARY KEY, data_type TEXT NOT NULL, identifier TEXT,"
                    + " description TEXT DEFAULT '', last_change DATETIME, min_x DOUBLE, min_y DOUBLE, max_x DOUBLE, max_y DOUBLE, srs_id INTEGER)");
            s.execute("CREATE TABLE gpkg_geometry_columns (table_name TEXT NOT NULL, column_name TEXT NOT NULL,"
                    + " geometry_type_name TEXT NOT NULL, srs_id INTEGER NOT NULL, z TINYINT NOT NULL, m TINYINT NOT NULL)");
            layer(s, "counties", 4326);
            layer(s, "laea", 3035);
            WKTReader wkt = new WKTReader();
            Geometry square = wkt.read("POLYGON((0 0, 1 0, 1 1, 0 1, 0 0))");
            Geometry two = wkt.read("MULTIPOLYGON(((2 0, 3 0, 3 1, 2 0)), ((4 0, 5 0, 5 1, 4 0)))");
            try (PreparedStatement insert = c.prepareStatement("INSERT INTO counties (code, label, geom) VALUES (?, ?, ?)")) {
                row(insert, "A1", "Alpha", blob(square, 4326, ByteOrder.LITTLE_ENDIAN, true, false));
                row(insert, "B2", "Beta", blob(two, 4326, ByteOrder.BIG_ENDIAN, false, false));
                row(insert, "C3", "Gamma", null);
                row(insert, "D4", "Delta", blob(square, 4326, ByteOrder.LITTLE_ENDIAN, false, true));
                row(insert, null, "No key", blob(square, 4326, ByteOrder.LITTLE_ENDIAN, true, false));
                row(insert, "E5", "Point", blob(wkt.read("POINT(1 2)"), 4326, ByteOrder.LITTLE_ENDIAN, false, false));
                row(insert, "F6", "Garbage", new byte[] {1, 2, 3, 4, 5, 6, 7, 8, 9});
            }
            try (PreparedStatement insert = c.prepareStatement("INSERT INTO laea (code, label, geom) VALUES (?, ?, ?)")) {
                // GN 7-2 / GIGS 5110 worked example: (5 E, 50 N) -> E 3962799.45, N 2999718.85 (reference/worked-examples.md 1a)
                Geometry around = wkt.read("POLYGON((3962799.45 2999718.85, 3972799.45 2999718.85, 3972799.45 3009718.85, 3962799.45 2999718.85))");
                row(insert, "L1", "Lambert", blob(around, 3035, ByteOrder.LITTLE_ENDIAN, true, false));
            }
        }
    }

    /**
     * scaffold's sampler reads the first features table by name (gpkg_contents, clause 1.1.3) with every column
     * but its geometry column (gpkg_geometry_columns, clause 2.1.5), values as text in row order.
     */
    @Test
    void scaffoldSamplesTheFirstLayerWithoutItsGeometry() throws java.io.IOException {
        RegionAttributes attributes = RegionAttributes.read(dir.resolve("regions.gpkg")).orElseThrow();
        assertEquals("counties", attributes.part());
        assertEquals(java.util.List.of("fid", "code", "label"), java.util.List.copyOf(attributes.attributes().keySet()));
        assertEquals(java.util.Arrays.asList("A1", "B2", "C3", "D4", null, "E5", "F6"), attributes.attributes().get("code"));
    }

    private static void layer(Statement s, String table, int srsId) throws Exception {
        s.execute("CREATE TABLE " + table + " (fid INTEGER PRIMARY KEY AUTOINCREMENT, code TEXT, label TEXT, geom BLOB)");
        s.execute("INSERT INTO gpkg_contents (table_name, data_type, identifier, srs_id) VALUES ('" + table + "', 'features', '" + table + "', " + srsId + ")");
        s.execute("INSERT INTO gpkg_geometry_columns VALUES ('" + table + "', 'geom', 'MULTIPOLYGON', " + srsId + ", 0, 0)");
    }

    private static void row(PreparedStatement insert, String code, String label, byte[] geom) throws Exception {
        insert.setString(1, code);
        insert.setString(2, label);
        insert.setBytes(3, geom);
        insert.executeUpdate();
    }

    /** GeoPackageBinary: "GP", version 0, flags (Y empty bit 4, E envelope bits 3-1, B byte order bit 0), srs_id, envelope, WKB. */
    static byte[] blob(Geometry g, int srsId, ByteOrder order, boolean envelope, boolean empty) {
        byte[] wkb = new WKBWriter(2, order == ByteOrder.LITTLE_ENDIAN ? ByteOrderValues.LITTLE_ENDIAN : ByteOrderValues.BIG_ENDIAN).write(g);
        ByteBuffer b = ByteBuffer.allocate(8 + (envelope ? 32 : 0) + wkb.length).order(order);
        int flags = (empty ? 0b1_0000 : 0) | (envelope ? 0b0010 : 0) | (order == ByteOrder.LITTLE_ENDIAN ? 1 : 0);
        b.put((byte) 0x47).put((byte) 0x50).put((byte) 0).put((byte) flags).putInt(srsId);
        if (envelope) {
            Envelope e = g.getEnvelopeInternal();
            b.putDouble(e.getMinX()).putDouble(e.getMaxX()).putDouble(e.getMinY()).putDouble(e.getMaxY());
        }
        return b.put(wkb).array();
    }

    @Test
    void readsAllHeaderVariantsAndReportsBadRows() {
        Findings findings = new Findings();
        List<Region> regions = RegionReaders.read(dir, new RegionSourceSpec("regions.gpkg", "code", "label", "counties"), findings);
        assertEquals(List.of("A1", "B2", "C3", "D4"), regions.stream().map(Region::key).collect(Collectors.toList()));
        assertEquals(1.0, regions.get(0).lonLat().getArea(), 1e-12);
        assertEquals(2, regions.get(1).lonLat().getNumGeometries(), "big-endian header without envelope");
        assertTrue(regions.get(2).lonLat().isEmpty(), "SQL NULL geometry");
        assertTrue(regions.get(3).lonLat().isEmpty(), "empty flag");
        assertEquals("Beta", regions.get(1).name());
        assertEquals(List.of("region-key-missing row 5", "geometry-unsupported feature \"E5\"", "geopackage-geometry-malformed feature \"F6\""),
                findings.list().stream().map(f -> f.code() + " " + f.place()).collect(Collectors.toList()));
    }

    @Test
    void theFeatureIdCanBeTheKey() {
        Findings findings = new Findings();
        List<Region> regions = RegionReaders.read(dir, new RegionSourceSpec("regions.gpkg", "@id", "", "counties"), findings);
        assertEquals("1", regions.get(0).key());
        assertEquals("1", regions.get(0).name());
    }

    @Test
    void aLayerInAnotherCrsIsTransformedWithSis() {
        // GN 7-2 worked example for EPSG:3035: (E 3962799.45, N 2999718.85) is (5 E, 50 N).
        Findings findings = new Findings();
        List<Region> regions = RegionReaders.read(dir, new RegionSourceSpec("regions.gpkg", "code", "", "laea"),
                SourceCrs::toLonLat, findings);
        assertEquals(List.of(), findings.list());
        var first = regions.get(0).lonLat().getCoordinates()[0];
        assertEquals(5.0, first.x, 1e-7);
        assertEquals(50.0, first.y, 1e-7);
    }

    @Test
    void withoutAResolverAnotherCrsIsAnError() {
        Findings findings = new Findings();
        List<Region> regions = RegionReaders.read(dir, new RegionSourceSpec("regions.gpkg", "code", "", "laea"), findings);
        assertEquals(List.of(), regions);
        Finding finding = findings.list().get(0);
        assertEquals("crs-unsupported", finding.code());
        assertEquals("layer \"laea\"", finding.place());
    }

    @Test
    void aMissingOrUnnamedLayerIsReported() {
        Findings missing = new Findings();
        RegionReaders.read(dir, new RegionSourceSpec("regions.gpkg", "code", "", "nowhere"), missing);
        assertEquals("geopackage-layer-missing", missing.list().get(0).code());
        Findings unnamed = new Findings();
        RegionReaders.read(dir, new RegionSourceSpec("regions.gpkg", "code", "", ""), unnamed);
        assertTrue(unnamed.list().get(0).message().contains("[counties, laea]"), unnamed.list().get(0).message());
    }
}
