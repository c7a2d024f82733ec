package aequa.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import java.util.TreeMap;
import java.util.concurrent.ForkJoinPool;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Work done in parallel (maps, the formats of a map, regions checked and measured, projection families
 * scored) gives the very bytes of a run on one thread. The demo project (six maps, five geometry sources,
 * small multiples, an antimeridian) is published from scratch inside a fork/join pool of one thread and
 * inside one of four: aequa's parallel streams run in the pool they are started from.
 */
class ParallelOutputTest {

    @TempDir
    Path tmp;

    @Test
    void oneThreadAndFourThreadsPublishTheSameBytes() throws Exception {
        Map<String, String> oneThread = publishIn(new ForkJoinPool(1), "one");
        Map<String, String> fourThreads = publishIn(new ForkJoinPool(4), "four");
        assertTrue(oneThread.size() > 40, "the whole demo site: " + oneThread.keySet());
        assertEquals(oneThread.keySet(), fourThreads.keySet());
        for (String path : oneThread.keySet()) {
            assertTrue(oneThread.get(path).equals(fourThreads.get(path)), path + " differs between 1 and 4 threads");
        }
    }

    private Map<String, String> publishIn(ForkJoinPool pool, String name) throws Exception {
        Path project = copy(Path.of("data-demo"), tmp.resolve(name + "-project"));
        Path site = tmp.resolve(name + "-site");
        StringWriter err = new StringWriter();
        try {
            int code = pool.submit(() -> Main.run(new String[] {"publish", project.toString(), "--out", site.toString()},
                    new PrintWriter(new StringWriter(), true), new PrintWriter(err, true))).get();
            assertEquals(0, code, err.toString());
        } finally {
            pool.shutdown();
        }
        return contents(site);
    }

    private static Path copy(Path from, Path to) throws IOException {
        try (Stream<Path> walk = Files.walk(from)) {
            for (Path p : walk.filter(p -> !p.toString().contains(".aequa-cache")).toList()) {
                Path target = to.resolve(from.relativize(p).toString());
                if (Files.isDirectory(p)) {
                    Files.createDirectories(target);
                } else {
                    Files.copy(p, target);
                }
            }
        }
        return to;
    }

    /** Every file of a site by relative path, with its exact bytes (as ISO 8859-1 text, one char per byte). */
    private static Map<String, String> contents(Path site) throws IOException {
        Map<String, String> files = new TreeMap<>();
        try (Stream<Path> walk = Files.walk(site)) {
            for (Path p : walk.filter(Files::isRegularFile).toList()) {
                files.put(site.relativize(p).toString(), new String(Files.readAllBytes(p), StandardCharsets.ISO_8859_1));
            }
        }
        return files;
    }
}
