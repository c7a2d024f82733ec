package aequa.project;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import aequa.findings.Finding;
import aequa.findings.Findings;

/**
 * A project file without content is called empty, not a value of the wrong type (what the YAML reader
 * alone would say about line 1). YAML 1.2, section 9.1: comments and a document marker carry no content.
 */
class EmptyProjectFileTest {

    @TempDir
    Path dir;

    private List<String> codes(String yaml) throws IOException {
        Files.writeString(dir.resolve(ProjectFile.FILE_NAME), yaml, StandardCharsets.UTF_8);
        Findings findings = new Findings();
        assertTrue(ProjectLoader.load(dir, findings).isEmpty());
        return findings.list().stream().map(Finding::code).toList();
    }

    @Test
    void emptyBlankCommentedAndMarkedFilesAreEmpty() throws IOException {
        assertEquals(List.of("project-file-empty"), codes(""));
        assertEquals(List.of("project-file-empty"), codes("\n  \n"));
        assertEquals(List.of("project-file-empty"), codes("# maps to come\n"));
        assertEquals(List.of("project-file-empty"), codes("---\n# maps to come\n"));
    }

    @Test
    void aBareWordIsNotEmptyButTheWrongType() throws IOException {
        assertEquals(List.of("project-wrong-type"), codes("maps\n"));
    }
}
