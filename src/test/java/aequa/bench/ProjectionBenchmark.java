package aequa.bench;

import java.util.Map;
import java.util.Random;
import java.util.concurrent.TimeUnit;

import org.apache.sis.referencing.operation.transform.DefaultMathTransformFactory;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Threads;
import org.openjdk.jmh.annotations.Warmup;
import org.opengis.parameter.ParameterValueGroup;
import org.opengis.referencing.operation.MathTransform;

import aequa.projection.EqualAreaProjection;
import aequa.projection.ProjectionFamily;
import aequa.projection.Projections;

/**
 * Forward projection throughput per family on one core, in batches of {@value #POINTS} points (one
 * operation = one batch, so points per second = operations per second x {@value #POINTS}); and, for the
 * three SIS-backed families, the same batch through the SIS transform called directly, to measure the
 * wrapper's overhead. Run: {@code mvn -o -q -Pbench test-compile exec:exec -Dbench=ProjectionBenchmark}
 * (add JMH options after the name, e.g. {@code -Dbench="ProjectionBenchmark -f 2"}).
 */
@BenchmarkMode(Mode.Throughput)
@OutputTimeUnit(TimeUnit.SECONDS)
@Fork(1)
@Threads(1)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
@State(Scope.Thread)
public class ProjectionBenchmark {

    static final int POINTS = 10_000;

    @Param({"lambert-azimuthal", "albers-conic", "cylindrical", "cylindrical-transverse", "cylindrical-oblique",
            "equal-earth", "mollweide"})
    public String family;

    private EqualAreaProjection projection;
    private MathTransform sisDirect;
    private double[] lonLat;
    private double[] xy;

    @Setup(Level.Trial)
    public void setUp() throws Exception {
        ProjectionFamily f = ProjectionFamily.fromConfigName(family).orElseThrow();
        Map<String, Double> parameters = Map.of("centre-lon", 10.0, "centre-lat", 50.0, "standard-parallel-1", 40.0,
                "standard-parallel-2", 60.0, "azimuth", 30.0, "standard-line-offset", 5.0);
        projection = Projections.create(f, parameters);
        // points over Europe (35-70 N, 10 W - 40 E), inside every family's domain
        Random random = new Random(42);
        lonLat = new double[2 * POINTS];
        for (int i = 0; i < POINTS; i++) {
            lonLat[2 * i] = -10 + 50 * random.nextDouble();
            lonLat[2 * i + 1] = 35 + 35 * random.nextDouble();
        }
        xy = new double[2 * POINTS];
        sisDirect = sisTransform(f);
    }

    @Benchmark
    public double aequaForward() {
        projection.forward(lonLat, 0, xy, 0, POINTS);
        return xy[POINTS];
    }

    /** The SIS transform that aequa wraps, built here with SIS's own API and called directly (NaN for our families). */
    @Benchmark
    public double sisForward() throws Exception {
        if (sisDirect == null) {
            return Double.NaN;
        }
        sisDirect.transform(lonLat, 0, xy, 0, POINTS);
        return xy[POINTS];
    }

    private static MathTransform sisTransform(ProjectionFamily family) throws Exception {
        String method;
        switch (family) {
            case LAMBERT_AZIMUTHAL:
                method = "Lambert Azimuthal Equal Area";
                break;
            case ALBERS_CONIC:
                method = "Albers Equal Area";
                break;
            case CYLINDRICAL:
                method = "Lambert Cylindrical Equal Area";
                break;
            default:
                return null;
        }
        var builder = DefaultMathTransformFactory.provider().builder(method);
        ParameterValueGroup p = builder.parameters();
        p.parameter("semi_major").setValue(6378137.0);
        p.parameter("semi_minor").setValue(6356752.314245179);
        if (family == ProjectionFamily.LAMBERT_AZIMUTHAL) {
            p.parameter("Latitude of natural origin").setValue(50.0);
            p.parameter("Longitude of natural origin").setValue(10.0);
        } else if (family == ProjectionFamily.ALBERS_CONIC) {
            p.parameter("Latitude of false origin").setValue(50.0);
            p.parameter("Longitude of false origin").setValue(10.0);
            p.parameter("Latitude of 1st standard parallel").setValue(40.0);
            p.parameter("Latitude of 2nd standard parallel").setValue(60.0);
        } else {
            p.parameter("Longitude of natural origin").setValue(10.0);
            p.parameter("Latitude of 1st standard parallel").setValue(40.0);
        }
        return builder.create();
    }
}
