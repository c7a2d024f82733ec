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

/** One vocabulary for every reader: the part-picking word of each source is checked against the file type. */
class SourceVocabularyTest {

    @TempDir
    Path dir;

    private List<Finding> load(String sources) throws IOException {
        for (String file : List.of("a.topojson", "b.zip", "c.xlsx", "d.csv", "e.geojson", "g.sqlite3", "h.ods")) {
            Files.writeString(dir.resolve(file), "");
        }
        Files.writeString(dir.resolve("aequa.yaml"), sources
                + "maps:\n  - { id: m, regions: r, figures: f, indicator: x }\n");
        Findings findings = new Findings();
        ProjectLoader.load(dir, findings);
        return findings.list();
    }

    @Test
    void eachReaderTakesItsOwnWords() throws IOException {
        List<Finding> fine = load("regions:\n  r: { file: a.topojson, key: \"@id\", object: states }\n"
                + "  s: { file: b.zip, key: GEOID, layer: cb_2017_us_state }\n"
                + "figures:\n  f: { file: c.xlsx, key: GEOID, sheet: Counties, header-row: 4 }\n");
        assertEquals(List.of(), fine);
    }

    @Test
    void theFileTypesTheReadersReadAndNoOthers() throws IOException {
        // README, "Input formats": SQLite files end in .sqlite, .sqlite3, .db or .gpkg
        assertEquals(List.of(), load("regions:\n  r: { file: e.geojson, key: code }\n"
                + "figures:\n  f: { file: g.sqlite3, key: code, table: rates }\n"));
        List<Finding> ods = load("regions:\n  r: { file: e.geojson, key: code }\nfigures:\n  f: { file: h.ods, key: code }\n");
        assertEquals(List.of("project-file-type"), ods.stream().map(Finding::code).toList());
        assertEquals(FigureSourceSpec.FILE_TYPES.size(), ods.get(0).hint().split(", ").length, ods.get(0).hint());
    }

    @Test
    void aWordForAnotherFileTypeIsReportedWhereItStands() throws IOException {
        List<Finding> findings = load("regions:\n  r: { file: e.geojson, key: id, object: states }\n"
                + "figures:\n  f:\n    file: d.csv\n    key: code\n    sheet: Data\n");
        assertEquals(List.of("project-setting-not-applicable", "project-setting-not-applicable"),
                findings.stream().map(Finding::code).toList());
        assertEquals("line 2, column 34", findings.get(0).place()); // the key itself, where the user wrote it
        assertEquals("line 7, column 5", findings.get(1).place());
        assertTrue(findings.get(1).hint().contains(".xlsx"), findings.get(1).hint());
    }
}
