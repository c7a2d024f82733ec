package aequa.bench;

import java.lang.management.ManagementFactory;
import java.lang.management.MemoryPoolMXBean;
import java.lang.management.MemoryType;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.TimeUnit;

import org.locationtech.jts.coverage.CoverageSimplifier;
import org.locationtech.jts.geom.Geometry;
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
import org.openjdk.jmh.annotations.TearDown;
import org.openjdk.jmh.annotations.Warmup;

import aequa.ellipsoid.LonLatDensifier;
import aequa.findings.Findings;
import aequa.inputs.regions.Region;
import aequa.inputs.regions.RegionReaders;
import aequa.planar.CoverageSimplification;
import aequa.planar.PolygonProjector;
import aequa.project.RegionSourceSpec;
import aequa.projection.EqualAreaProjection;
import aequa.projection.Projections;

/**
 * The geometry stage end to end on one core: read GeoJSON (streaming) -> densify -> project (Lambert
 * azimuthal equal-area through SIS) -> coverage simplification for a 1,000-pixel-wide map, on a synthetic
 * Voronoi coverage ({@link SyntheticCoverage}). Throughput = input vertices / time per run. The work runs
 * on one thread; the fork uses the launcher's collector. To hold the whole JVM, collector included, to one
 * processor, replace the fork's options as shown in the second command.
 *
 * <pre>
 * mvn -o -q -Pbench test-compile exec:exec -Dbench="GeometryBenchmark -p cells=100000"
 * mvn -o -q -Pbench test-compile exec:exec -Dbench="GeometryBenchmark -p cells=100000 -jvmArgsAppend '-Xmx4g -XX:+UseParallelGC -XX:ActiveProcessorCount=1'"
 * </pre>
 * Peak heap, in a fresh JVM (run {@link #main} with {@code heap CELLS}), is the sum of the heap pools' peak
 * usage over one run, reported against the GeoJSON file's size; the figure that matters is the smallest
 * {@code -Xmx} with which that run completes. {@code stages CELLS RUNS} times each stage separately, for
 * finding where the time goes, and keeps the baseline our coverage simplifier replaced: JTS's
 * {@code CoverageSimplifier} on the same projected coverage at the same tolerance, with its time and the
 * vertices each keeps.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.SingleShotTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Fork(value = 1, jvmArgsAppend = {"-Xmx4g", "-XX:+UseParallelGC"}) // the collector the ./aequa launcher asks for
@Warmup(iterations = 2)
@Measurement(iterations = 9)
public class GeometryBenchmark {

    /** Map width the tolerance and densification are chosen for, pixels. */
    private static final double OUTPUT_WIDTH_PX = 1000;

    @Param({"100000"})
    public int cells;

    private Path dir;
    private long vertices;

    @Setup(Level.Trial)
    public void writeCoverage() throws Exception {
        dir = Files.createTempDirectory("aequa-bench");
        vertices = SyntheticCoverage.write(dir.resolve("cells.geojson"), cells, 20261202L);
        System.out.printf(Locale.ROOT, "%n%d cells, %d vertices, %.1f MB of GeoJSON%n", cells, vertices,
                Files.size(dir.resolve("cells.geojson")) / 1e6);
    }

    @TearDown(Level.Trial)
    public void deleteCoverage() throws Exception {
        Files.deleteIfExists(dir.resolve("cells.geojson"));
        Files.deleteIfExists(dir);
    }

    @Benchmark
    public List<Geometry> readDensifyProjectSimplify() {
        return run(dir);
    }

    /** One end-to-end run; returns the simplified coverage. */
    static List<Geometry> run(Path dir) {
        Findings findings = new Findings();
        List<Region> regions = new ArrayList<>(RegionReaders.read(dir, new RegionSourceSpec("cells.geojson", "@id", "name", ""), findings));
        if (findings.hasErrors()) {
            throw new IllegalStateException(findings.list().toString());
        }
        EqualAreaProjection laea = Projections.lambertAzimuthal(SyntheticCoverage.BOX.centre().x, SyntheticCoverage.BOX.centre().y);
        double mapWidthM = 4_000_000; // the box is about 3,500 km wide at 52.5 N
        double stepDeg = LonLatDensifier.stepDeg(mapWidthM, OUTPUT_WIDTH_PX);
        PolygonProjector projector = new PolygonProjector(laea, stepDeg);
        List<String> keys = new ArrayList<>(regions.size());
        List<Geometry> planar = new ArrayList<>(regions.size());
        for (int i = 0; i < regions.size(); i++) {
            Region region = regions.set(i, null); // lon/lat no longer needed once projected: let it go
            keys.add(region.key());
            planar.add(projector.project(LonLatDensifier.densify(region.lonLat(), stepDeg)));
        }
        double toleranceM = CoverageSimplification.screenToleranceM(mapWidthM, OUTPUT_WIDTH_PX);
        return CoverageSimplification.simplify(keys, planar, toleranceM, CoverageSimplification.islandThresholdM2(toleranceM)).planarM();
    }

    /**
     * {@code heap CELLS}: one run in this JVM, then peak heap against file size; prints one line.
     * {@code stages CELLS RUNS}: RUNS runs in this JVM, each stage timed; prints a line per run.
     */
    public static void main(String[] args) throws Exception {
        if (args[0].equals("stages")) {
            stages(Integer.parseInt(args[1]), Integer.parseInt(args[2]));
            return;
        }
        int cells = Integer.parseInt(args[1]);
        Path dir = Files.createTempDirectory("aequa-heap");
        long vertices = SyntheticCoverage.write(dir.resolve("cells.geojson"), cells, 20261202L);
        long fileBytes = Files.size(dir.resolve("cells.geojson"));
        System.gc();
        List<MemoryPoolMXBean> heapPools = new ArrayList<>();
        for (MemoryPoolMXBean pool : ManagementFactory.getMemoryPoolMXBeans()) {
            if (pool.getType() == MemoryType.HEAP) {
                pool.resetPeakUsage();
                heapPools.add(pool);
            }
        }
        long start = System.nanoTime();
        int kept = run(dir).size();
        double seconds = (System.nanoTime() - start) / 1e9;
        long peak = heapPools.stream().mapToLong(p -> p.getPeakUsage().getUsed()).sum();
        System.out.printf(Locale.ROOT, "cells=%d vertices=%d file=%.1f MB peakHeap=%.1f MB ratio=%.2f time=%.2f s (%.2f M vertices/s) kept=%d%n",
                cells, vertices, fileBytes / 1e6, peak / 1e6, (double) peak / fileBytes, seconds, vertices / seconds / 1e6, kept);
        Files.delete(dir.resolve("cells.geojson"));
        Files.delete(dir);
    }

    private static long vertexCount(List<Geometry> coverage) {
        return coverage.stream().mapToLong(Geometry::getNumPoints).sum();
    }

    private static void stages(int cells, int runs) throws Exception {
        Path dir = Files.createTempDirectory("aequa-stages");
        long vertices = SyntheticCoverage.write(dir.resolve("cells.geojson"), cells, 20261202L);
        for (int run = 0; run < runs; run++) {
            long t0 = System.nanoTime();
            Findings findings = new Findings();
            List<Region> regions = RegionReaders.read(dir, new RegionSourceSpec("cells.geojson", "@id", "name", ""), findings);
            long t1 = System.nanoTime();
            EqualAreaProjection laea = Projections.lambertAzimuthal(SyntheticCoverage.BOX.centre().x, SyntheticCoverage.BOX.centre().y);
            double mapWidthM = 4_000_000;
            double stepDeg = LonLatDensifier.stepDeg(mapWidthM, OUTPUT_WIDTH_PX);
            List<String> keys = new ArrayList<>(regions.size());
            List<Geometry> dense = new ArrayList<>(regions.size());
            for (Region region : regions) {
                keys.add(region.key());
                dense.add(LonLatDensifier.densify(region.lonLat(), stepDeg));
            }
            long t2 = System.nanoTime();
            PolygonProjector projector = new PolygonProjector(laea, stepDeg);
            List<Geometry> planar = new ArrayList<>(regions.size());
            for (Geometry geometry : dense) {
                planar.add(projector.project(geometry));
            }
            long t3 = System.nanoTime();
            double toleranceM = CoverageSimplification.screenToleranceM(mapWidthM, OUTPUT_WIDTH_PX);
            List<Geometry> ours = CoverageSimplification.simplify(keys, planar, toleranceM,
                    CoverageSimplification.islandThresholdM2(toleranceM)).planarM();
            long t4 = System.nanoTime();
            // the baseline: JTS's own coverage simplifier (VW on a shared-edge coverage) at the same tolerance
            Geometry[] jts = CoverageSimplifier.simplify(planar.toArray(new Geometry[0]), toleranceM);
            long t5 = System.nanoTime();
            System.out.printf(Locale.ROOT, "read %.2f s, densify %.2f s, project %.2f s, simplify %.2f s: %.2f s (%.2f M vertices/s);"
                            + " JTS CoverageSimplifier %.2f s (%.1f times ours), vertices kept: ours %d, JTS %d%n",
                    (t1 - t0) / 1e9, (t2 - t1) / 1e9, (t3 - t2) / 1e9, (t4 - t3) / 1e9, (t4 - t0) / 1e9, vertices / ((t4 - t0) / 1e3),
                    (t5 - t4) / 1e9, (double) (t5 - t4) / (t4 - t3), vertexCount(ours), vertexCount(java.util.Arrays.asList(jts)));
        }
        Files.delete(dir.resolve("cells.geojson"));
        Files.delete(dir);
    }
}
