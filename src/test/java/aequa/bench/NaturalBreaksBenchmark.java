package aequa.bench;

import java.util.List;
import java.util.Random;
import java.util.concurrent.TimeUnit;

import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

import aequa.classes.Classified;
import aequa.classes.Classifier;
import aequa.project.ClassMethod;
import aequa.project.ClassesSpec;

/**
 * Natural breaks through the classifier front door (sort, exact Fisher programme, rounding, counts) for
 * 10,000 and 100,000 distinct skewed values into 7 classes. Goals (issue 5): under 50 ms and under 2 s warm.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.SampleTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Fork(1)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
public class NaturalBreaksBenchmark {

    @Param({"10000", "100000"})
    public int size;

    private double[] values;
    private final ClassesSpec spec = new ClassesSpec(ClassMethod.NATURAL_BREAKS, 7, List.of(), null);

    @Setup
    public void makeValues() {
        Random random = new Random(20240917);
        values = new double[size];
        for (int i = 0; i < size; i++) {
            values[i] = Math.exp(1.5 * random.nextGaussian()) * 100; // log-normal: skewed like rates
        }
    }

    @Benchmark
    public Classified classify() {
        return Classifier.classify(values, spec, "bench.yaml", "map \"bench\"");
    }
}
