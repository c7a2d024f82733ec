package aequa.project;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import aequa.findings.Finding;
import aequa.findings.Findings;

/** {@code largest-circle-mm} is bounded and belongs to circle maps; a bad value is reported at its line. */
class CircleSettingTest {

    @TempDir
    Path dir;

    private List<Finding> load(String mapLines) throws IOException {
        Files.createDirectories(dir.resolve("regions"));
        Files.createDirectories(dir.resolve("figures"));
        Files.writeString(dir.resolve("regions/r.geojson"), "{\"type\":\"FeatureCollection\",\"features\":[]}");
        Files.writeString(dir.resolve("figures/f.csv"), "code,n\n");
        Files.writeString(dir.resolve(ProjectFile.FILE_NAME), String.join("\n",
                "regions:",
                "  r: { file: regions/r.geojson, key: code }",
                "figures:",
                "  f: { file: figures/f.csv, key: code }",
                "maps:",
                "  - id: m",
                "    regions: r",
                "    figures: f",
                "    indicator: n",
                mapLines, ""));
        Findings findings = new Findings();
        ProjectLoader.load(dir, findings);
        return findings.list();
    }

    @Test
    void aCircleLargerThanTheBoundIsReportedAtItsLine() throws IOException {
        List<Finding> findings = load("    display: circles\n    largest-circle-mm: 100");
        Finding f = findings.stream().filter(x -> x.code().equals("project-bad-value")).findFirst().orElseThrow();
        assertTrue(f.place().startsWith("line 11"), f.place());
        assertTrue(f.message().contains("from 2 to 40"), f.message());
    }

    @Test
    void aCircleSizeOnAChoroplethIsReported() throws IOException {
        List<Finding> findings = load("    largest-circle-mm: 10");
        assertEquals(1, findings.stream().filter(x -> x.code().equals("project-bad-value")
                && x.message().contains("only to 'display: circles'")).count(), findings.toString());
    }

    @Test
    void aCircleSizeWithinTheBoundIsAccepted() throws IOException {
        List<Finding> findings = load("    display: circles\n    largest-circle-mm: 12");
        assertTrue(findings.stream().noneMatch(x -> x.code().equals("project-bad-value")), findings.toString());
    }
}
