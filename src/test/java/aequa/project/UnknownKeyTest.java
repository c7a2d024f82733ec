package aequa.project;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import aequa.findings.Finding;
import aequa.findings.Findings;

/** An unknown key is reported at its own line, with the key it was probably meant to be. */
class UnknownKeyTest {

    @TempDir
    Path dir;

    private Finding loadOnlyFinding(String yaml) throws IOException {
        Files.writeString(dir.resolve(ProjectFile.FILE_NAME), yaml, StandardCharsets.UTF_8);
        Findings findings = new Findings();
        Optional<LoadedProject> project = ProjectLoader.load(dir, findings);
        assertTrue(project.isEmpty());
        assertEquals(1, findings.list().size(), findings.list().toString());
        return findings.list().get(0);
    }

    @Test
    void misspeltKeyIsReportedAtItsLineWithTheNearestKnownKey() throws IOException {
        Finding finding = loadOnlyFinding("""
                site:
                  title: "Atlas"
                  theme: daylight
                  language: en
                  publsher: "Us"
                  notice: "Invented."

                regions: {}
                """);
        assertEquals("project-unknown-key", finding.code());
        assertEquals("line 5, column 3", finding.place());
        assertTrue(finding.hint().startsWith("Did you mean 'publisher'?"), finding.hint());
    }

    @Test
    void keyInAnotherCaseIsNamedAsSuch() throws IOException {
        Finding finding = loadOnlyFinding("site:\n  Title: \"Atlas\"\n");
        assertEquals("line 2, column 3", finding.place());
        assertTrue(finding.hint().startsWith("Keys are lower case: write 'title'."), finding.hint());
    }

    @Test
    void unrelatedKeyGetsOnlyTheList() throws IOException {
        Finding finding = loadOnlyFinding("site:\n  title: \"Atlas\"\n  colourway: red\n");
        assertTrue(finding.hint().startsWith("Known keys here: "), finding.hint());
        assertTrue(finding.hint().contains("publisher"), finding.hint());
    }

    @Test
    void editDistanceMatchesTextbookExamples() {
        // Wagner and Fischer 1974; the classic example: kitten -> sitting needs 3 edits
        assertEquals(3, KeySuggestion.editDistance("kitten", "sitting"));
        assertEquals(1, KeySuggestion.editDistance("publsher", "publisher"));
        assertEquals(0, KeySuggestion.editDistance("", ""));
        assertEquals(4, KeySuggestion.editDistance("", "abcd"));
    }
}
