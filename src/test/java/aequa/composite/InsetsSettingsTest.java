package aequa.composite;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import aequa.atlas.AtlasLoader;
import aequa.atlas.LoadOptions;
import aequa.findings.Finding;
import aequa.findings.Findings;
import aequa.project.LoadedProject;
import aequa.project.ProjectLoader;
import aequa.testing.RealProject;

/**
 * Bad {@code insets} settings are findings with the project file's line and a hint, each fixture with the one
 * problem it must produce (on the US Census Bureau's 2017 states, src/test/resources/geometry/SOURCE.md).
 */
class InsetsSettingsTest {

    @Test
    void wordsCornersScalesAndRepeatedKeysAreCheckedWithTheProjectFile(@TempDir Path dir) throws IOException {
        assertEquals(List.of("project-unknown-value@line 6"), projectFindings(dir, "    insets: sometimes"));
        assertEquals(List.of("project-unknown-value@line 7"), projectFindings(dir,
                "    insets:\n      - { regions: [\"02\"], corner: middle }"));
        assertEquals(List.of("project-bad-value@line 7"), projectFindings(dir,
                "    insets:\n      - { regions: [\"02\"], scale: 0 }"));
        assertEquals(List.of("insets-key-twice@line 8"), projectFindings(dir,
                "    insets:\n      - { regions: [\"02\"] }\n      - { regions: [\"15\", \"02\"] }"));
        assertEquals(List.of("insets-empty-part@line 7"), projectFindings(dir, "    insets:\n      - { name: Nothing }"));
    }

    @Test
    void unknownKeysAndPartsWithoutRegionsAreFoundAgainstTheRegions(@TempDir Path dir) throws IOException {
        assertEquals(List.of("insets-unknown-key@line 7"), atlasFindings(dir,
                "    insets:\n      - { regions: [\"99\"] }"));
        assertEquals(List.of("insets-empty-part@line 7"), atlasFindings(dir,
                "    insets:\n      - { box: [0, 0, 1, 1] }"));
        assertEquals(List.of(), atlasFindings(dir, "    insets:\n      - { name: Hawaii, box: [-161, 18, -154, 23] }"));
    }

    @Test
    void aRegionSourcesSettingAppliesUnlessTheMapHasItsOwn(@TempDir Path dir) throws IOException {
        project(dir, "    insets: auto");
        Path file = dir.resolve("aequa.yaml");
        Files.writeString(file, Files.readString(file).replace("name: name }", "name: name, insets: off }"));
        Findings findings = new Findings();
        var atlas = AtlasLoader.load(ProjectLoader.load(dir, findings).orElseThrow(), LoadOptions.defaults(), findings);
        assertEquals(6, atlas.maps().get(0).parts().size(), "the map's own 'auto' wins over the source's 'off'");
        Files.writeString(file, Files.readString(file).replace("    insets: auto\n", ""));
        atlas = AtlasLoader.load(ProjectLoader.load(dir, findings).orElseThrow(), LoadOptions.defaults(), findings);
        assertEquals(List.of(), atlas.maps().get(0).parts(), "the source's 'off' applies");
    }

    private static List<String> projectFindings(Path dir, String insets) throws IOException {
        Findings findings = new Findings();
        ProjectLoader.load(project(dir, insets), findings);
        return codes(findings);
    }

    private static List<String> atlasFindings(Path dir, String insets) throws IOException {
        Findings findings = new Findings();
        LoadedProject loaded = ProjectLoader.load(project(dir, insets), findings).orElseThrow();
        AtlasLoader.load(loaded, LoadOptions.defaults(), findings);
        return codes(findings);
    }

    private static List<String> codes(Findings findings) {
        return findings.list().stream().filter(f -> f.code().startsWith("insets-") || f.code().startsWith("project-"))
                .map(InsetsSettingsTest::codeAndLine).toList();
    }

    private static String codeAndLine(Finding f) {
        assertTrue(!f.hint().isBlank(), f.code() + " has a hint");
        assertEquals("aequa.yaml", f.file());
        return f.code() + "@" + f.place().replaceAll(", column \\d+", "");
    }

    private static Path project(Path dir, String insets) throws IOException {
        return RealProject.in(dir).regions("states", "us-states-2017.geojson")
                .figures("states", "id", "n", properties -> properties.path("id").asText().substring(1, 2))
                .projectFile(
                "regions: { states: { file: regions/states.geojson, key: id, name: name } }",
                "figures: { states: { file: figures/states.csv, key: code } }",
                "maps:",
                "  - id: states",
                "    regions: states",
                insets,
                "    figures: states",
                "    indicator: n",
                "    measure: rate");
    }
}
