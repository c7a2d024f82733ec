package aequa.demo;

import java.io.IOException;
import java.io.Writer;
import java.nio.file.Path;
import java.util.List;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.core.util.DefaultPrettyPrinter;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.Polygon;

/** Writes demo regions as an RFC 7946 GeoJSON FeatureCollection, one feature per region. */
final class DemoFiles {

    private DemoFiles() {
    }

    static void geojson(Path file, String title, List<DemoGenerator.Place> places) throws IOException {
        try (Writer out = DemoGenerator.utf8(file);
             JsonGenerator json = new JsonFactory().createGenerator(out)) {
            json.setPrettyPrinter(new DefaultPrettyPrinter().withObjectIndenter(
                    new com.fasterxml.jackson.core.util.DefaultIndenter("", "\n")));
            json.writeStartObject();
            json.writeStringField("type", "FeatureCollection");
            json.writeStringField("name", title);
            json.writeArrayFieldStart("features");
            for (DemoGenerator.Place place : places) {
                json.writeStartObject();
                json.writeStringField("type", "Feature");
                json.writeStringField("id", place.code());
                json.writeObjectFieldStart("properties");
                json.writeStringField("code", place.code());
                json.writeStringField("name", place.name());
                json.writeEndObject();
                writeGeometry(json, place.lonLat());
                json.writeEndObject();
            }
            json.writeEndArray();
            json.writeEndObject();
            json.flush();
            out.write('\n');
        }
    }

    private static void writeGeometry(JsonGenerator json, Geometry g) throws IOException {
        json.writeObjectFieldStart("geometry");
        boolean multi = g.getNumGeometries() > 1;
        json.writeStringField("type", multi ? "MultiPolygon" : "Polygon");
        json.writeArrayFieldStart("coordinates");
        for (int i = 0; i < g.getNumGeometries(); i++) {
            Polygon p = (Polygon) g.getGeometryN(i);
            if (multi) {
                json.writeStartArray();
            }
            json.writeStartArray();
            for (Coordinate c : p.getExteriorRing().getCoordinates()) {
                json.writeStartArray();
                json.writeRawValue(number(c.x));
                json.writeRawValue(number(c.y));
                json.writeEndArray();
            }
            json.writeEndArray();
            if (multi) {
                json.writeEndArray();
            }
        }
        json.writeEndArray();
        json.writeEndObject();
    }

    /** Six decimals (about 0.1 m), without trailing zeros. */
    private static String number(double v) {
        String s = new java.math.BigDecimal(v).setScale(6, java.math.RoundingMode.HALF_EVEN).stripTrailingZeros().toPlainString();
        return s.equals("-0") ? "0" : s;
    }
}
