package aequa.bench;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Random;
import java.util.stream.Stream;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;

/**
 * What users wait for: whole {@code ./aequa} processes, each a cold JVM, over a real file (the 3,231 US
 * counties) or a synthetic coverage ({@link SyntheticCoverage}), with one column of figures invented for the
 * benchmark (seeded). Scenarios, in this order in every round:
 * <ol>
 * <li>{@code full}: publish into an empty folder with no cache (the project's {@code .aequa-cache} deleted);</li>
 * <li>{@code no change}: the same publish again;</li>
 * <li>{@code figures only}: one cell of the figures changed, then publish (the monthly update);</li>
 * <li>{@code audit}: check every input (the geometry cache present, as after any publish);</li>
 * <li>{@code --version}: the JVM's start alone.</li>
 * </ol>
 * One unmeasured round first builds the launcher's class-data archive and fills the disk cache. Times are
 * medians over the rounds, from GNU time ({@code /usr/bin/time}: wall, user + system CPU, peak resident set
 * size); without it, wall times only. With {@code heap}, a last full publish runs with {@code -Xmx} set to
 * three times the GeoJSON's size, and says whether it completed.
 *
 * <pre>
 * mvn -o -q test-compile exec:java -Dexec.classpathScope=test -Dexec.mainClass=aequa.bench.WholeProcessBenchmark \
 *     -Dexec.args="counties ../shared/data/us-counties-2017.geojson 5"
 * mvn -o -q test-compile exec:java -Dexec.classpathScope=test -Dexec.mainClass=aequa.bench.WholeProcessBenchmark \
 *     -Dexec.args="synthetic 100000 5 heap"
 * </pre>
 * Run it from the repository's root (it starts {@code ./aequa}); the projects go to a temporary folder that
 * is deleted at the end.
 */
public final class WholeProcessBenchmark {

    private static final String[] SCENARIOS = {"full", "no change", "figures only", "audit", "--version"};
    private static final Path TIME = Path.of("/usr/bin/time");

    private final Path launcher = Path.of("aequa").toAbsolutePath();
    private final Path work;
    private final Path project;
    private final Path out;
    private final Map<String, List<double[]>> samples = new LinkedHashMap<>();

    private WholeProcessBenchmark(Path work) {
        this.work = work;
        this.project = work.resolve("project");
        this.out = work.resolve("site");
        for (String s : SCENARIOS) {
            samples.put(s, new ArrayList<>());
        }
    }

    public static void main(String[] args) throws Exception {
        if (args.length < 2) {
            System.err.println("usage: counties FILE.geojson [RUNS] | synthetic CELLS [RUNS] [heap]");
            System.exit(2);
        }
        int runs = args.length > 2 ? Integer.parseInt(args[2]) : 5;
        boolean heap = args.length > 3 && args[3].equals("heap");
        Path work = Files.createTempDirectory("aequa-whole-process");
        try {
            WholeProcessBenchmark bench = new WholeProcessBenchmark(work);
            Path geometry = bench.project.resolve("regions/regions.geojson");
            Files.createDirectories(geometry.getParent());
            if (args[0].equals("synthetic")) {
                SyntheticCoverage.write(geometry, Integer.parseInt(args[1]), 42);
            } else {
                Files.copy(Path.of(args[1]), geometry);
            }
            bench.writeProject(geometry);
            System.out.printf(Locale.ROOT, "%s: %,d bytes of GeoJSON, %d rounds, %d processors%n", args[0] + " " + args[1],
                    Files.size(geometry), runs, Runtime.getRuntime().availableProcessors());
            bench.round(false); // builds the class-data archive, fills the disk cache
            for (int i = 0; i < runs; i++) {
                bench.round(true);
            }
            bench.printTable();
            if (heap) {
                long xmxMb = 3 * Files.size(geometry) / (1 << 20);
                bench.clean();
                double[] run = bench.run("-Xmx" + xmxMb + "m", "publish", bench.project.toString(), "--out", bench.out.toString());
                System.out.printf(Locale.ROOT, "full publish with -Xmx%dm (3 x the GeoJSON): %s in %.1f s, peak RSS %.0f MB%n",
                        xmxMb, run[3] < 0 ? "FAILED" : "completed", run[0], run[2]);
            }
        } finally {
            deleteTree(work);
        }
    }

    /** A project of one map; two versions of the figures that differ in one cell. */
    private void writeProject(Path geometry) throws IOException {
        List<String> keys = new ArrayList<>();
        for (JsonNode feature : new ObjectMapper().readTree(geometry.toFile()).path("features")) {
            keys.add(feature.path("id").asText());
        }
        Random random = new Random(12);
        StringBuilder csv = new StringBuilder("key,rate\n");
        for (String key : keys) {
            csv.append(key).append(',').append(String.format(Locale.ROOT, "%.1f", 2 + random.nextDouble() * 38)).append('\n');
        }
        Files.createDirectories(project.resolve("figures"));
        Files.writeString(work.resolve("figures-a.csv"), csv);
        String first = keys.get(keys.size() / 2);
        Files.writeString(work.resolve("figures-b.csv"), csv.toString().replaceFirst("\n" + first + ",[0-9.]+\n", "\n" + first + ",41.5\n"));
        Files.copy(work.resolve("figures-a.csv"), project.resolve("figures/figures.csv"));
        Files.writeString(project.resolve("aequa.yaml"), String.join("\n",
                "site:",
                "  title: \"Benchmark: invented figures\"",
                "  publisher: \"aequa benchmark (figures invented)\"",
                "regions:",
                "  regions:",
                "    file: regions/regions.geojson",
                "    key: \"@id\"",
                "figures:",
                "  figures:",
                "    file: figures/figures.csv",
                "    key: key",
                "maps:",
                "  - id: rate",
                "    title: \"An invented rate\"",
                "    regions: regions",
                "    figures: figures",
                "    indicator: rate",
                "    measure: rate",
                "    unit: \"per 100\"",
                "    source: \"Invented for the benchmark\"",
                "    as-of: \"2026\"", ""));
    }

    private void round(boolean record) throws IOException, InterruptedException {
        String p = project.toString();
        String o = out.toString();
        clean();
        keep(record, "full", run(null, "publish", p, "--out", o));
        keep(record, "no change", run(null, "publish", p, "--out", o));
        Path csv = project.resolve("figures/figures.csv");
        boolean isA = Files.mismatch(csv, work.resolve("figures-a.csv")) == -1;
        Files.copy(work.resolve(isA ? "figures-b.csv" : "figures-a.csv"), csv, java.nio.file.StandardCopyOption.REPLACE_EXISTING);
        keep(record, "figures only", run(null, "publish", p, "--out", o));
        keep(record, "audit", run(null, "audit", p));
        keep(record, "--version", run(null, "--version"));
    }

    private void clean() throws IOException {
        deleteTree(out);
        deleteTree(project.resolve(".aequa-cache"));
    }

    private void keep(boolean record, String scenario, double[] run) {
        if (run[3] < 0) {
            throw new IllegalStateException(scenario + " failed");
        }
        if (record) {
            samples.get(scenario).add(run);
        }
    }

    /** Runs the launcher once: {wall s, CPU s, peak RSS MB, exit code (-1 on failure)}. */
    private double[] run(String javaOpts, String... args) throws IOException, InterruptedException {
        Path stats = work.resolve("time.txt");
        List<String> command = new ArrayList<>();
        boolean gnuTime = Files.isExecutable(TIME);
        if (gnuTime) {
            command.addAll(List.of(TIME.toString(), "-q", "-f", "%e %U %S %M", "-o", stats.toString()));
        }
        command.add(launcher.toString());
        command.addAll(Arrays.asList(args));
        ProcessBuilder builder = new ProcessBuilder(command).redirectErrorStream(true)
                .redirectOutput(work.resolve("output.txt").toFile());
        if (javaOpts != null) {
            builder.environment().put("JAVA_OPTS", javaOpts);
        }
        long start = System.nanoTime();
        int code = builder.start().waitFor();
        double wall = (System.nanoTime() - start) / 1e9;
        if (code != 0) {
            System.err.println(String.join(" ", args) + " exited with " + code + ":\n"
                    + Files.readString(work.resolve("output.txt"), StandardCharsets.UTF_8));
            return new double[] {wall, Double.NaN, Double.NaN, -1};
        }
        if (!gnuTime) {
            return new double[] {wall, Double.NaN, Double.NaN, code};
        }
        String[] f = Files.readString(stats).trim().split("\\s+");
        return new double[] {Double.parseDouble(f[0]), Double.parseDouble(f[1]) + Double.parseDouble(f[2]),
                Double.parseDouble(f[3]) / 1024, code};
    }

    private void printTable() {
        double fullWall = median(samples.get("full"), 0);
        double fullCpu = median(samples.get("full"), 1);
        System.out.println("| run | wall, median | CPU (user + system), median | share of a full publish (wall / CPU) | peak RSS, largest |");
        System.out.println("|---|---|---|---|---|");
        for (String s : SCENARIOS) {
            List<double[]> runs = samples.get(s);
            double wall = median(runs, 0);
            double cpu = median(runs, 1);
            double rss = runs.stream().mapToDouble(r -> r[2]).max().orElse(Double.NaN);
            System.out.printf(Locale.ROOT, "| %s | %.2f s | %.2f s | %.0f %% / %.0f %% | %.0f MB |%n", s, wall, cpu,
                    100 * wall / fullWall, 100 * cpu / fullCpu, rss);
        }
    }

    private static double median(List<double[]> runs, int column) {
        double[] values = runs.stream().mapToDouble(r -> r[column]).sorted().toArray();
        int n = values.length;
        return n == 0 ? Double.NaN : n % 2 == 1 ? values[n / 2] : (values[n / 2 - 1] + values[n / 2]) / 2;
    }

    private static void deleteTree(Path root) throws IOException {
        if (!Files.exists(root)) {
            return;
        }
        try (Stream<Path> paths = Files.walk(root)) {
            for (Path path : paths.sorted(Comparator.reverseOrder()).toList()) {
                Files.delete(path);
            }
        }
    }
}
