package aequa.bench;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.TimeUnit;

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
import org.openjdk.jmh.annotations.Warmup;

import aequa.atlas.Atlas;
import aequa.publish.PublishBenchmarkSupport;
import aequa.publish.PublishOptions;
import aequa.publish.PublishResult;
import aequa.publish.SitePublisher;

/**
 * Full publish versus a rebuild with nothing changed, five maps of 3,000 regions, with stand-in artwork that
 * costs {@value PublishBenchmarkSupport#DRAW_MILLIS} ms per picture (the drawing stage's goal for a
 * 3,000-region SVG is under 300 ms). Run: {@code mvn -o -q -Pbench test-compile exec:exec -Dbench=PublishBenchmark}
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Fork(1)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
public class PublishBenchmark {

    private Atlas atlas;
    private Path out;

    @Setup(Level.Trial)
    public void setUp() throws IOException {
        Path tmp = Files.createTempDirectory("aequa-bench-");
        atlas = PublishBenchmarkSupport.atlas(tmp.resolve("project"), 5, 3000);
        out = tmp.resolve("site");
        SitePublisher.publish(atlas, PublishBenchmarkSupport.artwork(), out, PublishOptions.defaults());
    }

    @Benchmark
    public PublishResult fullPublish() throws IOException {
        PublishBenchmarkSupport.forget(out);
        return SitePublisher.publish(atlas, PublishBenchmarkSupport.artwork(), out, PublishOptions.defaults());
    }

    @Benchmark
    public PublishResult rebuildNothingChanged() throws IOException {
        return SitePublisher.publish(atlas, PublishBenchmarkSupport.artwork(), out, PublishOptions.defaults());
    }
}
