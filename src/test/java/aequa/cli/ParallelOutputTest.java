package aequa.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Path;
import java.util.Map;
import java.util.concurrent.ForkJoinPool;

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
        Path project = ProjectFolders.copyWithoutCache(Path.of("data-demo"), tmp.resolve(name + "-project"));
        Path site = tmp.resolve(name + "-site");
        StringWriter err = new StringWriter();
        try {
            int code = pool.submit(() -> Main.run(new String[] {"publish", project.toString(), "--out", site.toString()},
                    new PrintWriter(new StringWriter(), true), new PrintWriter(err, true))).get();
            assertEquals(0, code, err.toString());
        } finally {
            pool.shutdown();
        }
        return ProjectFolders.contents(site);
    }
}
