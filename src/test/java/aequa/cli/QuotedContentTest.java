package aequa.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** A file that is not what it should be is quoted in messages only as a short, escaped excerpt. */
class QuotedContentTest {

    private final StringWriter out = new StringWriter();
    private final StringWriter err = new StringWriter();

    @TempDir
    Path tmp;

    private Path scaffolded() {
        Path project = tmp.resolve("project");
        assertEquals(0, Main.run(new String[] {"scaffold", project.toString()}, new PrintWriter(out, true),
                new PrintWriter(err, true)));
        return project;
    }

    private int audit(Path project) {
        return Main.run(new String[] {"audit", project.toString()}, new PrintWriter(out, true), new PrintWriter(err, true));
    }

    @Test
    void aTokenInARegionFileIsCut() throws IOException {
        Path project = scaffolded();
        String token = "ghp_" + "0123456789abcdef".repeat(10);
        Files.writeString(project.resolve("regions/districts.geojson"), token + "\n");
        assertEquals(1, audit(project));
        assertTrue(err.toString().contains("Unrecognized token '" + token.substring(0, 24) + "..."), err.toString());
        assertFalse(err.toString().contains(token.substring(0, 40)), "the token was printed whole: " + err);
    }

    @Test
    void aHeaderRowIsQuotedShortAndEscaped() throws IOException {
        Path project = scaffolded();
        String header = "root:x:0:0:root:/root:/bin/bash\u001b]0;owned\u0007" + "y".repeat(300);
        Files.writeString(project.resolve("figures/districts.csv"), header + "\nNW\n");
        assertEquals(1, audit(project));
        assertFalse(err.toString().contains("\u001b"), "a terminal escape was printed");
        assertFalse(err.toString().contains("y".repeat(40)), "the header was printed whole");
        assertTrue(err.toString().contains("\"root:x:0:0:root:/root:/b... ("), err.toString());
    }
}
