package aequa.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** A file that is not what it should be is quoted in messages only as a short, escaped excerpt. */
class QuotedContentTest {

    private final CliSession cli = new CliSession();

    @TempDir
    Path tmp;

    @Test
    void aTokenInARegionFileIsCut() throws IOException {
        Path project = cli.scaffold(tmp.resolve("project"));
        String token = "ghp_" + "0123456789abcdef".repeat(10);
        Files.writeString(project.resolve("regions/districts.geojson"), token + "\n");
        assertEquals(1, cli.run("audit", project.toString()));
        assertTrue(cli.errText().contains("Unrecognized token '" + token.substring(0, 24) + "..."), cli.errText());
        assertFalse(cli.errText().contains(token.substring(0, 40)), "the token was printed whole: " + cli.errText());
    }

    @Test
    void aHeaderRowIsQuotedShortAndEscaped() throws IOException {
        Path project = cli.scaffold(tmp.resolve("project"));
        String header = "root:x:0:0:root:/root:/bin/bash\u001b]0;owned\u0007" + "y".repeat(300);
        Files.writeString(project.resolve("figures/districts.csv"), header + "\nNW\n");
        assertEquals(1, cli.run("audit", project.toString()));
        assertFalse(cli.errText().contains("\u001b"), "a terminal escape was printed");
        assertFalse(cli.errText().contains("y".repeat(40)), "the header was printed whole");
        assertTrue(cli.errText().contains("\"root:x:0:0:root:/root:/b... ("), cli.errText());
    }

    @Test
    void aValueThatIsNotANumberIsQuotedShort() throws IOException {
        Path project = cli.scaffold(tmp.resolve("project"));
        Path csv = project.resolve("figures/districts.csv");
        Files.writeString(csv, Files.readString(csv).replace("NW,Ashgrove,12.5", "NW,Ashgrove,\"" + "z".repeat(5000) + "\""));
        assertEquals(1, cli.run("audit", project.toString()));
        assertTrue(cli.errText().contains("The value \"" + "z".repeat(24) + "... (5,000 characters)\""), cli.errText());
    }
}
