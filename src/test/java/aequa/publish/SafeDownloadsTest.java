package aequa.publish;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** CSV injection rules, file-safe ids and the guard that keeps writes inside the output folder. */
class SafeDownloadsTest {

    /** OWASP "CSV Injection" lists = + - @ tab and carriage return as the characters a cell must not start with. */
    @Test
    void cellsThatCouldBeFormulasGetALeadingQuote() {
        for (String risky : List.of("=1+1", "+1", "-1", "@SUM(A1)", "\tx", "\rx")) {
            assertEquals("'" + risky, FiguresCsv.neutralise(risky), risky);
        }
        for (String safe : List.of("Norvale", "1=1", " =x", "", "'already")) {
            assertEquals(safe, FiguresCsv.neutralise(safe), safe);
        }
    }

    @Test
    void csvFollowsRfc4180AndKeepsStatusesApart() {
        String csv = new String(FiguresCsv.write(SiteFixtures.map("m", SiteFixtures.Texts.plain(), 6, 0)),
                StandardCharsets.UTF_8);
        String[] lines = csv.split("\r\n", -1);
        // RFC 4180 section 2: CRLF after each record, header first; 6 regions x 1 period
        assertEquals(8, lines.length);
        assertEquals("", lines[7]);
        assertEquals(String.join(",", FiguresCsv.HEADER.stream().map(h -> "\"" + h + "\"").toList()), lines[0]);
        assertTrue(lines[2].contains("\"no data\""), lines[2]);
        assertTrue(lines[3].contains("\"suppressed\""), lines[3]);
        assertTrue(lines[4].contains("\"not applicable\""), lines[4]);
        assertTrue(lines[5].contains("\"zero\",0,0,1,\"yes\""), lines[5]);
        assertTrue(lines[6].startsWith("\"K005\",\"Region 5\",\"2031\",\"reported\",50,50,2,\"no\",\"\",10000"), lines[6]);
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "Clinics 2031|clinics-2031",
        "../../etc/passwd|etc-passwd",
        "CON|map-con",
        "''|map",
        "Ünïcode Map!|n-code-map",
        ".hidden|hidden",
        "a/b\\c|a-b-c"})
    void idsBecomeFileSafe(String id, String expected) {
        assertEquals(expected, SafePaths.fileSafeId(id));
    }

    @Test
    void duplicateIdsAreMadeDistinct() {
        assertEquals(List.of("a-b", "a-b-2", "a-b-3"), SafePaths.distinctFileSafeIds(List.of("a b", "A-B", "a/b")));
    }

    @Test
    void longIdsAreCut() {
        assertEquals(SafePaths.MAX_ID_LENGTH, SafePaths.fileSafeId("x".repeat(500)).length());
    }

    @Test
    void writesOutsideTheOutputAreRefused() {
        Path root = Path.of("/tmp/out");
        assertEquals(Path.of("/tmp/out/maps/a/index.html"), SafePaths.inside(root, "maps/a/index.html"));
        for (String bad : List.of("../x", "maps/../../x", "/etc/passwd", "", ".", "a\\..\\..\\x")) {
            assertThrows(IllegalArgumentException.class, () -> SafePaths.inside(root, bad), bad);
        }
    }
}
