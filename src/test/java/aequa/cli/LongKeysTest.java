package aequa.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** A key of a million characters is reported in a few words, quickly, and never printed whole. */
class LongKeysTest {

    private final StringWriter out = new StringWriter();
    private final StringWriter err = new StringWriter();

    private int run(String... args) {
        return Main.run(args, new PrintWriter(out, true), new PrintWriter(err, true));
    }

    @Test
    void hugeRegionAndStatisticsKeysAreReportedWithAnExcerpt(@TempDir Path tmp) throws IOException {
        Path project = tmp.resolve("project");
        assertEquals(0, run("scaffold", project.toString()));
        String hugeRegionKey = "K".repeat(1_000_000);
        String hugeFigureKey = "U".repeat(1_000_000);
        Path regions = project.resolve("regions/districts.geojson");
        Files.writeString(regions, Files.readString(regions).replace("\"code\":\"NW\"", "\"code\":\"" + hugeRegionKey + "\""));
        Path csv = project.resolve("figures/districts.csv");
        Files.writeString(csv, Files.readString(csv) + hugeFigureKey + ",Long,1.0\n");

        long start = System.nanoTime();
        assertEquals(1, run("audit", project.toString()));
        long elapsedMs = (System.nanoTime() - start) / 1_000_000;

        String messages = err.toString();
        assertTrue(messages.contains("feature 1: The key \"" + "K".repeat(24) + "... (1,000,000 characters)\" is too long"),
                messages.substring(0, Math.min(2000, messages.length())));
        assertTrue(messages.contains("row 6: The key \"" + "U".repeat(24) + "..."), "statistics row reported");
        assertTrue(messages.length() < 5_000, "a key was printed whole: " + messages.length() + " characters");
        assertTrue(elapsedMs < 30_000, "took " + elapsedMs + " ms");
    }
}
