package aequa.inputs.regions;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.concurrent.TimeUnit;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.junit.jupiter.api.Test;

/**
 * The README's heap promise for the reader, checked in a JVM of its own: a 200 MB GeoJSON, streamed, is
 * read into regions (packed coordinates, 16 bytes a vertex) within a heap of 2.4 times its size (480 MB),
 * the factor the README states for the whole geometry stage.
 */
class LargeGeoJsonTest {

    private static final long BYTES = 200_000_000L;

    @Test
    void twoHundredMegabytesStreamWithinTheHeapPromise() throws Exception {
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        Process read = new ProcessBuilder(java, "-Xmx480m", "-XX:+UseParallelGC", "-cp", System.getProperty("java.class.path"),
                LargeGeoJsonStream.class.getName(), Long.toString(BYTES)).redirectErrorStream(true).start();
        String printed = new String(read.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        assertTrue(read.waitFor(5, TimeUnit.MINUTES), printed);
        assertEquals(0, read.exitValue(), printed);
        Matcher counts = Pattern.compile("bytes (\\d+) regions (\\d+) vertices (\\d+) findings 0").matcher(printed);
        assertTrue(counts.find(), printed);
        assertTrue(Long.parseLong(counts.group(1)) >= BYTES, printed);
        long regions = Long.parseLong(counts.group(2));
        assertEquals(regions * (LargeGeoJsonStream.VERTICES_PER_CELL + 1), Long.parseLong(counts.group(3)), printed);
    }
}
