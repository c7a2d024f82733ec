package aequa.inputs.regions;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.charset.Charset;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.zip.ZipEntry;
import java.util.zip.ZipOutputStream;

import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.LinearRing;
import org.locationtech.jts.geom.Polygon;

import com.linuxense.javadbf.DBFDataType;
import com.linuxense.javadbf.DBFField;
import com.linuxense.javadbf.DBFWriter;

/**
 * Writes Shapefiles for tests. No Shapefile writer is reachable from the package registries aequa may use
 * (GeoTools lives in its own repository), so the {@code .shp} and {@code .shx} are written here from the ESRI
 * Shapefile Technical Description (July 1998): the 100-byte main header (file code 9994 and length in 16-bit
 * words big-endian, version 1000 and shape type little-endian, bounding box), records with a big-endian header
 * (number from 1, content length in words) and little-endian Polygon content (type, box, NumParts, NumPoints,
 * Parts, Points); the index holds (offset, content length) per record in words. Outer rings are written
 * clockwise and holes counter-clockwise, as the description requires. The {@code .dbf} is written by javadbf's
 * {@code DBFWriter}, a general-purpose library, with character fields.
 */
public final class ShapefileFixture {

    /** The WGS 84 geographic CRS as ESRI writes it in a .prj (ESRI's WKT 1 flavour: D_ datum prefix, no AXIS). */
    public static final String WGS84_PRJ = "GEOGCS[\"GCS_WGS_1984\",DATUM[\"D_WGS_1984\",SPHEROID[\"WGS_1984\",6378137.0,298.257223563]],"
            + "PRIMEM[\"Greenwich\",0.0],UNIT[\"Degree\",0.0174532925199433]]";

    /** One record: its attribute values (text, one per field) and its geometry (null for a null shape). */
    public record Feature(List<String> values, Geometry lonLat) {
    }

    private ShapefileFixture() {
    }

    /** Writes {@code base}.shp/.shx/.dbf (and .prj, .cpg when not null) in {@code dir}. */
    public static void write(Path dir, String base, List<String> fields, List<Feature> features, String prj, String cpg,
                      Charset dbfCharset) throws IOException {
        Files.write(dir.resolve(base + ".shp"), shp(features, false));
        Files.write(dir.resolve(base + ".shx"), shp(features, true));
        Files.write(dir.resolve(base + ".dbf"), dbf(fields, features, dbfCharset));
        if (prj != null) {
            Files.writeString(dir.resolve(base + ".prj"), prj, StandardCharsets.ISO_8859_1);
        }
        if (cpg != null) {
            Files.writeString(dir.resolve(base + ".cpg"), cpg, StandardCharsets.ISO_8859_1);
        }
    }

    /** Zips every file of {@code dir} whose name starts with {@code base + "."} into {@code zip}, sorted. */
    public static void zip(Path dir, String base, Path zip) throws IOException {
        try (ZipOutputStream out = new ZipOutputStream(Files.newOutputStream(zip));
             var files = Files.list(dir)) {
            for (Path file : files.filter(f -> f.getFileName().toString().startsWith(base + ".")).sorted().toList()) {
                out.putNextEntry(new ZipEntry(file.getFileName().toString()));
                out.write(Files.readAllBytes(file));
                out.closeEntry();
            }
        }
    }

    static byte[] dbf(List<String> fields, List<Feature> features, Charset charset) throws IOException {
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        DBFWriter writer = new DBFWriter(bytes, charset);
        DBFField[] dbfFields = new DBFField[fields.size()];
        for (int f = 0; f < fields.size(); f++) {
            int width = 1;
            for (Feature feature : features) {
                String value = feature.values().get(f);
                width = Math.max(width, value == null ? 1 : value.getBytes(charset).length);
            }
            dbfFields[f] = new DBFField(fields.get(f), DBFDataType.CHARACTER, width);
        }
        writer.setFields(dbfFields);
        for (Feature feature : features) {
            writer.addRecord(feature.values().toArray());
        }
        writer.close();
        return bytes.toByteArray();
    }

    /** The main file, or with {@code index} the .shx. */
    static byte[] shp(List<Feature> features, boolean index) {
        List<byte[]> contents = new ArrayList<>();
        Envelope all = new Envelope();
        for (Feature feature : features) {
            contents.add(content(feature.lonLat()));
            if (feature.lonLat() != null) {
                all.expandToInclude(feature.lonLat().getEnvelopeInternal());
            }
        }
        int length = 100;
        for (byte[] content : contents) {
            length += index ? 8 : 8 + content.length;
        }
        ByteBuffer out = ByteBuffer.allocate(length);
        out.order(ByteOrder.BIG_ENDIAN).putInt(9994).putInt(0).putInt(0).putInt(0).putInt(0).putInt(0).putInt(length / 2);
        out.order(ByteOrder.LITTLE_ENDIAN).putInt(1000).putInt(5);
        out.putDouble(all.getMinX()).putDouble(all.getMinY()).putDouble(all.getMaxX()).putDouble(all.getMaxY());
        out.putDouble(0).putDouble(0).putDouble(0).putDouble(0);
        int offset = 100;
        for (int r = 0; r < contents.size(); r++) {
            byte[] content = contents.get(r);
            out.order(ByteOrder.BIG_ENDIAN);
            if (index) {
                out.putInt(offset / 2).putInt(content.length / 2);
            } else {
                out.putInt(r + 1).putInt(content.length / 2).put(content);
            }
            offset += 8 + content.length;
        }
        return out.array();
    }

    private static byte[] content(Geometry geometry) {
        if (geometry == null) {
            return ByteBuffer.allocate(4).order(ByteOrder.LITTLE_ENDIAN).putInt(0).array();
        }
        List<Coordinate[]> rings = new ArrayList<>();
        for (int p = 0; p < geometry.getNumGeometries(); p++) {
            Polygon polygon = (Polygon) geometry.getGeometryN(p);
            rings.add(wound(polygon.getExteriorRing(), false));
            for (int h = 0; h < polygon.getNumInteriorRing(); h++) {
                rings.add(wound(polygon.getInteriorRingN(h), true));
            }
        }
        int points = rings.stream().mapToInt(r -> r.length).sum();
        ByteBuffer out = ByteBuffer.allocate(44 + 4 * rings.size() + 16 * points).order(ByteOrder.LITTLE_ENDIAN);
        Envelope box = geometry.getEnvelopeInternal();
        out.putInt(5).putDouble(box.getMinX()).putDouble(box.getMinY()).putDouble(box.getMaxX()).putDouble(box.getMaxY());
        out.putInt(rings.size()).putInt(points);
        int start = 0;
        for (Coordinate[] ring : rings) {
            out.putInt(start);
            start += ring.length;
        }
        for (Coordinate[] ring : rings) {
            for (Coordinate c : ring) {
                out.putDouble(c.x).putDouble(c.y);
            }
        }
        return out.array();
    }

    private static Coordinate[] wound(LinearRing ring, boolean counterClockwise) {
        Coordinate[] coordinates = ring.getCoordinates();
        boolean isCcw = org.locationtech.jts.algorithm.Orientation.isCCW(coordinates);
        if (isCcw != counterClockwise) {
            Coordinate[] reversed = new Coordinate[coordinates.length];
            for (int i = 0; i < coordinates.length; i++) {
                reversed[i] = coordinates[coordinates.length - 1 - i];
            }
            return reversed;
        }
        return coordinates;
    }
}
