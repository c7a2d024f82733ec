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

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Running out of memory ends with a message saying how much memory Java had and how to give it more, and
 * exit code 3, not a raw stack trace and exit 1 (the data-error code). Run in a child JVM with a 16 MB heap,
 * on a region name of 12 million characters (24 MB as a Java string), with the readers' text limit raised
 * above it (README, read limits).
 */
class OutOfMemoryTest {

    @TempDir
    Path tmp;

    @Test
    void aNameTooLargeForTheHeapGivesAdviceAndExitThree() throws Exception {
        Path project = tmp.resolve("project");
        assertEquals(0, Main.run(new String[] {"scaffold", project.toString()},
                new PrintWriter(new StringWriter()), new PrintWriter(new StringWriter())));
        writeHugeName(project.resolve("regions/districts.geojson"), 12_000_000);

        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        Process child = new ProcessBuilder(java, "-Xmx16m", "-Daequa.limit.string-chars=100000000", "-cp", System.getProperty("java.class.path"),
                Main.class.getName(), "audit", project.toString())
                .redirectOutput(ProcessBuilder.Redirect.DISCARD).start();
        String stderr = new String(child.getErrorStream().readAllBytes(), StandardCharsets.UTF_8);
        int code = child.waitFor();

        assertEquals(3, code, stderr);
        assertTrue(stderr.contains("at most 16 MB"), stderr);
        assertTrue(stderr.contains("JAVA_OPTS=-Xmx2g"), stderr);
        assertFalse(stderr.contains("\tat "), "a stack trace was printed: " + stderr);
    }

    /** Replaces the first region's name by {@code chars} letters: one string larger than the whole heap. */
    private static void writeHugeName(Path file, int chars) throws IOException {
        String geojson = Files.readString(file, StandardCharsets.UTF_8);
        try (Writer w = Files.newBufferedWriter(file, StandardCharsets.UTF_8)) {
            int at = geojson.indexOf("\"Ashgrove\"");
            w.write(geojson, 0, at + 1);
            for (int i = 0; i < chars / 1000; i++) {
                w.write("a".repeat(1000));
            }
            w.write(geojson, at + "\"Ashgrove".length(), geojson.length() - at - "\"Ashgrove".length());
        }
    }
}
