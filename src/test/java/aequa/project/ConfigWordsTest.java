package aequa.project;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import aequa.findings.Finding;
import aequa.findings.Findings;

/**
 * The modes of the project file are read into enums once, by {@link ProjectLoader}: known words become
 * constants, every unknown word is one {@code project-unknown-value} finding at its own line and column
 * naming the allowed words, and all of them are reported in one run.
 */
class ConfigWordsTest {

    @TempDir
    Path dir;

    private Findings load(String maps) throws IOException {
        Files.createDirectories(dir.resolve("data"));
        Files.writeString(dir.resolve("data/r.geojson"), "{\"type\":\"FeatureCollection\",\"features\":[]}", StandardCharsets.UTF_8);
        Files.writeString(dir.resolve("data/f.csv"), "code,rate\n", StandardCharsets.UTF_8);
        Files.writeString(dir.resolve(ProjectFile.FILE_NAME), """
                regions:
                  r: { file: data/r.geojson, key: code }
                figures:
                  f: { file: data/f.csv, key: code }
                maps:
                """ + maps, StandardCharsets.UTF_8);
        Findings findings = new Findings();
        loaded = ProjectLoader.load(dir, findings);
        return findings;
    }

    private Optional<LoadedProject> loaded;

    @Test
    void knownWordsBecomeConstants() throws IOException {
        Findings findings = load("""
                  - id: a
                    regions: r
                    figures: f
                    indicator: rate
                    measure: count
                    normalise: area
                    display: circles
                    classes: { method: std-dev, count: 4 }
                    colours: { scheme: Diverging }
                """);
        assertEquals(List.of(), findings.list());
        MapSpec map = loaded.orElseThrow().file().maps().get(0);
        assertEquals(Measure.COUNT, map.measure());
        assertEquals(Normalisation.AREA, map.normalise());
        assertEquals(MapDisplay.CIRCLES, map.display());
        assertEquals(ClassMethod.STANDARD_DEVIATION, map.classes().method());
        assertEquals(ColourScheme.DIVERGING, map.colours().scheme(), "words are read in lower case");
    }

    @Test
    void leftOutModesTakeTheirDocumentedDefaults() throws IOException {
        load("  - { id: a, regions: r, figures: f, indicator: rate }\n");
        MapSpec map = loaded.orElseThrow().file().maps().get(0);
        // README, "The project file": the defaults of each key
        assertEquals(Measure.UNDECLARED, map.measure());
        assertEquals(Normalisation.NONE, map.normalise());
        assertEquals(MapDisplay.CHOROPLETH, map.display());
        assertEquals(ClassMethod.QUANTILE, map.classes().method());
        assertEquals(ColourScheme.SEQUENTIAL, map.colours().scheme());
        assertEquals(MissingFigures.WARNING, loaded.get().file().checks().missingFigures());
        assertEquals(TableLayout.WIDE, loaded.get().file().figures().get("f").layout());
        assertEquals(KeyMatching.EXACT, loaded.get().file().figures().get("f").keyMatching());
    }

    @Test
    void everyUnknownWordIsReportedAtItsPlaceWithTheAllowedWords() throws IOException {
        Findings findings = load("""
                  - id: a
                    regions: r
                    figures: f
                    indicator: rate
                    display: bubbles
                    classes: { method: jenks }
                    colours: { scheme: rainbow }
                """);
        assertTrue(loaded.isEmpty(), "a project file with an unknown word is not used");
        List<Finding> found = findings.list();
        assertEquals(List.of("project-unknown-value", "project-unknown-value", "project-unknown-value"),
                found.stream().map(Finding::code).toList(), found.toString());
        assertEquals("line 10, column 14", found.get(0).place());
        assertEquals("Use one of: 'choropleth', 'circles'.", found.get(0).hint());
        assertEquals("line 11, column 24", found.get(1).place());
        assertTrue(found.get(1).message().contains("'jenks'"), found.get(1).message());
        assertTrue(found.get(1).hint().contains("'natural-breaks'") && found.get(1).hint().contains("'std-dev'"), found.get(1).hint());
        assertEquals("line 12, column 24", found.get(2).place());
        assertEquals("Use one of: 'sequential', 'diverging', 'qualitative'.", found.get(2).hint());
    }

    @Test
    void aListWhereAWordBelongsIsAWrongType() throws IOException {
        Findings findings = load("  - { id: a, regions: r, figures: f, indicator: rate, display: [circles] }\n");
        assertTrue(loaded.isEmpty());
        assertEquals("project-wrong-type", findings.list().get(0).code(), findings.list().toString());
    }

    @Test
    void wordsAreUniqueWithinEachTable() {
        for (Class<? extends ConfigWord> type : List.of(MapDisplay.class, Measure.class, Normalisation.class, ClassMethod.class,
                ColourScheme.class, MissingFigures.class, TableLayout.class, KeyMatching.class)) {
            List<String> words = java.util.Arrays.stream(type.getEnumConstants()).map(ConfigWord::configName).toList();
            assertEquals(words.size(), words.stream().distinct().count(), type.getSimpleName());
        }
    }
}
