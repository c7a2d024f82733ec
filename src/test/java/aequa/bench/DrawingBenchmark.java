package aequa.bench;

import java.util.List;
import java.util.concurrent.TimeUnit;

import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

import aequa.atlas.MapModel;
import aequa.project.ClassMethod;
import aequa.drawing.DrawnMap;
import aequa.drawing.MapDrawings;
import aequa.drawing.MapFixtures;
import aequa.drawing.Theme;
import aequa.drawing.Themes;
import aequa.drawing.WebSize;

/**
 * A national map of about 3,000 regions (16 vertices each, invented) drawn as a 1,200 px web SVG and as a
 * 1,200 px PNG, warm. Goals from the issue: SVG under 300 ms, PNG under 500 ms.
 * Run: {@code mvn -o -q -Pbench test-compile exec:exec -Dbench=DrawingBenchmark}
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.SampleTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Fork(value = 1, jvmArgsAppend = {"-Djava.awt.headless=true", "-Xmx2g"})
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
public class DrawingBenchmark {

    private MapModel model;
    private Theme theme;

    @Setup
    public void setUp() {
        model = MapFixtures.build(70, 62, List.of("2024"), "choropleth", ClassMethod.QUANTILE, 5, 3);
        theme = Themes.bundled("daylight");
    }

    @Benchmark
    public DrawnMap webSvg() {
        return MapDrawings.webSvg(model, theme, WebSize.STANDARD);
    }

    @Benchmark
    public DrawnMap png() {
        return MapDrawings.png(model, theme, 1200, 1);
    }
}
