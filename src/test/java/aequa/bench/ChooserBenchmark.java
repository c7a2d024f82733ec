package aequa.bench;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.concurrent.TimeUnit;

import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Threads;
import org.openjdk.jmh.annotations.Warmup;

import aequa.projection.Footprint;
import aequa.projection.ProjectionChoice;
import aequa.projection.ProjectionChooser;
import aequa.projection.ProjectionRequest;

/**
 * The automatic choice for a footprint of {@value #VERTICES} vertices: 400 regions with wiggly edges
 * tiling a continent-sized box (35-70 N, 10 W - 40 E), 250 vertices each. Measures the footprint
 * analysis alone and footprint plus choice, average time per operation in milliseconds (goal: under 200 ms
 * warm). Run: {@code mvn -o -q -Pbench test-compile exec:exec -Dbench=ChooserBenchmark}.
 */
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Fork(1)
@Threads(1)
@Warmup(iterations = 6, time = 2)
@Measurement(iterations = 5, time = 2)
@State(Scope.Thread)
public class ChooserBenchmark {

    static final int VERTICES = 100_000;

    private List<Geometry> regions;

    @Setup(Level.Trial)
    public void setUp() {
        GeometryFactory factory = new GeometryFactory();
        Random random = new Random(7);
        regions = new ArrayList<>();
        int columns = 20;
        int rows = 20;
        int perSide = VERTICES / (columns * rows) / 4;
        for (int r = 0; r < rows; r++) {
            for (int c = 0; c < columns; c++) {
                double west = -10 + 50.0 * c / columns;
                double south = 35 + 35.0 * r / rows;
                double w = 50.0 / columns;
                double h = 35.0 / rows;
                List<Coordinate> ring = new ArrayList<>();
                double[][] corners = {{west, south}, {west + w, south}, {west + w, south + h}, {west, south + h}};
                for (int k = 0; k < 4; k++) {
                    double[] a = corners[k];
                    double[] b = corners[(k + 1) % 4];
                    for (int i = 0; i < perSide; i++) {
                        double t = (double) i / perSide;
                        double wiggle = i == 0 ? 0 : 0.02 * (random.nextDouble() - 0.5);
                        ring.add(new Coordinate(a[0] + t * (b[0] - a[0]) + wiggle, a[1] + t * (b[1] - a[1]) + wiggle));
                    }
                }
                ring.add(new Coordinate(ring.get(0)));
                regions.add(factory.createPolygon(ring.toArray(Coordinate[]::new)));
            }
        }
    }

    @Benchmark
    public Footprint footprintOnly() {
        return Footprint.of(regions);
    }

    @Benchmark
    public ProjectionChoice footprintAndChoice() {
        return ProjectionChooser.choose(Footprint.of(regions), ProjectionRequest.automatic());
    }
}
