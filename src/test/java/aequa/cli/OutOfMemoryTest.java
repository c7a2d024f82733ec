package aequa.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Running out of memory ends with a message saying how much memory Java had and how to give it more, and
 * exit code 3, not a raw stack trace and exit 1 (the data-error code). Run in a child JVM with a small heap.
 */
class OutOfMemoryTest {

    @TempDir
    Path tmp;

    @Test
    void aRegionTooLargeForTheHeapGivesAdviceAndExitThree() throws Exception {
        Path project = tmp.resolve("project");
        assertEquals(0, Main.run(new String[] {"scaffold", project.toString()},
                new PrintWriter(new StringWriter()), new PrintWriter(new StringWriter())));
        writeCircle(project.resolve("regions/districts.geojson"), 300_000);

        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        Process child = new ProcessBuilder(java, "-Xmx24m", "-cp", System.getProperty("java.class.path"),
                Main.class.getName(), "audit", project.toString())
                .redirectOutput(ProcessBuilder.Redirect.DISCARD).start();
        String stderr = new String(child.getErrorStream().readAllBytes(), StandardCharsets.UTF_8);
        int code = child.waitFor();

        assertEquals(3, code, stderr);
        assertTrue(stderr.contains("at most 24 MB"), stderr);
        assertTrue(stderr.contains("JAVA_OPTS=-Xmx2g"), stderr);
        assertFalse(stderr.contains("\tat "), "a stack trace was printed: " + stderr);
    }

    /** One region, a circle of {@code vertices} points: about 24 bytes of GeoJSON per point. */
    private static void writeCircle(Path file, int vertices) throws IOException {
        try (Writer w = Files.newBufferedWriter(file, StandardCharsets.UTF_8)) {
            w.write("{\"type\":\"FeatureCollection\",\"features\":[{\"type\":\"Feature\",\"properties\":{\"code\":\"NW\","
                    + "\"name\":\"Ashgrove\"},\"geometry\":{\"type\":\"Polygon\",\"coordinates\":[[");
            for (int i = 0; i <= vertices; i++) {
                double a = 2 * Math.PI * (i % vertices) / vertices;
                w.write(String.format(Locale.ROOT, "%s[%.7f,%.7f]", i == 0 ? "" : ",",
                        10.5 + 0.4 * Math.cos(a), 46.5 + 0.4 * Math.sin(a)));
            }
            w.write("]]}}]}");
        }
    }
}
