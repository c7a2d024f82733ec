package aequa.project;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import aequa.findings.Finding;

/**
 * The classes setting of a map is checked once, where the project file is read, each problem with its line:
 * the classifier takes only a spec these checks accept (ClassifierTest).
 */
class ClassesSettingsTest {

    @TempDir
    Path dir;

    private List<Finding> load(String classes) throws IOException {
        return OneMapProject.findings(dir, "classes", classes);
    }

    private List<String> codes(String classes) throws IOException {
        return load(classes).stream().map(Finding::code).toList();
    }

    @Test
    void aSpecTheClassifierTakesPasses() throws IOException {
        assertEquals(List.of(), codes("{ method: quantile, count: 5 }"));
        assertEquals(List.of(), codes("{ method: manual, breaks: [10, 20, 50] }"));
        assertEquals(List.of(), codes("{ method: diverging, count: 4, midpoint: 0 }"));
    }

    @Test
    void countsOutsideTwoToNine() throws IOException {
        assertEquals(List.of("project-bad-value"), codes("{ method: quantile, count: 1 }"));
        assertEquals(List.of("project-bad-value"), codes("{ method: natural-breaks, count: 10 }"));
    }

    @Test
    void manualBreaksMissingRepeatedDescendingOrNotFiniteNumbers() throws IOException {
        // YAML's .nan and .inf are syntax errors to the project file's parser, but 1e999 reads as infinity
        for (String breaks : List.of("[]", "[5, 5]", "[10, 5]", "[1e999]", "[1, 1e999]")) {
            List<Finding> findings = load("{ method: manual, breaks: " + breaks + " }");
            assertEquals(List.of("project-bad-value"), findings.stream().map(Finding::code).toList(), breaks);
            assertEquals("line 10, column 32", findings.get(0).place(), breaks); // at the key, where the user wrote it
        }
        assertEquals(List.of("project-bad-value"), codes("{ method: manual }"));
    }

    @Test
    void divergingClassesNeedAFiniteMidpoint() throws IOException {
        assertEquals(List.of("project-missing-key"), codes("{ method: diverging, count: 4 }"));
        assertEquals(List.of("project-bad-value"), codes("{ method: diverging, count: 4, midpoint: 1e999 }"));
    }
}
