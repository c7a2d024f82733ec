package aequa.bench;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;

import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.Polygon;
import org.locationtech.jts.triangulate.VoronoiDiagramBuilder;

import com.fasterxml.jackson.core.JsonEncoding;
import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonGenerator;

import aequa.ellipsoid.LonLatDensifier;

/**
 * A large synthetic region coverage for benchmarks: Voronoi cells (JTS VoronoiDiagramBuilder) of seeded
 * random sites over a continent-sized lon/lat box, densified so each cell has about 50 vertices, written as
 * RFC 7946 GeoJSON with 7 decimals. Neighbouring cells share their borders vertex for vertex (the
 * builder computes each Voronoi vertex once; the densifier is direction-independent; equal doubles print
 * equally).
 */
final class SyntheticCoverage {

    /** The box: 50 deg of longitude by 35 deg of latitude, about Europe's size. */
    static final Envelope BOX = new Envelope(-10, 40, 35, 70);

    private SyntheticCoverage() {
    }

    /** Writes {@code cells} cells to {@code file}; returns the number of vertices written (closing ones excluded). */
    static long write(Path file, int cells, long seed) throws IOException {
        GeometryFactory factory = new GeometryFactory();
        Random random = new Random(seed);
        List<Coordinate> sites = new ArrayList<>(cells);
        for (int i = 0; i < cells; i++) {
            sites.add(new Coordinate(BOX.getMinX() + random.nextDouble() * BOX.getWidth(),
                    BOX.getMinY() + random.nextDouble() * BOX.getHeight()));
        }
        VoronoiDiagramBuilder builder = new VoronoiDiagramBuilder();
        builder.setSites(sites);
        builder.setClipEnvelope(BOX);
        Geometry diagram = builder.getDiagram(factory);
        // perimeter of a cell ~ 4 sqrt(area / cells); ~50 vertices each
        double stepDeg = 4 * Math.sqrt(BOX.getArea() / cells) / 50;
        long vertices = 0;
        JsonFactory json = new JsonFactory();
        try (OutputStream out = Files.newOutputStream(file);
             JsonGenerator gen = json.createGenerator(out, JsonEncoding.UTF8)) {
            gen.writeStartObject();
            gen.writeStringField("type", "FeatureCollection");
            gen.writeArrayFieldStart("features");
            for (int i = 0; i < diagram.getNumGeometries(); i++) {
                Geometry cell = diagram.getGeometryN(i).intersection(factory.toGeometry(BOX));
                if (!(cell instanceof Polygon) || cell.isEmpty()) {
                    continue;
                }
                Polygon dense = (Polygon) LonLatDensifier.densify(cell.norm(), stepDeg);
                Coordinate[] ring = dense.getExteriorRing().getCoordinates();
                if (!org.locationtech.jts.algorithm.Orientation.isCCW(ring)) {
                    java.util.Collections.reverse(java.util.Arrays.asList(ring));
                }
                vertices += ring.length - 1;
                gen.writeStartObject();
                gen.writeStringField("type", "Feature");
                gen.writeStringField("id", "c" + i);
                gen.writeObjectFieldStart("properties");
                gen.writeStringField("name", "Cell " + i);
                gen.writeEndObject();
                gen.writeObjectFieldStart("geometry");
                gen.writeStringField("type", "Polygon");
                gen.writeArrayFieldStart("coordinates");
                gen.writeStartArray();
                for (Coordinate c : ring) {
                    gen.writeStartArray();
                    gen.writeNumber(round7(c.x));
                    gen.writeNumber(round7(c.y));
                    gen.writeEndArray();
                }
                gen.writeEndArray();
                gen.writeEndArray();
                gen.writeEndObject();
                gen.writeEndObject();
            }
            gen.writeEndArray();
            gen.writeEndObject();
        }
        return vertices;
    }

    /** 7 decimals, as the shared data files (about 1 cm); equal inputs give equal outputs. */
    private static double round7(double v) {
        return Math.round(v * 1e7) / 1e7;
    }
}
