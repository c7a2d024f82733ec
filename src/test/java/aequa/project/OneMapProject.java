package aequa.project;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import aequa.findings.Finding;
import aequa.findings.Findings;

/** A project of one map with one setting under test, read as publish reads it; its setting is on line 10. */
final class OneMapProject {

    private OneMapProject() {
    }

    /** The findings of reading a project in {@code dir} whose map has {@code key: value}. */
    static List<Finding> findings(Path dir, String key, String value) throws IOException {
        Files.writeString(dir.resolve("r.geojson"), "");
        Files.writeString(dir.resolve("f.csv"), "");
        Files.writeString(dir.resolve("aequa.yaml"), "regions:\n  r: { file: r.geojson, key: code }\n"
                + "figures:\n  f: { file: f.csv, key: code }\n"
                + "maps:\n  - id: m\n    regions: r\n    figures: f\n    indicator: x\n    " + key + ": " + value + "\n");
        Findings findings = new Findings();
        assertTrue(ProjectLoader.load(dir, findings).isEmpty() || findings.list().isEmpty(),
                "a project with an error is not loaded");
        return findings.list();
    }
}
